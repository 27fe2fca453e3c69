package org.tensio.ui.editor.model;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

/**
 * The editing model of one project file (docs/file-format.md): materials, sections with their parts, profiles
 * and loops, stations with their load cases, and combinations, each with property-change events. Every other
 * key (name, description, units, loadTables, keys this version does not know) is kept as read, in file order.
 * The model is lenient: it holds what the user typed, valid or not; the engine validates the serialised text.
 * No SWT resources; changed on the UI thread by commands only.
 */
public final class ProjectModel extends ModelElement {

    /** Property fired when the whole document was replaced (raw text edit, reload). */
    public static final String DOCUMENT = "document"; //$NON-NLS-1$

    private static final Set<String> KEYS = Set.of("materials", "sections", "stations", "combinations"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$ //$NON-NLS-4$

    private JsonObject original;
    private final List<ObjectNode> materials = new ArrayList<>();
    private final List<SectionModel> sections = new ArrayList<>();
    private final List<StationModel> stations = new ArrayList<>();
    private final List<ObjectNode> combinations = new ArrayList<>();

    /** A model of {@code root}. */
    public ProjectModel(JsonObject root) {
        load(root);
    }

    /**
     * Parses JSON text into a model.
     *
     * @throws IllegalArgumentException when the text is not a JSON object (message from the JSON parser)
     */
    public static ProjectModel parse(String json) {
        return new ProjectModel(parseObject(json));
    }

    /** @throws IllegalArgumentException when {@code json} is not a JSON object */
    public static JsonObject parseObject(String json) {
        try {
            JsonElement e = JsonParser.parseString(json);
            if (!e.isJsonObject()) {
                throw new IllegalArgumentException("project file: the top level must be a JSON object"); //$NON-NLS-1$
            }
            return e.getAsJsonObject();
        } catch (com.google.gson.JsonParseException e) {
            throw new IllegalArgumentException("project file: not JSON: " + e.getMessage(), e); //$NON-NLS-1$
        }
    }

    private void load(JsonObject root) {
        original = root.deepCopy();
        materials.clear();
        sections.clear();
        stations.clear();
        combinations.clear();
        for (Map.Entry<String, JsonElement> e : members(root, "materials")) { //$NON-NLS-1$
            materials.add(new ObjectNode(e.getKey(), asObject(e.getValue())));
        }
        for (Map.Entry<String, JsonElement> e : members(root, "sections")) { //$NON-NLS-1$
            sections.add(SectionModel.read(e.getKey(), asObject(e.getValue())));
        }
        for (Map.Entry<String, JsonElement> e : members(root, "stations")) { //$NON-NLS-1$
            stations.add(StationModel.read(e.getKey(), asObject(e.getValue())));
        }
        for (Map.Entry<String, JsonElement> e : members(root, "combinations")) { //$NON-NLS-1$
            combinations.add(new ObjectNode(e.getKey(), asObject(e.getValue())));
        }
    }

    /** Replaces the whole document by {@code root} and fires {@link #DOCUMENT}. */
    public void replace(JsonObject root) {
        load(root);
        fire(DOCUMENT, null, this);
    }

    private static Iterable<Map.Entry<String, JsonElement>> members(JsonObject root, String key) {
        JsonElement e = root.get(key);
        return e != null && e.isJsonObject() ? e.getAsJsonObject().entrySet() : List.of();
    }

    private static JsonObject asObject(JsonElement e) {
        return e != null && e.isJsonObject() ? e.getAsJsonObject() : new JsonObject();
    }

    static Profile readProfile(JsonElement json) {
        JsonObject o = asObject(json);
        JsonElement t = o.get("type"); //$NON-NLS-1$
        String type = t != null && t.isJsonPrimitive() ? t.getAsString() : ""; //$NON-NLS-1$
        if (Profile.CLOSED.equals(type) || Profile.WITH_VOIDS.equals(type)) {
            Loop outer = LoopJson.read(o.get("outer")); //$NON-NLS-1$
            List<Loop> voids = new ArrayList<>();
            JsonElement vs = o.get("voids"); //$NON-NLS-1$
            if (vs != null && vs.isJsonArray()) {
                for (JsonElement v : vs.getAsJsonArray()) {
                    voids.add(LoopJson.read(v));
                }
            }
            JsonObject extras = new JsonObject();
            for (Map.Entry<String, JsonElement> e : o.entrySet()) {
                if (!Set.of("type", "outer", "voids").contains(e.getKey())) { //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
                    extras.add(e.getKey(), e.getValue().deepCopy());
                }
            }
            return Profile.arbitrary(outer, voids, Profile.WITH_VOIDS.equals(type), extras);
        }
        JsonObject params = o.deepCopy();
        params.remove("type"); //$NON-NLS-1$
        return Profile.parametric(type, params);
    }

    /** @return the materials in file order, unmodifiable */
    public List<ObjectNode> materials() {
        return Collections.unmodifiableList(materials);
    }

    /** @return the sections in file order, unmodifiable */
    public List<SectionModel> sections() {
        return Collections.unmodifiableList(sections);
    }

    /** @return the section with this id, or null */
    public SectionModel section(String id) {
        return sections.stream().filter(s -> s.id().equals(id)).findFirst().orElse(null);
    }

    /** @return the stations in file order, unmodifiable */
    public List<StationModel> stations() {
        return Collections.unmodifiableList(stations);
    }

    /** @return the combinations in file order, unmodifiable */
    public List<ObjectNode> combinations() {
        return Collections.unmodifiableList(combinations);
    }

    /** @return the length unit symbol of the file (mm when not given) */
    public String lengthUnit() {
        JsonObject units = asObject(original.get("units")); //$NON-NLS-1$
        JsonElement l = units.get("length"); //$NON-NLS-1$
        return l != null && l.isJsonPrimitive() ? l.getAsString() : "mm"; //$NON-NLS-1$
    }

    /** @return the force unit symbol of the file (N when not given) */
    public String forceUnit() {
        JsonObject units = asObject(original.get("units")); //$NON-NLS-1$
        JsonElement f = units.get("force"); //$NON-NLS-1$
        return f != null && f.isJsonPrimitive() ? f.getAsString() : "N"; //$NON-NLS-1$
    }

    /** @return the project as the file writes it */
    public JsonObject toJson() {
        Map<String, JsonElement> now = new LinkedHashMap<>();
        JsonObject m = new JsonObject();
        materials.forEach(n -> m.add(n.id(), n.toJson()));
        now.put("materials", m); //$NON-NLS-1$
        JsonObject s = new JsonObject();
        sections.forEach(n -> s.add(n.id(), n.toJson()));
        now.put("sections", s); //$NON-NLS-1$
        if (original.has("stations") || !stations.isEmpty()) { //$NON-NLS-1$
            JsonObject st = new JsonObject();
            stations.forEach(n -> st.add(n.id(), n.toJson()));
            now.put("stations", st); //$NON-NLS-1$
        }
        if (original.has("combinations") || !combinations.isEmpty()) { //$NON-NLS-1$
            JsonObject c = new JsonObject();
            combinations.forEach(n -> c.add(n.id(), n.toJson()));
            now.put("combinations", c); //$NON-NLS-1$
        }
        return OrderedJson.merge(original, KEYS, now);
    }

    /** @return the project as JSON text (see {@link JsonText}) */
    public String toText() {
        return JsonText.write(toJson());
    }
}
