package org.tensio.engine.fatigue;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * A project's fatigue data: per material, per station, and the unit factors the published fits need (they are
 * written for MPa and mm). Immutable.
 *
 * @param mpaPerStressUnit MPa in one stress unit of the project (1 for N and mm)
 * @param mmPerLengthUnit  mm in one length unit of the project (1 for mm)
 * @param materials        fatigue data by material id
 * @param stations         fatigue checks by station id, file order
 * @since 0.1
 */
public record FatigueData(double mpaPerStressUnit, double mmPerLengthUnit, Map<String, FatigueMaterial> materials,
        Map<String, FatigueStation> stations) {

    /** No fatigue data. */
    public static final FatigueData NONE = new FatigueData(1, 1, Map.of(), Map.of());

    /** Copies the maps; validates the factors. */
    public FatigueData {
        if (!(mpaPerStressUnit > 0) || !(mmPerLengthUnit > 0)) {
            throw new IllegalArgumentException("fatigue: unit factors must be positive, got " + mpaPerStressUnit + ", "
                    + mmPerLengthUnit);
        }
        materials = Collections.unmodifiableMap(new LinkedHashMap<>(materials));
        stations = Collections.unmodifiableMap(new LinkedHashMap<>(stations));
    }

    /**
     * @param stationId a station id
     * @return the fatigue check of that station, or null when it has none
     * @since 0.1
     */
    public FatigueStation station(String stationId) {
        return stations.get(stationId);
    }

    /** @return true when there is no fatigue station */
    public boolean isEmpty() {
        return stations.isEmpty();
    }
}
