package org.tensio.engine.geometry;

/**
 * An immutable point (or vector) in the plane of a cross-section.
 * <p>
 * Coordinates are in the project's length unit, in the section's own frame: right-handed x, y with the
 * member axis z pointing towards the viewer. Components must be finite.
 *
 * @param x abscissa, length unit
 * @param y ordinate, length unit
 * @since 0.1
 */
public record Point2(double x, double y) {

    /** Rejects NaN and infinite components. */
    public Point2 {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("point (" + x + ", " + y + ") must have finite coordinates");
        }
    }

    /** @return this point moved by (dx, dy) */
    public Point2 plus(double dx, double dy) {
        return new Point2(x + dx, y + dy);
    }

    /** @return Euclidean distance to {@code other} */
    public double distance(Point2 other) {
        return Math.hypot(other.x - x, other.y - y);
    }

    /**
     * @param cos cosine of the rotation angle
     * @param sin sine of the rotation angle
     * @return this point rotated counter-clockwise about the origin
     */
    public Point2 rotated(double cos, double sin) {
        return new Point2(cos * x - sin * y, sin * x + cos * y);
    }
}
