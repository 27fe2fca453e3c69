package org.tensio.engine.geometry;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * A closed boundary: a chain of segments in which each segment starts exactly where the previous one ends
 * and the last ends where the first starts. Immutable.
 *
 * @since 0.1
 */
public final class Contour {

    private final List<Segment> segments;
    private final Moments moments;

    /**
     * @param segments at least one segment (a single full-turn arc, or two or more pieces)
     * @throws IllegalArgumentException when the chain is empty, open or has a gap
     */
    public Contour(List<? extends Segment> segments) {
        if (segments == null || segments.isEmpty()) {
            throw new IllegalArgumentException("a contour needs at least one segment");
        }
        List<Segment> copy = List.copyOf(segments);
        for (int i = 0; i < copy.size(); i++) {
            Segment s = copy.get(i);
            Segment next = copy.get((i + 1) % copy.size());
            if (!s.end().equals(next.start())) {
                throw new IllegalArgumentException("contour is not closed: segment " + i + " ends at " + s.end()
                        + " but segment " + ((i + 1) % copy.size()) + " starts at " + next.start());
            }
        }
        this.segments = copy;
        this.moments = Moments.of(copy);
    }

    /** A closed polygon through {@code vertices} (the closing edge is implied; do not repeat the first vertex). */
    public static Contour polygon(List<Point2> vertices) {
        if (vertices.size() < 3) {
            throw new IllegalArgumentException("a polygon needs at least 3 vertices, got " + vertices.size());
        }
        List<Segment> segs = new ArrayList<>(vertices.size());
        for (int i = 0; i < vertices.size(); i++) {
            segs.add(new LineSegment(vertices.get(i), vertices.get((i + 1) % vertices.size())));
        }
        return new Contour(segs);
    }

    /** A full circle, counter-clockwise, made of two half arcs. */
    public static Contour circle(Point2 centre, double radius) {
        return ellipse(centre, radius, radius);
    }

    /** A full axis-aligned ellipse, counter-clockwise, made of two half arcs. */
    public static Contour ellipse(Point2 centre, double a, double b) {
        if (!(a > 0) || !(b > 0)) {
            throw new IllegalArgumentException("ellipse semi-axes must be positive, got " + a + ", " + b);
        }
        Point2 e = centre.plus(a, 0);
        Point2 w = centre.plus(-a, 0);
        return new Contour(List.of(new ArcSegment(centre, a, b, 0, Math.PI, e, w),
                new ArcSegment(centre, a, b, Math.PI, Math.PI, w, e)));
    }

    /** @return the segments in traversal order (unmodifiable) */
    public List<Segment> segments() {
        return segments;
    }

    /** @return exact area moments (signed: negative when clockwise) */
    public Moments moments() {
        return moments;
    }

    /** @return signed area: positive when counter-clockwise */
    public double signedArea() {
        return moments.area();
    }

    /** @return the same boundary traversed the other way */
    public Contour reversed() {
        List<Segment> rev = new ArrayList<>(segments.size());
        for (Segment s : segments) {
            rev.add(s.reversed());
        }
        Collections.reverse(rev);
        return new Contour(rev);
    }

    /** @return this contour, reversed if needed so that it runs counter-clockwise ({@code ccw}) or clockwise */
    public Contour oriented(boolean ccw) {
        return (signedArea() > 0) == ccw ? this : reversed();
    }

    /** @return this contour moved by (dx, dy) */
    public Contour translated(double dx, double dy) {
        List<Segment> out = new ArrayList<>(segments.size());
        for (Segment s : segments) {
            out.add(s.translated(dx, dy));
        }
        return new Contour(out);
    }

    /** @return the exact axis-aligned bounding box (arcs included) */
    public Bounds bounds() {
        Bounds b = Bounds.EMPTY;
        for (Segment s : segments) {
            b = b.union(Bounds.of(s));
        }
        return b;
    }

    @Override
    public String toString() {
        return "Contour" + segments;
    }
}
