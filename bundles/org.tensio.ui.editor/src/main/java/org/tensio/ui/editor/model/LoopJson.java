package org.tensio.ui.editor.model;

import java.util.ArrayList;
import java.util.List;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

/** Reads and writes a loop in the file's notation (docs/file-format.md §7): vertices {@code [x, y]} and arc markers. */
final class LoopJson {

    private LoopJson() {
    }

    /**
     * Reads a loop leniently (the engine validates): items that are neither a vertex nor a marker after a
     * vertex are skipped.
     */
    static Loop read(JsonElement json) {
        List<Vertex> vertices = new ArrayList<>();
        if (json != null && json.isJsonArray()) {
            for (JsonElement item : json.getAsJsonArray()) {
                double[] p = point(item);
                if (p != null) {
                    vertices.add(new Vertex(p[0], p[1]));
                } else if (item.isJsonObject() && !vertices.isEmpty()) {
                    ArcMarker arc = marker(item.getAsJsonObject());
                    if (arc != null) {
                        vertices.get(vertices.size() - 1).setArcToNext(arc);
                    }
                }
            }
        }
        return new Loop(vertices);
    }

    private static ArcMarker marker(JsonObject o) {
        double[] through = point(o.get("through")); //$NON-NLS-1$
        if (through != null) {
            return new ArcMarker(ArcMarker.Kind.THROUGH, through[0], through[1]);
        }
        double[] centre = point(o.get("centre")); //$NON-NLS-1$
        if (centre != null) {
            JsonElement turn = o.get("turn"); //$NON-NLS-1$
            boolean cw = turn != null && turn.isJsonPrimitive() && "cw".equals(turn.getAsString()); //$NON-NLS-1$
            return new ArcMarker(cw ? ArcMarker.Kind.CENTRE_CW : ArcMarker.Kind.CENTRE_CCW, centre[0], centre[1]);
        }
        return null;
    }

    static double[] point(JsonElement e) {
        if (e == null || !e.isJsonArray() || e.getAsJsonArray().size() != 2) {
            return null;
        }
        JsonArray a = e.getAsJsonArray();
        double x = JsonNumbers.value(a.get(0), Double.NaN);
        double y = JsonNumbers.value(a.get(1), Double.NaN);
        return Double.isFinite(x) && Double.isFinite(y) ? new double[] { x, y } : null;
    }

    static JsonArray point(double x, double y) {
        JsonArray a = new JsonArray();
        a.add(JsonNumbers.of(x));
        a.add(JsonNumbers.of(y));
        return a;
    }

    static JsonArray write(Loop loop) {
        JsonArray items = new JsonArray();
        for (Vertex v : loop.vertices()) {
            items.add(point(v.x(), v.y()));
            ArcMarker arc = v.arcToNext();
            if (arc != null) {
                JsonObject m = new JsonObject();
                switch (arc.kind()) {
                case THROUGH -> m.add("through", point(arc.x(), arc.y())); //$NON-NLS-1$
                case CENTRE_CCW, CENTRE_CW -> {
                    m.add("centre", point(arc.x(), arc.y())); //$NON-NLS-1$
                    m.addProperty("turn", arc.kind() == ArcMarker.Kind.CENTRE_CW ? "cw" : "ccw"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
                }
                }
                items.add(m);
            }
        }
        return items;
    }
}
