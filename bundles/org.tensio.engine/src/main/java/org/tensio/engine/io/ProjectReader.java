package org.tensio.engine.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;

import org.tensio.engine.fatigue.FatigueData;
import org.tensio.engine.geometry.ArcSegment;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.LineSegment;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Segment;
import org.tensio.engine.io.LoadTableReader.StationCases;
import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.profile.ArbitraryClosedProfile;
import org.tensio.engine.profile.ArbitraryProfileWithVoids;
import org.tensio.engine.profile.ProfileDef;
import org.tensio.engine.profile.ProfileTypes;
import org.tensio.engine.spi.CheckCriterion;
import org.tensio.engine.spi.Extensions;
import org.tensio.engine.spi.ProfileType;
import org.tensio.engine.project.Combination;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.section.Criterion;
import org.tensio.engine.section.Material;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;
import org.tensio.engine.section.SectionValidator;
import org.tensio.engine.units.UnitSystem;

/**
 * Reads a Tensio project file (format version {@value #FORMAT_VERSION}, described in
 * {@code docs/file-format.md} and {@code docs/tensio-project.schema.json}) into a {@link Project}.
 * <p>
 * The reader is strict: JSON as RFC 8259 defines it (no comments, NaN, Infinity, trailing commas or
 * repeated keys), every key known, every value of the right type and range, and every section's geometry
 * valid by {@link SectionValidator}. Anything else is a {@link ProjectFormatException} whose
 * {@link ProjectFormatException#path() path} is the JSONPath of the offending value (e.g.
 * {@code $.sections.shaft.profile.radius}; the containing object when a key is missing) and whose message
 * names the value. No other exception escapes {@link #read} or {@link #parse}, for any input.
 * <p>
 * Materials with a strength ({@code fy}, {@code fu}) or an {@code allowable} get {@link MaterialLimits}
 * ({@link Project#limits()}); the others are not checked. Load cases may also come from CSV load tables
 * ({@code loadTables}, read by {@code LoadTableReader}): their files are resolved against the project file's
 * folder, so {@link #read} and {@link #parse(String, String, Path)} with a folder read them and
 * {@link #parse(String, String)} rejects them. Table values are converted to the project's units; nothing else
 * is converted: the project keeps the units of its file.
 * <p>
 * Limits: files of at most {@value #MAX_FILE_BYTES} bytes (16 MiB), nesting at most {@value #MAX_DEPTH}
 * levels, at most {@value #MAX_LOOP_VERTICES} vertices in one loop; load tables of at most
 * {@value #MAX_TABLE_BYTES} bytes (64 MiB) and {@value #MAX_TABLE_ROWS} data rows each, at most
 * {@value #MAX_LOAD_TABLES} of them; at most {@value #MAX_STATIONS} stations, {@value #MAX_STATION_CASES} station
 * load cases in all and {@value #MAX_COMBINATIONS} combinations. (Meshing has its own limits and a memory
 * estimate: {@link org.tensio.engine.mesh.MeshBudget}.)
 * <p>
 * Single use; the static methods are the entry points. Thread-safe in that each call has its own state.
 *
 * @since 0.1
 */
public final class ProjectReader {

    /** The format version this reader understands, the value of the top-level key {@code tensio}. */
    public static final int FORMAT_VERSION = 1;
    /** Largest file accepted, bytes (16 MiB). */
    public static final long MAX_FILE_BYTES = 16L * 1024 * 1024;
    /** Deepest nesting of objects and arrays accepted (the top-level object is level 1). */
    public static final int MAX_DEPTH = 64;
    /** Most vertices accepted in one loop. */
    public static final int MAX_LOOP_VERTICES = 200_000;
    /** Largest load table accepted, bytes (64 MiB). */
    public static final long MAX_TABLE_BYTES = LoadTableReader.MAX_BYTES;
    /** Most data rows (non-blank rows after the header) accepted in one load table. */
    public static final int MAX_TABLE_ROWS = LoadTableReader.MAX_ROWS;
    /** Most stations accepted. */
    public static final int MAX_STATIONS = 100_000;
    /** Most station load cases (station × load-case pairs) accepted, the file's and the load tables' together. */
    public static final int MAX_STATION_CASES = LoadTableReader.MAX_STATION_CASES;
    /** Most combinations accepted. */
    public static final int MAX_COMBINATIONS = 10_000;
    /** Longest id (of a material, section, station, load case or combination) accepted, characters. */
    public static final int MAX_ID_LENGTH = 200;
    /**
     * Largest magnitude of a force or moment component accepted (file, load tables and combinations), force or
     * force·length: with section sizes of at least {@link SectionValidator#MIN_SIZE} it keeps stresses far inside
     * the double range.
     */
    public static final double MAX_ABS_FORCE = 1e30;
    /** Most load tables accepted. */
    public static final int MAX_LOAD_TABLES = 1_000;

    static final Set<String> ROOT_KEYS = Set.of("tensio", "name", "description", "units", "materials",
            "sections", "stations", "loadTables", "combinations", "fatigue");
    private static final Set<String> UNIT_KEYS = Set.of("length", "force");
    static final Set<String> MATERIAL_KEYS = Set.of("E", "nu", "fy", "fu", "partialFactor", "criteria", "allowable");
    static final Set<String> ALLOWABLE_KEYS = Set.of("normal", "shear", "equivalent");
    static final Set<String> LOAD_TABLE_KEYS = Set.of("file", "description", "units", "columns", "delimiter",
            "decimalSeparator", "scale", "headerRow", "unknownStations");
    /** Field separators a load table may use. */
    static final List<String> DELIMITERS = List.of(",", ";", "\t");
    /** Decimal separators a load table may use. */
    static final List<String> DECIMAL_SEPARATORS = List.of(".", ",");
    /** What to do with table rows of stations the project does not define. */
    static final List<String> UNKNOWN_STATIONS = List.of("reject", "skip");
    private static final Set<String> SECTION_KEYS = Set.of("description", "material", "profile", "offset", "parts");
    private static final Set<String> PART_KEYS = Set.of("material", "profile", "offset");
    static final Set<String> STATION_KEYS = Set.of("section", "forces");
    private static final Set<String> FORCE_KEYS = Set.of("N", "Vx", "Vy", "Mx", "My", "T");
    private static final Set<String> CLOSED_KEYS = Set.of("type", "outer");
    private static final Set<String> VOIDS_KEYS = Set.of("type", "outer", "voids");
    private static final Set<String> THROUGH_KEYS = Set.of("through");
    private static final Set<String> CENTRE_KEYS = Set.of("centre", "turn");

    private final String suffix;
    private final Path baseDir;
    private final Map<String, MaterialLimits> limits = new LinkedHashMap<>();
    private final Extensions extensions;

