package org.tensio.ui.editor.model;

import java.util.Iterator;
import java.util.Map;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;

/**
 * Writes project JSON for people: two-space indentation, and objects and arrays that hold only numbers,
 * strings and points (vertices, force components, factors, arc markers) on one line.
 */
public final class JsonText {

    private static final int INLINE_LIMIT = 100;

    private JsonText() {
    }

    /** @return {@code root} as text ending with a line break */
    public static String write(JsonElement root) {
        StringBuilder out = new StringBuilder();
        write(root, out, 0);
        return out.append('\n').toString();
    }

    private static void write(JsonElement e, StringBuilder out, int depth) {
        String inline = inline(e);
        if (inline != null && inline.length() <= INLINE_LIMIT) {
            out.append(inline);
            return;
        }
        if (e.isJsonObject()) {
            out.append('{');
            Iterator<Map.Entry<String, JsonElement>> it = e.getAsJsonObject().entrySet().iterator();
            while (it.hasNext()) {
                Map.Entry<String, JsonElement> m = it.next();
                newline(out, depth + 1);
                out.append(new JsonPrimitive(m.getKey())).append(": "); //$NON-NLS-1$
                write(m.getValue(), out, depth + 1);
                if (it.hasNext()) {
                    out.append(',');
                }
            }
            newline(out, depth);
            out.append('}');
        } else if (e.isJsonArray()) {
            JsonArray a = e.getAsJsonArray();
            if (a.size() > 0 && allInline(a)) {
                writeWrappedArray(a, out, depth);
                return;
            }
            out.append('[');
            for (int i = 0; i < a.size(); i++) {
                newline(out, depth + 1);
                write(a.get(i), out, depth + 1);
                if (i < a.size() - 1) {
                    out.append(',');
                }
            }
            newline(out, depth);
            out.append(']');
        } else {
            out.append(e.toString());
        }
    }

    /** An array of short items (a loop): as many items on a line as fit. */
    private static void writeWrappedArray(JsonArray a, StringBuilder out, int depth) {
        out.append('[');
        int lineStart = out.length();
        for (int i = 0; i < a.size(); i++) {
            String item = inline(a.get(i));
            if (out.length() - lineStart + item.length() > INLINE_LIMIT) {
                newline(out, depth + 1);
                lineStart = out.length();
            }
            out.append(item);
            if (i < a.size() - 1) {
                out.append(", "); //$NON-NLS-1$
            }
        }
        out.append(']');
    }

    private static boolean allInline(JsonArray a) {
        for (JsonElement item : a) {
            String s = inline(item);
            if (s == null || s.length() > INLINE_LIMIT) {
                return false;
            }
        }
        return true;
    }

    /** @return one-line text of {@code e} when it holds only primitives and flat arrays/objects, else null */
    private static String inline(JsonElement e) {
        if (e.isJsonPrimitive() || e.isJsonNull()) {
            return e.toString();
        }
        StringBuilder out = new StringBuilder();
        if (e.isJsonArray()) {
            out.append('[');
            JsonArray a = e.getAsJsonArray();
            for (int i = 0; i < a.size(); i++) {
                String s = flat(a.get(i));
                if (s == null) {
                    return null;
                }
                out.append(i == 0 ? "" : ", ").append(s); //$NON-NLS-1$ //$NON-NLS-2$
            }
            return out.append(']').toString();
        }
        JsonObject o = e.getAsJsonObject();
        out.append('{');
        boolean first = true;
        for (Map.Entry<String, JsonElement> m : o.entrySet()) {
            String s = flat(m.getValue());
            if (s == null) {
                return null;
            }
            out.append(first ? "" : ", ").append(new JsonPrimitive(m.getKey())).append(": ").append(s); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
            first = false;
        }
        return out.append('}').toString();
    }

    /** primitives, and arrays of primitives (points) */
    private static String flat(JsonElement e) {
        if (e.isJsonPrimitive() || e.isJsonNull()) {
            return e.toString();
        }
        if (e.isJsonArray()) {
            StringBuilder out = new StringBuilder("["); //$NON-NLS-1$
            JsonArray a = e.getAsJsonArray();
            for (int i = 0; i < a.size(); i++) {
                if (!a.get(i).isJsonPrimitive()) {
                    return null;
                }
                out.append(i == 0 ? "" : ", ").append(a.get(i)); //$NON-NLS-1$ //$NON-NLS-2$
            }
            return out.append(']').toString();
        }
        if (e.isJsonObject()) {
            // an arc marker {"centre": [x, y], "turn": "ccw"} inside a loop
            JsonObject o = e.getAsJsonObject();
            StringBuilder out = new StringBuilder("{"); //$NON-NLS-1$
            boolean first = true;
            for (Map.Entry<String, JsonElement> m : o.entrySet()) {
                JsonElement v = m.getValue();
                if (!(v.isJsonPrimitive() || v.isJsonArray() && v.getAsJsonArray().size() <= 3
                        && allPrimitive(v.getAsJsonArray()))) {
                    return null;
                }
                out.append(first ? "" : ", ").append(new JsonPrimitive(m.getKey())).append(": ").append(v); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
                first = false;
            }
            return out.append('}').toString();
        }
        return null;
    }

    private static boolean allPrimitive(JsonArray a) {
        for (JsonElement x : a) {
            if (!x.isJsonPrimitive()) {
                return false;
            }
        }
        return true;
    }

    private static void newline(StringBuilder out, int depth) {
        out.append('\n');
        out.append("  ".repeat(depth)); //$NON-NLS-1$
    }
}
