package org.tensio.ui.results.stress;

import java.nio.file.Path;

import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.project.Project;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;

/**
 * What evaluating a point of one section needs, all computed beforehand: the project, the section, its exact
 * properties with torsion and its finite-element solution (mesh, smoothed fields and point locator). With this,
 * a point costs an evaluation only (no mesh, no solve). Immutable (the engine's solution is immutable).
 *
 * @param file     the project file
 * @param project  the project read from it
 * @param section  the section
 * @param props    its properties ({@code SectionAnalysisService.properties})
 * @param solution its finite-element solution, or null when the engine could not solve it (elementary shear and
 *                 closed-form torsion only)
 */
public record PreparedSection(Path file, Project project, Section section, SectionProperties props,
        FiniteElementSolution solution) {
}
