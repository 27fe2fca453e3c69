package org.tensio.cli.report;

import java.util.ArrayList;
import java.util.List;

import org.tensio.engine.geometry.Bounds;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.mesh.Mesh;
import org.tensio.engine.section.Section;

/**
 * The stress contour plot of a station: filled bands of the field ({@link Bands}) in Tensio's {@link Ramp}, the
 * section outline on top, the governing point ringed and marked G, and a stepped legend with a number at every
 * band boundary, a pointer at the field's largest nodal value and a bar at the capacity when it falls on the scale.
 */
final class ContourDrawing {

    private static final String INK = SectionDrawing.INK;

    private ContourDrawing() {
    }

    /**
     * @param quantity  what is plotted, e.g. "von Mises demand"
     * @param governing the governing point, or null
     * @param capacity  the criterion's capacity at the governing point, or null
     */
    static Scene of(Section s, NodalField field, String quantity, String stressUnit, String caseId, Point2 governing,
            Double capacity) {
        double boxW = 410, boxH = 330, top = 40, left = 20;
        Bounds b = s.bounds();
        View view = View.fit(b, left, top, boxW, boxH);
        double dh = b.height() * view.scale();
        double legendH = Math.max(dh, 240);
        Scene sc = new Scene(600, top + legendH + 86, quantity + " for case " + caseId);
        sc.bold(12, 20, quantity + " (" + stressUnit + "), case " + caseId, 13, Scene.Anchor.START, INK);

        double[] levels = Bands.levels(field.min, field.max, 10);
        int nb = levels.length - 1;
        List<List<double[]>> bands = new ArrayList<>();
        for (int i = 0; i < nb; i++) {
            bands.add(new ArrayList<>());
        }
        Mesh m = field.mesh;
        double[] x = new double[3], y = new double[3], f = new double[3];
        for (int e = 0; e < m.elementCount(); e++) {
            for (int[] t : Bands.SUB) {
                for (int i = 0; i < 3; i++) {
                    int node = m.node(e, t[i]);
                    x[i] = view.px(m.x(node));
                    y[i] = view.py(m.y(node));
                    f[i] = field.values[6 * e + t[i]];
                }
                Bands.clip(x, y, f, levels, bands);
            }
        }
        for (int i = 0; i < nb; i++) {
            String c = colour(i, nb);
            // a hairline stroke in the band's own colour closes the anti-aliasing seams between adjacent pieces
            sc.add(new Scene.Shape(bands.get(i), true, false, c, c, 0.35, null));
        }
        sc.add(new Scene.Shape(view.rings(s), true, true, null, INK, 1.1, null));
        if (governing != null) {
            double gx = view.px(governing.x()), gy = view.py(governing.y());
            sc.circle(gx, gy, 7, null, "#ffffff", 3.4);
            sc.circle(gx, gy, 7, null, INK, 1.4);
            sc.line("#ffffff", 3, null, gx + 5, gy - 5, gx + 15, gy - 15);
            sc.line(INK, 1.2, null, gx + 5, gy - 5, gx + 15, gy - 15);
            sc.bold(gx + 17, gy - 17, "G", 13, Scene.Anchor.START, INK);
        }
        legend(sc, levels, field.max, capacity, stressUnit, left + boxW + 44, top + 8, legendH - 16);
        double ty = top + legendH + 56;
        double tiny = 1e-9 * b.diagonal();
        sc.text(12, ty, "G: governing point " + (governing == null ? "—"
                : Fmt.point(SectionDrawing.snap(governing.x(), tiny), SectionDrawing.snap(governing.y(), tiny)))
                + "; the field is the check engine's own samples at the mesh nodes.", 10.5, Scene.Anchor.START,
                SectionDrawing.MUTED);
        sc.text(12, ty + 15, "Bands cut the nodal field exactly, interpolated linearly on each quarter of every"
                + " six-node element.", 10.5, Scene.Anchor.START, SectionDrawing.MUTED);
        return sc;
    }

    static String colour(int band, int bands) {
        return Ramp.at(bands == 1 ? 0.5 : (band + 0.5) / bands);
    }

    private static void legend(Scene sc, double[] levels, double max, Double capacity, String unit, double x, double y,
            double h) {
        int nb = levels.length - 1;
        double w = 20, bh = h / nb;
        for (int i = 0; i < nb; i++) {
            double yb = y + h - (i + 1) * bh;
            sc.polygon(colour(i, nb), null, 0, x, yb, x + w, yb, x + w, yb + bh, x, yb + bh);
        }
        sc.polygon(null, INK, 0.8, x, y, x + w, y, x + w, y + h, x, y + h);
        double lo = levels[0], hi = levels[nb];
        int every = nb > 14 ? 2 : 1;
        for (int i = 0; i <= nb; i += every) {
            double yy = y + h - i * bh;
            sc.line(INK, 0.8, null, x + w, yy, x + w + 5, yy);
            sc.text(x + w + 8, yy + 4, Fmt.sig(levels[i], 4), 10.5, Scene.Anchor.START, INK);
        }
        sc.text(x, y - 12, unit, 10.5, Scene.Anchor.START, SectionDrawing.MUTED);
        double ym = y + h - (max - lo) / (hi - lo) * h;
        sc.polygon(INK, null, 0, x - 1, ym, x - 9, ym - 5, x - 9, ym + 5);
        double ty = y + h + 22;
        sc.polygon(INK, null, 0, x - 1, ty - 4, x - 9, ty - 9, x - 9, ty + 1);
        sc.text(x + 2, ty, "max " + Fmt.sig(max, 4), 10.5, Scene.Anchor.START, INK);
        if (capacity != null) {
            ty += 16;
            boolean on = capacity >= lo && capacity <= hi;
            if (on) {
                double yc = y + h - (capacity - lo) / (hi - lo) * h;
                sc.line(SectionDrawing.ACCENT, 2.4, null, x - 5, yc, x + w + 5, yc);
            }
            sc.line(SectionDrawing.ACCENT, 2.4, null, x - 10, ty - 4, x, ty - 4);
            sc.bold(x + 2, ty, "capacity " + Fmt.sig(capacity, 4) + (on ? "" : capacity > hi ? " (above)" : " (below)"),
                    10.5, Scene.Anchor.START, SectionDrawing.ACCENT);
        }
    }
}
