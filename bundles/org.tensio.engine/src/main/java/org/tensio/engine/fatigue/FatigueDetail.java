package org.tensio.engine.fatigue;

import java.util.List;

/**
 * The fatigue side of one check result: the governing point's stresses over the cycle, the corrected
 * endurance limit with every factor and its source, the notch factors at the point and, when asked for, the
 * minimum diameter of the round shaft. Stresses in the project's stress unit, lengths in its length unit.
 *
 * @param history         the load-history id
 * @param historyText     what the history is
 * @param criterion       the criterion of the result
 * @param stationCriteria every criterion checked at the station (the lines of its fatigue diagram)
 * @param sigmaA          σa', von Mises of the Kf-amplified alternating components (for the fatigue lines with the
 *                        axial alternating stress divided by 0.85; for the yield checks the actual stresses)
 * @param sigmaM          σm', von Mises of the Kf-amplified mean components
 * @param sigmaMax        σmax', largest von Mises stress over the cycle
 * @param factorOfSafety  n = 1/utilisation (+∞ when the demand is 0)
 * @param endurance       Se with Se' and ka ... kf
 * @param sut             ultimate strength Sut
 * @param sy              yield strength Sy, or NaN
 * @param notch           the notch factors at the point ({@link NotchFactors#NONE} when no notch acts there)
 * @param notchText       which notches act at the point
 * @param minimumDiameter the smallest diameter for the station's required factor by this criterion, or NaN
 * @param minimumText     how it was found (or why not), empty when not asked for
 * @since 0.1
 */
public record FatigueDetail(String history, String historyText, FatigueCriterion criterion,
        List<FatigueCriterion> stationCriteria, double sigmaA, double sigmaM, double sigmaMax, double factorOfSafety,
        EnduranceLimit endurance, double sut, double sy, NotchFactors notch, String notchText, double minimumDiameter,
        String minimumText) {

    /** Copies the list. */
    public FatigueDetail {
        stationCriteria = List.copyOf(stationCriteria);
    }

    /** @return Se */
    public double se() {
        return endurance.value();
    }
}
