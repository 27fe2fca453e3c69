package org.tensio.ui.editor.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

/**
 * A JSON object of the project edited key by key (a material, a load case's forces, a combination's factors):
 * its id and its members in file order. Keys the editor does not know are kept as they are.
 */
public final class ObjectNode extends ModelElement {

    /** Property fired when a member is set or removed; the event's new value is the key. */
    public static final String MEMBER = "member"; //$NON-NLS-1$

    private final String id;
    private final JsonObject members;

    /** @param id the key of this object in its parent; {@code members} is copied */
    public ObjectNode(String id, JsonObject members) {
        this.id = id;
        this.members = members.deepCopy();
    }

    /** @return the key of this object in its parent */
    public String id() {
        return id;
    }

    /** @return the member {@code key}, or null when absent */
    public JsonElement get(String key) {
        JsonElement e = members.get(key);
        return e == null ? null : e.deepCopy();
    }

    /** @return the member keys in file order */
    public List<String> keys() {
        List<String> keys = new ArrayList<>();
        for (Map.Entry<String, JsonElement> e : members.entrySet()) {
            keys.add(e.getKey());
        }
        return keys;
    }

    /** Sets member {@code key} to {@code value} (a copy), or removes it when {@code value} is null. */
    public void set(String key, JsonElement value) {
        if (value == null) {
            members.remove(key);
        } else {
            members.add(key, value.deepCopy());
        }
        fire(MEMBER, null, key);
    }

    /** @return a copy of the members as JSON */
    public JsonObject toJson() {
        return members.deepCopy();
    }
}
