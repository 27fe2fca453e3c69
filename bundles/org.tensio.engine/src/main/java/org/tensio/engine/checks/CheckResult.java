package org.tensio.engine.checks;

import org.tensio.engine.geometry.Point2;

/**
 * The governing point of one station, load case (or combination) and criterion.
 *
 * @param station     station id
 * @param caseId      load case or combination id
 * @param criterion   criterion name ({@link Criterion} for static checks; other families add their own)
 * @param material    material of the governing point
 * @param utilisation demand / capacity (pass when ≤ 1)
 * @param demand      stress unit
 * @param capacity    stress unit
 * @param point       the governing point, section frame
 * @param sigmaZ      stress state at the point, stress unit
 * @param tauZX       stress state at the point
 * @param tauZY       stress state at the point
 * @param singular    true when the point is at a sharp re-entrant corner (value mesh-dependent)
 * @since 0.1
 */
public record CheckResult(String station, String caseId, String criterion, String material, double utilisation,
        double demand, double capacity, Point2 point, double sigmaZ, double tauZX, double tauZY, boolean singular) {

    /** @return true when utilisation ≤ 1 */
    public boolean passed() {
        return utilisation <= 1.0;
    }
}
