package org.tensio.engine.geometry;

import java.util.ArrayList;
import java.util.List;

/**
 * A plane region bounded by one outer contour and any number of holes. Orientation is normalised on
 * construction: the outer contour runs counter-clockwise, holes clockwise, so signed moments of all
 * contours add up to the region's moments. Validity (no self-intersection, holes inside and disjoint) is
 * checked by {@code org.tensio.engine.section.SectionValidator}, not here. Immutable.
 *
 * @since 0.1
 */
public final class Region {

    /** Where a point lies relative to a region. */
    public enum Location {
        /** Strictly inside. */
        INSIDE,
        /** On the boundary within the tolerance. */
        BOUNDARY,
        /** Outside (or inside a hole). */
        OUTSIDE
    }

    private final Contour outer;
    private final List<Contour> holes;
    private final List<Contour> contours;
    private final Moments moments;
    private final Bounds bounds;

    /**
     * @param outer outer boundary (any orientation)
     * @param holes voids (any orientation), may be empty
     */
    public Region(Contour outer, List<Contour> holes) {
        if (outer == null || holes == null) {
            throw new IllegalArgumentException("region outer contour and hole list must not be null");
        }
        this.outer = outer.oriented(true);
        List<Contour> hs = new ArrayList<>(holes.size());
        for (Contour h : holes) {
            hs.add(h.oriented(false));
        }
        this.holes = List.copyOf(hs);
        List<Contour> all = new ArrayList<>(hs.size() + 1);
        all.add(this.outer);
        all.addAll(this.holes);
        this.contours = List.copyOf(all);
        Moments m = Moments.ZERO;
        for (Contour k : contours) {
            m = m.plus(k.moments());
        }
        this.moments = m;
        this.bounds = this.outer.bounds();
    }

    /** A region without holes. */
    public Region(Contour outer) {
        this(outer, List.of());
    }

    /** @return outer boundary, counter-clockwise */
    public Contour outer() {
        return outer;
    }

    /** @return holes, clockwise (unmodifiable) */
    public List<Contour> holes() {
        return holes;
    }

    /** @return outer boundary followed by the holes */
    public List<Contour> contours() {
        return contours;
    }

    /** @return exact moments about the origin */
    public Moments moments() {
        return moments;
    }

    /** @return exact bounding box */
    public Bounds bounds() {
        return bounds;
    }

    /** @return this region moved by (dx, dy) */
    public Region translated(double dx, double dy) {
        List<Contour> hs = new ArrayList<>(holes.size());
        for (Contour h : holes) {
            hs.add(h.translated(dx, dy));
        }
        return new Region(outer.translated(dx, dy), hs);
    }

    /**
     * @param p         the point
     * @param tolerance distance within which a point counts as on the boundary, length unit
     * @return where p lies
     */
    public Location locate(Point2 p, double tolerance) {
        for (Contour k : contours) {
            for (Segment s : k.segments()) {
                if (Distances.toSegment(p, s) <= tolerance) {
                    return Location.BOUNDARY;
                }
            }
        }
        return Chords.winding(this, p) != 0 ? Location.INSIDE : Location.OUTSIDE;
    }
}
