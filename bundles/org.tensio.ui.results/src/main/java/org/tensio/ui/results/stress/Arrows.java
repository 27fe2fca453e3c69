package org.tensio.ui.results.stress;

import org.eclipse.swt.graphics.GC;

/** Arrow drawing with SWT graphics. */
final class Arrows {

    private static final double HEAD = 7;
    private static final double HEAD_ANGLE = Math.toRadians(24);

    private Arrows() {
    }

    /** A line from (x0, y0) to (x1, y1) with a filled head at (x1, y1), in the GC's foreground colour. */
    static void arrow(GC gc, double x0, double y0, double x1, double y1) {
        double len = Math.hypot(x1 - x0, y1 - y0);
        if (len < 1) {
            return;
        }
        gc.drawLine(round(x0), round(y0), round(x1), round(y1));
        double a = Math.atan2(y1 - y0, x1 - x0);
        double h = Math.min(HEAD, len * 0.6);
        int[] head = { round(x1), round(y1), round(x1 - h * Math.cos(a - HEAD_ANGLE)),
                round(y1 - h * Math.sin(a - HEAD_ANGLE)), round(x1 - h * Math.cos(a + HEAD_ANGLE)),
                round(y1 - h * Math.sin(a + HEAD_ANGLE)) };
        gc.setBackground(gc.getForeground());
        gc.fillPolygon(head);
    }

    static int round(double v) {
        return (int) Math.round(v);
    }
}
