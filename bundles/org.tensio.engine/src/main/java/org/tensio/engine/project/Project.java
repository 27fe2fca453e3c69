package org.tensio.engine.project;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tensio.engine.fatigue.FatigueData;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.section.Material;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.section.Section;
import org.tensio.engine.units.UnitSystem;

/**
 * A whole project as read from its file: units, materials, sections, stations with their load cases, and
 * combinations. All maps keep file order and are unmodifiable. Immutable.
 *
 * @param units        unit system
 * @param materials    materials by id
 * @param sections     sections by id
 * @param stations     stations by id
 * @param combinations combinations by id
 * @param limits       what each material is checked against, by material id (materials without an entry are
 *                     not checked)
 * @param fatigue      the fatigue checks of the project ({@link FatigueData#NONE} when it has none)
 * @since 0.1
 */
public record Project(UnitSystem units, Map<String, Material> materials, Map<String, Section> sections,
        Map<String, Station> stations, Map<String, Combination> combinations, Map<String, MaterialLimits> limits,
        FatigueData fatigue) {

    /** A project without fatigue checks. */
    public Project(UnitSystem units, Map<String, Material> materials, Map<String, Section> sections,
            Map<String, Station> stations, Map<String, Combination> combinations, Map<String, MaterialLimits> limits) {
        this(units, materials, sections, stations, combinations, limits, FatigueData.NONE);
    }

    /** A project without check limits. */
    public Project(UnitSystem units, Map<String, Material> materials, Map<String, Section> sections,
            Map<String, Station> stations, Map<String, Combination> combinations) {
        this(units, materials, sections, stations, combinations, Map.of());
    }

    /** Copies the maps; a null {@code fatigue} is {@link FatigueData#NONE}. */
    public Project {
        fatigue = fatigue == null ? FatigueData.NONE : fatigue;
        limits = Collections.unmodifiableMap(new LinkedHashMap<>(limits));
        materials = Collections.unmodifiableMap(new LinkedHashMap<>(materials));
        sections = Collections.unmodifiableMap(new LinkedHashMap<>(sections));
        stations = Collections.unmodifiableMap(new LinkedHashMap<>(stations));
        combinations = Collections.unmodifiableMap(new LinkedHashMap<>(combinations));
    }

    /**
     * @return the section with this id
     * @throws IllegalArgumentException naming the id when there is none
     */
    public Section section(String id) {
        Section s = sections.get(id);
        if (s == null) {
            throw new IllegalArgumentException("section: no section '" + id + "' (have " + sections.keySet() + ")");
        }
        return s;
    }

    /**
     * @return the station with this id
     * @throws IllegalArgumentException naming the id when there is none
     */
    public Station station(String id) {
        Station s = stations.get(id);
        if (s == null) {
            throw new IllegalArgumentException("station: no station '" + id + "' (have " + stations.keySet() + ")");
        }
        return s;
    }

    /**
     * The internal forces of a load case or of a combination at a station.
     *
     * @throws IllegalArgumentException naming the station and case when the case is unknown there, or a
     *                                  combination names a case the station does not have
     */
    public InternalForces forces(String stationId, String caseId) {
        Station st = station(stationId);
        InternalForces f = st.cases().get(caseId);
        if (f != null) {
            return f;
        }
        Combination c = combinations.get(caseId);
        if (c == null) {
            throw new IllegalArgumentException("case: station '" + stationId + "' has no load case or combination '"
                    + caseId + "' (cases " + st.cases().keySet() + ", combinations " + combinations.keySet() + ")");
        }
        InternalForces sum = InternalForces.ZERO;
        for (Map.Entry<String, Double> e : c.factors().entrySet()) {
            InternalForces lc = st.cases().get(e.getKey());
            if (lc == null) {
                throw new IllegalArgumentException("combinations." + caseId + ": station '" + stationId
                        + "' has no load case '" + e.getKey() + "'");
            }
            sum = sum.plusScaled(e.getValue(), lc);
        }
        return sum;
    }
}
