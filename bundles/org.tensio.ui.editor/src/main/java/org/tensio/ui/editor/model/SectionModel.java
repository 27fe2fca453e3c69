package org.tensio.ui.editor.model;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

/**
 * A section of the project: id and its parts. A section read in the single-material form is written back in
 * it while it has one part; with more parts it is written as {@code "parts"} (docs/file-format.md §5).
 */
public final class SectionModel extends ModelElement {

    /** Property fired when parts are added or removed. */
    public static final String PARTS = "parts"; //$NON-NLS-1$

    private final String id;
    private final JsonObject original;
    private final boolean compositeForm;
    private final List<Part> parts = new ArrayList<>();

    private SectionModel(String id, JsonObject original, boolean compositeForm, List<Part> parts) {
        this.id = id;
        this.original = original;
        this.compositeForm = compositeForm;
        this.parts.addAll(parts);
    }

    /** Reads a section (leniently: the engine validates). */
    static SectionModel read(String id, JsonObject json) {
        JsonElement ps = json.get("parts"); //$NON-NLS-1$
        List<Part> parts = new ArrayList<>();
        if (ps != null && ps.isJsonArray()) {
            for (JsonElement p : ps.getAsJsonArray()) {
                if (p.isJsonObject()) {
                    parts.add(Part.read(p.getAsJsonObject()));
                }
            }
            return new SectionModel(id, json.deepCopy(), true, parts);
        }
        JsonObject own = new JsonObject();
        for (String key : Part.KEYS) {
            if (json.has(key)) {
                own.add(key, json.get(key).deepCopy());
            }
        }
        parts.add(Part.read(own));
        return new SectionModel(id, json.deepCopy(), false, parts);
    }

    /** @return the section id */
    public String id() {
        return id;
    }

    /** @return the parts, unmodifiable */
    public List<Part> parts() {
        return Collections.unmodifiableList(parts);
    }

    /** Inserts a part at {@code index}. */
    public void addPart(int index, Part p) {
        parts.add(index, p);
        fire(PARTS, null, p);
    }

    /** Removes a part; @return its index or -1. */
    public int removePart(Part p) {
        int i = parts.indexOf(p);
        if (i >= 0) {
            parts.remove(i);
            fire(PARTS, p, null);
        }
        return i;
    }

    /** @return the section as the file writes it */
    public JsonObject toJson() {
        Set<String> known = new HashSet<>(Part.KEYS);
        known.add("parts"); //$NON-NLS-1$
        Map<String, JsonElement> now;
        if (!compositeForm && parts.size() == 1) {
            now = parts.get(0).known();
        } else {
            JsonArray array = new JsonArray();
            for (Part p : parts) {
                array.add(p.toJson());
            }
            now = new java.util.LinkedHashMap<>();
            now.put("parts", array); //$NON-NLS-1$
        }
        return OrderedJson.merge(original, known, now);
    }
}
