package org.tensio.engine.geometry;

/**
 * An axis-aligned box, length unit. {@link #EMPTY} has inverted limits and is the identity of {@link #union}.
 *
 * @param minX least x
 * @param minY least y
 * @param maxX greatest x
 * @param maxY greatest y
 * @since 0.1
 */
public record Bounds(double minX, double minY, double maxX, double maxY) {

    /** The empty box. */
    public static final Bounds EMPTY = new Bounds(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY,
            Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY);

    /** @return the smallest box holding both */
    public Bounds union(Bounds o) {
        return new Bounds(Math.min(minX, o.minX), Math.min(minY, o.minY), Math.max(maxX, o.maxX),
                Math.max(maxY, o.maxY));
    }

    /** @return width along x */
    public double width() {
        return maxX - minX;
    }

    /** @return height along y */
    public double height() {
        return maxY - minY;
    }

    /** @return length of the diagonal; a size scale for tolerances */
    public double diagonal() {
        return Math.hypot(width(), height());
    }

    /** @return the exact bounding box of one segment, arcs included (extreme points within the sweep) */
    public static Bounds of(Segment s) {
        Point2 p = s.start(), q = s.end();
        double minX = Math.min(p.x(), q.x()), maxX = Math.max(p.x(), q.x());
        double minY = Math.min(p.y(), q.y()), maxY = Math.max(p.y(), q.y());
        if (s instanceof ArcSegment arc) {
            double c = arc.centre().x(), d = arc.centre().y();
            for (int k = 0; k < 4; k++) {
                double t = k * Math.PI / 2;
                if (Angles.inSweep(t, arc.startParam(), arc.sweep())) {
                    switch (k) {
                        case 0 -> maxX = Math.max(maxX, c + arc.a());
                        case 1 -> maxY = Math.max(maxY, d + arc.b());
                        case 2 -> minX = Math.min(minX, c - arc.a());
                        default -> minY = Math.min(minY, d - arc.b());
                    }
                }
            }
        }
        return new Bounds(minX, minY, maxX, maxY);
    }
}
