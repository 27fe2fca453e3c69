package org.tensio.engine.checks;

import org.tensio.engine.fatigue.FatigueDetail;
import org.tensio.engine.geometry.Point2;

/**
 * The governing point of one station, load case (or combination) and criterion.
 *
 * @param station     station id
 * @param caseId      load case or combination id
 * @param criterion   criterion name ({@link org.tensio.engine.section.Criterion} for static checks; other families
 *                    add their own)
 * @param material    material id of the governing point (each material is checked against its own limits)
 * @param utilisation demand / capacity (pass when ≤ 1)
 * @param demand      stress unit
 * @param capacity    stress unit
 * @param point       the governing point, section frame
 * @param sigmaZ      stress state at the point, stress unit
 * @param tauZX       stress state at the point
 * @param tauZY       stress state at the point
 * @param singular    true when the point lies within 2 % of the section's bounding-box diagonal of a sharp
 *                    re-entrant corner of the mesh (shear there is mesh-dependent)
 * @param fatigue     for a fatigue result ({@link org.tensio.engine.fatigue.FatigueCriterion} names, {@code caseId}
 *                    the load-history id, the stress state the Kf-amplified peak of the cycle): its factors and
 *                    stresses; null for a static check
 * @since 0.1
 */
public record CheckResult(String station, String caseId, String criterion, String material, double utilisation,
        double demand, double capacity, Point2 point, double sigmaZ, double tauZX, double tauZY, boolean singular,
        FatigueDetail fatigue) {

    /** A static check result (no fatigue detail). */
    public CheckResult(String station, String caseId, String criterion, String material, double utilisation,
            double demand, double capacity, Point2 point, double sigmaZ, double tauZX, double tauZY, boolean singular) {
        this(station, caseId, criterion, material, utilisation, demand, capacity, point, sigmaZ, tauZX, tauZY, singular,
                null);
    }

    /** @return true for a fatigue result (with {@link #fatigue()} details) */
    public boolean isFatigue() {
        return fatigue != null;
    }

    /** @return true when utilisation ≤ 1 */
    public boolean passed() {
        return utilisation <= 1.0;
    }
}
