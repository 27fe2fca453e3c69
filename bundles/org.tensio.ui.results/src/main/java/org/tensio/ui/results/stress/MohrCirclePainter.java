package org.tensio.ui.results.stress;

import org.eclipse.osgi.util.NLS;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.Rectangle;
import org.tensio.engine.stress.PrincipalStresses;
import org.tensio.engine.stress.StressComponents;
import org.tensio.ui.results.model.ResultsText;

/**
 * Mohr's circles of the point's three-dimensional state (σx = σy = τxy = 0, so σ2 = 0): the large circle through
 * σ3 and σ1 (filled) and the two inner circles σ3–σ2 and σ2–σ1; σ to the right, τ up. The two faces of the
 * element drawing are marked: Z = (σz, τ) for the face normal to z and U = (0, −τ) for the face normal to u, with
 * the diameter joining them. Values in the project's stress unit.
 */
final class MohrCirclePainter {

    private static final int PAD = 8;

    private MohrCirclePainter() {
    }

    static void paint(GC gc, Rectangle area, StressComponents s, PrincipalStresses ps, String stressUnit, Palette p) {
        gc.setAntialias(SWT.ON);
        gc.setForeground(p.ink);
        gc.drawText(Messages.Mohr_title, area.x + PAD, area.y + PAD, true);
        if (s == null || ps == null) {
            gc.drawText(Messages.StressPointView_incomplete, area.x + PAD, area.y + 3 * PAD, true);
            return;
        }
        int line = gc.getFontMetrics().getHeight();
        double left = area.x + 2 * PAD, right = area.x + area.width - 2 * PAD;
        double top = area.y + PAD + 3 * line, bottom = area.y + area.height - PAD - line;
        double s1 = ps.sigma1(), s3 = ps.sigma3(), r = ps.tauMax();
        double lo = Math.min(s3, 0), hi = Math.max(s1, 0);
        if (hi - lo == 0) {
            gc.drawText(Messages.StressElement_unstressed, area.x + PAD, area.y + 3 * PAD, true);
            return;
        }
        double scale = Math.min((right - left) / (hi - lo), (bottom - top) / (2 * r));
        double mid = (lo + hi) / 2;
        double cx = (left + right) / 2, cy = (top + bottom) / 2;
        java.util.function.DoubleUnaryOperator px = v -> cx + (v - mid) * scale;
        java.util.function.DoubleUnaryOperator py = t -> cy - t * scale;

        // axes
        gc.setForeground(p.faint);
        gc.drawLine(Arrows.round(left - PAD), Arrows.round(cy), Arrows.round(right + PAD), Arrows.round(cy));
        gc.drawLine(Arrows.round(px.applyAsDouble(0)), Arrows.round(top - line / 2.0),
                Arrows.round(px.applyAsDouble(0)), Arrows.round(bottom + line / 2.0));
        gc.drawText("\u03c3", Arrows.round(right + PAD - 8), Arrows.round(cy - line - 2), true); //$NON-NLS-1$
        gc.drawText("\u03c4", Arrows.round(px.applyAsDouble(0) + 4), Arrows.round(top - line), true); //$NON-NLS-1$

        // circles: large (filled), then the two inner ones
        circle(gc, px, py, s3, s1, p, true);
        gc.setForeground(p.faint);
        circle(gc, px, py, s3, 0, p, false);
        circle(gc, px, py, 0, s1, p, false);

        // the faces and the diameter joining them
        double zx = px.applyAsDouble(s.sigmaZ()), zy = py.applyAsDouble(s.tauResultant());
        double ux = px.applyAsDouble(0), uy = py.applyAsDouble(-s.tauResultant());
        gc.setForeground(p.shear);
        gc.drawLine(Arrows.round(zx), Arrows.round(zy), Arrows.round(ux), Arrows.round(uy));
        dot(gc, zx, zy, p.shear);
        dot(gc, ux, uy, p.shear);
        gc.drawText("Z", Arrows.round(zx - 4), Arrows.round(zy - line - 4), true); //$NON-NLS-1$
        gc.drawText("U", Arrows.round(ux - 4), Arrows.round(uy + 4), true); //$NON-NLS-1$

        // principal stresses (short tags at the points, values in the legend) and τmax at the top
        double x1 = px.applyAsDouble(s1), x3 = px.applyAsDouble(s3);
        dot(gc, x1, cy, p.tension);
        dot(gc, x3, cy, p.compression);
        gc.setForeground(p.tension);
        Point e1 = gc.textExtent("\u03c31"); //$NON-NLS-1$
        double at1 = x1 + 6 + e1.x <= area.x + area.width - 2 ? x1 + 6 : x1 - e1.x - 6;
        gc.drawText("\u03c31", Arrows.round(at1), Arrows.round(cy + 2), true); //$NON-NLS-1$
        gc.setForeground(p.compression);
        Point e3 = gc.textExtent("\u03c33"); //$NON-NLS-1$
        gc.drawText("\u03c33", Arrows.round(x3 - e3.x - 6), Arrows.round(cy + 2), true); //$NON-NLS-1$
        double ctr = px.applyAsDouble(s.sigmaZ() / 2);
        dot(gc, ctr, cy - r * scale, p.shear);
        gc.setForeground(p.shear);
        gc.drawText("\u03c4max", Arrows.round(ctr + 6), Arrows.round(cy - r * scale - line + 2), true); //$NON-NLS-1$
        String legend = NLS.bind(Messages.Mohr_legend, new Object[] { ResultsText.number(s1), ResultsText.number(s3),
                ResultsText.number(r), stressUnit });
        gc.setForeground(p.ink);
        gc.drawText(legend, area.x + PAD, area.y + PAD + line, true);
    }

    private static void circle(GC gc, java.util.function.DoubleUnaryOperator px,
            java.util.function.DoubleUnaryOperator py, double a, double b, Palette p, boolean filled) {
        double x0 = px.applyAsDouble(Math.min(a, b)), x1 = px.applyAsDouble(Math.max(a, b));
        double rad = (x1 - x0) / 2;
        if (rad < 0.5) {
            return;
        }
        double cy = py.applyAsDouble(0);
        int x = Arrows.round(x0), y = Arrows.round(cy - rad), d = Arrows.round(2 * rad);
        if (filled) {
            gc.setBackground(p.fill);
            gc.fillOval(x, y, d, d);
            gc.setForeground(p.shear);
        }
        gc.drawOval(x, y, d, d);
    }

    private static void dot(GC gc, double x, double y, org.eclipse.swt.graphics.Color c) {
        gc.setBackground(c);
        gc.fillOval(Arrows.round(x - 3), Arrows.round(y - 3), 7, 7);
    }
}
