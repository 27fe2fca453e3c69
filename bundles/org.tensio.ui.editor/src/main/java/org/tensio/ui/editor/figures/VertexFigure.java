package org.tensio.ui.editor.figures;

import org.eclipse.draw2d.Figure;
import org.eclipse.draw2d.Graphics;
import org.eclipse.draw2d.geometry.Rectangle;
import org.eclipse.swt.graphics.Color;

/** A vertex handle: a small square centred on the vertex; a diamond when an arc starts at the vertex. */
public final class VertexFigure extends Figure {

    /** Side of the handle, figure units. */
    public static final int SIZE = 9;

    private boolean arc;
    private Color fill;
    private Color line;

    /** Colours (owned by a registry). */
    public void setColours(Color fillColour, Color lineColour) {
        fill = fillColour;
        line = lineColour;
        repaint();
    }

    /** Marks whether the edge to the next vertex is an arc. */
    public void setArc(boolean on) {
        arc = on;
        repaint();
    }

    /** @return the bounds of a handle centred at (fx, fy) */
    public static Rectangle boundsAt(int fx, int fy) {
        return new Rectangle(fx - SIZE / 2, fy - SIZE / 2, SIZE, SIZE);
    }

    @Override
    protected void paintFigure(Graphics g) {
        Rectangle r = getBounds().getCopy().resize(-1, -1);
        g.setBackgroundColor(fill);
        g.setForegroundColor(line);
        if (arc) {
            int cx = r.x + r.width / 2;
            int cy = r.y + r.height / 2;
            int[] d = { cx, r.y, r.right(), cy, cx, r.bottom(), r.x, cy };
            g.fillPolygon(d);
            g.drawPolygon(d);
        } else {
            g.fillRectangle(r);
            g.drawRectangle(r);
        }
    }
}
