package org.tensio.engine.verification;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import com.google.gson.stream.JsonWriter;

/**
 * The views of a {@link VerificationRecord}. Every view carries the engine version, the date (UTC, ISO 8601),
 * the Java runtime, the operating system, the caution and, for every case, the quantity, the computed value,
 * the reference, its source, the absolute and relative error, the tolerance and pass/fail.
 * <ul>
 * <li>{@link #json}: one object; its keys are stable (other tools read them; keys are added, never renamed):
 * {@code record, engineVersion, date, javaVersion, os, processors, units, caution, passed, caseCount,
 * passedCount, failedCount, cases[]} with {@code cases[]} = {@code id, family, section, sectionDefinition,
 * quantity, description, unit, value, reference, referenceFormula, source, absoluteError, relativeError,
 * tolerance, toleranceRule, toleranceAbsolute, toleranceJustification, passed, computedBy, fixture, line,
 * note}. {@code tolerance} is the allowed deviation relative to the reference (for an absolute rule:
 * {@code toleranceAbsolute}/|reference|), comparable with {@code relativeError}; numbers that do not exist
 * (relative values for a zero reference, the value of a failed computation) are {@code null}. Every digit of
 * every double is kept.</li>
 * <li>{@link #csv}: RFC 4180 (CRLF line ends), one header row ({@link #CSV_COLUMNS}) and one row per case;
 * every row also carries the record's engine version, date, Java, OS and caution, so that a row copied
 * elsewhere keeps its provenance. Missing numbers are empty fields.</li>
 * <li>{@link #text}: a readable listing per family, each case followed by its source and the reason for its
 * tolerance; values to 10 significant digits, errors to 3.</li>
 * <li>{@link #html}: a self-contained page (no scripts, no external resources) with the same content as the
 * text view, the caution at top and bottom.</li>
 * </ul>
 *
 * @since 0.1
 */
public enum RecordFormat {
    /** Readable listing. */
    text,
    /** Machine-readable JSON with stable keys. */
    json,
    /** RFC 4180 comma-separated values. */
    csv,
    /** Self-contained HTML page. */
    html;

    /** CSV columns, in order. */
    public static final List<String> CSV_COLUMNS = List.of("id", "family", "section", "quantity", "description",
            "unit", "value", "reference", "referenceFormula", "source", "absoluteError", "relativeError", "tolerance",
            "toleranceRule", "toleranceAbsolute", "toleranceJustification", "passed", "computedBy", "note",
            "engineVersion", "date", "javaVersion", "os", "caution");

    /** @return the record in this format */
    public String render(VerificationRecord r) {
        StringWriter w = new StringWriter();
        write(r, w);
        return w.toString();
    }

