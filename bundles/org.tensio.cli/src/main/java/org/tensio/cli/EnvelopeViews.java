package org.tensio.cli;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Function;

import org.tensio.engine.checks.Peak;
import org.tensio.engine.checks.PointEnvelope;
import org.tensio.engine.checks.Range;
import org.tensio.engine.checks.StationEnvelope;
import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.units.UnitSystem;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;

/**
 * Views of a {@link StationEnvelope}. JSON keys (stable): {@code station, units, forces{N:{max, min, maxCase,
 * minCase}, ...}, points[]{x, y, part, sigmaZ{max, min, maxCase, minCase}, tauZX{...}, tauZY{...}, vonMises{max,
 * maxCase}, tauMax{max, maxCase}}}, plus {@code section, cases, material, singular, warnings, caution}.
 */
final class EnvelopeViews {

    private EnvelopeViews() {
    }

    static JsonObject json(StationEnvelope e, UnitSystem u) {
        JsonObject o = new JsonObject();
        o.addProperty("station", e.station());
        o.addProperty("section", e.section());
        o.add("units", Json.units(u));
        JsonArray cases = new JsonArray();
        e.cases().forEach(cases::add);
        o.add("cases", cases);
        JsonObject forces = new JsonObject();
        for (Map.Entry<ForceComponent, Range> f : e.forces().entrySet()) {
            forces.add(f.getKey().key(), range(f.getValue()));
        }
        o.add("forces", forces);
        JsonArray points = new JsonArray();
        for (PointEnvelope p : e.points()) {
            JsonObject j = new JsonObject();
            j.addProperty("x", p.point().x());
            j.addProperty("y", p.point().y());
            j.addProperty("part", p.part());
            j.addProperty("material", p.material());
            j.addProperty("singular", p.singular());
            j.add("sigmaZ", range(p.sigmaZ()));
            j.add("tauZX", range(p.tauZX()));
            j.add("tauZY", range(p.tauZY()));
            j.add("vonMises", peak(p.vonMises()));
            j.add("tauMax", peak(p.tauMax()));
            points.add(j);
        }
        o.add("points", points);
        JsonArray w = new JsonArray();
        e.warnings().forEach(w::add);
        o.add("warnings", w);
        o.addProperty("caution", Caution.TEXT);
        return o;
    }

    private static JsonObject range(Range r) {
        JsonObject o = new JsonObject();
        o.addProperty("max", r.max());
        o.addProperty("min", r.min());
        o.addProperty("maxCase", r.maxCase());
        o.addProperty("minCase", r.minCase());
        return o;
    }

    private static JsonObject peak(Peak p) {
        JsonObject o = new JsonObject();
        o.addProperty("max", p.max());
        o.addProperty("maxCase", p.maxCase());
        return o;
    }

