package org.tensio.ui.editor.model;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

/** A station: its section id and its load cases (each an {@link ObjectNode} of force components). */
public final class StationModel extends ModelElement {

    /** Property fired when the section id changes. */
    public static final String SECTION = "section"; //$NON-NLS-1$

    private static final Set<String> KEYS = Set.of("section", "forces"); //$NON-NLS-1$ //$NON-NLS-2$

    private final String id;
    private final JsonObject original;
    private String section;
    private final boolean hasForces;
    private final List<ObjectNode> cases = new ArrayList<>();

    private StationModel(String id, JsonObject original, String section, boolean hasForces, List<ObjectNode> cases) {
        this.id = id;
        this.original = original;
        this.section = section;
        this.hasForces = hasForces;
        this.cases.addAll(cases);
    }

    static StationModel read(String id, JsonObject json) {
        JsonElement s = json.get("section"); //$NON-NLS-1$
        JsonElement f = json.get("forces"); //$NON-NLS-1$
        List<ObjectNode> cases = new ArrayList<>();
        if (f != null && f.isJsonObject()) {
            for (Map.Entry<String, JsonElement> e : f.getAsJsonObject().entrySet()) {
                cases.add(new ObjectNode(e.getKey(),
                        e.getValue().isJsonObject() ? e.getValue().getAsJsonObject() : new JsonObject()));
            }
        }
        return new StationModel(id, json.deepCopy(), s != null && s.isJsonPrimitive() ? s.getAsString() : null,
                f != null, cases);
    }

    /** @return the station id */
    public String id() {
        return id;
    }

    /** @return the section id, or null */
    public String section() {
        return section;
    }

    /** Sets the section id. */
    public void setSection(String newSection) {
        String old = section;
        section = newSection;
        fire(SECTION, old, newSection);
    }

    /** @return the load cases given in the file (not those of load tables), unmodifiable */
    public List<ObjectNode> cases() {
        return Collections.unmodifiableList(cases);
    }

    /** @return the station as the file writes it */
    public JsonObject toJson() {
        Map<String, JsonElement> now = new LinkedHashMap<>();
        if (section != null) {
            now.put("section", new com.google.gson.JsonPrimitive(section)); //$NON-NLS-1$
        }
        if (hasForces || !cases.isEmpty()) {
            JsonObject forces = new JsonObject();
            for (ObjectNode c : cases) {
                forces.add(c.id(), c.toJson());
            }
            now.put("forces", forces); //$NON-NLS-1$
        }
        return OrderedJson.merge(original, KEYS, now);
    }
}