    /**
     * Writes the record in this format to {@code out} (flushed, not closed).
     *
     * @throws UncheckedIOException when {@code out} fails
     */
    public void write(VerificationRecord r, Writer out) {
        try {
            switch (this) {
                case json -> json(r, out);
                case csv -> csv(r, out);
                case text -> text(r, out);
                case html -> html(r, out);
            }
            out.flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String date(VerificationRecord r) {
        return r.date().toString();
    }

    // ---- JSON -------------------------------------------------------------------------------------------

    private static void json(VerificationRecord r, Writer out) throws IOException {
        JsonWriter w = new JsonWriter(out);
        w.setIndent("  ");
        w.setSerializeNulls(true);
        w.beginObject();
        w.name("record").value("Tensio engine verification record");
        w.name("engineVersion").value(r.engineVersion());
        w.name("date").value(date(r));
        w.name("javaVersion").value(r.javaVersion());
        w.name("os").value(r.os());
        w.name("processors").value(r.processors());
        w.name("units").value(r.units());
        w.name("caution").value(r.caution());
        w.name("passed").value(r.passed());
        w.name("caseCount").value(r.cases().size());
        w.name("passedCount").value(r.passedCount());
        w.name("failedCount").value(r.failedCount());
        w.name("cases").beginArray();
        for (CaseResult c : r.cases()) {
            VerificationCase d = c.definition();
            w.beginObject();
            w.name("id").value(d.id());
            w.name("family").value(d.family());
            w.name("section").value(d.section());
            w.name("sectionDefinition").value(d.sectionDefinition());
            w.name("quantity").value(d.quantity());
            w.name("description").value(d.description());
            w.name("unit").value(d.unit());
            number(w.name("value"), c.value());
            number(w.name("reference"), d.reference());
            w.name("referenceFormula").value(d.referenceFormula());
            w.name("source").value(d.source());
            number(w.name("absoluteError"), c.absoluteError());
            number(w.name("relativeError"), c.relativeError());
            number(w.name("tolerance"), d.tolerance().relative(d.reference()));
            w.name("toleranceRule").value(d.tolerance().rule());
            number(w.name("toleranceAbsolute"), d.tolerance().absolute(d.reference()));
            w.name("toleranceJustification").value(d.toleranceJustification());
            w.name("passed").value(c.passed());
            w.name("computedBy").value(c.computedBy());
            w.name("fixture").value(d.fixture());
            w.name("line").value(d.line());
            w.name("note").value(c.note());
            w.endObject();
        }
        w.endArray();
        w.endObject();
        w.flush();
        out.write('\n');
    }

    private static void number(JsonWriter w, double v) throws IOException {
        if (Double.isFinite(v)) {
            w.value(v);
        } else {
            w.nullValue();
        }
    }

    // ---- CSV --------------------------------------------------------------------------------------------

    private static void csv(VerificationRecord r, Writer out) throws IOException {
        row(out, CSV_COLUMNS);
        for (CaseResult c : r.cases()) {
            VerificationCase d = c.definition();
            row(out, List.of(d.id(), d.family(), d.section(), d.quantity(), d.description(), d.unit(), num(c.value()),
                    num(d.reference()), d.referenceFormula(), d.source(), num(c.absoluteError()), num(c.relativeError()),
                    num(d.tolerance().relative(d.reference())), d.tolerance().rule(),
                    num(d.tolerance().absolute(d.reference())), d.toleranceJustification(),
                    c.passed() ? "pass" : "FAIL", c.computedBy(), c.note() == null ? "" : c.note(), r.engineVersion(),
                    date(r), r.javaVersion(), r.os(), r.caution()));
        }
    }

    private static String num(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }

    private static void row(Writer out, List<String> fields) throws IOException {
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) {
                out.write(',');
            }
            String f = fields.get(i);
            if (f.indexOf(',') >= 0 || f.indexOf('"') >= 0 || f.indexOf('\n') >= 0 || f.indexOf('\r') >= 0) {
                out.write('"');
                out.write(f.replace("\"", "\"\""));
                out.write('"');
            } else {
                out.write(f);
            }
        }
        out.write("\r\n");
    }

    // ---- text -------------------------------------------------------------------------------------------

    private static Map<String, List<CaseResult>> byFamily(VerificationRecord r) {
        Map<String, List<CaseResult>> m = new LinkedHashMap<>();
        for (CaseResult c : r.cases()) {
            m.computeIfAbsent(c.definition().family(), k -> new ArrayList<>()).add(c);
        }
        return m;
    }

    private static void text(VerificationRecord r, Writer out) throws IOException {
        StringBuilder b = new StringBuilder();
        b.append("Tensio engine verification record\n");
        b.append("  engine version  ").append(r.engineVersion()).append('\n');
        b.append("  date (UTC)      ").append(date(r)).append('\n');
        b.append("  Java            ").append(r.javaVersion()).append('\n');
        b.append("  OS              ").append(r.os()).append(", ").append(r.processors()).append(" processors\n");
        b.append("  units           ").append(r.units()).append('\n');
        b.append("  result          ").append(verdict(r)).append("\n\n");
        for (Map.Entry<String, List<CaseResult>> e : byFamily(r).entrySet()) {
            long failed = e.getValue().stream().filter(c -> !c.passed()).count();
            b.append(e.getKey()).append(" (").append(e.getValue().size()).append(" cases, ")
                    .append(failed == 0 ? "all passed" : failed + " FAILED").append(")\n");
            for (CaseResult c : e.getValue()) {
                VerificationCase d = c.definition();
                b.append(c.passed() ? "  pass  " : "  FAIL  ").append(d.id()).append(": ").append(d.quantity())
                        .append(" [").append(d.unit()).append("]\n");
                b.append("        ").append(d.description()).append("; section ").append(d.section()).append('\n');
                b.append("        value ").append(Numbers.shortest(c.value(), 10)).append("   reference ")
                        .append(Numbers.shortest(d.reference(), 10)).append(" = ").append(d.referenceFormula())
                        .append('\n');
                b.append("        abs. error ").append(Numbers.shortest(c.absoluteError(), 3)).append("   rel. error ")
                        .append(Numbers.shortest(c.relativeError(), 3)).append("   tolerance ")
                        .append(d.tolerance().rule()).append(" (± ")
                        .append(Numbers.shortest(d.tolerance().absolute(d.reference()), 3)).append(")\n");
                b.append("        source: ").append(d.source()).append('\n');
                b.append("        tolerance: ").append(d.toleranceJustification()).append('\n');
                if (c.note() != null) {
                    b.append("        error: ").append(c.note()).append('\n');
                }
            }
            b.append('\n');
        }
        b.append(verdict(r)).append('\n');
        b.append("Caution: ").append(r.caution()).append('\n');
        out.write(b.toString());
    }

