package org.tensio.cli;

import java.util.LinkedHashSet;
import java.util.Locale;
import java.util.Set;

import org.tensio.engine.checks.CheckReport;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.fatigue.Factor;
import org.tensio.engine.fatigue.FatigueDetail;
import org.tensio.engine.fatigue.NotchFactors;
import org.tensio.engine.units.UnitSystem;

import com.google.gson.JsonNull;
import com.google.gson.JsonObject;

/**
 * Views of the fatigue side of check results: the {@code fatigue} object of a JSON result (an extra key; the
 * stable keys of the result are untouched) and the fatigue block of the text view.
 */
final class FatigueViews {

    /** The fatigue caution, in every view that shows fatigue results. */
    static final String CAUTION = "Fatigue results are sensitive to the surface, notch and load-spectrum assumptions;"
            + " they support, not replace, the governing design rules.";

    private FatigueViews() {
    }

    /** @return the {@code fatigue} object of one result */
    static JsonObject json(FatigueDetail d) {
        JsonObject o = new JsonObject();
        o.addProperty("history", d.history());
        o.addProperty("historyDescription", d.historyText());
        o.addProperty("criterion", d.criterion().name());
        o.addProperty("n", finite(d.factorOfSafety()));
        num(o, "sigmaA", d.sigmaA());
        num(o, "sigmaM", d.sigmaM());
        num(o, "sigmaMax", d.sigmaMax());
        JsonObject f = new JsonObject();
        JsonObject src = new JsonObject();
        f.addProperty(d.endurance().basis().symbol().equals("Se'") ? "SePrime" : "SfPrime", d.endurance().basis().value());
        src.addProperty(d.endurance().basis().symbol().equals("Se'") ? "SePrime" : "SfPrime",
                d.endurance().basis().source());
        for (Factor k : d.endurance().factors()) {
            f.addProperty(k.symbol(), k.value());
            src.addProperty(k.symbol(), k.source());
        }
        f.addProperty("Se", d.se());
        f.addProperty("Sut", d.sut());
        num(f, "Sy", d.sy());
        NotchFactors nf = d.notch();
        f.addProperty("Kt", nf.kt());
        f.addProperty("Kts", nf.kts());
        f.addProperty("KtAxial", nf.ktAxial());
        num(f, "q", nf.q());
        num(f, "qs", nf.qs());
        f.addProperty("Kf", nf.kf());
        f.addProperty("Kfs", nf.kfs());
        f.addProperty("KfAxial", nf.kfAxial());
        src.addProperty("Kt", nf.ktSource());
        src.addProperty("q", nf.qSource());
        o.add("factors", f);
        o.add("sources", src);
        o.addProperty("notch", d.notchText());
        num(o, "minimumDiameter", d.minimumDiameter());
        o.addProperty("minimumDiameterNote", d.minimumText());
        o.addProperty("caution", CAUTION);
        return o;
    }

    private static void num(JsonObject o, String key, double v) {
        if (Double.isFinite(v)) {
            o.addProperty(key, v);
        } else {
            o.add(key, JsonNull.INSTANCE);
        }
    }

    private static Double finite(double v) {
        return Double.isFinite(v) ? v : null;
    }

    /** @return the fatigue block of the text view, or "" when there are no fatigue results */
    static String text(CheckReport r, UnitSystem u) {
        String nl = System.lineSeparator(), st = u.stressUnit();
        StringBuilder sb = new StringBuilder();
        Set<String> shown = new LinkedHashSet<>();
        for (CheckResult c : r.results()) {
            if (!c.isFatigue()) {
                continue;
            }
            FatigueDetail d = c.fatigue();
            String key = c.station() + "\u0000" + c.caseId() + "\u0000" + c.material();
            if (shown.add(key)) {
                if (shown.size() == 1) {
                    sb.append(nl).append("Fatigue (stresses in ").append(st).append(')').append(nl);
                }
                sb.append(String.format(Locale.ROOT, "  station '%s', history '%s', material '%s': %s%n", c.station(),
                        c.caseId(), c.material(), d.historyText()));
                StringBuilder k = new StringBuilder();
                k.append(d.endurance().basis().symbol()).append(" = ").append(Text.num(d.endurance().basis().value()));
                for (Factor f : d.endurance().factors()) {
                    k.append(", ").append(f.symbol()).append(" = ").append(Text.num(f.value()));
                }
                k.append(", Se = ").append(Text.num(d.se())).append(", Sut = ").append(Text.num(d.sut()));
                if (Double.isFinite(d.sy())) {
                    k.append(", Sy = ").append(Text.num(d.sy()));
                }
                sb.append("    ").append(k).append(nl);
            }
            sb.append(String.format(Locale.ROOT, "    %-20s n = %-8s at (%s, %s): Kf = %s, Kfs = %s, σa' = %s, σm' = %s%s%n",
                    d.criterion().name(), Double.isFinite(d.factorOfSafety()) ? Text.num(d.factorOfSafety()) : "inf",
                    CheckViews.coord(c.point().x(), c.point().y()), CheckViews.coord(c.point().y(), c.point().x()),
                    Text.num(d.notch().kf()), Text.num(d.notch().kfs()), Text.num(d.sigmaA()), Text.num(d.sigmaM()),
                    d.criterion().name().equals("firstCycleYield") ? ", σmax' = " + Text.num(d.sigmaMax()) : ""));
            if (!d.minimumText().isEmpty()) {
                sb.append("      ").append(d.minimumText()).append(nl);
            }
        }
        if (!shown.isEmpty()) {
            sb.append("  ").append(CAUTION).append(nl);
        }
        return sb.toString();
    }
}
