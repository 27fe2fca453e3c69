package org.tensio.ui.editor.model;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

/**
 * Writes an object whose known members come from the model and whose other members are kept as read, in the
 * order of the file: known members take their old place, new ones go after the kept ones.
 */
final class OrderedJson {

    private OrderedJson() {
    }

    /**
     * @param original the object as read (its order and its unknown members are kept)
     * @param known    the keys the model owns (whether present now or not)
     * @param current  the model's current values of known keys (absent: not written)
     */
    static JsonObject merge(JsonObject original, Set<String> known, Map<String, JsonElement> current) {
        JsonObject out = new JsonObject();
        Map<String, JsonElement> pending = new LinkedHashMap<>(current);
        for (Map.Entry<String, JsonElement> e : original.entrySet()) {
            String key = e.getKey();
            if (known.contains(key)) {
                JsonElement now = pending.remove(key);
                if (now != null) {
                    out.add(key, now);
                }
            } else {
                out.add(key, e.getValue().deepCopy());
            }
        }
        pending.forEach(out::add);
        return out;
    }
}
