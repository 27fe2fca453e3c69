package org.tensio.cli;

import java.util.List;

import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.mesh.MeshOptions;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * What the properties report says about the finite-element torsion and shear solution of one section: the
 * solution on the default mesh, optionally the one on a refined mesh, or the reason it failed.
 */
record TorsionReport(FiniteElementSolution solution, FiniteElementSolution refined, String error) {

    static TorsionReport of(SectionAnalysisService engine, Section s, SectionProperties p, boolean convergence) {
        try {
            FiniteElementSolution f = engine.solution(s);
            FiniteElementSolution r = null;
            if (convergence) {
                r = engine.solution(s, MeshOptions.defaults().refined(), null);
            }
            return new TorsionReport(f, r, null);
        } catch (RuntimeException e) {
            return new TorsionReport(null, null, e.getMessage() == null ? e.toString() : e.getMessage());
        }
    }

    List<Double> shearCoefficients() {
        if (solution == null || !solution.hasShearFields()) {
            return null;
        }
        double[] sa = solution.shearAreas();
        double a = solution.geometricArea();
        return List.of(sa[0] / a, sa[1] / a);
    }
}