    private ProjectReader(String sourceName, Path baseDir, Extensions extensions) {
        this.suffix = sourceName == null || sourceName.isEmpty() ? "" : " (in " + sourceName + ")";
        this.baseDir = baseDir;
        this.extensions = extensions == null ? Extensions.none() : extensions;
    }

    /**
     * Reads and validates a project file (UTF-8, an optional byte-order mark is skipped). Load tables are
     * resolved against the file's folder.
     *
     * @param file the file
     * @return the project
     * @throws IOException            when the file cannot be read
     * @throws ProjectFormatException when its content is not a valid project; the size limit is checked before
     *                                reading
     */
    public static Project read(Path file) throws IOException, ProjectFormatException {
        return read(file, Extensions.none());
    }

    /**
     * As {@link #read(Path)}, accepting also the contributed criteria and profile types of {@code extensions}.
     *
     * @since 0.1
     */
    public static Project read(Path file, Extensions extensions) throws IOException, ProjectFormatException {
        Path name = file.getFileName();
        String source = name == null ? file.toString() : name.toString();
        long size = Files.size(file);
        if (size > MAX_FILE_BYTES) {
            throw tooLarge(size, source);
        }
        byte[] bytes;
        try (InputStream in = Files.newInputStream(file)) {
            bytes = in.readNBytes((int) MAX_FILE_BYTES + 1);
        }
        if (bytes.length > MAX_FILE_BYTES) {
            throw tooLarge(bytes.length, source);
        }
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw new ProjectFormatException("$", "the file is not valid UTF-8 text (in " + source + ")");
        }
        return parse(text, source, file.toAbsolutePath().getParent(), extensions);
    }

    /**
     * Parses and validates a project from its JSON text, without a folder: a project with {@code loadTables}
     * is rejected (use {@link #read} or {@link #parse(String, String, Path)}).
     *
     * @param json       the document; a leading byte-order mark is skipped; null counts as empty
     * @param sourceName where the text came from, quoted in messages as "(in sourceName)"; may be null
     * @return the project
     * @throws ProjectFormatException when the text is not a valid project
     */
    public static Project parse(String json, String sourceName) throws ProjectFormatException {
        return parse(json, sourceName, null);
    }

    /**
     * Parses and validates a project from its JSON text, reading its load tables from a folder.
     *
     * @param json       the document; a leading byte-order mark is skipped; null counts as empty
     * @param sourceName where the text came from, quoted in messages as "(in sourceName)"; may be null
     * @param baseDir    the folder that {@code loadTables} file names are relative to (normally the project
     *                   file's folder); null when there is none, which makes {@code loadTables} an error
     * @return the project
     * @throws ProjectFormatException when the text is not a valid project, or a load table cannot be read or is
     *                                not valid (I/O errors on a table included, naming the file)
     */
    public static Project parse(String json, String sourceName, Path baseDir) throws ProjectFormatException {
        return parse(json, sourceName, baseDir, Extensions.none());
    }

    /**
     * As {@link #parse(String, String, Path)}, accepting also the contributed criteria and profile types of
     * {@code extensions} (null: none).
     *
     * @since 0.1
     */
    public static Project parse(String json, String sourceName, Path baseDir, Extensions extensions)
            throws ProjectFormatException {
        String text = json == null ? "" : json;
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        if (text.length() > MAX_FILE_BYTES / 3) {
            long bytes = utf8Length(text);
            if (bytes > MAX_FILE_BYTES) {
                throw tooLarge(bytes, sourceName);
            }
        }
        ProjectReader reader = new ProjectReader(sourceName, baseDir, extensions);
        try {
            JsonElement root = StrictJson.parse(text, MAX_DEPTH, 2 * MAX_LOOP_VERTICES + 1, reader.suffix);
            return reader.project(root);
        } catch (RuntimeException e) {
            // a safety net: every expected failure is already a ProjectFormatException with a precise path
            throw reader.fail(JsonPath.ROOT, "cannot read the project: " + e);
        }
    }

    private static ProjectFormatException tooLarge(long bytes, String source) {
        return new ProjectFormatException("$", "the file is " + bytes + " bytes, more than the limit of "
                + MAX_FILE_BYTES + " bytes (16 MiB)" + (source == null ? "" : " (in " + source + ")"));
    }

    private static long utf8Length(String s) {
        long n = 0;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c < 0x80) {
                n += 1;
            } else if (c < 0x800) {
                n += 2;
            } else if (Character.isHighSurrogate(c) && i + 1 < s.length()
                    && Character.isLowSurrogate(s.charAt(i + 1))) {
                n += 4;
                i++;
            } else {
                n += 3;
            }
        }
        return n;
    }

    // ---------------------------------------------------------------- the document

    private Project project(JsonElement rootElement) throws ProjectFormatException {
        JsonPath root = JsonPath.ROOT;
        if (!rootElement.isJsonObject()) {
            throw fail(root, "a project file must be a JSON object, got " + describe(rootElement));
        }
        JsonObject o = rootElement.getAsJsonObject();
        if (!o.has("tensio")) {
            throw fail(root, "missing required key 'tensio' (the format version, " + FORMAT_VERSION
                    + "); is this a Tensio project file?");
        }
        JsonPath vp = root.child("tensio");
        double version = number(o.get("tensio"), vp);
        if (version != FORMAT_VERSION) {
            throw fail(vp, "unsupported format version " + fmt(version) + " (this reader knows version "
                    + FORMAT_VERSION + ")");
        }
        Fields f = new Fields(o, root, ROOT_KEYS);
        f.optString("name");
        f.optString("description");
        UnitSystem units = units(f);
        Map<String, Material> materials = materials(f.require("materials"), root.child("materials"));
        Map<String, Section> sections = sections(f.require("sections"), root.child("sections"), materials);
        Map<String, StationCases> building = f.has("stations")
                ? stations(f.get("stations"), root.child("stations"), sections)
                : new LinkedHashMap<>();
        if (f.has("loadTables")) {
            loadTables(f.get("loadTables"), root.child("loadTables"), units, building);
        }
        Map<String, Station> stations = new LinkedHashMap<>();
        for (StationCases s : building.values()) {
            if (!s.forcesGiven && s.cases.isEmpty()) {
                throw fail(s.path, "missing required key 'forces' (the station's load cases; it may be left out "
                        + "only when a load table gives the station's rows)");
            }
            try {
                stations.put(s.id, new Station(s.id, s.sectionId, s.cases));
            } catch (IllegalArgumentException ex) {
                throw fail(s.path, ex.getMessage());
            }
        }
        Map<String, Combination> combinations = f.has("combinations")
                ? combinations(f.get("combinations"), root.child("combinations"), stations)
                : Map.of();
        FatigueData fatigue = f.has("fatigue") ? FatigueReader.read(f.get("fatigue"), root.child("fatigue"), suffix, units,
                materials, limits, sections, stations, combinations) : FatigueData.NONE;
        return new Project(units, materials, sections, stations, combinations, limits, fatigue);
    }

    private UnitSystem units(Fields root) throws ProjectFormatException {
        if (!root.has("units")) {
            return UnitSystem.MM_N;
        }
        JsonPath p = root.path.child("units");
        Fields f = new Fields(object(root.get("units"), p), p, UNIT_KEYS);
        String length = f.string("length");
        String force = f.string("force");
        if (!UnitSystem.LENGTHS.contains(length)) {
            throw fail(p.child("length"),
                    "unknown length unit '" + length + "' (use one of " + UnitSystem.LENGTHS + ")");
        }
        if (!UnitSystem.FORCES.contains(force)) {
            throw fail(p.child("force"), "unknown force unit '" + force + "' (use one of " + UnitSystem.FORCES + ")");
        }
        try {
            return new UnitSystem(length, force);
        } catch (IllegalArgumentException e) {
            throw rethrow(e, f);
        }
    }

    private Map<String, Material> materials(JsonElement e, JsonPath p) throws ProjectFormatException {
        Map<String, Material> out = new LinkedHashMap<>();
        for (Map.Entry<String, JsonElement> m : object(e, p).entrySet()) {
            JsonPath mp = p.child(m.getKey());
            String id = id(m.getKey(), mp, "material");
            Fields f = new Fields(object(m.getValue(), mp), mp, MATERIAL_KEYS);
            double modulus = f.number("E");
            double nu = f.number("nu");
            Double fy = f.has("fy") ? f.number("fy") : null;
            try {
                out.put(id, new Material(id, modulus, nu, fy));
            } catch (IllegalArgumentException ex) {
                throw rethrow(ex, f);
            }
            MaterialLimits l = limits(id, f, fy);
            if (l != null) {
                limits.put(id, l);
            }
        }
        return out;
    }

    /** @return what the material is checked against, or null when it gives no strength and no allowable */
    private MaterialLimits limits(String id, Fields f, Double fy) throws ProjectFormatException {
        JsonPath p = f.path;
        Double fu = null;
        if (f.has("fu")) {
            fu = f.number("fu");
            if (!(fu > 0)) {
                throw fail(p.child("fu"), "fu: " + fmt(fu) + " must be positive (the ultimate strength, "
                        + "force/length²)");
            }
            if (fy != null && fu < fy) {
                throw fail(p.child("fu"), "fu: " + fmt(fu) + " is below fy " + fmt(fy) + " (the ultimate strength "
                        + "cannot be less than the yield strength)");
            }
        }
        double gamma = 1.0;
        if (f.has("partialFactor")) {
            gamma = f.number("partialFactor");
            if (!(gamma >= 1)) {
                throw fail(p.child("partialFactor"), "partialFactor: " + fmt(gamma) + " must be at least 1 (the "
                        + "strengths are divided by it)");
            }
        }
        String[] allowableKeys = {"normal", "shear", "equivalent"};
        Double[] allowable = new Double[allowableKeys.length];
        boolean anyAllowable = false;
        if (f.has("allowable")) {
            JsonPath ap = p.child("allowable");
            Fields af = new Fields(object(f.get("allowable"), ap), ap, ALLOWABLE_KEYS);
            if (af.o.isEmpty()) {
                throw fail(ap, "allowable needs at least one of " + List.of(allowableKeys) + ", got {}");
            }
            for (int i = 0; i < allowableKeys.length; i++) {
                if (af.has(allowableKeys[i])) {
                    double v = af.number(allowableKeys[i]);
                    if (!(v > 0)) {
                        throw fail(ap.child(allowableKeys[i]), allowableKeys[i] + ": " + fmt(v) + " must be positive "
                                + "(an allowable stress, force/length²)");
                    }
                    allowable[i] = v;
                    anyAllowable = true;
                }
            }
        }
        List<Criterion> criteria = new ArrayList<>();
        List<String> contributed = new ArrayList<>();
        List<JsonPath> contributedPaths = new ArrayList<>();
        if (f.has("criteria")) {
            JsonPath cp = p.child("criteria");
            JsonArray list = array(f.get("criteria"), cp);
            if (list.isEmpty()) {
                throw fail(cp, "criteria needs at least one criterion (one of " + List.of(Criterion.values())
                        + "), got an empty array");
            }
            for (int i = 0; i < list.size(); i++) {
                String name = string(list.get(i), cp.item(i));
                Criterion c = criterion(name);
                if (c == null && extensions.criterion(name).isPresent()) {
                    if (contributed.contains(name)) {
                        throw fail(cp.item(i), "criterion '" + name + "' is listed twice");
                    }
                    contributed.add(name);
                    contributedPaths.add(cp.item(i));
                    continue;
                }
                if (c == null) {
                    throw fail(cp.item(i), "unknown criterion '" + StrictJson.abbreviate(name) + "' (use one of "
                            + criterionNames() + ")");
                }
                if (criteria.contains(c)) {
                    throw fail(cp.item(i), "criterion '" + name + "' is listed twice (items " + criteria.indexOf(c)
                            + " and " + i + ")");
                }
                criteria.add(c);
            }
        }
        if (fy == null && fu == null && !anyAllowable) {
            for (String key : List.of("criteria", "partialFactor")) {
                if (f.has(key)) {
                    throw fail(p.child(key), "'" + key + "' is given but material '" + id + "' has nothing to check "
                            + "against: give fy, fu or allowable");
                }
            }
            return null;
        }
        boolean defaulted = criteria.isEmpty() && contributed.isEmpty();
        if (defaulted) {
            criteria.add(Criterion.vonMises);
        }
        for (int i = 0; i < criteria.size(); i++) {
            Criterion c = criteria.get(i);
            try {
                new MaterialLimits(id, List.of(c), gamma, fy, fu, allowable[0], allowable[1], allowable[2]);
            } catch (IllegalArgumentException ex) {
                String needs = "criterion " + c + " needs " + switch (c) {
                    case vonMises, tresca -> "fy or allowable.equivalent";
                    case maxPrincipal -> "fy, fu or allowable.normal";
                    case maxShear, shear -> "fy or allowable.shear";
                    case normal -> "fy or allowable.normal";
                };
                throw defaulted
                        ? fail(p, "the default " + needs + " (material '" + id + "'); give it, or list the criteria "
                                + "to check with 'criteria'")
                        : fail(p.child("criteria").item(i), needs + " (material '" + id + "')");
            }
        }
        MaterialLimits built;
        try {
            built = new MaterialLimits(id, criteria, contributed, gamma, fy, fu, allowable[0], allowable[1],
                    allowable[2]);
        } catch (IllegalArgumentException ex) {
            throw fail(p, ex.getMessage());
        }
        for (int i = 0; i < contributed.size(); i++) {
            CheckCriterion c = extensions.criterion(contributed.get(i)).orElseThrow();
            double capacity;
            try {
                capacity = c.capacity(built);
            } catch (RuntimeException ex) {
                throw fail(contributedPaths.get(i), "criterion " + c.id() + " (material '" + id + "'): "
                        + ex.getMessage());
            }
            if (!(capacity > 0) || !Double.isFinite(capacity)) {
                throw fail(contributedPaths.get(i), "criterion " + c.id() + " (material '" + id + "') gives the capacity "
                        + capacity + "; it must be positive and finite");
            }
        }
        return built;
    }

    private List<String> criterionNames() {
        List<String> names = new ArrayList<>();
        for (Criterion c : Criterion.values()) {
            names.add(c.name());
        }
        names.addAll(extensions.criteria().keySet());
        return names;
    }

    private static Criterion criterion(String name) {
        for (Criterion c : Criterion.values()) {
            if (c.name().equals(name)) {
                return c;
            }
        }
        return null;
    }

    // ---------------------------------------------------------------- sections

    /** Where each piece of a section came from, to turn validator findings into paths. */
    private record PartSource(JsonPath part, JsonPath profile, boolean arbitrary) {
    }

    private Map<String, Section> sections(JsonElement e, JsonPath p, Map<String, Material> materials)
            throws ProjectFormatException {
        Map<String, Section> out = new LinkedHashMap<>();
        for (Map.Entry<String, JsonElement> s : object(e, p).entrySet()) {
            JsonPath sp = p.child(s.getKey());
            String id = id(s.getKey(), sp, "section");
            out.put(id, section(id, s.getValue(), sp, materials));
        }
        return out;
    }

    private Section section(String id, JsonElement e, JsonPath p, Map<String, Material> materials)
            throws ProjectFormatException {
        Fields f = new Fields(object(e, p), p, SECTION_KEYS);
        f.optString("description");
        List<SectionPart> parts = new ArrayList<>();
        List<PartSource> sources = new ArrayList<>();
        if (f.has("parts")) {
            for (String single : List.of("material", "profile", "offset")) {
                if (f.has(single)) {
                    throw fail(p.child(single), "a composite section (with 'parts') takes no '" + single
                            + "': give it to each part");
                }
            }
            JsonPath pp = p.child("parts");
            JsonArray list = array(f.get("parts"), pp);
            if (list.isEmpty()) {
                throw fail(pp, "a composite section needs at least one part, got an empty array");
            }
            for (int i = 0; i < list.size(); i++) {
                JsonPath ip = pp.item(i);
                Fields pf = new Fields(object(list.get(i), ip), ip, PART_KEYS);
                parts.add(part(pf, materials, sources));
            }
        } else {
            if (!f.has("material") || !f.has("profile")) {
                throw fail(p, "missing required key '" + (f.has("material") ? "profile" : "material")
                        + "' (a section has 'material' and 'profile', or 'parts')");
            }
            parts.add(part(f, materials, sources));
        }
        Section section;
        try {
            section = new Section(id, parts);
        } catch (IllegalArgumentException ex) {
            throw fail(p, ex.getMessage());
        }
        Optional<SectionValidator.Problem> problem;
        try {
            problem = SectionValidator.check(section);
        } catch (RuntimeException ex) {
            throw fail(p, "section '" + id + "': geometry could not be checked: " + ex);
        }
        if (problem.isPresent()) {
            SectionValidator.Problem pr = problem.get();
            throw fail(pathOf(pr, sources.get(pr.part())), pr.message());
        }
        return section;
    }

    private static JsonPath pathOf(SectionValidator.Problem pr, PartSource src) {
        if (pr.kind() == SectionValidator.Kind.PARTS_OVERLAP || pr.kind() == SectionValidator.Kind.CHECK_FAILED) {
            return src.part();
        }
        if (pr.contour() == SectionValidator.WHOLE_PART || !src.arbitrary()) {
            return src.profile();
        }
        if (pr.contour() == 0) {
            return src.profile().child("outer");
        }
        return src.profile().child("voids").item(pr.contour() - 1);
    }

    private SectionPart part(Fields f, Map<String, Material> materials, List<PartSource> sources)
            throws ProjectFormatException {
        JsonPath mp = f.path.child("material");
        String materialId = f.string("material");
        Material material = materials.get(materialId);
        if (material == null) {
            throw fail(mp, "unknown material '" + materialId + "' (defined: " + materials.keySet() + ")");
        }
        JsonPath pp = f.path.child("profile");
        JsonElement pe = f.require("profile");
        ProfileDef profile = profile(pe, pp);
        double dx = 0;
        double dy = 0;
        if (f.has("offset")) {
            Point2 o = pair(f.get("offset"), f.path.child("offset"), "an offset");
            dx = o.x();
            dy = o.y();
        }
        boolean arbitrary = profile instanceof ArbitraryClosedProfile || profile instanceof ArbitraryProfileWithVoids;
        sources.add(new PartSource(f.path, pp, arbitrary));
        try {
            return SectionPart.of(profile, dx, dy, material);
        } catch (IllegalArgumentException ex) {
            throw fail(f.path, ex.getMessage());
        } catch (RuntimeException ex) {
            // a profile whose region cannot be built (a defect of that profile type, not of the file)
            throw fail(pp, profile.type() + " cannot be built from these dimensions: " + ex.getMessage());
        }
    }

    private ProfileDef profile(JsonElement e, JsonPath p) throws ProjectFormatException {
        JsonObject o = object(e, p);
        if (!o.has("type")) {
            throw fail(p, "missing required key 'type' (one of " + ProfileTypes.names() + ")");
        }
        JsonPath tp = p.child("type");
        String type = string(o.get("type"), tp);
        if (ArbitraryClosedProfile.TYPE.equals(type)) {
            Fields f = new Fields(o, p, CLOSED_KEYS);
            Contour outer = loop(f.require("outer"), p.child("outer"));
            return new ArbitraryClosedProfile(outer);
        }
        if (ArbitraryProfileWithVoids.TYPE.equals(type)) {
            Fields f = new Fields(o, p, VOIDS_KEYS);
            Contour outer = loop(f.require("outer"), p.child("outer"));
            JsonPath vp = p.child("voids");
            JsonArray list = array(f.require("voids"), vp);
            List<Contour> voids = new ArrayList<>(list.size());
            for (int i = 0; i < list.size(); i++) {
                voids.add(loop(list.get(i), vp.item(i)));
            }
            return new ArbitraryProfileWithVoids(outer, voids);
        }
        Optional<ProfileType> contributedType = extensions.profileType(type);
        if (contributedType.isPresent()) {
            return contributedProfile(contributedType.get(), o, p);
        }
        if (!ProfileTypes.names().contains(type)) {
            List<String> names = new ArrayList<>(ProfileTypes.names());
            names.addAll(extensions.profileTypes().keySet());
            throw fail(tp, "unknown profile type '" + type + "' (use one of " + names + ")");
        }
        List<String> known = ProfileTypes.parameterNames(type);
        Fields f = new Fields(o, p, o.keySet());
        List<String> unknown = new ArrayList<>();
        Map<String, Double> probe = new LinkedHashMap<>();
        for (String key : o.keySet()) {
            if (!key.equals("type")) {
                probe.put(key, 0.0);
                if (!known.contains(key)) {
                    unknown.add(key);
                }
            }
        }
        if (!unknown.isEmpty() && rejectsUnknown(type, probe)) {
            throw fail(p.child(unknown.get(0)), "unknown key '" + StrictJson.abbreviate(unknown.get(0)) + "' ("
                    + type + " takes " + known + ")");
        }
        for (String key : ProfileTypes.requiredParameterNames(type)) {
            if (!o.has(key)) {
                throw fail(p, "missing required key '" + key + "' (" + type + " takes " + known + ")");
            }
        }
        Map<String, Double> parameters = new LinkedHashMap<>();
        for (String key : probe.keySet()) {
            parameters.put(key, f.number(key));
        }
        try {
            return ProfileTypes.create(type, parameters);
        } catch (IllegalArgumentException ex) {
            throw rethrow(ex, f);
        } catch (RuntimeException ex) {
            throw fail(p, type + " cannot be built from these dimensions: " + ex.getMessage());
        }
    }

    /** A profile of a contributed type: keys checked against its parameter names, then its own validation. */
    private ProfileDef contributedProfile(ProfileType t, JsonObject o, JsonPath p) throws ProjectFormatException {
        String type = t.type();
        List<String> known = t.parameterNames();
        Fields f = new Fields(o, p, o.keySet());
        for (String key : o.keySet()) {
            if (!key.equals("type") && !known.contains(key)) {
                throw fail(p.child(key), "unknown key '" + StrictJson.abbreviate(key) + "' (" + type + " takes "
                        + known + ")");
            }
        }
        for (String key : t.requiredParameterNames()) {
            if (!o.has(key)) {
                throw fail(p, "missing required key '" + key + "' (" + type + " takes " + known + ")");
            }
        }
        Map<String, Double> parameters = new LinkedHashMap<>();
        for (String key : known) {
            parameters.put(key, o.has(key) ? f.number(key) : 0.0);
        }
        ProfileDef def;
        try {
            def = t.create(Collections.unmodifiableMap(parameters));
        } catch (IllegalArgumentException ex) {
            throw rethrow(ex, f);
        } catch (RuntimeException ex) {
            throw fail(p, type + " cannot be built from these dimensions: " + ex);
        }
        if (def == null || def.region() == null || !type.equals(def.type())) {
            throw fail(p, "profile type " + type + " (" + t.getClass().getName() + ") returned "
                    + (def == null ? "no profile" : "a profile of type '" + def.type() + "'"));
        }
        return def;
    }

    /**
     * @return true when {@link ProfileTypes#create} refuses some of the keys as unknown parameters (keys outside
     *         {@code parameterNames} may still be IFC4 attributes it accepts with the value 0)
     */
    private static boolean rejectsUnknown(String type, Map<String, Double> probe) {
        try {
            ProfileTypes.create(type, probe);
            return false;
        } catch (IllegalArgumentException ex) {
            return String.valueOf(ex.getMessage()).contains("unknown parameter");
        }
    }

    // ---------------------------------------------------------------- loops

    /** One item of a loop after the first vertex: a vertex, or an arc marker standing before the next vertex. */
    private sealed interface Marker permits Through, About {
    }

    private record Through(Point2 via, JsonPath path) implements Marker {
    }

    private record About(Point2 centre, boolean ccw, JsonPath path) implements Marker {
    }

    private Contour loop(JsonElement e, JsonPath p) throws ProjectFormatException {
        JsonArray items = array(e, p);
        if (items.isEmpty()) {
            throw fail(p, "a loop needs vertices [x, y], got an empty array");
        }
        List<Point2> vertices = new ArrayList<>();
        List<JsonPath> vertexPaths = new ArrayList<>();
        List<Marker> after = new ArrayList<>();
        for (int i = 0; i < items.size(); i++) {
            JsonElement item = items.get(i);
            JsonPath ip = p.item(i);
            if (item.isJsonArray()) {
                if (vertices.size() == MAX_LOOP_VERTICES) {
                    throw fail(p, "the loop has more than " + MAX_LOOP_VERTICES + " vertices (the limit)");
                }
                vertices.add(pair(item, ip, "a vertex"));
                vertexPaths.add(ip);
                after.add(null);
            } else if (item.isJsonObject()) {
                if (vertices.isEmpty()) {
                    throw fail(ip, "a loop must start with a vertex [x, y], got an arc marker");
                }
                if (after.get(after.size() - 1) != null) {
                    throw fail(ip, "two arc markers in a row; put a vertex [x, y] between them");
                }
                after.set(after.size() - 1, marker(item.getAsJsonObject(), ip));
            } else {
                throw fail(ip, "expected a vertex [x, y] or an arc marker {\"through\": ...} / {\"centre\": ..., "
                        + "\"turn\": ...}, got " + describe(item));
            }
        }
        int n = vertices.size();
        List<Segment> segments = new ArrayList<>(n);
        boolean anyArc = false;
        for (int i = 0; i < n; i++) {
            Point2 a = vertices.get(i);
            Point2 b = vertices.get((i + 1) % n);
            Marker m = after.get(i);
            if (m == null) {
                if (n == 1) {
                    throw fail(p, "a loop needs at least 3 vertices, or an arc, got 1 vertex");
                }
                if (a.equals(b)) {
                    throw i + 1 == n
                            ? fail(vertexPaths.get(i), "vertex " + fmt(a) + " repeats the first vertex (the loop "
                                    + "closes by itself; do not repeat the first vertex)")
                            : fail(vertexPaths.get(i + 1), "vertex " + fmt(b) + " repeats the vertex before it");
                }
                segments.add(new LineSegment(a, b));
            } else {
                anyArc = true;
                segments.add(arc(a, b, m));
            }
        }
        if (n < 3 && !anyArc) {
            throw fail(p, "a loop needs at least 3 vertices, or an arc, got " + n + " vertices");
        }
        try {
            return new Contour(segments);
        } catch (IllegalArgumentException ex) {
            throw fail(p, ex.getMessage());
        }
    }

    private Marker marker(JsonObject o, JsonPath p) throws ProjectFormatException {
        if (o.has("through")) {
            Fields f = new Fields(o, p, THROUGH_KEYS);
            return new Through(pair(f.get("through"), p.child("through"), "an arc's 'through' point"), p);
        }
        if (o.has("centre")) {
            Fields f = new Fields(o, p, CENTRE_KEYS);
            Point2 c = pair(f.get("centre"), p.child("centre"), "an arc's 'centre'");
            String turn = f.string("turn");
            if (!turn.equals("ccw") && !turn.equals("cw")) {
                throw fail(p.child("turn"),
                        "turn must be \"ccw\" or \"cw\", got \"" + StrictJson.abbreviate(turn) + "\"");
            }
            return new About(c, turn.equals("ccw"), p);
        }
        Set<String> known = new LinkedHashSet<>(List.of("through", "centre", "turn"));
        for (String key : o.keySet()) {
            if (!known.contains(key)) {
                throw fail(p.child(key), "unknown key '" + StrictJson.abbreviate(key)
                        + "' in an arc marker (use {\"through\": [x, y]} or {\"centre\": [x, y], "
                        + "\"turn\": \"ccw\"|\"cw\"})");
            }
        }
        throw fail(p, "an arc marker needs 'through' or 'centre'");
    }

    private ArcSegment arc(Point2 from, Point2 to, Marker m) throws ProjectFormatException {
        try {
            if (m instanceof Through t) {
                return ArcSegment.through(from, t.via(), to);
            }
            About c = (About) m;
            return ArcSegment.circular(c.centre(), from, to, c.ccw());
        } catch (IllegalArgumentException ex) {
            throw fail(m instanceof Through t ? t.path() : ((About) m).path(), ex.getMessage());
        }
    }

    // ---------------------------------------------------------------- stations and combinations

    private Map<String, StationCases> stations(JsonElement e, JsonPath p, Map<String, Section> sections)
            throws ProjectFormatException {
        Map<String, StationCases> out = new LinkedHashMap<>();
        JsonObject all = object(e, p);
        if (all.size() > MAX_STATIONS) {
            throw fail(p, all.size() + " stations, more than the limit of " + MAX_STATIONS);
        }
        long stationCases = 0;
        for (Map.Entry<String, JsonElement> s : all.entrySet()) {
            JsonPath sp = p.child(s.getKey());
            String id = id(s.getKey(), sp, "station");
            Fields f = new Fields(object(s.getValue(), sp), sp, STATION_KEYS);
            String sectionId = f.string("section");
            if (!sections.containsKey(sectionId)) {
                throw fail(sp.child("section"),
                        "unknown section '" + sectionId + "' (defined: " + sections.keySet() + ")");
            }
            JsonPath fp = sp.child("forces");
            StationCases station = new StationCases(id, sectionId, sp, f.has("forces"));
            JsonObject forces = f.has("forces") ? object(f.get("forces"), fp) : new JsonObject();
            stationCases += forces.size();
            if (stationCases > MAX_STATION_CASES) {
                throw fail(fp, "more than " + MAX_STATION_CASES + " station load cases in the project (the limit)");
            }
            for (Map.Entry<String, JsonElement> c : forces.entrySet()) {
                JsonPath cp = fp.child(c.getKey());
                String caseId = id(c.getKey(), cp, "load case");
                Fields cf = new Fields(object(c.getValue(), cp), cp, FORCE_KEYS);
                double[] v = new double[6];
                String[] keys = {"N", "Vx", "Vy", "Mx", "My", "T"};
                for (int i = 0; i < keys.length; i++) {
                    v[i] = cf.has(keys[i]) ? cf.number(keys[i]) : 0;
                    if (!(Math.abs(v[i]) <= MAX_ABS_FORCE)) {
                        throw fail(cp.child(keys[i]), keys[i] + ": " + fmt(v[i]) + " is beyond ±" + fmt(MAX_ABS_FORCE)
                                + " (far beyond any real force or moment in any unit system; check the value and units)");
                    }
                }
                try {
                    station.addFileCase(caseId, new InternalForces(v[0], v[1], v[2], v[3], v[4], v[5]));
                } catch (IllegalArgumentException ex) {
                    throw fail(cp, ex.getMessage());
                }
            }
            out.put(id, station);
        }
        return out;
    }

    // ---------------------------------------------------------------- load tables

    private void loadTables(JsonElement e, JsonPath p, UnitSystem projectUnits, Map<String, StationCases> stations)
            throws ProjectFormatException {
        JsonArray list = array(e, p);
        if (list.size() > MAX_LOAD_TABLES) {
            throw fail(p, list.size() + " load tables, more than the limit of " + MAX_LOAD_TABLES);
        }
        List<LoadTableReader.Spec> specs = new ArrayList<>(list.size());
        for (int i = 0; i < list.size(); i++) {
            specs.add(loadTable(i, list.get(i), p.item(i), projectUnits));
        }
        for (LoadTableReader.Spec spec : specs) {
            if (spec.resolved() == null) {
                throw fail(spec.path().child("file"), "load table '" + StrictJson.abbreviate(spec.file()) + "' cannot "
                        + "be found: the project was given as text without its folder (read it from its file, or "
                        + "pass the folder)");
            }
            LoadTableReader.read(spec, specs, stations, projectUnits, suffix);
        }
    }

    private LoadTableReader.Spec loadTable(int index, JsonElement e, JsonPath p, UnitSystem projectUnits)
            throws ProjectFormatException {
        Fields f = new Fields(object(e, p), p, LOAD_TABLE_KEYS);
        JsonPath filePath = p.child("file");
        String file = f.string("file");
        f.optString("description");
        if (file.isBlank()) {
            throw fail(filePath, "file must name a CSV file, got \"" + StrictJson.abbreviate(file) + "\"");
        }
        if (file.indexOf('\\') >= 0) {
            throw fail(filePath, "file '" + StrictJson.abbreviate(file) + "': write folders with '/', not '\\'");
        }
        if (file.indexOf('\0') >= 0) {
            throw fail(filePath, "file '" + StrictJson.abbreviate(file) + "' contains a NUL character");
        }
        if (file.startsWith("/") || (file.length() > 1 && file.charAt(1) == ':')) {
            throw fail(filePath, "file '" + StrictJson.abbreviate(file) + "' must be relative to the project file's "
                    + "folder (so that the project can move with its tables)");
        }
        UnitSystem units = f.has("units") ? units(f) : projectUnits;
        Map<String, String> columns = new LinkedHashMap<>();
        if (f.has("columns")) {
            JsonPath cp = p.child("columns");
            Fields cf = new Fields(object(f.get("columns"), cp), cp, new LinkedHashSet<>(LoadTableReader.COLUMN_KEYS));
            Map<String, String> keyOf = new LinkedHashMap<>();
            for (String key : LoadTableReader.COLUMN_KEYS) {
                if (!cf.has(key)) {
                    continue;
                }
                String header = cf.string(key);
                if (header.isBlank()) {
                    throw fail(cp.child(key), key + ": a column header name must not be empty, got \""
                            + StrictJson.abbreviate(header) + "\"");
                }
                String other = keyOf.putIfAbsent(header, key);
                if (other != null) {
                    throw fail(cp.child(key), "column '" + StrictJson.abbreviate(header) + "' is already mapped to "
                            + other + "; one column cannot give both " + other + " and " + key);
                }
                columns.put(key, header);
            }
        }
        char delimiter = ',';
        if (f.has("delimiter")) {
            String d = f.string("delimiter");
            if (!DELIMITERS.contains(d)) {
                throw fail(p.child("delimiter"), "delimiter must be \",\", \";\" or \"\\t\" (tab), got \""
                        + StrictJson.abbreviate(d) + "\"");
            }
            delimiter = d.charAt(0);
        }
        char decimal = '.';
        if (f.has("decimalSeparator")) {
            String d = f.string("decimalSeparator");
            if (!DECIMAL_SEPARATORS.contains(d)) {
                throw fail(p.child("decimalSeparator"), "decimalSeparator must be \".\" or \",\", got \""
                        + StrictJson.abbreviate(d) + "\"");
            }
            decimal = d.charAt(0);
            if (decimal == delimiter) {
                throw fail(p.child("decimalSeparator"), "decimalSeparator ',' needs another delimiter than ',' "
                        + "(e.g. \"delimiter\": \";\")");
            }
        }
        double[] scale = new double[ForceComponent.values().length];
        java.util.Arrays.fill(scale, 1.0);
        if (f.has("scale")) {
            JsonPath sp = p.child("scale");
            Fields sf = new Fields(object(f.get("scale"), sp), sp, FORCE_KEYS);
            for (ForceComponent c : ForceComponent.values()) {
                if (sf.has(c.key())) {
                    scale[c.ordinal()] = sf.number(c.key());
                }
            }
        }
        int headerRow = 1;
        if (f.has("headerRow")) {
            double h = f.number("headerRow");
            if (h != Math.rint(h) || h < 1 || h > MAX_TABLE_ROWS) {
                throw fail(p.child("headerRow"), "headerRow must be a whole number from 1 to " + MAX_TABLE_ROWS
                        + " (the 1-based row of the column headers), got " + fmt(h));
            }
            headerRow = (int) h;
        }
        boolean skip = false;
        if (f.has("unknownStations")) {
            String u = f.string("unknownStations");
            if (!UNKNOWN_STATIONS.contains(u)) {
                throw fail(p.child("unknownStations"), "unknownStations must be one of " + UNKNOWN_STATIONS
                        + ", got \"" + StrictJson.abbreviate(u) + "\"");
            }
            skip = u.equals("skip");
        }
        Path resolved;
        try {
            resolved = baseDir == null ? null : baseDir.resolve(file).normalize();
        } catch (java.nio.file.InvalidPathException ex) {
            throw fail(filePath, "file '" + StrictJson.abbreviate(file) + "' is not a valid file name here: "
                    + ex.getReason());
        }
        return new LoadTableReader.Spec(index, p, file, resolved, units, columns, f.has("columns"), delimiter,
                decimal, scale, headerRow, skip);
    }

    private Map<String, Combination> combinations(JsonElement e, JsonPath p, Map<String, Station> stations)
            throws ProjectFormatException {
        Set<String> cases = new LinkedHashSet<>();
        for (Station s : stations.values()) {
            cases.addAll(s.cases().keySet());
        }
        Map<String, Combination> out = new LinkedHashMap<>();
        Map<String, double[]> largest = largestForces(stations);
        JsonObject all = object(e, p);
        if (all.size() > MAX_COMBINATIONS) {
            throw fail(p, all.size() + " combinations, more than the limit of " + MAX_COMBINATIONS);
        }
        for (Map.Entry<String, JsonElement> c : all.entrySet()) {
            JsonPath cp = p.child(c.getKey());
            String id = id(c.getKey(), cp, "combination");
            if (cases.contains(id)) {
                throw fail(cp, "combination '" + id + "' has the name of a load case; give it another name");
            }
            JsonObject factors = object(c.getValue(), cp);
            if (factors.isEmpty()) {
                throw fail(cp, "combination '" + id + "' needs at least one load case factor, got {}");
            }
            Map<String, Double> map = new LinkedHashMap<>();
            for (Map.Entry<String, JsonElement> f : factors.entrySet()) {
                JsonPath fp = cp.child(f.getKey());
                double factor = number(f.getValue(), fp);
                if (!cases.contains(f.getKey())) {
                    throw fail(fp, "load case '" + StrictJson.abbreviate(f.getKey())
                            + "' is not defined at any station (cases: " + cases + ")");
                }
                map.put(f.getKey(), factor);
            }
            try {
                out.put(id, new Combination(id, map));
            } catch (IllegalArgumentException ex) {
                throw fail(cp, ex.getMessage());
            }
            requireFiniteSums(id, map, cp, stations, largest);
        }
        return out;
    }

    /** @return per load case, the largest |component| of its forces over all stations, in ForceComponent order */
    private static Map<String, double[]> largestForces(Map<String, Station> stations) {
        Map<String, double[]> out = new java.util.HashMap<>();
        for (Station s : stations.values()) {
            for (Map.Entry<String, InternalForces> c : s.cases().entrySet()) {
                double[] m = out.computeIfAbsent(c.getKey(), k -> new double[ForceComponent.values().length]);
                for (ForceComponent fc : ForceComponent.values()) {
                    m[fc.ordinal()] = Math.max(m[fc.ordinal()], Math.abs(c.getValue().get(fc)));
                }
            }
        }
        return out;
    }

    /**
     * Rejects a combination whose forces exceed {@link #MAX_ABS_FORCE} at some station (huge factors or forces): the
     * sum of |factor| × the largest |force| bounds every station's combined force, and only when that bound
     * exceeds the limit are the stations summed one by one to name the first that does.
     */
    private void requireFiniteSums(String id, Map<String, Double> factors, JsonPath cp, Map<String, Station> stations,
            Map<String, double[]> largest) throws ProjectFormatException {
        for (ForceComponent fc : ForceComponent.values()) {
            double bound = 0;
            for (Map.Entry<String, Double> f : factors.entrySet()) {
                bound += Math.abs(f.getValue()) * largest.get(f.getKey())[fc.ordinal()];
            }
            if (bound <= MAX_ABS_FORCE) {
                continue;
            }
            for (Station s : stations.values()) {
                double sum = 0;
                for (Map.Entry<String, Double> f : factors.entrySet()) {
                    InternalForces lc = s.cases().get(f.getKey());
                    sum += lc == null ? 0 : f.getValue() * lc.get(fc);
                }
                if (!(Math.abs(sum) <= MAX_ABS_FORCE)) {
                    throw fail(cp, "combination '" + id + "' gives " + fc.key() + " = " + sum + " at station '"
                            + s.id() + "', beyond ±" + fmt(MAX_ABS_FORCE) + " (check the factors' and the forces' "
                            + "magnitudes and units)");
                }
            }
        }
    }

    // ---------------------------------------------------------------- typed access

    /** An object being read: knows its path, rejects unknown keys up front. */
    private final class Fields {
        final JsonObject o;
        final JsonPath path;

        Fields(JsonObject o, JsonPath path, Set<String> allowed) throws ProjectFormatException {
            this.o = o;
            this.path = path;
            for (String key : o.keySet()) {
                if (!allowed.contains(key)) {
                    throw fail(path.child(key), "unknown key '" + StrictJson.abbreviate(key) + "' (allowed here: "
                            + new java.util.TreeSet<>(allowed) + ")");
                }
            }
        }

        boolean has(String key) {
            return o.has(key);
        }

        JsonElement get(String key) {
            return o.get(key);
        }

        JsonElement require(String key) throws ProjectFormatException {
            JsonElement e = o.get(key);
            if (e == null) {
                throw fail(path, "missing required key '" + key + "'");
            }
            return e;
        }

        double number(String key) throws ProjectFormatException {
            return ProjectReader.this.number(require(key), path.child(key));
        }

        String string(String key) throws ProjectFormatException {
            return ProjectReader.this.string(require(key), path.child(key));
        }

        void optString(String key) throws ProjectFormatException {
            if (o.has(key)) {
                ProjectReader.this.string(o.get(key), path.child(key));
            }
        }
    }

    private JsonObject object(JsonElement e, JsonPath p) throws ProjectFormatException {
        if (e == null || !e.isJsonObject()) {
            throw fail(p, "expected an object, got " + describe(e));
        }
        return e.getAsJsonObject();
    }

    private JsonArray array(JsonElement e, JsonPath p) throws ProjectFormatException {
        if (e == null || !e.isJsonArray()) {
            throw fail(p, "expected an array, got " + describe(e));
        }
        return e.getAsJsonArray();
    }

    private double number(JsonElement e, JsonPath p) throws ProjectFormatException {
        if (e instanceof JsonPrimitive prim && prim.isNumber()) {
            double d = prim.getAsDouble();
            if (Double.isFinite(d)) {
                return d;
            }
        }
        throw fail(p, "expected a number, got " + describe(e));
    }

    private String string(JsonElement e, JsonPath p) throws ProjectFormatException {
        if (e instanceof JsonPrimitive prim && prim.isString()) {
            return prim.getAsString();
        }
        throw fail(p, "expected a string, got " + describe(e));
    }

    /** @return [x, y] as a point */
    private Point2 pair(JsonElement e, JsonPath p, String what) throws ProjectFormatException {
        if (e == null || !e.isJsonArray() || e.getAsJsonArray().size() != 2) {
            throw fail(p, what + " must be [x, y], got " + describe(e));
        }
        JsonArray a = e.getAsJsonArray();
        return new Point2(number(a.get(0), p.item(0)), number(a.get(1), p.item(1)));
    }

    private String id(String key, JsonPath p, String what) throws ProjectFormatException {
        if (key.length() > MAX_ID_LENGTH) {
            throw fail(p.parent(), "a " + what + " id must have at most " + MAX_ID_LENGTH + " characters, got one of "
                    + key.length() + ": '" + StrictJson.abbreviate(key) + "'");
        }
        if (key.isBlank()) {
            throw fail(p, "a " + what + " id must not be empty, got \"" + StrictJson.abbreviate(key) + "\"");
        }
        return key;
    }

    private static final Pattern POINT = Pattern.compile("Point2\\[x=([^,\\]]+), y=([^\\]]+)\\]");

    /** @return a format error at p; points in geometry messages are written as in the file, [x, y] */
    private ProjectFormatException fail(JsonPath p, String message) {
        String m = POINT.matcher(message).replaceAll(r -> Matcher.quoteReplacement(
                "[" + fmtLiteral(r.group(1)) + ", " + fmtLiteral(r.group(2)) + "]"));
        // a long value quoted from the file is shortened, however it reached the message (one line of reasonable
        // length); only in long messages, so that the prose's apostrophes are left alone
        if (m.length() > 400) {
            m = LONG_QUOTE.matcher(m).replaceAll(r -> Matcher.quoteReplacement("'" + StrictJson.abbreviate(r.group(1))
                    + "'"));
        }
        return new ProjectFormatException(p.toString(), m + suffix);
    }

    private static final Pattern LONG_QUOTE = Pattern.compile("'([^'\n]{100,})'");

    /**
     * Turns a constructor's rejection into a format error. Constructors name the offending field first
     * ({@code "radius: -25 must be positive"}) or as a word of the message; when exactly one key of the object
     * being built is so named, the path points at that key, otherwise at the object.
     */
    private ProjectFormatException rethrow(IllegalArgumentException ex, Fields f) {
        String m = ex.getMessage() == null ? ex.toString() : ex.getMessage();
        JsonPath at = f.path;
        List<String> named = new ArrayList<>();
        for (String key : f.o.keySet()) {
            if (m.startsWith(key + ":")) {
                named = List.of(key);
                break;
            }
            if (Pattern.compile("(?<![A-Za-z0-9_])" + Pattern.quote(key) + "(?![A-Za-z0-9_])").matcher(m).find()) {
                named.add(key);
            }
        }
        if (named.size() == 1) {
            at = f.path.child(named.get(0));
        }
        return fail(at, m);
    }

    /** @return a short description of a JSON value for messages, naming the value */
    static String describe(JsonElement e) {
        if (e == null) {
            return "nothing";
        }
        if (e.isJsonNull()) {
            return "null";
        }
        if (e.isJsonObject()) {
            return "an object";
        }
        if (e.isJsonArray()) {
            int n = e.getAsJsonArray().size();
            return "an array of " + n + (n == 1 ? " item" : " items");
        }
        JsonPrimitive p = e.getAsJsonPrimitive();
        if (p.isBoolean()) {
            return p.getAsBoolean() ? "true" : "false";
        }
        if (p.isNumber()) {
            return "the number " + fmt(p.getAsDouble());
        }
        return "the string \"" + StrictJson.abbreviate(p.getAsString()) + "\"";
    }

    private static String fmtLiteral(String javaDouble) {
        try {
            return fmt(Double.parseDouble(javaDouble));
        } catch (NumberFormatException e) {
            return javaDouble;
        }
    }

    private static String fmt(Point2 p) {
        return "[" + fmt(p.x()) + ", " + fmt(p.y()) + "]";
    }

    /** @return a number as written in a file: integers without a decimal point, others in shortest form */
    static String fmt(double d) {
        if (d == Math.rint(d) && Math.abs(d) < 1e15) {
            return Long.toString((long) d);
        }
        return Double.toString(d);
    }
}
