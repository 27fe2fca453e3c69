package org.tensio.engine.io;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;

import org.tensio.engine.fatigue.EnduranceLimit;
import org.tensio.engine.fatigue.EquivalentDiameter;
import org.tensio.engine.fatigue.FatigueConditions;
import org.tensio.engine.fatigue.FatigueCriterion;
import org.tensio.engine.fatigue.FatigueData;
import org.tensio.engine.fatigue.FatigueMaterial;
import org.tensio.engine.fatigue.FatigueStation;
import org.tensio.engine.fatigue.LoadHistory;
import org.tensio.engine.fatigue.MarinFactors;
import org.tensio.engine.fatigue.Notch;
import org.tensio.engine.fatigue.NotchFactors;
import org.tensio.engine.fatigue.NotchLocation;
import org.tensio.engine.fatigue.NotchSensitivity;
import org.tensio.engine.fatigue.NotchType;
import org.tensio.engine.fatigue.SurfaceFinish;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.project.Combination;
import org.tensio.engine.project.Station;
import org.tensio.engine.section.Material;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;
import org.tensio.engine.units.UnitSystem;

/**
 * Reads the optional top-level {@code fatigue} block of a project file (docs/file-format.md §12) into
 * {@link FatigueData}, with the same strictness as {@link ProjectReader}: every key known, exact types, and every
 * error a {@link ProjectFormatException} at the JSON path of the offending value. Everything the fatigue check
 * will need is checked here (materials and stations exist, load cases can be evaluated, a surface finish and an
 * ultimate strength for every material, fy where a criterion needs it, notch-sensitivity fits cover the
 * material), so that the check itself does not fail on the file's content. Called by {@link ProjectReader}
 * after the combinations.
 */
final class FatigueReader {

    static final Set<String> FATIGUE_KEYS = Set.of("materials", "stations");
    static final Set<String> MATERIAL_KEYS = Set.of("fu", "fy", "enduranceLimit", "estimate", "fatigueStrength",
            "cycles", "surface", "reliability", "temperature", "miscellaneous", "notchSensitivity");
    static final Set<String> STATION_KEYS = Set.of("histories", "notches", "criteria", "surface", "reliability",
            "temperature", "miscellaneous", "equivalentDiameter", "requiredFactor");
    static final Set<String> HISTORY_KEYS = Set.of("rotating", "maximum", "minimum", "alternating", "mean");
    static final Set<String> NOTCH_KEYS = Set.of("type", "kt", "kts", "ktAxial", "radius", "q", "qs", "kf", "kfs",
            "kfAxial", "location");
    static final Set<String> LOCATION_KEYS = Set.of("radiusBand", "points", "within");
    private static final Set<String> FORCE_KEYS = Set.of("N", "Vx", "Vy", "Mx", "My", "T");

    private final String suffix;
    private final UnitSystem units;
    private final Map<String, Material> materials;
    private final Map<String, MaterialLimits> limits;
    private final Map<String, Section> sections;
    private final Map<String, Station> stations;
    private final Map<String, Combination> combinations;

    private FatigueReader(String suffix, UnitSystem units, Map<String, Material> materials,
            Map<String, MaterialLimits> limits, Map<String, Section> sections, Map<String, Station> stations,
            Map<String, Combination> combinations) {
        this.suffix = suffix;
        this.units = units;
        this.materials = materials;
        this.limits = limits;
        this.sections = sections;
        this.stations = stations;
        this.combinations = combinations;
    }

    /**
     * @param e      the value of {@code fatigue}
     * @param p      its path
     * @param suffix " (in file)" for messages
     * @return the fatigue data
     */
    static FatigueData read(JsonElement e, JsonPath p, String suffix, UnitSystem units, Map<String, Material> materials,
            Map<String, MaterialLimits> limits, Map<String, Section> sections, Map<String, Station> stations,
            Map<String, Combination> combinations) throws ProjectFormatException {
        return new FatigueReader(suffix, units, materials, limits, sections, stations, combinations).data(e, p);
    }

