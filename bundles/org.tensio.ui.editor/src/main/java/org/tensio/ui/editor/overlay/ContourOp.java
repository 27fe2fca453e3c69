package org.tensio.ui.editor.overlay;

import java.util.HashMap;
import java.util.Map;

import org.tensio.engine.checks.FatigueCheckOp;
import org.tensio.engine.checks.UnitStressField;
import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.linalg.ProgressMonitor;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.mesh.Mesh;
import org.tensio.engine.mesh.MeshOptions;
import org.tensio.engine.project.Project;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Criterion;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * Computes a contour with the engine service: properties and finite-element solution of the section, its unit
 * stress fields at every mesh node ({@link UnitStressField}) and the forces of the station's case or
 * combination ({@link Project#forces}); the utilisation over the material's built-in and contributed criteria
 * ({@link StaticUtilisation}, as the engine's check); for {@link Quantity#FATIGUE_UTILISATION} the fatigue
 * utilisation of the station's load history at every node ({@link FatigueCheckOp#sampleUtilisation}: the check's
 * own numbers, so on the default mesh the contour's maximum is the check's governing fatigue utilisation). Runs
 * off the UI thread; cancellable through the monitor.
 */
public final class ContourOp {

    private ContourOp() {
    }

    /**
     * @throws java.util.concurrent.CancellationException when {@code monitor} cancels
     * @throws IllegalArgumentException                   naming the station, case (load history) or section when
     *                                                    unknown, or a criterion not contributed to the engine
     */
    public static ContourResult compute(SectionAnalysisService service, ContourRequest r, ProgressMonitor monitor) {
        Project project = r.project();
        Section section = project.section(r.sectionId());
        SectionProperties props = service.properties(section);
        FiniteElementSolution fe = r.targetElements() == MeshOptions.DEFAULT_ELEMENTS ? service.solution(section)
                : service.solution(section, MeshOptions.elements(r.targetElements()), monitor);
        if (monitor.isCancelled()) {
            throw new java.util.concurrent.CancellationException();
        }
        Mesh mesh = fe.mesh();
        double[] x = new double[mesh.nodeCount()];
        double[] y = new double[mesh.nodeCount()];
        for (int i = 0; i < x.length; i++) {
            x[i] = mesh.x(i);
            y[i] = mesh.y(i);
        }
        int[] elements = new int[6 * mesh.elementCount()];
        for (int e = 0; e < mesh.elementCount(); e++) {
            for (int k = 0; k < 6; k++) {
                elements[6 * e + k] = mesh.node(e, k);
            }
        }
        double[] values = null;
        double min = Double.NaN;
        double max = Double.NaN;
        if (r.stationId() != null && r.caseId() != null) {
            UnitStressField field;
            double[] sampleValues;
            if (r.quantity().fatigue()) {
                FatigueCheckOp.SampleUtilisation u = new FatigueCheckOp(project, service)
                        .sampleUtilisation(r.stationId(), r.caseId(), fe);
                field = u.field();
                sampleValues = u.utilisation();
            } else {
                field = UnitStressField.of(section, props, fe);
                sampleValues = stresses(project, service, r, field);
            }
            Map<String, Integer> sample = new HashMap<>();
            for (int i = 0; i < field.size(); i++) {
                sample.put(field.node(i) + "/" + field.material(i), i); //$NON-NLS-1$
            }
            values = new double[elements.length];
            min = Double.POSITIVE_INFINITY;
            max = Double.NEGATIVE_INFINITY;
            for (int e = 0; e < mesh.elementCount(); e++) {
                String material = section.parts().get(mesh.part(e)).material().name();
                for (int k = 0; k < 6; k++) {
                    Integer i = sample.get(elements[6 * e + k] + "/" + material); //$NON-NLS-1$
                    double v = i == null ? Double.NaN : sampleValues[i];
                    values[6 * e + k] = v;
                    if (Double.isFinite(v)) {
                        min = Math.min(min, v);
                        max = Math.max(max, v);
                    }
                }
            }
            if (min > max) {
                min = Double.NaN;
                max = Double.NaN;
            }
        }
        return new ContourResult(r, x, y, elements, values, min, max, props.centroid(), props.principalAngleDeg(),
                props.shearCentre() != null ? props.shearCentre() : fe.shearCentre(), project.units().stressUnit());
    }

    /** @return per sample of {@code field} the stress quantity or static utilisation of the request's case */
    private static double[] stresses(Project project, SectionAnalysisService service, ContourRequest r,
            UnitStressField field) {
        InternalForces f = project.forces(r.stationId(), r.caseId());
        double[] s = new double[field.size()];
        double[] zx = new double[field.size()];
        double[] zy = new double[field.size()];
        field.evaluate(f, s, zx, zy);
        StaticUtilisation utilisation = new StaticUtilisation(project, service);
        double[] out = new double[field.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = switch (r.quantity()) {
            case SIGMA_Z -> s[i];
            case TAU -> Math.hypot(zx[i], zy[i]);
            case VON_MISES -> MaterialLimits.demand(Criterion.vonMises, s[i], zx[i], zy[i]);
            case UTILISATION -> utilisation.at(field.material(i), s[i], zx[i], zy[i]);
            case FATIGUE_UTILISATION -> throw new IllegalStateException("fatigue utilisation is not a stress of a case");
            };
        }
        return out;
    }
}
