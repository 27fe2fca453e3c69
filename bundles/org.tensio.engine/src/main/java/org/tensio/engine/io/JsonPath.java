package org.tensio.engine.io;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.regex.Pattern;

/**
 * A location in a JSON document in the JSONPath notation of RFC 9535: {@code $} for the root, {@code .key}
 * for a member whose name is a plain identifier, {@code ['key']} otherwise, {@code [i]} for the i-th array
 * item (from 0). Immutable; children share their parent, so making one is cheap and the text is built only
 * when asked for.
 */
final class JsonPath {

    /** The document root, {@code $}. */
    static final JsonPath ROOT = new JsonPath(null, null, -1);

    private static final Pattern PLAIN = Pattern.compile("[A-Za-z_][A-Za-z0-9_]*");

    private final JsonPath parent;
    private final String name;
    private final int index;

    private JsonPath(JsonPath parent, String name, int index) {
        this.parent = parent;
        this.name = name;
        this.index = index;
    }

    /** @return the path of member {@code key} of the object at this path */
    JsonPath child(String key) {
        return new JsonPath(this, key, -1);
    }

    /** @return the path of the value that holds this one; the root for the root */
    JsonPath parent() {
        return parent == null ? this : parent;
    }

    /** @return the path of item {@code i} of the array at this path */
    JsonPath item(int i) {
        return new JsonPath(this, null, i);
    }

    @Override
    public String toString() {
        Deque<JsonPath> chain = new ArrayDeque<>();
        for (JsonPath p = this; p.parent != null; p = p.parent) {
            chain.push(p);
        }
        StringBuilder sb = new StringBuilder("$");
        for (JsonPath p : chain) {
            if (p.name == null) {
                sb.append('[').append(p.index).append(']');
            } else if (PLAIN.matcher(p.name).matches()) {
                sb.append('.').append(p.name);
            } else {
                sb.append("['");
                appendEscaped(sb, p.name);
                sb.append("']");
            }
        }
        return sb.toString();
    }

    private static void appendEscaped(StringBuilder sb, String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '\'' || c == '\\') {
                sb.append('\\').append(c);
            } else if (c < 0x20) {
                sb.append(String.format("\\u%04x", (int) c));
            } else {
                sb.append(c);
            }
        }
    }
}
