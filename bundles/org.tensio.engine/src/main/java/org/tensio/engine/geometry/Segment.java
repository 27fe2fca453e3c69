package org.tensio.engine.geometry;

/**
 * One piece of a closed boundary: a straight line or an axis-aligned elliptic arc (circular when both
 * semi-axes are equal). Segments are immutable; {@link #start()} and {@link #end()} are stored exactly
 * so that consecutive segments of a {@link Contour} share their end points bit for bit.
 *
 * @since 0.1
 */
public sealed interface Segment permits LineSegment, ArcSegment {

    /** @return first point, length unit */
    Point2 start();

    /** @return last point, length unit */
    Point2 end();

    /** @return the same curve traversed the other way */
    Segment reversed();

    /** @return the same curve moved by (dx, dy) */
    Segment translated(double dx, double dy);

    /**
     * @return the point at parameter {@code u} in [0, 1] along the segment (linear in length for a line,
     *         linear in the angle parameter for an arc)
     */
    Point2 pointAt(double u);

    /** @return the curve's length, length unit (exact for lines and circular arcs, numerical for elliptic arcs) */
    double length();
}
