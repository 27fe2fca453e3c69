package org.tensio.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.tensio.engine.checks.CheckReport;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.units.UnitSystem;

import com.google.gson.JsonArray;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;

/**
 * Views of a {@link CheckReport}: JSON (stable keys {@code passed, maxUtilisation, results[]{station, case,
 * criterion, utilisation, demand, capacity, point{x, y}}}, plus {@code material, sigmaZ, tauZX, tauZY, singular}
 * per result, a {@code fatigue} object on fatigue results ({@link FatigueViews}), and {@code units, warnings,
 * caution}), CSV and a text table.
 */
final class CheckViews {

    /** The CSV header: stable. */
    static final String CSV_HEADER = "station,case,criterion,material,utilisation,demand,capacity,x,y";

    private CheckViews() {
    }

    static JsonObject json(CheckReport r, UnitSystem u) {
        JsonObject o = new JsonObject();
        o.addProperty("passed", r.passed());
        o.addProperty("maxUtilisation", r.maxUtilisation());
        JsonArray results = new JsonArray();
        for (CheckResult c : r.results()) {
            JsonObject j = new JsonObject();
            j.addProperty("station", c.station());
            j.addProperty("case", c.caseId());
            j.addProperty("criterion", c.criterion());
            j.addProperty("utilisation", c.utilisation());
            j.addProperty("demand", c.demand());
            j.addProperty("capacity", c.capacity());
            j.add("point", Json.point(c.point()));
            j.addProperty("material", c.material());
            j.addProperty("sigmaZ", c.sigmaZ());
            j.addProperty("tauZX", c.tauZX());
            j.addProperty("tauZY", c.tauZY());
            j.addProperty("singular", c.singular());
            j.addProperty("passed", c.passed());
            if (c.isFatigue()) {
                j.add("fatigue", FatigueViews.json(c.fatigue()));
            }
            results.add(j);
        }
        o.add("results", results);
        int g = r.governingIndex();
        if (g >= 0) {
            o.addProperty("governing", g);
        } else {
            o.add("governing", JsonNull.INSTANCE);
        }
        o.addProperty("failed", r.failedCount());
        o.add("units", Json.units(u));
        JsonArray w = new JsonArray();
        r.warnings().forEach(w::add);
        o.add("warnings", w);
        o.addProperty("caution", Caution.TEXT);
        return o;
    }

    /** RFC 4180 CSV: header, one row per result, then '#' comment lines (warnings, the caution last). */
    static String csv(CheckReport r) {
        StringBuilder sb = new StringBuilder();
        sb.append(CSV_HEADER).append("\r\n");
        for (CheckResult c : r.results()) {
            sb.append(field(c.station())).append(',').append(field(c.caseId())).append(',').append(field(c.criterion()))
                    .append(',').append(field(c.material())).append(',').append(number(c.utilisation())).append(',')
                    .append(number(c.demand())).append(',').append(number(c.capacity())).append(',')
                    .append(number(c.point().x())).append(',').append(number(c.point().y())).append("\r\n");
        }
        for (String w : r.warnings()) {
            sb.append("# warning: ").append(w.replace('\r', ' ').replace('\n', ' ')).append("\r\n");
        }
        sb.append("# ").append(Caution.TEXT).append("\r\n");
        return sb.toString();
    }

    /** Quotes a field holding a comma, a quote, a line break or a leading '#' (which would read as a comment). */
    static String field(String s) {
        if (s.isEmpty() || s.indexOf(',') >= 0 || s.indexOf('"') >= 0 || s.indexOf('\n') >= 0 || s.indexOf('\r') >= 0
                || s.startsWith("#") || !s.strip().equals(s)) {
            return '"' + s.replace("\"", "\"\"") + '"';
        }
        return s;
    }

    /** Shortest decimal that reads back to the same double (Java's Double.toString), never localised. */
    static String number(double v) {
        return Double.toString(v);
    }

    /** A table in project order; the governing row is marked with '>' and "governing". */
    static String text(CheckReport r, UnitSystem u) {
        String nl = System.lineSeparator();
        StringBuilder sb = new StringBuilder();
        String st = u.stressUnit();
        sb.append(r.results().stream().anyMatch(CheckResult::isFatigue) ? "Static and fatigue checks (stresses in "
                : "Static checks (stresses in ").append(st).append(", points in ").append(u.length()).append(')').append(nl);
        if (r.results().isEmpty()) {
            sb.append("  no checks were performed (see the warnings)").append(nl);
        } else {
            String[] head = {"", "station", "case", "criterion", "material", "utilisation", "demand", "capacity", "x", "y",
                "result"};
            List<String[]> rows = new ArrayList<>();
            int g = r.governingIndex();
            for (int i = 0; i < r.results().size(); i++) {
                CheckResult c = r.results().get(i);
                String result = (c.passed() ? "ok" : "FAIL") + (i == g ? "  governing" : "")
                        + (c.singular() ? "  (singular corner)" : "");
                rows.add(new String[] {i == g ? ">" : "", c.station(), c.caseId(), c.criterion(), c.material(),
                    Text.num(c.utilisation()), Text.num(c.demand()), Text.num(c.capacity()), coord(c.point().x(),
                    c.point().y()), coord(c.point().y(), c.point().x()), result});
            }
            int[] w = new int[head.length];
            for (int k = 0; k < head.length; k++) {
                w[k] = head[k].length();
                for (String[] row : rows) {
                    w[k] = Math.max(w[k], row[k].length());
                }
            }
            appendRow(sb, head, w, nl);
            for (String[] row : rows) {
                appendRow(sb, row, w, nl);
            }
            CheckResult gov = r.results().get(g);
            sb.append(nl);
            if (r.passed()) {
                sb.append(String.format(Locale.ROOT, "PASS: all %d checks have utilisation <= 1; max %s", r.results().size(),
                        Text.num(r.maxUtilisation())));
            } else {
                sb.append(String.format(Locale.ROOT, "FAIL: %d of %d checks have utilisation > 1; max %s", r.failedCount(),
                        r.results().size(), Text.num(r.maxUtilisation())));
            }
            sb.append(String.format(Locale.ROOT, " (station '%s', case '%s', %s, material '%s', at (%s, %s))", gov.station(),
                    gov.caseId(), gov.criterion(), gov.material(), coord(gov.point().x(), gov.point().y()),
                    coord(gov.point().y(), gov.point().x())))
                    .append(nl);
        }
        sb.append(FatigueViews.text(r, u));
        for (String w : r.warnings()) {
            sb.append("warning: ").append(w).append(nl);
        }
        sb.append(Caution.TEXT).append(nl);
        return sb.toString();
    }

    /**
     * A coordinate for reading: round-off below 1e-12 of the point's distance from the origin (a mesh node on a
     * circle at 90°, x = 1.8e-15) shows as 0. Machine formats keep the exact value.
     */
    static String coord(double v, double other) {
        return Text.num(Math.abs(v) < 1e-12 * Math.abs(other) ? 0 : v);
    }

    private static void appendRow(StringBuilder sb, String[] row, int[] w, String nl) {
        StringBuilder line = new StringBuilder();
        for (int k = 0; k < row.length; k++) {
            boolean numeric = k >= 5 && k <= 9;
            String cell = numeric ? String.format("%" + w[k] + "s", row[k]) : String.format("%-" + w[k] + "s", row[k]);
            line.append(k == 0 ? "" : "  ").append(cell);
        }
        sb.append(line.toString().stripTrailing()).append(nl);
    }
}