    /**
     * The force envelope, the section-wide extreme of each stress quantity with its point and case, and the
     * {@code limit} points with the largest von Mises stress (all points when {@code limit} is 0).
     */
    static String text(StationEnvelope e, UnitSystem u, int limit) {
        String nl = System.lineSeparator();
        String st = u.stressUnit();
        StringBuilder sb = new StringBuilder();
        sb.append(String.format("Envelope of station '%s' (section '%s') over %d load cases and combinations: %s%n",
                e.station(), e.section(), e.cases().size(), String.join(", ", e.cases())));
        sb.append(nl).append("Internal forces (").append(u.force()).append(", ").append(u.momentUnit()).append(')').append(nl);
        sb.append(String.format("  %-4s %14s %-12s %14s %-12s%n", "", "max", "case", "min", "case"));
        for (Map.Entry<ForceComponent, Range> f : e.forces().entrySet()) {
            Range r = f.getValue();
            sb.append(String.format("  %-4s %14s %-12s %14s %-12s%n", f.getKey().key(), Text.num(r.max()), r.maxCase(),
                    Text.num(r.min()), r.minCase()).stripTrailing()).append(nl);
        }
        sb.append(nl).append("Extremes over the section (").append(e.points().size()).append(" sample points, ").append(st)
                .append(')').append(nl);
        extreme(sb, e, "sigmaZ max", p -> p.sigmaZ().max(), p -> p.sigmaZ().maxCase(), true);
        extreme(sb, e, "sigmaZ min", p -> p.sigmaZ().min(), p -> p.sigmaZ().minCase(), false);
        extreme(sb, e, "tauZX max", p -> p.tauZX().max(), p -> p.tauZX().maxCase(), true);
        extreme(sb, e, "tauZX min", p -> p.tauZX().min(), p -> p.tauZX().minCase(), false);
        extreme(sb, e, "tauZY max", p -> p.tauZY().max(), p -> p.tauZY().maxCase(), true);
        extreme(sb, e, "tauZY min", p -> p.tauZY().min(), p -> p.tauZY().minCase(), false);
        extreme(sb, e, "von Mises max", p -> p.vonMises().max(), p -> p.vonMises().maxCase(), true);
        extreme(sb, e, "tauMax max", p -> p.tauMax().max(), p -> p.tauMax().maxCase(), true);
        List<PointEnvelope> sorted = new ArrayList<>(e.points());
        sorted.sort(Comparator.comparingDouble((PointEnvelope p) -> p.vonMises().max()).reversed());
        int n = limit <= 0 ? sorted.size() : Math.min(limit, sorted.size());
        sb.append(nl).append(n == sorted.size() ? "All points" : "The " + n + " points with the largest von Mises stress")
                .append(", by von Mises (").append(st).append(", ").append(u.length()).append(')').append(nl);
        String fmt = "  %12s %12s %-10s %12s %-8s %12s %-8s %12s %-8s %12s %-8s%s%n";
        sb.append(String.format(fmt, "x", "y", "material", "sigmaZ max", "case", "sigmaZ min", "case", "von Mises",
                "case", "tauMax", "case", ""));
        for (int i = 0; i < n; i++) {
            PointEnvelope p = sorted.get(i);
            sb.append(String.format(fmt, CheckViews.coord(p.point().x(), p.point().y()),
                    CheckViews.coord(p.point().y(), p.point().x()), p.material(),
                    Text.num(p.sigmaZ().max()), p.sigmaZ().maxCase(), Text.num(p.sigmaZ().min()), p.sigmaZ().minCase(),
                    Text.num(p.vonMises().max()), p.vonMises().maxCase(), Text.num(p.tauMax().max()), p.tauMax().maxCase(),
                    p.singular() ? "  (singular corner)" : "").stripTrailing()).append(nl);
        }
        if (n < sorted.size()) {
            sb.append(String.format(Locale.ROOT, "  ... %d more points (--limit 0 or --format json lists all)%n",
                    sorted.size() - n));
        }
        for (String w : e.warnings()) {
            sb.append("warning: ").append(w).append(nl);
        }
        sb.append(Caution.TEXT).append(nl);
        return sb.toString();
    }

    private static void extreme(StringBuilder sb, StationEnvelope e, String label, Function<PointEnvelope, Double> value,
            Function<PointEnvelope, String> caseOf, boolean max) {
        PointEnvelope best = null;
        for (PointEnvelope p : e.points()) {
            if (best == null || (max ? value.apply(p) > value.apply(best) : value.apply(p) < value.apply(best))) {
                best = p;
            }
        }
        if (best == null) {
            return;
        }
        sb.append(String.format("  %-14s %14s  case %-12s at (%s, %s), %s%s%n", label, Text.num(value.apply(best)),
                caseOf.apply(best), CheckViews.coord(best.point().x(), best.point().y()),
                CheckViews.coord(best.point().y(), best.point().x()), best.material(),
                best.singular() ? " (singular corner)" : ""));
    }
}
