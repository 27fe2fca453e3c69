package org.tensio.ui.editor.model;

/**
 * A vertex of a loop, with the arc (if any) that runs from it to the next vertex. Coordinates in the section
 * frame of the profile (before the part's offset), length unit of the file, y up.
 */
public final class Vertex extends ModelElement {

    /** Property fired when the location changes. */
    public static final String LOCATION = "location"; //$NON-NLS-1$
    /** Property fired when the arc to the next vertex changes. */
    public static final String ARC = "arc"; //$NON-NLS-1$

    private double x;
    private double y;
    private ArcMarker arcToNext;

    /** A vertex with a straight edge to the next one. */
    public Vertex(double x, double y) {
        this(x, y, null);
    }

    /** A vertex followed by {@code arcToNext} (null: straight edge). */
    public Vertex(double x, double y, ArcMarker arcToNext) {
        checkFinite(x, y);
        this.x = x;
        this.y = y;
        this.arcToNext = arcToNext;
    }

    private static void checkFinite(double x, double y) {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("vertex must be finite, got (" + x + ", " + y + ")");
        }
    }

    /** @return x, length unit */
    public double x() {
        return x;
    }

    /** @return y, length unit */
    public double y() {
        return y;
    }

    /** @return the arc to the next vertex, or null for a straight edge */
    public ArcMarker arcToNext() {
        return arcToNext;
    }

    /** Moves the vertex. */
    public void setLocation(double newX, double newY) {
        checkFinite(newX, newY);
        double[] old = { x, y };
        x = newX;
        y = newY;
        fire(LOCATION, old, new double[] { x, y });
    }

    /** Sets the arc to the next vertex (null: straight). */
    public void setArcToNext(ArcMarker arc) {
        ArcMarker old = arcToNext;
        arcToNext = arc;
        fire(ARC, old, arc);
    }
}
