package org.tensio.ui.results.stress;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.checks.FatiguePointOp;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.units.UnitSystem;

/**
 * Everything the stress-point view shows for one point: the engine's stress state (with the contribution of each
 * internal force) for one station and case, the utilisation of each criterion of the point's material (built-in
 * and contributed), and — when the station has a fatigue check — the fatigue results at the point for each load
 * history and fatigue criterion. Immutable.
 *
 * @param sectionId     the section
 * @param stress        the engine's result (point, σz, τzx, τzy, principal stresses and directions, τmax, von
 *                      Mises, Tresca, contributions), stress unit of {@code units}
 * @param utilisations  demand / capacity per criterion name of the point's material: the built-in criteria in the
 *                      material's order, then the contributed ones; empty when the material has no limits or the
 *                      state is incomplete
 * @param governing     the name of the criterion with the largest utilisation, or null when none
 * @param caseChosen    true when the case was not given and this is the case with the largest utilisation (or
 *                      von Mises stress) at the point
 * @param units         the project's units
 * @param fatigue       the fatigue results at the point ({@link FatiguePointOp}), or null when the station has no
 *                      fatigue check or they could not be evaluated ({@code fatigueProblem} says why)
 * @param fatigueProblem why a fatigue station's results are missing, or null
 */
public record PointReport(String sectionId, PointStress stress, Map<String, Double> utilisations, String governing,
        boolean caseChosen, UnitSystem units, FatiguePointOp.Result fatigue, String fatigueProblem) {

    /** Copies the map (keeping its order). */
    public PointReport {
        utilisations = Collections.unmodifiableMap(new LinkedHashMap<>(utilisations));
    }

    /** @return the largest utilisation of the static criteria, or NaN when none */
    public double utilisation() {
        return governing == null ? Double.NaN : utilisations.get(governing);
    }

    /** @return this report with the fatigue results (or the reason they are missing) */
    PointReport withFatigue(FatiguePointOp.Result result, String problem) {
        return new PointReport(sectionId, stress, utilisations, governing, caseChosen, units, result, problem);
    }

    /** @return the engine's warnings for the point */
    public List<String> warnings() {
        return stress.warnings();
    }
}
