package org.tensio.ui.results.stress;

import org.eclipse.osgi.util.NLS;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.Rectangle;
import org.tensio.engine.stress.StressComponents;
import org.tensio.ui.results.model.ResultsText;

/**
 * The stress element at the point, drawn in the plane of the member axis z (to the right) and the direction u of
 * the resultant shear stress in the section plane (up; u makes the angle atan2(τzy, τzx) with x, shown in the
 * compass at the lower left). The faces normal to z carry σz (arrows outward for tension, inward for compression)
 * and τ along u; the faces normal to u carry the complementary shear τ along z. Arrow lengths are proportional to
 * the stresses (the larger drawn at full length, none shorter than 18 pixels). Values in the project's stress unit.
 */
final class StressElementPainter {

    private static final int PAD = 8;
    /** Arrows are never shorter than this (pixels), so that a small stress stays visible. */
    private static final double MIN_ARROW = 18;

    private StressElementPainter() {
    }

    static void paint(GC gc, Rectangle area, StressComponents s, String stressUnit, Palette p) {
        gc.setAntialias(org.eclipse.swt.SWT.ON);
        gc.setForeground(p.ink);
        gc.drawText(Messages.StressElement_title, area.x + PAD, area.y + PAD, true);
        if (s == null) {
            gc.drawText(Messages.StressPointView_incomplete, area.x + PAD, area.y + 3 * PAD, true);
            return;
        }
        double sz = s.sigmaZ(), tau = s.tauResultant();
        int line = gc.getFontMetrics().getHeight();
        double top = area.y + PAD + 2 * line, bottom = area.y + area.height - PAD - 2 * line;
        double cx = area.x + area.width / 2.0, cy = (top + bottom) / 2;
        double side = Math.max(20, Math.min(area.width * 0.36, (bottom - top) * 0.5));
        double h = side / 2;
        double reach = Math.max(18, Math.min(area.width / 2.0 - h - 2 * PAD, (bottom - top) / 2 - h - PAD) * 0.8);
        double big = Math.max(Math.abs(sz), tau);
        double ls = big == 0 ? 0 : Math.max(MIN_ARROW, reach * Math.abs(sz) / big);
        double lt = big == 0 ? 0 : Math.max(MIN_ARROW, side * 0.8 * tau / big);

        gc.setBackground(p.element);
        gc.fillRectangle(Arrows.round(cx - h), Arrows.round(cy - h), Arrows.round(side), Arrows.round(side));
        gc.setForeground(p.ink);
        gc.drawRectangle(Arrows.round(cx - h), Arrows.round(cy - h), Arrows.round(side), Arrows.round(side));

        gc.setLineWidth(2);
        if (sz != 0) {
            gc.setForeground(sz > 0 ? p.tension : p.compression);
            double gap = 4;
            for (int sgn = -1; sgn <= 1; sgn += 2) {
                double face = cx + sgn * (h + gap);
                double tip = face + sgn * ls;
                if (sz > 0) {
                    Arrows.arrow(gc, face, cy, tip, cy);
                } else {
                    Arrows.arrow(gc, tip, cy, face, cy);
                }
            }
            String label = NLS.bind(Messages.StressElement_sigma, ResultsText.number(sz), stressUnit);
            Point e = gc.textExtent(label);
            gc.drawText(label, Arrows.round(Math.min(cx + h + gap + ls - e.x, area.x + area.width - PAD - e.x)),
                    Arrows.round(cy + 6), true);
        }
        if (tau != 0) {
            gc.setForeground(p.shear);
            double off = 6;
            // +z face: τ along +u; −z face: along −u
            Arrows.arrow(gc, cx + h + off, cy + lt / 2, cx + h + off, cy - lt / 2);
            Arrows.arrow(gc, cx - h - off, cy - lt / 2, cx - h - off, cy + lt / 2);
            // +u face: τ along +z; −u face: along −z
            Arrows.arrow(gc, cx - lt / 2, cy - h - off, cx + lt / 2, cy - h - off);
            Arrows.arrow(gc, cx + lt / 2, cy + h + off, cx - lt / 2, cy + h + off);
            String label = NLS.bind(Messages.StressElement_tau, new Object[] { ResultsText.number(tau), stressUnit,
                    ResultsText.number(s.tauZX()), ResultsText.number(s.tauZY()) });
            Point e = gc.textExtent(label);
            gc.drawText(label, Arrows.round(Math.max(area.x + PAD, cx - e.x / 2.0)),
                    Arrows.round(cy - h - off - line - 4), true);
        }
        gc.setLineWidth(1);
        if (sz == 0 && tau == 0) {
            gc.setForeground(p.ink);
            gc.drawText(Messages.StressElement_unstressed, Arrows.round(cx - h), Arrows.round(cy + h + PAD), true);
        }
        compass(gc, area, s, p, line);
    }

    /** Axes z → and u ↑ at the lower left, and u's angle from x in the section plane. */
    private static void compass(GC gc, Rectangle area, StressComponents s, Palette p, int line) {
        double ox = area.x + PAD + 4, oy = area.y + area.height - PAD - line - 6;
        gc.setForeground(p.ink);
        Arrows.arrow(gc, ox, oy, ox + 28, oy);
        Arrows.arrow(gc, ox, oy, ox, oy - 28);
        gc.drawText("z", Arrows.round(ox + 31), Arrows.round(oy - line / 2.0), true); //$NON-NLS-1$
        gc.drawText("u", Arrows.round(ox + 3), Arrows.round(oy - 28 - line), true); //$NON-NLS-1$
        double angle = s.tauResultant() == 0 ? 0 : Math.toDegrees(Math.atan2(s.tauZY(), s.tauZX()));
        gc.drawText(NLS.bind(Messages.StressElement_uAngle, ResultsText.number(angle)), Arrows.round(ox),
                Arrows.round(oy + 4), true);
    }
}
