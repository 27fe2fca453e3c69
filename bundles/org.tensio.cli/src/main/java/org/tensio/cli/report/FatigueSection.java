package org.tensio.cli.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

import org.tensio.engine.checks.CheckReport;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.fatigue.Factor;
import org.tensio.engine.fatigue.FatigueDetail;
import org.tensio.engine.fatigue.NotchFactors;

/**
 * The report's fatigue section: the caution on fatigue results, then per station, load history and material the
 * fatigue diagram of the governing point ({@link FatigueDrawing}), the table of the endurance-limit and notch
 * factors with their values and sources, and the table of the criteria with σa', σm', n and utilisation.
 */
final class FatigueSection {

    /** The fatigue caution the section carries. */
    static final String CAUTION = "Fatigue results are sensitive to the surface, notch and load-spectrum assumptions"
            + " (finish, notch radius and sensitivity, the number and size of the cycles); they support, not replace,"
            + " the governing design rules, which take precedence.";

    private FatigueSection() {
    }

    /**
     * @param at the point of a result as the report writes it
     */
    static void add(Doc doc, CheckReport r, String stress, String len, Function<CheckResult, String> at) {
        Map<String, List<CheckResult>> groups = new LinkedHashMap<>();
        for (CheckResult c : r.results()) {
            if (c.isFatigue()) {
                groups.computeIfAbsent(c.station() + "\u0000" + c.caseId() + "\u0000" + c.material(),
                        k -> new ArrayList<>()).add(c);
            }
        }
        if (groups.isEmpty()) {
            return;
        }
        doc.add(new Doc.Heading(2, "Fatigue", "fatigue"));
        doc.add(new Doc.Caution(CAUTION, "caution-fatigue"));
        doc.add(new Doc.Para("Distortion-energy method: at every sample point the Kf-amplified alternating and mean"
                + " stresses of the load cycle are combined into von Mises values σa' and σm' (for the fatigue lines the"
                + " axial alternating stress divided by 0.85; the yield checks take the actual stresses); the criteria give the factor of safety n and the utilisation 1/n. A"
                + " rotating shaft under loads fixed in space has its bending fully reversed at every fibre. Notch"
                + " factors act only where each notch is located. Equation and table numbers are those of Shigley's"
                + " Mechanical Engineering Design, 9th/10th ed., recalled from memory.", true));
        int k = 0;
        for (List<CheckResult> g : groups.values()) {
            CheckResult gov = null;
            for (CheckResult c : g) {
                if (c.fatigue().criterion().isFatigueLine() && (gov == null || c.utilisation() > gov.utilisation())) {
                    gov = c;
                }
            }
            if (gov == null) {
                gov = g.get(0);
            }
            FatigueDetail d = gov.fatigue();
            String id = "fatigue-" + k++;
            doc.add(new Doc.Heading(3, "Station " + gov.station() + ", history " + gov.caseId() + ", material "
                    + gov.material(), id));
            doc.add(new Doc.Para("Load history: " + d.historyText() + ". Governing fatigue line: " + d.criterion().label()
                    + ", n = " + n(d.factorOfSafety()) + " (utilisation " + Fmt.fixed(gov.utilisation(), 3) + ") at "
                    + at.apply(gov) + " " + len + "; " + d.notchText() + ".", false));
            List<double[]> others = new ArrayList<>();
            for (CheckResult c : g) {
                FatigueDetail o = c.fatigue();
                if (c != gov && o.criterion().isFatigueLine() && (Math.abs(o.sigmaA() - d.sigmaA()) > 1e-9 * d.sigmaA()
                        || Math.abs(o.sigmaM() - d.sigmaM()) > 1e-9 * Math.max(d.sigmaM(), d.sigmaA()))) {
                    others.add(new double[] {o.sigmaM(), o.sigmaA()});
                }
            }
            doc.add(new Doc.Figures(List.of(new Doc.Figure(FatigueDrawing.of(d, others, stress), "fatigue-diagram",
                    "Fatigue diagram of the governing point G: the chosen criteria, the load line through G to the "
                            + d.criterion().label() + " line (reached at n × G), σm' along x, σa' along y, " + stress
                            + "."))));
            doc.add(factors(id, d, stress));
            Doc.TableBuilder t = new Doc.TableBuilder(id + "-criteria", "fatigue-criteria", gov.station(),
                    "Criteria (" + stress + ")", "Criterion", "Point (x, y) " + len, "Kf", "Kfs", "σa'", "σm'", "σmax'",
                    "Demand", "Capacity", "n", "Utilisation", "Minimum diameter (" + len + ")", "Result");
            for (CheckResult c : g) {
                FatigueDetail o = c.fatigue();
                t.row(c.criterion(), c.passed() ? "" : "fail", Doc.Cell.text(o.criterion().label()),
                        Doc.Cell.text(at.apply(c)), num(o.notch().kf(), 4), num(o.notch().kfs(), 4), num(o.sigmaA(), 5),
                        num(o.sigmaM(), 5), num(o.sigmaMax(), 5), num(c.demand(), 5), num(c.capacity(), 5),
                        Doc.Cell.num(n(o.factorOfSafety()), Double.isFinite(o.factorOfSafety()) ? o.factorOfSafety()
                                : null), Doc.Cell.num(Fmt.fixed(c.utilisation(), 3), c.utilisation()),
                        Doc.Cell.num(Double.isFinite(o.minimumDiameter()) ? Fmt.sig(o.minimumDiameter(), 5) : "—",
                                Double.isFinite(o.minimumDiameter()) ? o.minimumDiameter() : null),
                        Doc.Cell.text(c.passed() ? "pass" : "FAIL"));
            }
            doc.add(t.build());
            for (CheckResult c : g) {
                String m = c.fatigue().minimumText();
                if (!m.isEmpty()) {
                    doc.add(new Doc.Para(c.fatigue().criterion().label() + ": " + m + ".", true));
                }
            }
        }
    }

