package org.tensio.cli;

import java.util.Locale;

import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.checks.FatiguePointOp;
import org.tensio.engine.fatigue.FatigueDetail;
import org.tensio.engine.units.UnitSystem;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;

/**
 * Views of the fatigue results at one point ({@link FatiguePointOp.Result}) for {@code tensio stress} at a
 * station with a fatigue check: the {@code fatigue} object of the JSON output (an extra key) and a text block.
 * Each result carries the same {@code fatigue} object as a result of {@code tensio check} ({@link FatigueViews}).
 */
final class FatiguePointViews {

    private FatiguePointViews() {
    }

    /**
     * @return {@code {"onSurface", "surfaceDistance", "surfaceTolerance", "material", "results": [{"history",
     *         "criterion", "utilisation", "passed", "fatigue": {...}}], "notes": [...], "caution"}}
     */
    static JsonObject json(FatiguePointOp.Result r, double tolerance) {
        JsonObject o = new JsonObject();
        o.addProperty("onSurface", r.onSurface());
        o.addProperty("surfaceDistance", r.surfaceDistance());
        o.addProperty("surfaceTolerance", tolerance);
        o.addProperty("material", r.material());
        JsonArray results = new JsonArray();
        for (CheckResult c : r.results()) {
            JsonObject j = new JsonObject();
            j.addProperty("history", c.caseId());
            j.addProperty("criterion", c.criterion());
            j.addProperty("utilisation", c.utilisation());
            j.addProperty("passed", c.passed());
            j.add("fatigue", FatigueViews.json(c.fatigue()));
            results.add(j);
        }
        o.add("results", results);
        JsonArray notes = new JsonArray();
        r.notes().forEach(notes::add);
        o.add("notes", notes);
        o.addProperty("caution", FatigueViews.CAUTION);
        return o;
    }

    /** @return the text block: where the point is, then one line per history and criterion */
    static String text(FatiguePointOp.Result r, double tolerance, UnitSystem u) {
        String nl = System.lineSeparator();
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "Fatigue at this point (stresses in %s): %s, %s %s from the mesh boundary"
                + " (tolerance %s)%n", u.stressUnit(), r.onSurface() ? "on the surface" : "inside",
                Text.num(r.surfaceDistance()), u.length(), Text.num(tolerance)));
        for (String n : r.notes()) {
            sb.append("  ").append(n).append(nl);
        }
        for (CheckResult c : r.results()) {
            FatigueDetail d = c.fatigue();
            sb.append(String.format(Locale.ROOT, "  %-10s %-20s n = %-8s utilisation %s  σa' = %s, σm' = %s, σmax' = %s,"
                    + " Se = %s, Kf = %s, Kfs = %s%n", c.caseId(), c.criterion(),
                    Double.isFinite(d.factorOfSafety()) ? Text.num(d.factorOfSafety()) : "inf",
                    Text.num(c.utilisation()), Text.num(d.sigmaA()), Text.num(d.sigmaM()), Text.num(d.sigmaMax()),
                    Text.num(d.se()), Text.num(d.notch().kf()), Text.num(d.notch().kfs())));
        }
        if (!r.results().isEmpty()) {
            sb.append("  notches: ").append(r.results().get(0).fatigue().notchText()).append(nl);
        }
        sb.append("  ").append(FatigueViews.CAUTION).append(nl);
        return sb.toString();
    }
}