    private FatigueData data(JsonElement e, JsonPath p) throws ProjectFormatException {
        JsonObject o = object(e, p, FATIGUE_KEYS);
        double mm = UnitFactors.millimetres(units.length());
        double mpa = UnitFactors.newtons(units.force()) / (mm * mm);
        Map<String, FatigueMaterial> mats = new LinkedHashMap<>();
        if (o.has("materials")) {
            JsonPath mp = p.child("materials");
            for (Map.Entry<String, JsonElement> m : object(o.get("materials"), mp, null).entrySet()) {
                mats.put(m.getKey(), material(m.getKey(), m.getValue(), mp.child(m.getKey())));
            }
        }
        if (!o.has("stations")) {
            throw fail(p, "missing required key 'stations' (the stations to check for fatigue)");
        }
        JsonPath sp = p.child("stations");
        JsonObject so = object(o.get("stations"), sp, null);
        if (so.isEmpty()) {
            throw fail(sp, "stations needs at least one station, got {}");
        }
        Map<String, FatigueStation> out = new LinkedHashMap<>();
        for (Map.Entry<String, JsonElement> s : so.entrySet()) {
            out.put(s.getKey(), station(s.getKey(), s.getValue(), sp.child(s.getKey()), mats, mpa, mm));
        }
        return new FatigueData(mpa, mm, mats, out);
    }

    // ---------------------------------------------------------------- materials

    private FatigueMaterial material(String id, JsonElement e, JsonPath p) throws ProjectFormatException {
        Material mat = materials.get(id);
        if (mat == null) {
            throw fail(p, "unknown material '" + StrictJson.abbreviate(id) + "' (defined: " + materials.keySet() + ")");
        }
        JsonObject o = object(e, p, MATERIAL_KEYS);
        MaterialLimits lim = limits.get(id);
        Double fu = o.has("fu") ? Double.valueOf(positive(o, "fu", p)) : lim == null ? null : lim.ultimateStrength();
        if (fu == null) {
            throw fail(p, "missing required key 'fu' (the ultimate strength; material '" + id + "' gives none)");
        }
        Double fy = o.has("fy") ? Double.valueOf(positive(o, "fy", p)) : mat.fy();
        if (fy != null && fy > fu) {
            throw fail(p.child(o.has("fy") ? "fy" : "fu"), "fy " + fmt(fy) + " is above fu " + fmt(fu)
                    + " (the yield strength cannot exceed the ultimate strength)");
        }
        List<String> bases = new ArrayList<>();
        for (String k : List.of("enduranceLimit", "estimate", "fatigueStrength")) {
            if (o.has(k)) {
                bases.add(k);
            }
        }
        if (bases.size() != 1) {
            throw fail(bases.size() > 1 ? p.child(bases.get(1)) : p, (bases.isEmpty() ? "missing" : "more than one of")
                    + " 'enduranceLimit' (Se', given), 'estimate' (\"steel\": Se' from fu by the rule for steels) or"
                    + " 'fatigueStrength' with 'cycles' (materials without an endurance limit)"
                    + (bases.isEmpty() ? "" : ", got " + bases));
        }
        FatigueMaterial.Basis basis;
        Double strength = null, cycles = null;
        switch (bases.get(0)) {
            case "enduranceLimit" -> {
                basis = FatigueMaterial.Basis.given;
                strength = positive(o, "enduranceLimit", p);
            }
            case "estimate" -> {
                String v = string(o.get("estimate"), p.child("estimate"));
                if (!v.equals("steel")) {
                    throw fail(p.child("estimate"), "estimate must be \"steel\" (the only estimate Tensio knows: Se' ="
                            + " 0.5 fu up to 1400 MPa, 700 MPa above), got \"" + StrictJson.abbreviate(v) + "\"");
                }
                basis = FatigueMaterial.Basis.steelEstimate;
            }
            default -> {
                basis = FatigueMaterial.Basis.strengthAtCycles;
                strength = positive(o, "fatigueStrength", p);
                if (!o.has("cycles")) {
                    throw fail(p, "missing required key 'cycles' (the number of cycles of fatigueStrength)");
                }
                cycles = number(o.get("cycles"), p.child("cycles"));
                if (!(cycles >= 1)) {
                    throw fail(p.child("cycles"), "cycles: " + fmt(cycles) + " must be at least 1");
                }
            }
        }
        if (o.has("cycles") && basis != FatigueMaterial.Basis.strengthAtCycles) {
            throw fail(p.child("cycles"), "'cycles' belongs to 'fatigueStrength' only");
        }
        if (strength != null && !(strength < fu)) {
            throw fail(p.child(bases.get(0)), bases.get(0) + ": " + fmt(strength) + " must be below fu " + fmt(fu));
        }
        NotchSensitivity ns = NotchSensitivity.neuber;
        if (o.has("notchSensitivity")) {
            String v = string(o.get("notchSensitivity"), p.child("notchSensitivity"));
            ns = enumValue(NotchSensitivity.class, v, p.child("notchSensitivity"), "notchSensitivity");
        }
        FatigueConditions cond = conditions(o, p);
        try {
            return new FatigueMaterial(id, fu, fy, basis, strength, cycles, cond, ns);
        } catch (IllegalArgumentException ex) {
            throw fail(p, ex.getMessage());
        }
    }