    private static Doc.Table factors(String id, FatigueDetail d, String stress) {
        Doc.TableBuilder t = new Doc.TableBuilder(id + "-factors", "fatigue-factors", null, "Endurance limit and notch"
                + " factors at G", "Symbol", "What", "Value", "Source");
        Factor b = d.endurance().basis();
        t.row(b.symbol(), "", Doc.Cell.text(b.symbol()), Doc.Cell.text(b.name() + " (" + stress + ")"), num(b.value(), 5),
                Doc.Cell.text(b.source()));
        for (Factor f : d.endurance().factors()) {
            t.row(f.symbol(), "", Doc.Cell.text(f.symbol()), Doc.Cell.text(f.name()), num(f.value(), 4),
                    Doc.Cell.text(f.source()));
        }
        t.row("Se", "", Doc.Cell.text("Se"), Doc.Cell.text("corrected endurance limit (" + stress + ")"), num(d.se(), 5),
                Doc.Cell.text("Se = ka kb kc kd ke kf " + b.symbol()));
        NotchFactors n = d.notch();
        t.row("Kt", "", Doc.Cell.text("Kt, Kts, Kt,axial"), Doc.Cell.text("theoretical stress concentration"),
                Doc.Cell.text(Fmt.sig(n.kt(), 4) + ", " + Fmt.sig(n.kts(), 4) + ", " + Fmt.sig(n.ktAxial(), 4)),
                Doc.Cell.text(n.ktSource()));
        t.row("q", "", Doc.Cell.text("q, qs"), Doc.Cell.text("notch sensitivity"),
                Doc.Cell.text((Double.isNaN(n.q()) ? "—" : Fmt.sig(n.q(), 4)) + ", "
                        + (Double.isNaN(n.qs()) ? "—" : Fmt.sig(n.qs(), 4))), Doc.Cell.text(n.qSource()));
        t.row("Kf", "", Doc.Cell.text("Kf, Kfs, Kf,axial"), Doc.Cell.text("fatigue stress concentration"),
                Doc.Cell.text(Fmt.sig(n.kf(), 4) + ", " + Fmt.sig(n.kfs(), 4) + ", " + Fmt.sig(n.kfAxial(), 4)),
                Doc.Cell.text("Kf = 1 + q (Kt − 1) unless given; " + d.notchText()));
        return t.build();
    }

    private static String n(double v) {
        return Double.isFinite(v) ? Fmt.sig(v, 4) : "∞";
    }

    private static Doc.Cell num(double v, int sig) {
        return Double.isFinite(v) ? Doc.Cell.num(Fmt.sig(v, sig), v) : Doc.Cell.num("—", null);
    }
}
