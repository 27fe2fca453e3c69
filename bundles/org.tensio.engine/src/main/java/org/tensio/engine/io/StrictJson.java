package org.tensio.engine.io;

import java.io.EOFException;
import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;
import com.google.gson.Strictness;
import com.google.gson.stream.JsonReader;
import com.google.gson.stream.JsonToken;

/**
 * Builds a Gson tree from text with a {@link JsonReader} in {@link Strictness#STRICT} mode (RFC 8259 only:
 * no comments, no single quotes, no NaN or Infinity literals, no unquoted names, no trailing content),
 * and additionally rejects what {@code JsonParser} lets through or cannot bound:
 * <ul>
 * <li>a key repeated within one object (the tree model would silently keep the last one);</li>
 * <li>a number literal that overflows a double (e.g. {@code 1e400});</li>
 * <li>nesting deeper than {@code maxDepth} containers (the root object is depth 1);</li>
 * <li>an array with more than {@code maxItems} items.</li>
 * </ul>
 * Numbers are stored as {@link Double}. Every failure, truncated input included, is a
 * {@link ProjectFormatException} whose path is where the reader was. Single use.
 */
final class StrictJson {

    private final int maxDepth;
    private final int maxItems;
    private final String sourceSuffix;
    private JsonPath at = JsonPath.ROOT;
    private boolean rootDone;
    private String text;

    private StrictJson(int maxDepth, int maxItems, String sourceSuffix) {
        this.maxDepth = maxDepth;
        this.maxItems = maxItems;
        this.sourceSuffix = sourceSuffix;
    }

    /**
     * @param text         the whole document
     * @param maxDepth     greatest nesting of objects and arrays
     * @param maxItems     greatest number of items in one array
     * @param sourceSuffix appended to every message (e.g. " (in demo.json)"), may be empty
     * @return the root value
     * @throws ProjectFormatException on any syntax error or exceeded limit
     */
    static JsonElement parse(String text, int maxDepth, int maxItems, String sourceSuffix)
            throws ProjectFormatException {
        return new StrictJson(maxDepth, maxItems, sourceSuffix).run(text);
    }

    private JsonElement run(String text) throws ProjectFormatException {
        this.text = text;
        try (JsonReader r = new JsonReader(new StringReader(text))) {
            r.setStrictness(Strictness.STRICT);
            if (text.isBlank()) {
                throw fail("the file is empty");
            }
            JsonElement root = value(r, 0);
            at = JsonPath.ROOT;
            rootDone = true;
            if (r.peek() != JsonToken.END_DOCUMENT) {
                throw fail("unexpected content after the end of the top-level value");
            }
            return root;
        } catch (EOFException e) {
            throw fail("the file ends early (truncated?)" + where(e.getMessage()));
        } catch (IOException | IllegalStateException | NumberFormatException e) {
            String gson = e.getMessage() == null ? "" : e.getMessage();
            Matcher m = LINE_COLUMN.matcher(gson);
            String head = m.find() ? gson.substring(0, m.start()) : "";
            if (rootDone) {
                throw fail("unexpected content after the end of the top-level value" + where(gson));
            }
            if (head.startsWith("Unterminated") && m.find(0) && restIsBlank(m)) {
                throw fail("the file ends early (truncated?): " + head.toLowerCase(Locale.ROOT) + where(gson));
            }
            // Gson's generic advice (switch to lenient mode) does not apply: the format is strict JSON
            boolean generic = head.isEmpty() || head.startsWith("Use JsonReader");
            String at = where(gson);
            if (generic && NON_NUMBER.matcher(at).find()) {
                head = "NaN and Infinity are not JSON numbers";
                generic = false;
            }
            // Gson may quote the input in its message (e.g. a malformed \\u escape and what follows): one line only
            throw fail("not valid JSON" + (generic ? "" : " (" + printable(head.strip()) + ")") + at);
        }
    }

    /** @return true when nothing but white space follows the position Gson reported */
    private boolean restIsBlank(Matcher lineColumn) {
        int offset = offset(Integer.parseInt(lineColumn.group(1)), Integer.parseInt(lineColumn.group(2)));
        return offset < 0 || text.substring(Math.min(text.length(), offset)).isBlank();
    }

    /** @return the character offset of (line, column), both from 1, or -1 when the line does not exist */
    private int offset(int line, int column) {
        int offset = 0;
        for (int l = 1; l < line && offset >= 0; l++) {
            offset = text.indexOf('\n', offset);
            offset = offset < 0 ? -1 : offset + 1;
        }
        return offset < 0 ? -1 : offset + column - 1;
    }

    private static final Pattern NON_NUMBER = Pattern.compile("near '[:,\\[\\s]*[-+]?(NaN|Infinity)");
    private static final Pattern LINE_COLUMN = Pattern.compile(" at line (\\d+) column (\\d+)");

