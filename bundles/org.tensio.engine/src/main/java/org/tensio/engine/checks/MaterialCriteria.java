package org.tensio.engine.checks;

import java.util.ArrayList;
import java.util.List;

import org.tensio.engine.section.Criterion;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.spi.CheckCriterion;
import org.tensio.engine.spi.Extensions;

/**
 * The static check criteria of one material resolved once — the built-in ones ({@link MaterialLimits#criteria()})
 * in the material's order, then the contributed ones ({@link MaterialLimits#contributedCriteria()}, looked up in
 * the engine's {@link Extensions}) — each with its name, its demand at a stress state and its capacity. What
 * {@link CheckOp} evaluates at every sample point, and what any other view of the static utilisation (a point, a
 * contour) uses so that it gives the check's numbers. Stresses in the project's stress unit; utilisation = demand /
 * capacity, dimensionless.
 *
 * @since 0.1
 */
public final class MaterialCriteria {

    /** The demand of a criterion at a stress state (σz, τzx, τzy), stress unit. */
    @FunctionalInterface
    public interface Demand {
        /**
         * @param sigmaZ normal stress σz, stress unit
         * @param tauZX  shear stress τzx, stress unit
         * @param tauZY  shear stress τzy, stress unit
         * @return the demand, stress unit
         */
        double at(double sigmaZ, double tauZX, double tauZY);
    }

    /**
     * One criterion of a material.
     *
     * @param name     the criterion name as the results give it (built-in enum name or contributed id)
     * @param demand   its demand
     * @param capacity its capacity, stress unit, &gt; 0
     */
    public record Rule(String name, Demand demand, double capacity) {

        /** @return demand / capacity at the stress state, dimensionless */
        public double utilisation(double sigmaZ, double tauZX, double tauZY) {
            return demand.at(sigmaZ, tauZX, tauZY) / capacity;
        }
    }

    private MaterialCriteria() {
    }

    /**
     * @param limits     the material's limits
     * @param extensions the engine's contributions
     * @return the built-in, then the contributed criteria of the material
     * @throws IllegalArgumentException naming {@code materials.ID.criteria} and the criterion when a contributed
     *                                  criterion is not contributed to this engine, or what the criterion's
     *                                  capacity needs is missing
     */
    public static List<Rule> of(MaterialLimits limits, Extensions extensions) {
        List<Rule> rules = new ArrayList<>();
        for (Criterion c : limits.criteria()) {
            rules.add(new Rule(c.name(), (a, b, d) -> MaterialLimits.demand(c, a, b, d), limits.capacity(c)));
        }
        for (String id : limits.contributedCriteria()) {
            CheckCriterion c = extensions.criterion(id).orElseThrow(() -> new IllegalArgumentException("materials."
                    + limits.material() + ".criteria: criterion '" + id + "' is not contributed to this engine (have "
                    + extensions.criteria().keySet() + ")"));
            rules.add(new Rule(id, c::demand, c.capacity(limits)));
        }
        return rules;
    }

    /** @return the largest utilisation of {@code rules} at the stress state, 0 when there are none */
    public static double largest(List<Rule> rules, double sigmaZ, double tauZX, double tauZY) {
        double u = 0;
        for (Rule r : rules) {
            u = Math.max(u, r.utilisation(sigmaZ, tauZX, tauZY));
        }
        return u;
    }
}
