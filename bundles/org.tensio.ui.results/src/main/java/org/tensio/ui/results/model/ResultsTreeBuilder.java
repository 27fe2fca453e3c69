package org.tensio.ui.results.model;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.tensio.engine.checks.CheckReport;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.project.Project;

/**
 * Turns an engine {@link CheckReport} into the results tree: project → station → case or combination →
 * criterion → one governing point per material. Order is the report's (project order); nothing is
 * recomputed, every number is the engine's.
 */
public final class ResultsTreeBuilder {

    private ResultsTreeBuilder() {
    }

    /**
     * @param file        the project file
     * @param projectName the name of the root node
     * @param project     the project the report was computed for
     * @param report      the engine's report
     * @param message     the status line
     * @return the tree
     */
    public static ResultsTree build(Path file, String projectName, Project project, CheckReport report,
            String message) {
        Map<String, Map<String, Map<String, List<CheckResult>>>> byStation = new LinkedHashMap<>();
        for (CheckResult r : report.results()) {
            byStation.computeIfAbsent(r.station(), k -> new LinkedHashMap<>())
                    .computeIfAbsent(r.caseId(), k -> new LinkedHashMap<>())
                    .computeIfAbsent(r.criterion(), k -> new ArrayList<>()).add(r);
        }
        List<ResultNode> stations = new ArrayList<>();
        for (var st : byStation.entrySet()) {
            String stationId = st.getKey();
            String sectionId = project.station(stationId).sectionId();
            List<ResultNode> cases = new ArrayList<>();
            for (var cs : st.getValue().entrySet()) {
                List<ResultNode> criteria = new ArrayList<>();
                for (var cr : cs.getValue().entrySet()) {
                    List<ResultNode> points = new ArrayList<>();
                    for (CheckResult r : cr.getValue()) {
                        points.add(new ResultNode(NodeKind.POINT, r.material(), stationId, sectionId, cs.getKey(),
                                cr.getKey(), List.of(), r));
                    }
                    criteria.add(new ResultNode(NodeKind.CRITERION, cr.getKey(), stationId, sectionId, cs.getKey(),
                            cr.getKey(), points, null));
                }
                cases.add(new ResultNode(NodeKind.CASE, cs.getKey(), stationId, sectionId, cs.getKey(), null, criteria,
                        null));
            }
            stations.add(new ResultNode(NodeKind.STATION, stationId, stationId, sectionId, null, null, cases, null));
        }
        ResultNode root = new ResultNode(NodeKind.PROJECT, projectName, null, null, null, null, stations, null);
        return new ResultsTree(Optional.of(file), project, report, root, message, false);
    }
}
