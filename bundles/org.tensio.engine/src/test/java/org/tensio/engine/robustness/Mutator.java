package org.tensio.engine.robustness;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.regex.Pattern;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import com.google.gson.JsonPrimitive;

import org.tensio.engine.robustness.Harness.PathRule;

/**
 * Structured mutations of a valid project: one change to its JSON tree (a wrong type, an unknown or missing key,
 * a renamed key, an extreme number, an odd string, a duplicated or removed array item, a missing reference, an
 * unknown profile type, a unit change), each with what the reader must do about it: the path rule of the error,
 * and whether the result must be rejected.
 */
final class Mutator {

    /** One generated input. */
    record Mutation(String json, String what, PathRule rule, boolean mustFail) {
    }

    private record Node(List<Object> segs, JsonElement value) {
    }

    private static final Pattern PLAIN = Pattern.compile("[A-Za-z_][A-Za-z0-9_]*");

    /** Numbers that probe ranges, precision and overflow (finite: JSON has no NaN or Infinity). */
    private static final double[] EXTREMES = {0, -0.0, -1, 1e300, -1e300, 1e-300, -1e-300, Double.MIN_VALUE,
        Double.MAX_VALUE, -Double.MAX_VALUE, 1e20, 9007199254740993.0, 0.5, 1e-12, 1e12, 2.5e-8, 1e154, 1e-154};

    private static final String[] STRINGS = {"", " ", "x", "NaN", "Infinity", "-Infinity", "null", "1e400", "25",
        "\u0000", "\u0001\u007f", "\uFEFFbom", "Ünïcødé ✓", "'quoted'", "\"", "\\", "$.sections", "../../etc/passwd",
        "C:\\x", "MM", "mm ", "kn", "ccw ", "CW", "vonmises", "IfcCircleProfileDef", "Circle", "circleProfile"};

    private static final String[] BAD_TYPES = {"Circle", "circleProfile", "IfcCircleProfileDef", "CShapeProfile",
        "AsymmetricIShapeProfile", "IShapeProfile ", "", "ArbitraryOpenProfile", "CenterLineProfile", "TrapeziumProfile"};

    private Mutator() {
    }

    /** @return one mutation of {@code base}, chosen by {@code r} */
    static Mutation mutate(String base, Random r) {
        JsonObject root = JsonParser.parseString(base).getAsJsonObject();
        List<Node> nodes = new ArrayList<>();
        collect(root, new ArrayList<>(), nodes);
        for (int attempt = 0; attempt < 100; attempt++) {
            Node n = nodes.get(1 + r.nextInt(nodes.size() - 1));
            Mutation m = switch (r.nextInt(11)) {
                case 0, 1 -> wrongType(root, n, r);
                case 2 -> unknownKey(root, n, r);
                case 3 -> delete(root, n);
                case 4, 5 -> number(root, n, r);
                case 6 -> string(root, n, r);
                case 7 -> renameKey(root, n, r);
                case 8 -> duplicateItem(root, n, r);
                case 9 -> missingReference(root, r);
                default -> typeOrUnits(root, r);
            };
            if (m != null) {
                return m;
            }
        }
        throw new IllegalStateException("no mutation found");
    }

    private static void collect(JsonElement e, List<Object> segs, List<Node> out) {
        out.add(new Node(List.copyOf(segs), e));
        if (e.isJsonObject()) {
            for (Map.Entry<String, JsonElement> m : e.getAsJsonObject().entrySet()) {
                segs.add(m.getKey());
                collect(m.getValue(), segs, out);
                segs.remove(segs.size() - 1);
            }
        } else if (e.isJsonArray()) {
            JsonArray a = e.getAsJsonArray();
            for (int i = 0; i < a.size(); i++) {
                segs.add(i);
                collect(a.get(i), segs, out);
                segs.remove(segs.size() - 1);
            }
        }
    }

    static String path(List<Object> segs) {
        StringBuilder sb = new StringBuilder("$");
        for (Object s : segs) {
            if (s instanceof Integer i) {
                sb.append('[').append(i).append(']');
            } else if (PLAIN.matcher((String) s).matches()) {
                sb.append('.').append(s);
            } else {
                sb.append("['").append(((String) s).replace("\\", "\\\\").replace("'", "\\'")).append("']");
            }
        }
        return sb.toString();
    }

    /** @return true when the object at {@code segs} maps ids (materials, sections, stations, forces, combinations) */
    static boolean isIdMap(List<Object> segs) {
        if (segs.size() == 1) {
            return List.of("materials", "sections", "stations", "combinations").contains(segs.get(0));
        }
        if (segs.size() == 2) {
            return "combinations".equals(segs.get(0));
        }
        return segs.size() == 3 && "stations".equals(segs.get(0)) && "forces".equals(segs.get(2));
    }

