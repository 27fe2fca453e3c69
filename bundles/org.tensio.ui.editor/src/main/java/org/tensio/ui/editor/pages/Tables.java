package org.tensio.ui.editor.pages;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import org.tensio.ui.editor.model.ObjectNode;
import org.tensio.ui.editor.model.ProjectModel;
import org.tensio.ui.editor.model.StationModel;

/** Rows and columns of the editor's table pages. */
public final class Tables {

    /** Columns of the materials table (file keys, docs/file-format.md §4). */
    public static final List<String> MATERIAL_KEYS = List.of("E", "nu", "fy", "fu", "partialFactor"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$ //$NON-NLS-4$ //$NON-NLS-5$
    /** Columns of the load-case table: the six force components (§9). */
    public static final List<String> FORCE_KEYS = List.of("N", "Vx", "Vy", "Mx", "My", "T"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$ //$NON-NLS-4$ //$NON-NLS-5$ //$NON-NLS-6$

    private Tables() {
    }

    /** @return one row per material */
    public static List<Row> materials(ProjectModel m) {
        return m.materials().stream().map(n -> new Row(n.id(), n)).toList();
    }

    /** @return one row per load case of every station, labelled "station / case" */
    public static List<Row> cases(ProjectModel m) {
        List<Row> rows = new ArrayList<>();
        for (StationModel s : m.stations()) {
            for (ObjectNode c : s.cases()) {
                rows.add(new Row(s.id() + " / " + c.id(), c)); //$NON-NLS-1$
            }
        }
        return rows;
    }

    /** @return one row per combination */
    public static List<Row> combinations(ProjectModel m) {
        return m.combinations().stream().map(n -> new Row(n.id(), n)).toList();
    }

    /** @return the load-case ids of every station and every combination's keys, in file order */
    public static List<String> caseIds(ProjectModel m) {
        Set<String> ids = new LinkedHashSet<>();
        for (StationModel s : m.stations()) {
            s.cases().forEach(c -> ids.add(c.id()));
        }
        for (ObjectNode c : m.combinations()) {
            ids.addAll(c.keys());
        }
        return new ArrayList<>(ids);
    }
}