    /**
     * @return " at line L column C: 'text there'" from a Gson message, Gson's own advice and path left out
     *         (Gson suggests lenient mode; the format does not allow it)
     */
    private String where(String gsonMessage) {
        if (gsonMessage == null) {
            return "";
        }
        Matcher m = LINE_COLUMN.matcher(gsonMessage);
        if (!m.find()) {
            return "";
        }
        int line;
        int column;
        try {
            line = Integer.parseInt(m.group(1));
            column = Integer.parseInt(m.group(2));
        } catch (NumberFormatException e) {
            return "";
        }
        String found = near(line, column);
        return " at line " + line + " column " + column + (found.isEmpty() ? "" : ", near '" + found + "'");
    }

    /** @return up to 20 characters of the text around (line, column), both from 1, one line only */
    private String near(int line, int column) {
        int at = offset(line, column);
        if (at < 0) {
            return "";
        }
        int lineStart = at - column + 1;
        int start = Math.max(lineStart, Math.min(text.length(), at) - 1);
        int end = Math.min(text.length(), start + 20);
        int nl = text.indexOf('\n', start);
        if (nl >= 0 && nl < end) {
            end = nl;
        }
        return start >= end ? "" : abbreviate(text.substring(start, end).strip());
    }

    private JsonElement value(JsonReader r, int depth) throws IOException, ProjectFormatException {
        JsonToken t = r.peek();
        switch (t) {
            case BEGIN_OBJECT:
                return object(r, depth + 1);
            case BEGIN_ARRAY:
                return array(r, depth + 1);
            case STRING:
                return new JsonPrimitive(r.nextString());
            case NUMBER:
                return number(r.nextString());
            case BOOLEAN:
                return new JsonPrimitive(r.nextBoolean());
            case NULL:
                r.nextNull();
                return JsonNull.INSTANCE;
            default:
                throw fail("malformed JSON: unexpected " + t);
        }
    }

    private JsonObject object(JsonReader r, int depth) throws IOException, ProjectFormatException {
        if (depth > maxDepth) {
            throw fail("nesting is deeper than " + maxDepth + " levels");
        }
        r.beginObject();
        JsonPath self = at;
        JsonObject o = new JsonObject();
        while (r.hasNext()) {
            String name = r.nextName();
            at = self.child(name);
            if (o.has(name)) {
                throw fail("duplicate key '" + name + "' (a JSON object must not repeat a key)");
            }
            o.add(name, value(r, depth));
            at = self;
        }
        at = self;
        r.endObject();
        return o;
    }

    private JsonArray array(JsonReader r, int depth) throws IOException, ProjectFormatException {
        if (depth > maxDepth) {
            throw fail("nesting is deeper than " + maxDepth + " levels");
        }
        r.beginArray();
        JsonPath self = at;
        List<JsonElement> items = new ArrayList<>();
        while (r.hasNext()) {
            if (items.size() == maxItems) {
                at = self;
                throw fail("array has more than " + maxItems + " items");
            }
            at = self.item(items.size());
            items.add(value(r, depth));
            at = self;
        }
        at = self;
        r.endArray();
        JsonArray a = new JsonArray(items.size());
        for (JsonElement e : items) {
            a.add(e);
        }
        return a;
    }

    private JsonPrimitive number(String literal) throws ProjectFormatException {
        double d = Double.parseDouble(literal);
        if (!Double.isFinite(d)) {
            throw fail("number " + abbreviate(literal) + " is too large for a double");
        }
        return new JsonPrimitive(d);
    }

    private ProjectFormatException fail(String message) {
        return new ProjectFormatException(at.toString(), message + sourceSuffix);
    }

    /** @return s cut to at most 200 characters, control characters escaped as \\uXXXX */
    static String printable(String s) {
        String cut = s.length() <= 200 ? s : s.substring(0, 197) + "...";
        StringBuilder sb = new StringBuilder(cut.length());
        for (int i = 0; i < cut.length(); i++) {
            char c = cut.charAt(i);
            if (c < 0x20 || c == 0x7f || c == '\u2028' || c == '\u2029') {
                sb.append(String.format("\\u%04x", (int) c));
            } else {
                sb.append(c);
            }
        }
        return sb.toString();
    }

    /** @return s cut to at most 40 characters with an ellipsis, control characters escaped as \\uXXXX */
    static String abbreviate(String s) {
        String cut = s.length() <= 40 ? s : s.substring(0, 37) + "...";
        StringBuilder sb = new StringBuilder(cut.length());
        for (int i = 0; i < cut.length(); i++) {
            char c = cut.charAt(i);
            if (c < 0x20 || c == 0x7f) {
                sb.append(String.format("\\u%04x", (int) c));
            } else {
                sb.append(c);
            }
        }
        return sb.toString();
    }
}
