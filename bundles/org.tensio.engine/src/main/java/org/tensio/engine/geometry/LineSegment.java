package org.tensio.engine.geometry;

/**
 * A straight segment from {@code start} to {@code end}.
 *
 * @param start first point
 * @param end   last point
 * @since 0.1
 */
public record LineSegment(Point2 start, Point2 end) implements Segment {

    /** Rejects null points. */
    public LineSegment {
        if (start == null || end == null) {
            throw new IllegalArgumentException("line segment end points must not be null");
        }
    }

    @Override
    public LineSegment reversed() {
        return new LineSegment(end, start);
    }

    @Override
    public LineSegment translated(double dx, double dy) {
        return new LineSegment(start.plus(dx, dy), end.plus(dx, dy));
    }

    @Override
    public Point2 pointAt(double u) {
        if (u <= 0) {
            return start;
        }
        if (u >= 1) {
            return end;
        }
        return new Point2(start.x() + u * (end.x() - start.x()), start.y() + u * (end.y() - start.y()));
    }

    @Override
    public double length() {
        return start.distance(end);
    }
}
