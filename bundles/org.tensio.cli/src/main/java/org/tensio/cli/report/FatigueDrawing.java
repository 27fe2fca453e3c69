package org.tensio.cli.report;

import java.util.ArrayList;
import java.util.List;

import org.tensio.engine.fatigue.FatigueCriterion;
import org.tensio.engine.fatigue.FatigueDetail;

/**
 * The fatigue diagram of a governing point: the von Mises mean stress σm' along x, the alternating σa' along y;
 * the station's chosen criteria as lines (Goodman and Soderberg straight, Gerber a parabola, ASME elliptic a
 * quarter ellipse, the Langer yield line dashed); the load line from the origin through the point to the governing
 * criterion's line, which it meets at n times the point; the point itself. Drawn once as a {@link Scene} for the
 * HTML (SVG) and the PDF.
 */
final class FatigueDrawing {

    private static final String INK = SectionDrawing.INK;
    private static final String MUTED = SectionDrawing.MUTED;
    private static final String POINT = "#9a2f22";
    private static final String LOAD = "#7a5a12";

    private FatigueDrawing() {
    }

    /** Line colour of each criterion (its own palette, chosen for contrast on white). */
    static String colour(FatigueCriterion c) {
        return switch (c) {
            case fatigueGoodman -> "#1f6e78";
            case fatigueGerber -> "#6a3d9a";
            case fatigueAsmeElliptic -> "#2f7d32";
            case fatigueSoderberg -> "#b35806";
            case firstCycleYield, langer -> "#5b6670";
        };
    }

