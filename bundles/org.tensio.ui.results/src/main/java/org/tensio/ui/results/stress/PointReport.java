package org.tensio.ui.results.stress;

import java.util.List;
import java.util.Map;

import org.tensio.engine.section.Criterion;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.units.UnitSystem;

/**
 * Everything the stress-point view shows for one point: the engine's stress state (with the contribution of each
 * internal force) for one station and case, and the utilisation of each criterion of the point's material.
 * Immutable.
 *
 * @param sectionId     the section
 * @param stress        the engine's result (point, σz, τzx, τzy, principal stresses and directions, τmax, von
 *                      Mises, Tresca, contributions), stress unit of {@code units}
 * @param utilisations  demand / capacity per criterion of the point's material, in the material's order; empty
 *                      when the material has no limits or the state is incomplete
 * @param governing     the criterion with the largest utilisation, or null when none
 * @param caseChosen    true when the case was not given and this is the case with the largest utilisation (or
 *                      von Mises stress) at the point
 * @param units         the project's units
 */
public record PointReport(String sectionId, PointStress stress, Map<Criterion, Double> utilisations,
        Criterion governing, boolean caseChosen, UnitSystem units) {

    /** Copies the map (keeping its order). */
    public PointReport {
        utilisations = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(utilisations));
    }

    /** @return the largest utilisation, or NaN when none */
    public double utilisation() {
        return governing == null ? Double.NaN : utilisations.get(governing);
    }

    /** @return the engine's warnings for the point */
    public List<String> warnings() {
        return stress.warnings();
    }
}