    private FatigueConditions conditions(JsonObject o, JsonPath p) throws ProjectFormatException {
        SurfaceFinish surface = null;
        if (o.has("surface")) {
            surface = enumValue(SurfaceFinish.class, string(o.get("surface"), p.child("surface")), p.child("surface"),
                    "surface");
        }
        Double reliability = null;
        if (o.has("reliability")) {
            reliability = number(o.get("reliability"), p.child("reliability"));
            try {
                MarinFactors.reliability(reliability);
            } catch (IllegalArgumentException ex) {
                throw fail(p.child("reliability"), ex.getMessage());
            }
        }
        Double temperature = null;
        if (o.has("temperature")) {
            temperature = number(o.get("temperature"), p.child("temperature"));
            if (temperature < -273.15) {
                throw fail(p.child("temperature"), "temperature: " + fmt(temperature) + " °C is below absolute zero");
            }
            try {
                MarinFactors.temperature(temperature);
            } catch (IllegalArgumentException ex) {
                throw fail(p.child("temperature"), ex.getMessage());
            }
        }
        Double misc = null;
        if (o.has("miscellaneous")) {
            misc = positive(o, "miscellaneous", p);
        }
        return new FatigueConditions(surface, reliability, temperature, misc);
    }

    // ---------------------------------------------------------------- stations