    /** @return a deep copy of root with the node at {@code segs} replaced (null value: removed) */
    private static JsonObject with(JsonObject root, List<Object> segs, JsonElement value) {
        JsonObject copy = root.deepCopy();
        JsonElement parent = copy;
        for (int i = 0; i < segs.size() - 1; i++) {
            Object s = segs.get(i);
            parent = s instanceof Integer k ? parent.getAsJsonArray().get(k) : parent.getAsJsonObject().get((String) s);
        }
        Object last = segs.get(segs.size() - 1);
        if (last instanceof Integer k) {
            if (value == null) {
                parent.getAsJsonArray().remove((int) k);
            } else {
                parent.getAsJsonArray().set(k, value);
            }
        } else if (value == null) {
            parent.getAsJsonObject().remove((String) last);
        } else {
            parent.getAsJsonObject().add((String) last, value);
        }
        return copy;
    }

    private static int category(JsonElement e) {
        if (e.isJsonObject()) {
            return 0;
        }
        if (e.isJsonArray()) {
            return 1;
        }
        if (e.isJsonNull()) {
            return 2;
        }
        JsonPrimitive p = e.getAsJsonPrimitive();
        return p.isNumber() ? 3 : p.isString() ? 4 : 5;
    }

    private static JsonElement ofCategory(int c, Random r) {
        return switch (c) {
            case 0 -> {
                JsonObject o = new JsonObject();
                if (r.nextBoolean()) {
                    o.addProperty("x", 1);
                }
                yield o;
            }
            case 1 -> {
                JsonArray a = new JsonArray();
                if (r.nextBoolean()) {
                    a.add("x");
                }
                yield a;
            }
            case 2 -> JsonNull.INSTANCE;
            case 3 -> new JsonPrimitive(r.nextBoolean() ? 7 : -1.5);
            case 4 -> new JsonPrimitive(STRINGS[r.nextInt(STRINGS.length)]);
            default -> new JsonPrimitive(r.nextBoolean());
        };
    }

    private static Mutation wrongType(JsonObject root, Node n, Random r) {
        int old = category(n.value);
        int c;
        do {
            c = r.nextInt(6);
        } while (c == old);
        JsonElement v = ofCategory(c, r);
        String p = path(n.segs);
        return new Mutation(with(root, n.segs, v).toString(), "type of " + p + " → " + v, PathRule.atOrAbove(p), true);
    }

    private static Mutation unknownKey(JsonObject root, Node n, Random r) {
        if (!n.value.isJsonObject()) {
            return null;
        }
        String key = r.nextBoolean() ? "zzUnknown" : "unknown key " + r.nextInt(100);
        List<Object> segs = new ArrayList<>(n.segs);
        segs.add(key);
        String p = path(segs);
        if (isIdMap(n.segs)) {
            // a new id: its value must be valid there; a number never is
            return new Mutation(with(root, segs, new JsonPrimitive(3)).toString(), "new id " + p,
                    PathRule.atOrAbove(p), true);
        }
        return new Mutation(with(root, segs, new JsonPrimitive(1)).toString(), "unknown key " + p,
                PathRule.exactly(p), true);
    }

    private static Mutation delete(JsonObject root, Node n) {
        String p = path(n.segs);
        List<Object> parent = n.segs.subList(0, n.segs.size() - 1);
        PathRule rule = n.segs.size() <= 1 || isIdMap(parent) ? PathRule.ANY : PathRule.sameEntity(p);
        return new Mutation(with(root, n.segs, null).toString(), "delete " + p, rule, false);
    }

    private static Mutation number(JsonObject root, Node n, Random r) {
        if (category(n.value) != 3) {
            return null;
        }
        double old = n.value.getAsDouble();
        double v = switch (r.nextInt(4)) {
            case 0 -> -old;
            case 1 -> old * Math.pow(10, r.nextInt(41) - 20);
            default -> EXTREMES[r.nextInt(EXTREMES.length)];
        };
        String p = path(n.segs);
        PathRule entity = PathRule.sameEntity(p);
        // a huge force may make a combination overflow: that is reported at the combination
        PathRule rule = p.startsWith("$.stations") ? q -> entity.test(q) || q.startsWith("$.combinations.") : entity;
        return new Mutation(with(root, n.segs, new JsonPrimitive(v)).toString(), "number " + p + " → " + v, rule,
                false);
    }

    private static Mutation string(JsonObject root, Node n, Random r) {
        if (category(n.value) != 4) {
            return null;
        }
        String s = r.nextInt(8) == 0 ? "y".repeat(10_000) : STRINGS[r.nextInt(STRINGS.length)];
        String p = path(n.segs);
        return new Mutation(with(root, n.segs, new JsonPrimitive(s)).toString(), "string " + p + " → "
                + Harness.abbreviate(s), PathRule.sameEntity(p), false);
    }

