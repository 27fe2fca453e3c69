package org.tensio.ui.editor.ui;

import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.events.PaintEvent;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.tensio.ui.editor.parts.Inks;

/**
 * The contour legend beside the drawing: the quantity and its unit, the case, one box per band from the
 * highest down with the band's edge values, the extreme values, the quantity's own caution (fatigue) and the
 * general caution. Stateless apart from the {@link Legend} it shows.
 */
final class LegendCanvas extends Canvas {

    /**
     * What the legend shows. Immutable.
     *
     * @param caution the quantity's own caution shown above the general one, or null
     */
    record Legend(String title, String caseLabel, double[] edges, List<RGB> bands, RGB overLimit, String minMax,
            String caution) {
    }

    private static final int BOX_W = 26;
    private static final int BOX_H = 22;
    private static final int MARGIN = 8;

    private final Inks inks;
    private Legend legend;
    private String message = ""; //$NON-NLS-1$

    LegendCanvas(Composite parent, Inks inks) {
        super(parent, SWT.DOUBLE_BUFFERED);
        this.inks = inks;
        addPaintListener(this::paint);
    }

    void show(Legend l) {
        legend = l;
        message = ""; //$NON-NLS-1$
        redraw();
    }

    void showMessage(String text) {
        legend = null;
        message = text == null ? "" : text; //$NON-NLS-1$
        redraw();
    }

    Legend legend() {
        return legend;
    }

    /** @return the texts shown: title, case line, extreme values and cautions, or the message and the caution */
    List<String> texts() {
        List<String> out = new java.util.ArrayList<>();
        if (legend == null) {
            out.add(message);
        } else {
            out.add(legend.title());
            out.add(legend.caseLabel());
            out.add(legend.minMax());
            if (legend.caution() != null) {
                out.add(legend.caution());
            }
        }
        out.add(Messages.Caution);
        return out;
    }

    @Override
    public Point computeSize(int wHint, int hHint, boolean changed) {
        return new Point(Math.max(wHint, 200), Math.max(hHint, 360));
    }

    private void paint(PaintEvent e) {
        GC gc = e.gc;
        int width = getClientArea().width;
        int y = MARGIN;
        gc.setForeground(inks.get(Inks.OUTLINE));
        if (legend == null) {
            y = wrap(gc, message, MARGIN, y, width - 2 * MARGIN);
        } else {
            gc.drawText(legend.title(), MARGIN, y, true);
            y += gc.getFontMetrics().getHeight() + 2;
            y = wrap(gc, legend.caseLabel(), MARGIN, y, width - 2 * MARGIN) + 8;
            int n = legend.bands().size();
            if (legend.overLimit() != null) {
                gc.setBackground(inks.get(legend.overLimit()));
                gc.fillRectangle(MARGIN, y, BOX_W, BOX_H);
                gc.drawRectangle(MARGIN, y, BOX_W, BOX_H);
                gc.drawText(Messages.Legend_overLimit, MARGIN + BOX_W + 6, y + 3, true);
                y += BOX_H + 4;
            }
            int top = y;
            for (int i = n - 1; i >= 0; i--) {
                gc.setBackground(inks.get(legend.bands().get(i)));
                gc.fillRectangle(MARGIN, y, BOX_W, BOX_H);
                gc.drawRectangle(MARGIN, y, BOX_W, BOX_H);
                y += BOX_H;
            }
            int h = gc.getFontMetrics().getHeight();
            for (int i = 0; i <= n; i++) {
                int yy = top + (n - i) * BOX_H;
                gc.drawLine(MARGIN + BOX_W, yy, MARGIN + BOX_W + 4, yy);
                gc.drawText(Format.number(legend.edges()[i]), MARGIN + BOX_W + 6, yy - h / 2, true);
            }
            y += 10;
            y = wrap(gc, legend.minMax(), MARGIN, y, width - 2 * MARGIN);
            if (legend.caution() != null) {
                y = wrap(gc, legend.caution(), MARGIN, y + 12, width - 2 * MARGIN);
            }
        }
        y += 12;
        wrap(gc, Messages.Caution, MARGIN, y, width - 2 * MARGIN);
    }

    /** Draws {@code text} wrapped at word boundaries; @return the y below it */
    private static int wrap(GC gc, String text, int x, int y, int width) {
        int h = gc.getFontMetrics().getHeight();
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) { //$NON-NLS-1$
            String candidate = line.length() == 0 ? word : line + " " + word; //$NON-NLS-1$
            if (gc.textExtent(candidate).x > width && line.length() > 0) {
                gc.drawText(line.toString(), x, y, true);
                y += h;
                line = new StringBuilder(word);
            } else {
                line = new StringBuilder(candidate);
            }
        }
        if (line.length() > 0) {
            gc.drawText(line.toString(), x, y, true);
            y += h;
        }
        return y;
    }
}
