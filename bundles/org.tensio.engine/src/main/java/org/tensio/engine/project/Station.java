package org.tensio.engine.project;

import java.util.LinkedHashMap;
import java.util.Map;

import org.tensio.engine.loads.InternalForces;

/**
 * A station along a member: the section there and the internal forces of each load case.
 *
 * @param id        station id in the project file
 * @param sectionId id of the section at this station
 * @param cases     internal forces by load-case id, in file order
 * @since 0.1
 */
public record Station(String id, String sectionId, Map<String, InternalForces> cases) {

    /** Copies the case map, keeping its order. */
    public Station {
        if (id == null || sectionId == null || cases == null) {
            throw new IllegalArgumentException("station needs an id, a section and a case map");
        }
        cases = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(cases));
    }
}