    private static Mutation renameKey(JsonObject root, Node n, Random r) {
        if (n.segs.isEmpty() || !(n.segs.get(n.segs.size() - 1) instanceof String key)) {
            return null;
        }
        List<Object> parent = n.segs.subList(0, n.segs.size() - 1);
        String renamed = switch (r.nextInt(3)) {
            case 0 -> key.toUpperCase(java.util.Locale.ROOT).equals(key) ? key.toLowerCase(java.util.Locale.ROOT)
                    : key.toUpperCase(java.util.Locale.ROOT);
            case 1 -> key + "_";
            default -> key.length() > 1 ? key.substring(1) : key + key;
        };
        JsonObject copy = with(root, n.segs, null);
        List<Object> segs = new ArrayList<>(parent);
        segs.add(renamed);
        copy = with(copy, segs, n.value.deepCopy());
        String p = path(segs);
        if (isIdMap(parent) || "fatigue".equals(n.segs.get(0))) { // the fatigue block has id maps of its own
            return new Mutation(copy.toString(), "rename id " + path(n.segs) + " → " + renamed, PathRule.ANY, false);
        }
        String parentPath = path(parent);
        PathRule rule = q -> q.equals(p) || PathRule.atOrAbove(parentPath).test(q);
        return new Mutation(copy.toString(), "rename key " + path(n.segs) + " → " + renamed, rule, true);
    }

    private static Mutation duplicateItem(JsonObject root, Node n, Random r) {
        if (!n.value.isJsonArray() || n.value.getAsJsonArray().isEmpty()) {
            return null;
        }
        JsonArray a = n.value.getAsJsonArray().deepCopy();
        int i = r.nextInt(a.size());
        JsonArray b = new JsonArray();
        for (int k = 0; k < a.size(); k++) {
            b.add(a.get(k));
            if (k == i) {
                b.add(a.get(k).deepCopy());
            }
        }
        String p = path(n.segs);
        return new Mutation(with(root, n.segs, b).toString(), "duplicate " + p + "[" + i + "]", PathRule.sameEntity(p),
                false);
    }

    /** A combination naming a case no station has, or a section naming a missing material, or a station a section. */
    private static Mutation missingReference(JsonObject root, Random r) {
        int k = r.nextInt(3);
        if (k == 0 && root.has("combinations") && !root.getAsJsonObject("combinations").isEmpty()) {
            String combo = root.getAsJsonObject("combinations").keySet().iterator().next();
            List<Object> segs = List.of("combinations", combo, "LC_missing");
            return new Mutation(with(root, segs, new JsonPrimitive(1.2)).toString(), "combination names a missing case",
                    PathRule.exactly(path(segs)), true);
        }
        if (k == 1 && root.has("stations") && !root.getAsJsonObject("stations").isEmpty()) {
            String st = root.getAsJsonObject("stations").keySet().iterator().next();
            List<Object> segs = List.of("stations", st, "section");
            return new Mutation(with(root, segs, new JsonPrimitive("no_such_section")).toString(),
                    "station names a missing section", PathRule.exactly(path(segs)), true);
        }
        String sec = root.getAsJsonObject("sections").keySet().iterator().next();
        JsonObject s = root.getAsJsonObject("sections").getAsJsonObject(sec);
        List<Object> segs = s.has("parts") ? List.of("sections", sec, "parts", 0, "material")
                : List.of("sections", sec, "material");
        return new Mutation(with(root, segs, new JsonPrimitive("no_such_material")).toString(),
                "section names a missing material", PathRule.exactly(path(segs)), true);
    }

    /** An unknown profile type, or another unit system (valid: accepted with finite results; invalid: named). */
    private static Mutation typeOrUnits(JsonObject root, Random r) {
        if (r.nextBoolean()) {
            String sec = root.getAsJsonObject("sections").keySet().iterator().next();
            JsonObject s = root.getAsJsonObject("sections").getAsJsonObject(sec);
            List<Object> segs = s.has("parts") ? List.of("sections", sec, "parts", 0, "profile", "type")
                    : List.of("sections", sec, "profile", "type");
            String t = BAD_TYPES[r.nextInt(BAD_TYPES.length)];
            return new Mutation(with(root, segs, new JsonPrimitive(t)).toString(), "profile type '" + t + "'",
                    PathRule.exactly(path(segs)), true);
        }
        String[] lengths = {"mm", "cm", "m", "in", "ft", "km", "MM", "µm"};
        String[] forces = {"N", "kN", "MN", "lbf", "kip", "kgf", "n", "t"};
        String l = lengths[r.nextInt(lengths.length)];
        String f = forces[r.nextInt(forces.length)];
        JsonObject u = new JsonObject();
        u.addProperty("length", l);
        u.addProperty("force", f);
        boolean valid = List.of("mm", "cm", "m", "in", "ft").contains(l) && List.of("N", "kN", "MN", "lbf", "kip")
                .contains(f);
        // valid units may make unit-dependent rules (e.g. fatigue fits in MPa) reject values elsewhere: any place
        PathRule rule = valid ? PathRule.ANY
                : PathRule.atOrAbove("$.units." + (List.of("mm", "cm", "m", "in", "ft").contains(l) ? "force" : "length"));
        return new Mutation(with(root, List.of("units"), u).toString(), "units " + l + "/" + f, rule, !valid);
    }
}