    private FatigueStation station(String id, JsonElement e, JsonPath p, Map<String, FatigueMaterial> mats, double mpa,
            double mm) throws ProjectFormatException {
        Station st = stations.get(id);
        if (st == null) {
            throw fail(p, "unknown station '" + StrictJson.abbreviate(id) + "' (stations: " + stations.keySet() + ")");
        }
        Section section = sections.get(st.sectionId());
        JsonObject o = object(e, p, STATION_KEYS);
        List<FatigueMaterial> used = new ArrayList<>();
        for (SectionPart part : section.parts()) {
            FatigueMaterial fm = mats.get(part.material().name());
            if (fm != null && !used.contains(fm)) {
                used.add(fm);
            }
        }
        if (used.isEmpty()) {
            throw fail(p, "no material of section '" + section.name() + "' has fatigue data (add it to $.fatigue."
                    + "materials: " + section.parts().stream().map(x -> x.material().name()).distinct().toList() + ")");
        }
        if (!o.has("histories")) {
            throw fail(p, "missing required key 'histories' (load history id → {rotating | maximum and minimum |"
                    + " alternating and/or mean})");
        }
        JsonPath hp = p.child("histories");
        JsonObject ho = object(o.get("histories"), hp, null);
        if (ho.isEmpty()) {
            throw fail(hp, "histories needs at least one load history, got {}");
        }
        Double de = o.has("equivalentDiameter") ? Double.valueOf(positive(o, "equivalentDiameter", p)) : null;
        Map<String, LoadHistory> histories = new LinkedHashMap<>();
        for (Map.Entry<String, JsonElement> h : ho.entrySet()) {
            if (h.getKey().isBlank()) {
                throw fail(hp.child(h.getKey()), "a load history id must not be empty");
            }
            histories.put(h.getKey(), history(st, h.getValue(), hp.child(h.getKey()), section, de));
        }
        List<Notch> notches = new ArrayList<>();
        if (o.has("notches")) {
            JsonPath np = p.child("notches");
            JsonArray list = array(o.get("notches"), np);
            for (int i = 0; i < list.size(); i++) {
                notches.add(notch(list.get(i), np.item(i)));
            }
        }
        boolean allYield = used.stream().allMatch(m -> m.sy() != null);
        List<FatigueCriterion> criteria = new ArrayList<>();
        if (o.has("criteria")) {
            JsonPath cp = p.child("criteria");
            JsonArray list = array(o.get("criteria"), cp);
            if (list.isEmpty()) {
                throw fail(cp, "criteria needs at least one of " + List.of(FatigueCriterion.values())
                        + ", got an empty array");
            }
            for (int i = 0; i < list.size(); i++) {
                FatigueCriterion c = enumValue(FatigueCriterion.class, string(list.get(i), cp.item(i)), cp.item(i),
                        "criterion");
                if (criteria.contains(c)) {
                    throw fail(cp.item(i), "criterion '" + c + "' is listed twice");
                }
                if (c.needsYield() && !allYield) {
                    throw fail(cp.item(i), "criterion " + c + " needs fy of every fatigue material of section '"
                            + section.name() + "'");
                }
                criteria.add(c);
            }
        } else if (allYield) {
            criteria.addAll(List.of(FatigueCriterion.values()));
        } else {
            criteria.addAll(List.of(FatigueCriterion.fatigueGoodman, FatigueCriterion.fatigueGerber));
        }
        FatigueConditions cond = conditions(o, p);
        Double required = null;
        if (o.has("requiredFactor")) {
            required = number(o.get("requiredFactor"), p.child("requiredFactor"));
            if (!(required >= 1)) {
                throw fail(p.child("requiredFactor"), "requiredFactor: " + fmt(required) + " must be at least 1");
            }
        }
        // what the check will compute, tried now so that it cannot fail on the file's content
        for (FatigueMaterial fm : used) {
            FatigueConditions merged = cond.over(fm.conditions());
            if (merged.surface() == null) {
                throw fail(p, "no surface finish for material '" + fm.material() + "': give 'surface' here or in"
                        + " $.fatigue.materials." + fm.material() + " (one of " + List.of(SurfaceFinish.values()) + ")");
            }
            try {
                EnduranceLimit.of(fm, merged, MarinFactors.sizeAxial(), mpa);
            } catch (IllegalArgumentException ex) {
                throw fail(p, "material '" + fm.material() + "': " + ex.getMessage());
            }
            for (int i = 0; i < notches.size(); i++) {
                try {
                    NotchFactors.of(notches.get(i), fm.sut() * mpa, mm, fm.sensitivity());
                } catch (IllegalArgumentException ex) {
                    throw fail(p.child("notches").item(i), "material '" + fm.material() + "': " + ex.getMessage());
                }
            }
        }
        try {
            return new FatigueStation(id, histories, notches, criteria, cond, de, required);
        } catch (IllegalArgumentException ex) {
            throw fail(p, ex.getMessage());
        }
    }

    private LoadHistory history(Station st, JsonElement e, JsonPath p, Section section, Double de)
            throws ProjectFormatException {
        JsonObject o = object(e, p, HISTORY_KEYS);
        String rotating = o.has("rotating") ? caseId(st, o.get("rotating"), p.child("rotating")) : null;
        String max = o.has("maximum") ? caseId(st, o.get("maximum"), p.child("maximum")) : null;
        String min = o.has("minimum") ? caseId(st, o.get("minimum"), p.child("minimum")) : null;
        InternalForces alt = o.has("alternating") ? forces(o.get("alternating"), p.child("alternating")) : null;
        InternalForces mean = o.has("mean") ? forces(o.get("mean"), p.child("mean")) : null;
        if ((max == null) != (min == null)) {
            throw fail(p, "'maximum' and 'minimum' are given together (the two extreme load cases of the cycle)");
        }
        if (rotating != null && max != null) {
            throw fail(p.child("maximum"), "a rotating history takes no maximum/minimum pair (give extra alternating"
                    + " or mean forces instead)");
        }
        if (rotating == null && max == null && alt == null && mean == null) {
            throw fail(p, "a load history needs 'rotating', 'maximum' and 'minimum', or 'alternating' and/or 'mean'");
        }
        if (rotating != null && de == null && EquivalentDiameter.roundRadii(section) == null) {
            throw fail(p.child("rotating"), "section '" + section.name() + "' is not a circle or a tube: a rotating"
                    + " history needs the station's 'equivalentDiameter' for the size factor");
        }
        return new LoadHistory(rotating, max, min, alt, mean);
    }

