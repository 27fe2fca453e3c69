package org.tensio.ui.editor.figures;

import org.eclipse.draw2d.Figure;
import org.eclipse.draw2d.Graphics;
import org.eclipse.draw2d.geometry.Dimension;
import org.eclipse.draw2d.geometry.Point;
import org.eclipse.draw2d.geometry.Rectangle;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;

/**
 * What the editor draws under and over the parts: the stress contour (flat-coloured triangles), the mesh, the
 * centroid with the principal axes, the shear centre, the overall dimensions and a marked point. Everything in
 * figure coordinates; colours come from a registry owned by the editor page.
 */
public final class OverlayFigure extends Figure {

    private static final int MARK = 6;

    private int[] triangles = new int[0];
    private int[] bands = new int[0];
    private Color[] palette = new Color[0];
    private int[] meshEdges = new int[0];
    private Point centroid;
    private double axisAngle;
    private int axisLength;
    private Point shearCentre;
    private Rectangle dimensionBox;
    private String widthLabel;
    private String heightLabel;
    private Point mark;
    private Color ink;
    private Color meshInk;
    private Color axisInk;
    private Color markInk;

    /** Sets the colours (registry-owned). */
    public void setInks(Color text, Color mesh, Color axes, Color marker) {
        ink = text;
        meshInk = mesh;
        axisInk = axes;
        markInk = marker;
    }

    /**
     * Sets the contour.
     *
     * @param tri        6 ints per triangle (three corners)
     * @param bandOfTri  band index per triangle into {@code colours}
     * @param colours    band colours
     */
    public void setContour(int[] tri, int[] bandOfTri, Color[] colours) {
        triangles = tri.clone();
        bands = bandOfTri.clone();
        palette = colours.clone();
        repaint();
    }

    /** @return number of contour triangles shown */
    public int contourTriangleCount() {
        return bands.length;
    }

    /** @return band index of contour triangle {@code t} */
    public int band(int t) {
        return bands[t];
    }

    /** @return the three corners of contour triangle {@code t}, figure coordinates {x0, y0, x1, y1, x2, y2} */
    public int[] triangle(int t) {
        return java.util.Arrays.copyOfRange(triangles, 6 * t, 6 * t + 6);
    }

    /** Sets the mesh edges, 4 ints per edge; empty hides the mesh. */
    public void setMesh(int[] edges) {
        meshEdges = edges.clone();
        repaint();
    }

    /** @return number of mesh edges shown */
    public int meshEdgeCount() {
        return meshEdges.length / 4;
    }

    /** Centroid and principal axis angle (radians, counter-clockwise from +x in the section frame); null hides. */
    public void setCentroid(Point c, double angleRad, int length) {
        centroid = c;
        axisAngle = angleRad;
        axisLength = length;
        repaint();
    }

    /** @return the centroid shown, or null */
    public Point centroid() {
        return centroid;
    }

    /** Shear centre; null hides. */
    public void setShearCentre(Point sc) {
        shearCentre = sc;
        repaint();
    }

    /** @return the shear centre shown, or null */
    public Point shearCentre() {
        return shearCentre;
    }

    /** Overall dimensions of the section: box in figure units and its labels in the file's units. */
    public void setDimensions(Rectangle box, String width, String height) {
        dimensionBox = box == null ? null : box.getCopy();
        widthLabel = width;
        heightLabel = height;
        repaint();
    }

    /** A marked point (selected by another view); null hides. */
    public void setMark(Point p) {
        mark = p;
        repaint();
    }

    /** @return the marked point, or null */
    public Point mark() {
        return mark;
    }

    @Override
    protected void paintFigure(Graphics g) {
        // contour triangles without antialiasing: neighbours then meet without seams of blended colour
        g.setAntialias(SWT.OFF);
        for (int t = 0; t < bands.length; t++) {
            g.setBackgroundColor(palette[bands[t]]);
            int o = 6 * t;
            g.fillPolygon(new int[] { triangles[o], triangles[o + 1], triangles[o + 2], triangles[o + 3],
                    triangles[o + 4], triangles[o + 5] });
        }
        g.setAntialias(SWT.ON);
        if (meshEdges.length > 0 && meshInk != null) {
            g.setForegroundColor(meshInk);
            g.setLineWidth(1);
            for (int i = 0; i + 3 < meshEdges.length; i += 4) {
                g.drawLine(meshEdges[i], meshEdges[i + 1], meshEdges[i + 2], meshEdges[i + 3]);
            }
        }
        paintDimensions(g);
        if (centroid != null && axisInk != null) {
            g.setForegroundColor(axisInk);
            g.setLineWidth(1);
            g.setLineStyle(SWT.LINE_DASHDOT);
            for (double a : new double[] { axisAngle, axisAngle + Math.PI / 2 }) {
                int dx = (int) Math.round(Math.cos(a) * axisLength);
                int dy = (int) -Math.round(Math.sin(a) * axisLength);
                g.drawLine(centroid.x - dx, centroid.y - dy, centroid.x + dx, centroid.y + dy);
            }
            g.setLineStyle(SWT.LINE_SOLID);
            g.setLineWidth(2);
            g.drawOval(centroid.x - MARK, centroid.y - MARK, 2 * MARK, 2 * MARK);
            g.drawLine(centroid.x - MARK, centroid.y, centroid.x + MARK, centroid.y);
            g.drawLine(centroid.x, centroid.y - MARK, centroid.x, centroid.y + MARK);
        }
        if (shearCentre != null && axisInk != null) {
            g.setForegroundColor(axisInk);
            g.setLineWidth(2);
            int s = MARK;
            g.drawPolygon(new int[] { shearCentre.x, shearCentre.y - s, shearCentre.x + s, shearCentre.y + s,
                    shearCentre.x - s, shearCentre.y + s });
        }
        if (mark != null && markInk != null) {
            g.setForegroundColor(markInk);
            g.setLineWidth(2);
            g.drawLine(mark.x - 2 * MARK, mark.y - 2 * MARK, mark.x + 2 * MARK, mark.y + 2 * MARK);
            g.drawLine(mark.x - 2 * MARK, mark.y + 2 * MARK, mark.x + 2 * MARK, mark.y - 2 * MARK);
        }
    }

    private void paintDimensions(Graphics g) {
        if (dimensionBox == null || ink == null) {
            return;
        }
        g.setForegroundColor(ink);
        g.setLineWidth(1);
        Rectangle b = dimensionBox;
        int yDim = b.bottom() + 18;
        g.drawLine(b.x, yDim, b.right(), yDim);
        g.drawLine(b.x, yDim - 4, b.x, yDim + 4);
        g.drawLine(b.right(), yDim - 4, b.right(), yDim + 4);
        Dimension tw = textSize(g, widthLabel);
        g.drawText(widthLabel, b.x + (b.width - tw.width) / 2, yDim + 3);
        int xDim = b.x - 18;
        g.drawLine(xDim, b.y, xDim, b.bottom());
        g.drawLine(xDim - 4, b.y, xDim + 4, b.y);
        g.drawLine(xDim - 4, b.bottom(), xDim + 4, b.bottom());
        Dimension th = textSize(g, heightLabel);
        g.drawText(heightLabel, xDim - th.width - 4, b.y + (b.height - th.height) / 2);
    }

    private static Dimension textSize(Graphics g, String s) {
        int w = g.getFontMetrics().getAverageCharWidth() * s.length();
        return new Dimension(w, g.getFontMetrics().getHeight());
    }
}
