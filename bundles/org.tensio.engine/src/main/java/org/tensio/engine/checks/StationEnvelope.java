package org.tensio.engine.checks;

import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.loads.ForceComponent;

/**
 * The envelope of one station over all its load cases and the combinations it can evaluate ({@link EnvelopeOp}).
 *
 * @param station  station id
 * @param section  section id
 * @param cases    the load cases and combinations enveloped, project order
 * @param forces   per force component, the range of the internal force (force or force·length), all six
 * @param points   per sample point (every mesh node; once per material at shared nodes), node order
 * @param warnings skipped combinations, method notes
 * @since 0.1
 */
public record StationEnvelope(String station, String section, List<String> cases, Map<ForceComponent, Range> forces,
        List<PointEnvelope> points, List<String> warnings) {

    /** Copies the collections. */
    public StationEnvelope {
        cases = List.copyOf(cases);
        forces = Collections.unmodifiableMap(new EnumMap<>(forces));
        points = List.copyOf(points);
        warnings = List.copyOf(warnings);
    }
}
