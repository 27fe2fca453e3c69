package org.tensio.engine.profile;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Function;

/**
 * The registry of parameterised profile types: type name (as written in the project file, e.g.
 * {@code "IShapeProfile"}) to a factory that builds the {@link ProfileDef} from a map of parameters named by
 * their IFC4 attributes in lowerCamelCase, length unit.
 * <p>
 * {@link #create} rejects, with an {@link IllegalArgumentException} naming them, unknown types, unknown
 * parameter names, missing required parameters and null values; optional parameters that are absent take
 * their IFC4 default (0: sharp corner; for {@code LShapeProfile.width}, 0 means "equal to depth").
 * IFC4 attributes this engine does not support (the flange, web and leg slopes of tapered sections) are
 * accepted only with the value 0. The profile's own constructor then validates the values.
 * <p>
 * The arbitrary profiles ({@link ArbitraryClosedProfile}, {@link ArbitraryProfileWithVoids}, see
 * {@link #ARBITRARY}) have no parameters: the project-file reader builds them from contours, and
 * {@link #create} refuses them.
 * <p>
 * <b>How to add a profile type:</b> write one immutable record implementing {@link ProfileDef} in this
 * package (validation in the compact constructor, {@code parameters()} in IFC4 attribute order), then add
 * one registration line to the static block below, e.g.
 *
 * <pre>
 * register(CShapeProfile.TYPE, "depth width wallThickness girth [internalFilletRadius]",
 *         p -&gt; new CShapeProfile(p.get("depth"), p.get("width"), p.get("wallThickness"), p.get("girth"),
 *                 p.get("internalFilletRadius")));
 * </pre>
 *
 * The parameter list is written in IFC4 attribute order: a plain name is required, {@code [name]} is
 * optional (default 0), {@code {name}} is an IFC4 attribute that is accepted only as 0. The round-trip test
 * ({@code create(p.type(), p.parameters()).equals(p)}) in {@code ProfileTypesTest} then covers the new
 * type's name mapping once an example instance is added there.
 * <p>
 * Thread-safe: the registry is filled once during class initialisation and never changes.
 *
 * @since 0.1
 */
public final class ProfileTypes {

    /** Type names of the profiles built from contours by the file reader rather than by {@link #create}. */
    public static final Set<String> ARBITRARY = Collections.unmodifiableSet(
            new LinkedHashSet<>(List.of(ArbitraryClosedProfile.TYPE, ArbitraryProfileWithVoids.TYPE)));

    private static final Map<String, Entry> TYPES = new LinkedHashMap<>();

    static {
        register(CircleProfile.TYPE, "radius",
                p -> new CircleProfile(p.get("radius")));
        register(CircleHollowProfile.TYPE, "radius wallThickness",
                p -> new CircleHollowProfile(p.get("radius"), p.get("wallThickness")));
        register(EllipseProfile.TYPE, "semiAxis1 semiAxis2",
                p -> new EllipseProfile(p.get("semiAxis1"), p.get("semiAxis2")));
        register(RectangleProfile.TYPE, "xDim yDim",
                p -> new RectangleProfile(p.get("xDim"), p.get("yDim")));
        register(RectangleHollowProfile.TYPE, "xDim yDim wallThickness [innerFilletRadius] [outerFilletRadius]",
                p -> new RectangleHollowProfile(p.get("xDim"), p.get("yDim"), p.get("wallThickness"),
                        p.get("innerFilletRadius"), p.get("outerFilletRadius")));
        register(IShapeProfile.TYPE,
                "overallWidth overallDepth webThickness flangeThickness [filletRadius] [flangeEdgeRadius] {flangeSlope}",
                p -> new IShapeProfile(p.get("overallWidth"), p.get("overallDepth"), p.get("webThickness"),
                        p.get("flangeThickness"), p.get("filletRadius"), p.get("flangeEdgeRadius")));
        register(UShapeProfile.TYPE,
                "depth flangeWidth webThickness flangeThickness [filletRadius] [edgeRadius] {flangeSlope}",
                p -> new UShapeProfile(p.get("depth"), p.get("flangeWidth"), p.get("webThickness"),
                        p.get("flangeThickness"), p.get("filletRadius"), p.get("edgeRadius")));
        register(LShapeProfile.TYPE, "depth [width] thickness [filletRadius] [edgeRadius] {legSlope}",
                p -> new LShapeProfile(p.get("depth"), p.get("width"), p.get("thickness"), p.get("filletRadius"),
                        p.get("edgeRadius")));
        register(TShapeProfile.TYPE, "depth flangeWidth webThickness flangeThickness [filletRadius]"
                + " [flangeEdgeRadius] [webEdgeRadius] {webSlope} {flangeSlope}",
                p -> new TShapeProfile(p.get("depth"), p.get("flangeWidth"), p.get("webThickness"),
                        p.get("flangeThickness"), p.get("filletRadius"), p.get("flangeEdgeRadius"),
                        p.get("webEdgeRadius")));
        register(ZShapeProfile.TYPE, "depth flangeWidth webThickness flangeThickness [filletRadius] [edgeRadius]",
                p -> new ZShapeProfile(p.get("depth"), p.get("flangeWidth"), p.get("webThickness"),
                        p.get("flangeThickness"), p.get("filletRadius"), p.get("edgeRadius")));
    }

    private ProfileTypes() {
    }

    /** @return the names of the parameterised types {@link #create} can build, in registration order */
    public static Set<String> names() {
        return Collections.unmodifiableSet(TYPES.keySet());
    }

