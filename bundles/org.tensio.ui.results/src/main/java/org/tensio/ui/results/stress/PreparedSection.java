package org.tensio.ui.results.stress;

import java.nio.file.Path;

import org.tensio.engine.checks.FatiguePointOp;
import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.project.Project;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.spi.Extensions;

/**
 * What evaluating a point of one section needs, all computed beforehand: the project, the section, its exact
 * properties with torsion, its finite-element solution (mesh, smoothed fields and point locator), the engine's
 * contributions (for contributed criteria) and, when the project checks fatigue, the fatigue evaluator of the
 * section. With this, a point costs an evaluation only (no mesh, no solve). Immutable except for the fatigue
 * evaluator's cache of resolved rules (its evaluations are serialised).
 *
 * @param file       the project file
 * @param project    the project read from it
 * @param section    the section
 * @param props      its properties ({@code SectionAnalysisService.properties})
 * @param solution   its finite-element solution, or null when the engine could not solve it (elementary shear and
 *                   closed-form torsion only)
 * @param extensions the engine's contributions (contributed criteria of the materials)
 * @param fatigue    the fatigue evaluator at a point, or null when the project has no fatigue station or there is
 *                   no finite-element solution
 */
public record PreparedSection(Path file, Project project, Section section, SectionProperties props,
        FiniteElementSolution solution, Extensions extensions, FatiguePointOp fatigue) {

    /** Without contributions; the fatigue evaluator is made when the project has fatigue stations and a solution. */
    public PreparedSection(Path file, Project project, Section section, SectionProperties props,
            FiniteElementSolution solution) {
        this(file, project, section, props, solution, Extensions.none(), fatigueOf(project, section, props, solution));
    }

    /** Validates; a null {@code extensions} means none. */
    public PreparedSection {
        extensions = extensions == null ? Extensions.none() : extensions;
    }

    /** @return the fatigue evaluator of the section, or null when the project checks no fatigue or fe is null */
    static FatiguePointOp fatigueOf(Project project, Section section, SectionProperties props,
            FiniteElementSolution fe) {
        return fe == null || project.fatigue().isEmpty() ? null : new FatiguePointOp(project, section, props, fe);
    }
}
