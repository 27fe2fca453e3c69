package org.tensio.ui.editor.overlay;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.project.Project;
import org.tensio.engine.section.Criterion;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.spi.CheckCriterion;

/**
 * The static utilisation at a point as the engine's check ({@code org.tensio.engine.checks.CheckOp}) computes it:
 * the largest demand / capacity over the material's built-in criteria ({@link MaterialLimits#criteria()}) and its
 * contributed ones ({@link MaterialLimits#contributedCriteria()}, resolved through the engine's
 * {@link SectionAnalysisService#extensions()}). Each material's criteria are resolved once. Not thread-safe.
 */
final class StaticUtilisation {

    /** One criterion of a material: its demand from (σz, τzx, τzy) and its capacity, stress unit. */
    private record Rule(Demand demand, double capacity) {
    }

    @FunctionalInterface
    private interface Demand {
        double at(double sigmaZ, double tauZX, double tauZY);
    }

    private final Project project;
    private final SectionAnalysisService service;
    private final Map<String, List<Rule>> rules = new HashMap<>();

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
        List<Rule> list = rules.computeIfAbsent(material, this::resolve);
        if (list.isEmpty()) {
            return Double.NaN;
        }
        double u = 0;
        for (Rule r : list) {
            u = Math.max(u, r.demand().at(sigmaZ, tauZX, tauZY) / r.capacity());
        }
        return u;
    }

    private List<Rule> resolve(String material) {
        MaterialLimits lim = project.limits().get(material);
        List<Rule> out = new ArrayList<>();
        if (lim == null) {
            return out;
        }
        for (Criterion c : lim.criteria()) {
            out.add(new Rule((a, b, d) -> MaterialLimits.demand(c, a, b, d), lim.capacity(c)));
        }
        for (String id : lim.contributedCriteria()) {
            CheckCriterion c = service.extensions().criterion(id)
                    .orElseThrow(() -> new IllegalArgumentException("materials." + material + ".criteria: criterion '"
                            + id + "' is not contributed to this engine (have "
                            + service.extensions().criteria().keySet() + ")"));
            out.add(new Rule(c::demand, c.capacity(lim)));
        }
        return out;
    }
}