    private String caseId(Station st, JsonElement e, JsonPath p) throws ProjectFormatException {
        String id = string(e, p);
        if (st.cases().containsKey(id)) {
            return id;
        }
        Combination c = combinations.get(id);
        if (c == null) {
            throw fail(p, "station '" + st.id() + "' has no load case or combination '" + StrictJson.abbreviate(id)
                    + "' (cases " + st.cases().keySet() + ", combinations " + combinations.keySet() + ")");
        }
        for (String lc : c.factors().keySet()) {
            if (!st.cases().containsKey(lc)) {
                throw fail(p, "combination '" + id + "' names load case '" + lc + "', which station '" + st.id()
                        + "' does not have");
            }
        }
        return id;
    }

    private InternalForces forces(JsonElement e, JsonPath p) throws ProjectFormatException {
        JsonObject o = object(e, p, FORCE_KEYS);
        double[] v = new double[6];
        String[] k = {"N", "Vx", "Vy", "Mx", "My", "T"};
        for (int i = 0; i < 6; i++) {
            if (o.has(k[i])) {
                v[i] = number(o.get(k[i]), p.child(k[i]));
            }
        }
        return new InternalForces(v[0], v[1], v[2], v[3], v[4], v[5]);
    }

    private Notch notch(JsonElement e, JsonPath p) throws ProjectFormatException {
        JsonObject o = object(e, p, NOTCH_KEYS);
        if (!o.has("type")) {
            throw fail(p, "missing required key 'type' (one of " + List.of(NotchType.values()) + ")");
        }
        NotchType type = enumValue(NotchType.class, string(o.get("type"), p.child("type")), p.child("type"), "type");
        Double[] v = new Double[9];
        String[] k = {"kt", "kts", "ktAxial", "radius", "q", "qs", "kf", "kfs", "kfAxial"};
        for (int i = 0; i < k.length; i++) {
            if (o.has(k[i])) {
                double d = number(o.get(k[i]), p.child(k[i]));
                boolean ok = switch (k[i]) {
                    case "radius" -> d > 0;
                    case "q", "qs" -> d >= 0 && d <= 1;
                    default -> d >= 1;
                };
                if (!ok) {
                    throw fail(p.child(k[i]), k[i] + ": " + fmt(d) + (k[i].equals("radius") ? " must be positive (the"
                            + " notch root radius)" : k[i].startsWith("q") ? " must lie in [0, 1] (a notch sensitivity)"
                                    : " must be at least 1 (a stress-concentration factor)"));
                }
                v[i] = d;
            }
        }
        NotchLocation loc = o.has("location") ? location(o.get("location"), p.child("location"))
                : new NotchLocation.Surface();
        try {
            return new Notch(type, v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7], v[8], loc);
        } catch (IllegalArgumentException ex) {
            throw fail(p, ex.getMessage());
        }
    }

    private NotchLocation location(JsonElement e, JsonPath p) throws ProjectFormatException {
        if (e instanceof JsonPrimitive prim && prim.isString()) {
            if (prim.getAsString().equals("surface")) {
                return new NotchLocation.Surface();
            }
            throw fail(p, "location must be \"surface\", {\"radiusBand\": [rMin, rMax]} or {\"points\": [[x, y], ...],"
                    + " \"within\": d}, got " + ProjectReader.describe(e));
        }
        JsonObject o = object(e, p, LOCATION_KEYS);
        if (o.has("radiusBand")) {
            if (o.has("points") || o.has("within")) {
                throw fail(p, "a location is a radiusBand or points with within, not both");
            }
            JsonPath rp = p.child("radiusBand");
            JsonArray a = array(o.get("radiusBand"), rp);
            if (a.size() != 2) {
                throw fail(rp, "radiusBand must be [rMin, rMax], got " + ProjectReader.describe(a));
            }
            double r0 = number(a.get(0), rp.item(0)), r1 = number(a.get(1), rp.item(1));
            if (!(r0 >= 0) || !(r1 >= r0)) {
                throw fail(rp, "radiusBand needs 0 ≤ rMin ≤ rMax, got [" + fmt(r0) + ", " + fmt(r1) + "]");
            }
            return new NotchLocation.RadiusBand(r0, r1);
        }
        if (!o.has("points") || !o.has("within")) {
            throw fail(p, "a location object needs 'radiusBand', or 'points' and 'within'");
        }
        JsonPath pp = p.child("points");
        JsonArray a = array(o.get("points"), pp);
        if (a.isEmpty()) {
            throw fail(pp, "points needs at least one point [x, y], got an empty array");
        }
        List<Point2> pts = new ArrayList<>();
        for (int i = 0; i < a.size(); i++) {
            JsonPath ip = pp.item(i);
            JsonElement it = a.get(i);
            if (!it.isJsonArray() || it.getAsJsonArray().size() != 2) {
                throw fail(ip, "a point must be [x, y], got " + ProjectReader.describe(it));
            }
            pts.add(new Point2(number(it.getAsJsonArray().get(0), ip.item(0)), number(it.getAsJsonArray().get(1),
                    ip.item(1))));
        }
        double within = number(o.get("within"), p.child("within"));
        if (!(within > 0)) {
            throw fail(p.child("within"), "within: " + fmt(within) + " must be positive (a distance)");
        }
        return new NotchLocation.NearPoints(pts, within);
    }

    // ---------------------------------------------------------------- typed access

    private <E extends Enum<E>> E enumValue(Class<E> type, String v, JsonPath p, String what)
            throws ProjectFormatException {
        for (E c : type.getEnumConstants()) {
            if (c.name().equals(v)) {
                return c;
            }
        }
        throw fail(p, "unknown " + what + " '" + StrictJson.abbreviate(v) + "' (use one of "
                + List.of(type.getEnumConstants()) + ")");
    }

    private JsonObject object(JsonElement e, JsonPath p, Set<String> allowed) throws ProjectFormatException {
        if (e == null || !e.isJsonObject()) {
            throw fail(p, "expected an object, got " + ProjectReader.describe(e));
        }
        JsonObject o = e.getAsJsonObject();
        if (allowed != null) {
            for (String key : o.keySet()) {
                if (!allowed.contains(key)) {
                    throw fail(p.child(key), "unknown key '" + StrictJson.abbreviate(key) + "' (allowed here: "
                            + new TreeSet<>(allowed) + ")");
                }
            }
        }
        return o;
    }

    private JsonArray array(JsonElement e, JsonPath p) throws ProjectFormatException {
        if (e == null || !e.isJsonArray()) {
            throw fail(p, "expected an array, got " + ProjectReader.describe(e));
        }
        return e.getAsJsonArray();
    }

    private double number(JsonElement e, JsonPath p) throws ProjectFormatException {
        if (e instanceof JsonPrimitive prim && prim.isNumber() && Double.isFinite(prim.getAsDouble())) {
            return prim.getAsDouble();
        }
        throw fail(p, "expected a number, got " + ProjectReader.describe(e));
    }

    private double positive(JsonObject o, String key, JsonPath p) throws ProjectFormatException {
        double v = number(o.get(key), p.child(key));
        if (!(v > 0)) {
            throw fail(p.child(key), key + ": " + fmt(v) + " must be positive");
        }
        return v;
    }

    private String string(JsonElement e, JsonPath p) throws ProjectFormatException {
        if (e instanceof JsonPrimitive prim && prim.isString()) {
            return prim.getAsString();
        }
        throw fail(p, "expected a string, got " + ProjectReader.describe(e));
    }

    private ProjectFormatException fail(JsonPath p, String message) {
        return new ProjectFormatException(p.toString(), message + suffix);
    }

    private static String fmt(double d) {
        return ProjectReader.fmt(d);
    }
}
