package org.tensio.ui.editor.overlay;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.checks.MaterialCriteria;
import org.tensio.engine.project.Project;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * The static utilisation at a point as the engine's check ({@code org.tensio.engine.checks.CheckOp}) computes it:
 * the largest demand / capacity over the material's built-in and contributed criteria
 * ({@link MaterialCriteria#of}, with the engine's {@link SectionAnalysisService#extensions()}). Each material's
 * criteria are resolved once. Not thread-safe.
 */
final class StaticUtilisation {

    private final Project project;
    private final SectionAnalysisService service;
    private final Map<String, List<MaterialCriteria.Rule>> rules = new HashMap<>();

    StaticUtilisation(Project project, SectionAnalysisService service) {
        this.project = project;
        this.service = service;
    }

    /**
     * @return the utilisation (dimensionless) of {@code material} at the stress state (σz, τzx, τzy in the stress
     *         unit), NaN for a material without limits
     * @throws IllegalArgumentException naming the material and the criterion when a contributed criterion it names
     *                                  is not contributed to the engine
     */
    double at(String material, double sigmaZ, double tauZX, double tauZY) {
        List<MaterialCriteria.Rule> list = rules.computeIfAbsent(material, this::resolve);
        return list.isEmpty() ? Double.NaN : MaterialCriteria.largest(list, sigmaZ, tauZX, tauZY);
    }

    private List<MaterialCriteria.Rule> resolve(String material) {
        MaterialLimits lim = project.limits().get(material);
        return lim == null ? List.of() : MaterialCriteria.of(lim, service.extensions());
    }
}
