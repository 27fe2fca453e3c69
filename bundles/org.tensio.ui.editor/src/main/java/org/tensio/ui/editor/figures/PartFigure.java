package org.tensio.ui.editor.figures;

import java.util.List;

import org.eclipse.draw2d.Figure;
import org.eclipse.draw2d.Graphics;
import org.eclipse.draw2d.geometry.Rectangle;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;

/**
 * One part of a section: its loops (outer boundary first, then voids) filled with the even-odd rule and
 * outlined. Loops are given in figure coordinates as flat arrays {x0, y0, x1, y1, ...}; the figure's bounds are
 * set by its parent's layout to the loops' bounding box.
 */
public final class PartFigure extends Figure {

    private List<int[]> loops = List.of();
    private Color fill;
    private Color line;
    private boolean filled = true;
    private boolean error;
    private Color errorColour;
    private boolean selected;
    private Color holeColour;

    /** Sets the loops (figure coordinates) and repaints. */
    public void setLoops(List<int[]> newLoops) {
        loops = List.copyOf(newLoops);
        repaint();
    }

    /** @return the loops in figure coordinates */
    public List<int[]> loops() {
        return loops;
    }

    /** Colours (owned by a registry, not disposed here). */
    public void setColours(Color fillColour, Color lineColour, Color errorLine) {
        fill = fillColour;
        line = lineColour;
        errorColour = errorLine;
        repaint();
    }

    /** Colour voids are filled with (the canvas background). */
    public void setHoleColour(Color c) {
        holeColour = c;
    }

    /** Filled (off while a contour is shown underneath). */
    public void setFilled(boolean on) {
        filled = on;
        repaint();
    }

    /** @return whether the part is drawn filled */
    public boolean isFilled() {
        return filled;
    }

    /** Marks the part as the place of a validation error (thick error-coloured outline). */
    public void setError(boolean on) {
        error = on;
        repaint();
    }

    /** @return whether the part is marked as the place of an error */
    public boolean isError() {
        return error;
    }

    /** Selection feedback (thicker outline). */
    public void setSelected(boolean on) {
        selected = on;
        repaint();
    }

    /** @return the bounding box of the loops, 1 unit larger on each side, or an empty box */
    public Rectangle loopBounds() {
        Rectangle r = null;
        for (int[] p : loops) {
            for (int i = 0; i + 1 < p.length; i += 2) {
                if (r == null) {
                    r = new Rectangle(p[i], p[i + 1], 1, 1);
                } else {
                    r.union(p[i], p[i + 1]);
                }
            }
        }
        return r == null ? new Rectangle(0, 0, 1, 1) : r.expand(3, 3);
    }

    @Override
    public boolean containsPoint(int x, int y) {
        if (!super.containsPoint(x, y) || loops.isEmpty()) {
            return false;
        }
        boolean inside = false;
        for (int[] p : loops) {
            inside ^= contains(p, x, y);
        }
        return inside;
    }

    private static boolean contains(int[] p, int x, int y) {
        boolean c = false;
        int n = p.length / 2;
        for (int i = 0, j = n - 1; i < n; j = i++) {
            int yi = p[2 * i + 1];
            int yj = p[2 * j + 1];
            if ((yi > y) != (yj > y)) {
                double xc = p[2 * i] + (double) (y - yi) * (p[2 * j] - p[2 * i]) / (yj - yi);
                if (x < xc) {
                    c = !c;
                }
            }
        }
        return c;
    }

    @Override
    protected void paintFigure(Graphics g) {
        if (loops.isEmpty()) {
            return;
        }
        g.setAntialias(SWT.ON);
        if (filled && fill != null) {
            // draw2d 3.2's ScaledGraphics has no fillPath: fill the outer loop, then the voids in the canvas colour
            g.setBackgroundColor(fill);
            g.fillPolygon(loops.get(0));
            if (loops.size() > 1) {
                g.setBackgroundColor(holeColour != null ? holeColour : fill);
                for (int i = 1; i < loops.size(); i++) {
                    g.fillPolygon(loops.get(i));
                }
            }
        }
        g.setForegroundColor(error && errorColour != null ? errorColour : line);
        g.setLineWidth(error ? 3 : selected ? 2 : 1);
        for (int[] p : loops) {
            g.drawPolygon(p);
        }
    }
}
