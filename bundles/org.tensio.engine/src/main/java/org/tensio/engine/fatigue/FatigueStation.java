package org.tensio.engine.fatigue;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The fatigue check of one station: its load histories, its notches, the criteria to apply and the conditions
 * that differ from its material's.
 *
 * @param station            the station id
 * @param histories          load history by id (file order); the id is the "case" of the results
 * @param notches            the notches at the station (may be empty: a plain section)
 * @param criteria           the criteria to apply, at least one
 * @param conditions         service conditions overriding the material's
 * @param equivalentDiameter the diameter for the size factor, length unit, or null to derive it from the section
 * @param requiredFactor     a required factor of safety ≥ 1 for the minimum diameter of a round shaft, or null
 * @since 0.1
 */
public record FatigueStation(String station, Map<String, LoadHistory> histories, List<Notch> notches,
        List<FatigueCriterion> criteria, FatigueConditions conditions, Double equivalentDiameter,
        Double requiredFactor) {

    /** Copies the collections; validates. */
    public FatigueStation {
        if (station == null || histories == null || histories.isEmpty() || notches == null || criteria == null
                || criteria.isEmpty() || conditions == null) {
            throw new IllegalArgumentException("fatigue station " + station + ": needs at least one history and one"
                    + " criterion");
        }
        histories = Collections.unmodifiableMap(new LinkedHashMap<>(histories));
        notches = List.copyOf(notches);
        criteria = List.copyOf(criteria);
        if (equivalentDiameter != null && (!(equivalentDiameter > 0) || !Double.isFinite(equivalentDiameter))) {
            throw new IllegalArgumentException("equivalentDiameter: must be positive, got " + equivalentDiameter);
        }
        if (requiredFactor != null && (!(requiredFactor >= 1) || !Double.isFinite(requiredFactor))) {
            throw new IllegalArgumentException("requiredFactor: must be at least 1, got " + requiredFactor);
        }
    }
}