    /**
     * @param d      the governing result's detail (its criterion draws the load line)
     * @param others the other criteria's governing points, {σm', σa'} each (drawn as small rings; may be empty)
     * @param unit   stress unit
     */
    static Scene of(FatigueDetail d, List<double[]> others, String unit) {
        double se = d.se(), sut = d.sut(), sy = d.sy();
        boolean yieldLine = d.stationCriteria().contains(FatigueCriterion.langer)
                || d.stationCriteria().contains(FatigueCriterion.firstCycleYield);
        double xMax = 1.08 * Math.max(sut, Math.max(d.sigmaM(), 1e-300));
        double yMax = 1.12 * Math.max(Math.max(se, yieldLine && Double.isFinite(sy) ? sy : 0), d.sigmaA());
        for (double[] o : others) {
            xMax = Math.max(xMax, 1.05 * o[0]);
            yMax = Math.max(yMax, 1.05 * o[1]);
        }
        Scene sc = new Scene(620, 390, "Fatigue diagram: σa' = " + Fmt.sig(d.sigmaA(), 4) + ", σm' = "
                + Fmt.sig(d.sigmaM(), 4) + " " + unit + ", n = " + Fmt.sig(d.factorOfSafety(), 4) + " ("
                + d.criterion().label() + ")");
        double left = 70, right = 430, top = 62, bottom = 330;
        double kx = (right - left) / xMax, ky = (bottom - top) / yMax;
        sc.bold(12, 20, "Fatigue diagram at G, history " + d.history(), 13, Scene.Anchor.START, INK);
        // frame and ticks
        sc.line(INK, 1.1, null, left, top - 8, left, bottom, right + 8, bottom);
        for (int i = 0; i <= 4; i++) {
            double vx = xMax * i / 4, vy = yMax * i / 4;
            double px = left + kx * vx, py = bottom - ky * vy;
            sc.line(MUTED, 0.6, null, px, bottom, px, bottom + 4);
            sc.text(px, bottom + 16, Fmt.sig(vx, 3), 9.5, Scene.Anchor.MIDDLE, MUTED);
            sc.line(MUTED, 0.6, null, left - 4, py, left, py);
            sc.text(left - 7, py + 3, Fmt.sig(vy, 3), 9.5, Scene.Anchor.END, MUTED);
            if (i > 0) {
                sc.line("#e3e6e9", 0.5, null, px, bottom, px, top);
                sc.line("#e3e6e9", 0.5, null, left, py, right, py);
            }
        }
        sc.text((left + right) / 2, bottom + 34, "σm' (von Mises mean, " + unit + ")", 10.5, Scene.Anchor.MIDDLE, INK);
        sc.text(14, top - 18, "σa' (von Mises alternating, " + unit + ")", 10.5, Scene.Anchor.START, INK);
        // criteria
        List<String[]> legend = new ArrayList<>();
        for (FatigueCriterion c : d.stationCriteria()) {
            double[] xy = curve(c, se, sut, sy);
            if (xy == null) {
                continue;
            }
            double[] px = new double[xy.length];
            for (int i = 0; i + 1 < xy.length; i += 2) {
                px[i] = left + kx * Math.min(xy[i], xMax);
                px[i + 1] = bottom - ky * Math.min(xy[i + 1], yMax);
            }
            sc.line(colour(c), c == d.criterion() ? 2.2 : 1.4, c == FatigueCriterion.langer ? new double[] {5, 4} : null, px);
            legend.add(new String[] {c.label(), colour(c), c == FatigueCriterion.langer ? "dash" : ""});
        }
        if (d.stationCriteria().contains(FatigueCriterion.firstCycleYield)
                && !d.stationCriteria().contains(FatigueCriterion.langer) && Double.isFinite(sy)) {
            double[] xy = curve(FatigueCriterion.langer, se, sut, sy);
            sc.line(colour(FatigueCriterion.langer), 1.2, new double[] {5, 4}, left + kx * xy[0], bottom - ky * xy[1],
                    left + kx * xy[2], bottom - ky * xy[3]);
            legend.add(new String[] {"yield, Sy (Langer)", colour(FatigueCriterion.langer), "dash"});
        }
        // load line to the governing criterion's line (at n times the point), and the point
        double n = d.factorOfSafety();
        double gx = left + kx * d.sigmaM(), gy = bottom - ky * d.sigmaA();
        if (Double.isFinite(n) && d.criterion().isFatigueLine()) {
            double s = 1; // shorten the line to the frame when n times the point lies outside it
            if (n * d.sigmaM() > xMax) {
                s = xMax / (n * d.sigmaM());
            }
            if (n * d.sigmaA() * s > yMax) {
                s = yMax / (n * d.sigmaA());
            }
            double ex = left + kx * n * d.sigmaM() * s, ey = bottom - ky * n * d.sigmaA() * s;
            sc.line(LOAD, 1.3, new double[] {3, 3}, left, bottom, ex, ey);
            if (s == 1) {
                sc.circle(ex, ey, 3.2, "#ffffff", LOAD, 1.3);
                sc.text(ex + 6, ey - 6, "n × G", 10, Scene.Anchor.START, LOAD);
            }
            legend.add(new String[] {"load line (n = " + Fmt.sig(n, 3) + ")", LOAD, "dash"});
        }
        for (double[] o : others) {
            sc.circle(left + kx * o[0], bottom - ky * o[1], 3, "#ffffff", POINT, 1.1);
        }
        sc.circle(gx, gy, 4.5, POINT, null, 0);
        sc.bold(gx + 7, gy + 14, "G", 11, Scene.Anchor.START, POINT);
        // legend and values
        double ly = top + 6;
        for (String[] l : legend) {
            sc.line(l[1], 2, l[2].isEmpty() ? null : new double[] {5, 4}, 448, ly - 4, 476, ly - 4);
            sc.text(482, ly, l[0], 10.5, Scene.Anchor.START, INK);
            ly += 17;
        }
        ly += 8;
        sc.text(448, ly, "Se = " + Fmt.sig(se, 4) + " " + unit, 10.5, Scene.Anchor.START, INK);
        sc.text(448, ly + 15, "Sut = " + Fmt.sig(sut, 4), 10.5, Scene.Anchor.START, INK);
        if (Double.isFinite(sy)) {
            sc.text(448, ly + 30, "Sy = " + Fmt.sig(sy, 4), 10.5, Scene.Anchor.START, INK);
        }
        sc.bold(448, ly + 50, "G: σm' = " + Fmt.sig(d.sigmaM(), 4), 10.5, Scene.Anchor.START, POINT);
        sc.bold(448, ly + 65, "    σa' = " + Fmt.sig(d.sigmaA(), 4), 10.5, Scene.Anchor.START, POINT);
        if (!others.isEmpty()) {
            sc.text(448, ly + 82, "rings: other criteria's points", 9.5, Scene.Anchor.START, MUTED);
        }
        return sc;
    }

    /** @return the criterion's line as x0, y0, x1, y1, ... in stress units, or null (first-cycle yield: no line) */
    static double[] curve(FatigueCriterion c, double se, double sut, double sy) {
        int n = 48;
        return switch (c) {
            case fatigueGoodman -> new double[] {0, se, sut, 0};
            case fatigueSoderberg -> Double.isFinite(sy) ? new double[] {0, se, sy, 0} : null;
            case langer -> Double.isFinite(sy) ? new double[] {0, sy, sy, 0} : null;
            case firstCycleYield -> null;
            case fatigueGerber -> {
                double[] xy = new double[2 * (n + 1)];
                for (int i = 0; i <= n; i++) {
                    double x = sut * i / n;
                    xy[2 * i] = x;
                    xy[2 * i + 1] = se * (1 - (x / sut) * (x / sut));
                }
                yield xy;
            }
            case fatigueAsmeElliptic -> {
                if (!Double.isFinite(sy)) {
                    yield null;
                }
                double[] xy = new double[2 * (n + 1)];
                for (int i = 0; i <= n; i++) {
                    double t = Math.PI / 2 * i / n;
                    xy[2 * i] = sy * Math.sin(t);
                    xy[2 * i + 1] = se * Math.cos(t);
                }
                yield xy;
            }
        };
    }
}
