package org.tensio.engine.checks;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.tensio.engine.project.Combination;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;

/**
 * The load cases and combinations evaluated at a station, in project order: the station's own load cases in
 * file order, then every combination of the project in file order. A combination that names a load case the
 * station does not have cannot be evaluated there: it is left out and a warning names it.
 *
 * @since 0.1
 */
public final class LoadCases {

    private LoadCases() {
    }

    /**
     * @param project  the project
     * @param station  one of its stations
     * @param warnings receives one line per combination left out (may be null)
     * @return case and combination ids, project order
     */
    public static List<String> at(Project project, Station station, List<String> warnings) {
        List<String> ids = new ArrayList<>(station.cases().keySet());
        for (Combination c : project.combinations().values()) {
            List<String> missing = new ArrayList<>();
            for (Map.Entry<String, Double> e : c.factors().entrySet()) {
                if (!station.cases().containsKey(e.getKey())) {
                    missing.add(e.getKey());
                }
            }
            if (missing.isEmpty()) {
                ids.add(c.id());
            } else if (warnings != null) {
                warnings.add("station '" + station.id() + "': combination '" + c.id() + "' skipped: the station has no"
                        + " load case " + String.join(", ", missing.stream().map(m -> "'" + m + "'").toList()));
            }
        }
        return ids;
    }
}