    private static String verdict(VerificationRecord r) {
        return r.passed() ? "all " + r.cases().size() + " cases passed"
                : r.failedCount() + " of " + r.cases().size() + " cases FAILED";
    }

    // ---- HTML -------------------------------------------------------------------------------------------

    private static String esc(String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '&' -> b.append("&amp;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> b.append(c);
            }
        }
        return b.toString();
    }

    private static void html(VerificationRecord r, Writer out) throws IOException {
        StringBuilder b = new StringBuilder();
        b.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        b.append("<title>Tensio engine verification record ").append(esc(date(r))).append("</title>\n");
        b.append("<style>\nbody{font-family:sans-serif;margin:2em;color:#222}\n")
                .append("table{border-collapse:collapse;width:100%;font-size:0.85em;margin-bottom:1.5em}\n")
                .append("th,td{border:1px solid #bbb;padding:0.25em 0.4em;vertical-align:top;text-align:left}\n")
                .append("td.n{text-align:right;font-family:monospace;white-space:nowrap}\n")
                .append("tr.fail td{background:#f7dcdc}\n")
                .append(".caution{border:2px solid #444;padding:0.6em;font-weight:bold}\n")
                .append("</style>\n</head>\n<body>\n");
        b.append("<p class=\"caution\">Caution: ").append(esc(r.caution())).append("</p>\n");
        b.append("<h1>Tensio engine verification record</h1>\n<table class=\"meta\">\n");
        meta(b, "Engine version", r.engineVersion());
        meta(b, "Date (UTC, ISO 8601)", date(r));
        meta(b, "Java", r.javaVersion());
        meta(b, "Operating system", r.os() + ", " + r.processors() + " processors");
        meta(b, "Units", r.units());
        meta(b, "Result", verdict(r));
        b.append("</table>\n");
        for (Map.Entry<String, List<CaseResult>> e : byFamily(r).entrySet()) {
            b.append("<h2>").append(esc(e.getKey())).append("</h2>\n<table>\n<tr><th>result</th><th>id</th>")
                    .append("<th>quantity</th><th>unit</th><th>value</th><th>reference</th><th>abs. error</th>")
                    .append("<th>rel. error</th><th>tolerance</th><th>why this tolerance</th><th>source</th></tr>\n");
            for (CaseResult c : e.getValue()) {
                VerificationCase d = c.definition();
                b.append(c.passed() ? "<tr>" : "<tr class=\"fail\">");
                b.append("<td>").append(c.passed() ? "pass" : "FAIL").append("</td>");
                b.append("<td>").append(esc(d.id())).append("</td>");
                b.append("<td><code>").append(esc(d.quantity())).append("</code><br>").append(esc(d.description()))
                        .append("; section ").append(esc(d.section()));
                if (c.note() != null) {
                    b.append("<br>error: ").append(esc(c.note()));
                }
                b.append("</td>");
                b.append("<td>").append(esc(d.unit())).append("</td>");
                b.append("<td class=\"n\">").append(esc(Numbers.shortest(c.value(), 10))).append("</td>");
                b.append("<td class=\"n\">").append(esc(Numbers.shortest(d.reference(), 10))).append("<br><code>")
                        .append(esc(d.referenceFormula())).append("</code></td>");
                b.append("<td class=\"n\">").append(esc(Numbers.shortest(c.absoluteError(), 3))).append("</td>");
                b.append("<td class=\"n\">").append(esc(Numbers.shortest(c.relativeError(), 3))).append("</td>");
                b.append("<td class=\"n\">").append(esc(d.tolerance().rule())).append("</td>");
                b.append("<td>").append(esc(d.toleranceJustification())).append("</td>");
                b.append("<td>").append(esc(d.source())).append("</td></tr>\n");
            }
            b.append("</table>\n");
        }
        b.append("<p class=\"caution\">Caution: ").append(esc(r.caution())).append("</p>\n</body>\n</html>\n");
        out.write(b.toString());
    }

    private static void meta(StringBuilder b, String k, String v) {
        b.append("<tr><th>").append(esc(k)).append("</th><td>").append(esc(v)).append("</td></tr>\n");
    }
}
