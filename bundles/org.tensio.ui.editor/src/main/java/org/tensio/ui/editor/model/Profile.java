package org.tensio.ui.editor.model;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

/**
 * A part's profile: its IFC4 type name, and either its parameters (parametric types, length unit of the file)
 * or its loops (the arbitrary types {@value #CLOSED} and {@value #WITH_VOIDS}). Other keys are kept as read.
 */
public final class Profile extends ModelElement {

    /** Arbitrary profile without voids. */
    public static final String CLOSED = "ArbitraryClosedProfile"; //$NON-NLS-1$
    /** Arbitrary profile with voids. */
    public static final String WITH_VOIDS = "ArbitraryProfileWithVoids"; //$NON-NLS-1$
    /** Property fired when a parameter changes; new value is the parameter name. */
    public static final String PARAMETER = "parameter"; //$NON-NLS-1$
    /** Property fired when a void is added or removed, or the type changes. */
    public static final String LOOPS = "loops"; //$NON-NLS-1$

    private String type;
    /** parametric: every key but "type"; arbitrary: keys other than type/outer/voids */
    private final JsonObject parameters;
    private final Loop outer;
    private final List<Loop> voids = new ArrayList<>();

    private Profile(String type, JsonObject parameters, Loop outer, List<Loop> voids) {
        this.type = type;
        this.parameters = parameters;
        this.outer = outer;
        this.voids.addAll(voids);
    }

    /** A parametric profile of {@code type} with these parameters (copied). */
    public static Profile parametric(String type, JsonObject parameters) {
        return new Profile(type, parameters.deepCopy(), null, List.of());
    }

    /** An arbitrary profile; its type is {@value #WITH_VOIDS} when {@code voids} is non-empty or {@code withVoids}. */
    public static Profile arbitrary(Loop outer, List<Loop> voids, boolean withVoids, JsonObject extras) {
        return new Profile(withVoids || !voids.isEmpty() ? WITH_VOIDS : CLOSED, extras.deepCopy(), outer, voids);
    }

    /** @return the IFC4 type name */
    public String type() {
        return type;
    }

    /** @return true for the arbitrary (loop) types */
    public boolean isArbitrary() {
        return outer != null;
    }

    /** @return the outer loop of an arbitrary profile, or null for a parametric one */
    public Loop outer() {
        return outer;
    }

    /** @return the voids of an arbitrary profile (empty for a parametric one), unmodifiable */
    public List<Loop> voids() {
        return Collections.unmodifiableList(voids);
    }

    /** @return every loop: outer first, then the voids (empty for a parametric profile) */
    public List<Loop> loops() {
        List<Loop> all = new ArrayList<>();
        if (outer != null) {
            all.add(outer);
            all.addAll(voids);
        }
        return all;
    }

    /** Adds a void at {@code index}; the type becomes {@value #WITH_VOIDS}. */
    public void addVoid(int index, Loop hole) {
        requireArbitrary();
        voids.add(index, hole);
        type = WITH_VOIDS;
        fire(LOOPS, null, hole);
    }

    /** Removes a void (the type stays {@value #WITH_VOIDS}); @return its index or -1 */
    public int removeVoid(Loop hole) {
        int i = voids.indexOf(hole);
        if (i >= 0) {
            voids.remove(i);
            fire(LOOPS, hole, null);
        }
        return i;
    }

    /** Sets the type back (used by undo of {@link #addVoid}). */
    public void setType(String newType) {
        String old = type;
        type = newType;
        fire(LOOPS, old, newType);
    }

    /** @return the parameter names of a parametric profile, in file order */
    public List<String> parameterNames() {
        List<String> names = new ArrayList<>();
        if (outer == null) {
            for (Map.Entry<String, JsonElement> e : parameters.entrySet()) {
                names.add(e.getKey());
            }
        }
        return names;
    }

    /** @return parameter {@code name}, or null when absent */
    public JsonElement parameter(String name) {
        JsonElement e = parameters.get(name);
        return e == null ? null : e.deepCopy();
    }

    /** Sets parameter {@code name} (null removes it). */
    public void setParameter(String name, JsonElement value) {
        JsonElement old = parameter(name);
        if (value == null) {
            parameters.remove(name);
        } else {
            parameters.add(name, value.deepCopy());
        }
        fire(PARAMETER, old, name);
    }

    private void requireArbitrary() {
        if (outer == null) {
            throw new IllegalStateException("profile type " + type + " has no loops");
        }
    }

    /** @return the profile as the file writes it */
    public JsonObject toJson() {
        JsonObject json = new JsonObject();
        json.addProperty("type", type); //$NON-NLS-1$
        if (outer == null) {
            for (Map.Entry<String, JsonElement> e : parameters.entrySet()) {
                json.add(e.getKey(), e.getValue().deepCopy());
            }
            return json;
        }
        json.add("outer", LoopJson.write(outer)); //$NON-NLS-1$
        if (WITH_VOIDS.equals(type)) {
            com.google.gson.JsonArray vs = new com.google.gson.JsonArray();
            for (Loop v : voids) {
                vs.add(LoopJson.write(v));
            }
            json.add("voids", vs); //$NON-NLS-1$
        }
        for (Map.Entry<String, JsonElement> e : parameters.entrySet()) {
            json.add(e.getKey(), e.getValue().deepCopy());
        }
        return json;
    }
}