    /**
     * @param type a name from {@link #names()}
     * @return the supported parameter names (required and optional) in IFC4 attribute order, as
     *         {@link ProfileDef#parameters()} reports them
     * @throws IllegalArgumentException when {@code type} is not registered
     */
    public static List<String> parameterNames(String type) {
        return entry(type).names;
    }

    /**
     * @param type a name from {@link #names()}
     * @return the parameters {@link #create} requires, in IFC4 attribute order
     * @throws IllegalArgumentException when {@code type} is not registered
     */
    public static List<String> requiredParameterNames(String type) {
        return entry(type).required;
    }

    /**
     * @param type a name from {@link #names()}
     * @return IFC4 attributes of the type that this engine does not model (the slopes of tapered sections);
     *         {@link #create} accepts them only with the value 0 and ignores them; not in {@link #parameterNames}
     * @throws IllegalArgumentException when {@code type} is not registered
     */
    public static List<String> zeroOnlyParameterNames(String type) {
        return entry(type).zeroOnly;
    }

    /**
     * Builds a parameterised profile.
     *
     * @param type       a name from {@link #names()}
     * @param parameters values by IFC4 attribute name (lowerCamelCase), length unit; not null, no null values
     * @return the validated profile
     * @throws IllegalArgumentException for an unknown or arbitrary type, unknown or missing parameter names,
     *                                  null values, a non-zero unsupported attribute, or values the profile's
     *                                  constructor rejects; the message names the type or parameter
     */
    public static ProfileDef create(String type, Map<String, Double> parameters) {
        Entry e = entry(type);
        if (parameters == null) {
            throw new IllegalArgumentException(type + ": parameters: null");
        }
        List<String> unknown = new ArrayList<>();
        for (Map.Entry<String, Double> kv : parameters.entrySet()) {
            String name = kv.getKey();
            if (name == null || !e.names.contains(name) && !e.zeroOnly.contains(name)) {
                unknown.add(String.valueOf(name));
            } else if (kv.getValue() == null) {
                throw new IllegalArgumentException(type + ": " + name + ": null, a value is required");
            }
        }
        List<String> missing = new ArrayList<>();
        for (String name : e.required) {
            if (!parameters.containsKey(name)) {
                missing.add(name);
            }
        }
        List<String> problems = new ArrayList<>();
        if (!unknown.isEmpty()) {
            problems.add("unknown parameter" + (unknown.size() > 1 ? "s " : " ") + String.join(", ", unknown));
        }
        if (!missing.isEmpty()) {
            problems.add("missing required parameter" + (missing.size() > 1 ? "s " : " ") + String.join(", ", missing));
        }
        if (!problems.isEmpty()) {
            throw new IllegalArgumentException(type + ": " + String.join("; ", problems) + " (parameters: "
                    + String.join(", ", e.names) + ")");
        }
        for (String name : e.zeroOnly) {
            Double v = parameters.get(name);
            if (v != null && v != 0) {
                throw new IllegalArgumentException(name + ": " + Check.fmt(v) + " is not supported by " + type
                        + " (parallel faces only); omit it or give 0");
            }
        }
        return e.factory.apply(new Values(type, e, parameters));
    }

    private static Entry entry(String type) {
        if (type == null) {
            throw new IllegalArgumentException("type: null, a profile type name is required");
        }
        if (ARBITRARY.contains(type)) {
            throw new IllegalArgumentException("type: " + type
                    + " is built from contours by the project-file reader, not from parameters");
        }
        Entry e = TYPES.get(type);
        if (e == null) {
            throw new IllegalArgumentException("type: '" + type + "' is not a known profile type (known: "
                    + String.join(", ", new TreeSet<>(TYPES.keySet())) + ")");
        }
        return e;
    }

    /**
     * Adds one type.
     *
     * @param spec parameter names in IFC4 order: {@code name} required, {@code [name]} optional (default 0),
     *             {@code {name}} accepted only as 0
     */
    private static void register(String type, String spec, Function<Values, ProfileDef> factory) {
        List<String> names = new ArrayList<>();
        List<String> required = new ArrayList<>();
        List<String> zeroOnly = new ArrayList<>();
        for (String token : spec.trim().split("\\s+")) {
            if (token.startsWith("[") && token.endsWith("]")) {
                names.add(token.substring(1, token.length() - 1));
            } else if (token.startsWith("{") && token.endsWith("}")) {
                zeroOnly.add(token.substring(1, token.length() - 1));
            } else {
                names.add(token);
                required.add(token);
            }
        }
        if (TYPES.put(type, new Entry(List.copyOf(names), List.copyOf(required), List.copyOf(zeroOnly),
                factory)) != null) {
            throw new IllegalStateException("profile type " + type + " registered twice");
        }
    }

    private record Entry(List<String> names, List<String> required, List<String> zeroOnly,
            Function<Values, ProfileDef> factory) {
    }

    /** The checked parameter values handed to a factory. */
    private static final class Values {

        private final String type;
        private final Entry entry;
        private final Map<String, Double> parameters;

        Values(String type, Entry entry, Map<String, Double> parameters) {
            this.type = type;
            this.entry = entry;
            this.parameters = parameters;
        }

        /** @return the value of a declared parameter, 0 for an absent optional one */
        double get(String name) {
            if (!entry.names.contains(name)) {
                throw new IllegalStateException(type + " factory reads undeclared parameter " + name);
            }
            Double v = parameters.get(name);
            return v == null ? 0 : v;
        }
    }
}
