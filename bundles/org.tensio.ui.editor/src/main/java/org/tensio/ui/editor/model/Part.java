package org.tensio.ui.editor.model;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

/**
 * One material part of a section: material id, profile and offset (length unit of the file; the profile's
 * origin is placed at the offset in the section frame). Unknown keys are kept.
 */
public final class Part extends ModelElement {

    /** Property fired when the material changes. */
    public static final String MATERIAL = "material"; //$NON-NLS-1$
    /** Property fired when the profile is replaced. */
    public static final String PROFILE = "profile"; //$NON-NLS-1$
    /** Property fired when the offset changes. */
    public static final String OFFSET = "offset"; //$NON-NLS-1$

    static final Set<String> KEYS = Set.of("material", "profile", "offset"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$

    private final JsonObject original;
    private String material;
    private Profile profile;
    private double[] offset;

    /** @param offset null when the file gives none (then [0, 0]) */
    public Part(String material, Profile profile, double[] offset, JsonObject original) {
        this.material = material;
        this.profile = profile;
        this.offset = offset == null ? null : offset.clone();
        this.original = original == null ? new JsonObject() : original.deepCopy();
    }

    /** Reads a part (leniently: the engine validates). */
    static Part read(JsonObject json) {
        JsonElement m = json.get("material"); //$NON-NLS-1$
        String material = m != null && m.isJsonPrimitive() ? m.getAsString() : null;
        Profile profile = ProjectModel.readProfile(json.get("profile")); //$NON-NLS-1$
        double[] offset = LoopJson.point(json.get("offset")); //$NON-NLS-1$
        return new Part(material, profile, offset, json);
    }

    /** @return the material id, or null when none is set */
    public String material() {
        return material;
    }

    /** @return the profile */
    public Profile profile() {
        return profile;
    }

    /** @return offset x, length unit */
    public double offsetX() {
        return offset == null ? 0 : offset[0];
    }

    /** @return offset y, length unit */
    public double offsetY() {
        return offset == null ? 0 : offset[1];
    }

    /** @return the offset as in the file, null when absent */
    public double[] offset() {
        return offset == null ? null : offset.clone();
    }

    /** Sets the material id. */
    public void setMaterial(String id) {
        String old = material;
        material = id;
        fire(MATERIAL, old, id);
    }

    /** Replaces the profile. */
    public void setProfile(Profile p) {
        Profile old = profile;
        profile = p;
        fire(PROFILE, old, p);
    }

    /** Sets the offset (null: none, i.e. [0, 0]). */
    public void setOffset(double[] newOffset) {
        double[] old = offset;
        offset = newOffset == null ? null : newOffset.clone();
        fire(OFFSET, old, newOffset);
    }

    /** @return the current values of the keys the model owns */
    Map<String, JsonElement> known() {
        Map<String, JsonElement> now = new LinkedHashMap<>();
        if (material != null) {
            now.put("material", new com.google.gson.JsonPrimitive(material)); //$NON-NLS-1$
        }
        now.put("profile", profile.toJson()); //$NON-NLS-1$
        if (offset != null) {
            now.put("offset", LoopJson.point(offset[0], offset[1])); //$NON-NLS-1$
        }
        return now;
    }

    /** @return the original object (for the order of keys and unknown keys) */
    JsonObject original() {
        return original;
    }

    /** @return the part as the file writes it inside {@code parts} */
    public JsonObject toJson() {
        return OrderedJson.merge(original, KEYS, known());
    }
}
