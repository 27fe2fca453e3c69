package org.tensio.engine.section;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.valid.IsValidOp;
import org.locationtech.jts.operation.valid.TopologyValidationError;
import org.tensio.engine.geometry.ArcSegment;
import org.tensio.engine.geometry.Bounds;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.geometry.Segment;

/**
 * Checks that a {@link Section} is a valid plane figure: every contour simple, holes inside their outer
 * boundary and apart from each other, no part of (near) zero area, and the parts of a composite
 * section not overlapping. Touching is allowed: a hole may touch the outer boundary or another hole at
 * isolated points as long as the material stays connected, and composite parts may share boundary.
 * <p>
 * Method. Each contour is turned into a JTS {@link LinearRing}: straight segments exactly, arcs by chords
 * whose end points lie on the arc at parameter values that are whole multiples of a step
 * {@code 2π/n}, n a power of two, at most {@value #MAX_STEP_DEG}° and small enough that the chord error
 * (sagitta) is at most {@value #CHORD_ERROR} times the section's bounding-box diagonal. Because the
 * chord points sit on one fixed grid per radius, two arcs of the same circle (a core inside a tube) give
 * identical points where they run together, so densification alone does not create overlaps. The
 * topology checks are those of {@link IsValidOp} (OGC simple features rules for polygons, self-touching
 * rings invalid).
 * <p>
 * Tolerances.
 * <ul>
 * <li>Zero area: a contour or a part whose exact area satisfies |A| &le; {@value #ZERO_AREA} · d², d the
 * diagonal of its bounding box.</li>
 * <li>Overlap of parts: the JTS intersection area exceeds {@value #OVERLAP} times the smaller part's area
 * <em>and</em> the intersection's mean width (2 · area / perimeter) exceeds twice the chord error, so that
 * slivers left by densifying two different curves that touch are not reported.</li>
 * <li>Size: the section's diagonal must lie in [{@value #MIN_SIZE}, {@value #MAX_SIZE}] length units so
 * that products of second moments (length⁸) stay finite and normal doubles.</li>
 * </ul>
 * A single-use operation object in the JTS style; {@link #check(Section)} and {@link #validate(Section)}
 * are the static short cuts. Only the first problem found is reported: contours of part 0 (outer, then
 * holes in order), part 0 as a whole, then part 1 and so on, then overlaps of parts in index order.
 *
 * @since 0.1
 */
public final class SectionValidator {

    /** Largest angular step of the chords replacing an arc, degrees. */
    public static final double MAX_STEP_DEG = 0.5;
    /** Largest chord error (sagitta) relative to the section's bounding-box diagonal. */
    public static final double CHORD_ERROR = 1e-6;
    /** Relative area below which a contour or part counts as degenerate (times the squared bbox diagonal). */
    public static final double ZERO_AREA = 1e-12;
    /** Relative intersection area above which two parts overlap (times the smaller part's area). */
    public static final double OVERLAP = 1e-9;
    /** Greatest number of ring points of one section after densifying its arcs. */
    public static final int MAX_POINTS = 2_000_000;
    /**
     * Smallest section bounding-box diagonal accepted, length unit. Products of four second moments (length⁸, as
     * in Ixx·Iyy − Ixy² of unsymmetric bending and of the shear centre) must stay inside the normal double range
     * (about 1e±308): 1e-30 keeps them above 1e-240.
     */
    public static final double MIN_SIZE = 1e-30;
    /** Largest section bounding-box diagonal accepted, length unit (length⁸ stays below 1e240). */
    public static final double MAX_SIZE = 1e30;
    /** Value of {@link Problem#contour()} when the problem concerns a part as a whole. */
    public static final int WHOLE_PART = -1;

    /** What is wrong. */
    public enum Kind {
        /** The section is too large or too small for the numerics. */
        SIZE_OUT_OF_RANGE,
        /** Densified arcs would need more than {@link #MAX_POINTS} points. */
        TOO_MANY_POINTS,
        /** A contour or part has (near) zero area. */
        ZERO_AREA,
        /** A contour crosses or touches itself. */
        SELF_INTERSECTION,
        /** A hole lies wholly or partly outside the outer boundary, or crosses it. */
        HOLE_OUTSIDE,
        /** Two holes overlap, cross, coincide or one lies inside the other. */
        HOLES_OVERLAP,
        /** Holes touch each other or the outer boundary so that the material falls apart. */
        DISCONNECTED_INTERIOR,
        /** Another topology error reported by JTS. */
        INVALID,
        /** Two parts of a composite section overlap. */
        PARTS_OVERLAP,
        /** The geometry could not be checked (a JTS robustness failure); treated as invalid. */
        CHECK_FAILED
    }

    /**
     * One problem.
     *
     * @param kind      what is wrong
     * @param part      index of the part concerned (the later one for an overlap)
     * @param contour   {@code 0} outer boundary, {@code k + 1} hole k (in the order given to the region), or
     *                  {@link #WHOLE_PART}
     * @param otherPart for {@link Kind#PARTS_OVERLAP} the earlier part; otherwise -1
     * @param location  a point where the problem is (on or near the densified boundary), or null
     * @param message   one line naming the section, the part when there are several, the contour and the
     *                  value (location, area)
     */
    public record Problem(Kind kind, int part, int contour, int otherPart, Point2 location, String message) {
    }

    private final Section section;
    private final GeometryFactory factory = new GeometryFactory();
    private double chordError;
    private int points;
    private Optional<Problem> result;

    /** @param section the section to check, not null */
    public SectionValidator(Section section) {
        if (section == null) {
            throw new IllegalArgumentException("section must not be null");
        }
        this.section = section;
    }

    /** @return the first problem of {@code section}, or empty when it is valid */
    public static Optional<Problem> check(Section section) {
        return new SectionValidator(section).problem();
    }

    /**
     * @throws IllegalArgumentException with the first problem's message when {@code section} is not valid
     */
    public static void validate(Section section) {
        Optional<Problem> p = check(section);
        if (p.isPresent()) {
            throw new IllegalArgumentException(p.get().message());
        }
    }

    /** @return the first problem, or empty when the section is valid; computed once */
    public Optional<Problem> problem() {
        if (result == null) {
            result = Optional.ofNullable(run());
        }
        return result;
    }

    private Problem run() {
        double size = section.bounds().diagonal();
        if (!(size >= MIN_SIZE && size <= MAX_SIZE)) {
            if (size == 0) {
                return problem(Kind.ZERO_AREA, 0, WHOLE_PART, -1, null, "has zero size");
            }
            return problem(Kind.SIZE_OUT_OF_RANGE, 0, WHOLE_PART, -1, null, "bounding-box diagonal " + fmt(size)
                    + " is outside the supported range " + fmt(MIN_SIZE) + " to " + fmt(MAX_SIZE));
        }
        chordError = CHORD_ERROR * size;
        List<SectionPart> parts = section.parts();
        List<Polygon> polygons = new ArrayList<>(parts.size());
        for (int i = 0; i < parts.size(); i++) {
            Polygon[] out = new Polygon[1];
            Problem p = checkPart(i, parts.get(i).region(), out);
            if (p != null) {
                return p;
            }
            polygons.add(out[0]);
        }
        for (int j = 1; j < parts.size(); j++) {
            for (int i = 0; i < j; i++) {
                Problem p = checkOverlap(i, j, polygons.get(i), polygons.get(j),
                        parts.get(i).region().moments().area(), parts.get(j).region().moments().area());
                if (p != null) {
                    return p;
                }
            }
        }
        return null;
    }

    private Problem checkPart(int part, Region region, Polygon[] out) {
        List<Contour> contours = region.contours();
        LinearRing[] rings = new LinearRing[contours.size()];
        for (int k = 0; k < contours.size(); k++) {
            Contour c = contours.get(k);
            double d = c.bounds().diagonal();
            double a = c.signedArea();
            if (!Double.isFinite(a)) {
                return problem(Kind.SIZE_OUT_OF_RANGE, part, k, -1, null, "area is not finite (coordinates too large)");
            }
            Bounds cb = c.bounds();
            boolean zero = Math.abs(a) <= ZERO_AREA * d * d;
            // a loop that is flat (one side of its box almost nil) is reported as having zero area; one that
            // is not flat but has a zero signed area crosses itself (a bow tie), which is the better message
            boolean flat = Math.min(cb.width(), cb.height()) <= 1e-6 * d;
            String zeroArea = "encloses zero area (area " + fmt(Math.abs(a)) + ", bounding box " + fmt(cb.width())
                    + " × " + fmt(cb.height()) + ")";
            Point2 first = c.segments().get(0).start();
            if (zero && flat) {
                return problem(Kind.ZERO_AREA, part, k, -1, first, zeroArea);
            }
            Coordinate[] coords = densify(c);
            if (coords == null) {
                return problem(Kind.TOO_MANY_POINTS, part, k, -1, null,
                        "needs more than " + MAX_POINTS + " points once its arcs are divided into chords");
            }
            if (coords.length < 4) {
                return problem(Kind.ZERO_AREA, part, k, -1, first, zeroArea);
            }
            rings[k] = factory.createLinearRing(coords);
            IsValidOp alone = new IsValidOp(factory.createPolygon(rings[k]));
            if (!alone.isValid()) {
                TopologyValidationError e = alone.getValidationError();
                Point2 at = point(e.getCoordinate());
                if (e.getErrorType() == TopologyValidationError.TOO_FEW_POINTS) {
                    return problem(Kind.ZERO_AREA, part, k, -1, at, zeroArea);
                }
                return problem(Kind.SELF_INTERSECTION, part, k, -1, at,
                        "intersects itself" + (at == null ? "" : " at " + fmt(at)));
            }
            if (zero) {
                return problem(Kind.ZERO_AREA, part, k, -1, first, zeroArea);
            }
        }
        LinearRing[] holes = new LinearRing[rings.length - 1];
        System.arraycopy(rings, 1, holes, 0, holes.length);
        Polygon polygon = factory.createPolygon(rings[0], holes);
        IsValidOp op = new IsValidOp(polygon);
        if (!op.isValid()) {
            return holeProblem(part, rings, op.getValidationError());
        }
        Bounds b = region.bounds();
        double area = region.moments().area();
        double d = b.diagonal();
        if (Math.abs(area) <= ZERO_AREA * d * d) {
            return problem(Kind.ZERO_AREA, part, WHOLE_PART, -1, null, "material area is zero or nearly so (area "
                    + fmt(area) + ", bounding box " + fmt(b.width()) + " × " + fmt(b.height()) + ")");
        }
        out[0] = polygon;
        return null;
    }

    private Problem holeProblem(int part, LinearRing[] rings, TopologyValidationError e) {
        Point2 at = point(e.getCoordinate());
        List<Integer> near = ringsNear(rings, e.getCoordinate());
        int hole = near.isEmpty() ? WHOLE_PART : near.get(near.size() - 1);
        int other = near.size() >= 2 ? near.get(near.size() - 2) : -1;
        String where = at == null ? "" : " at " + fmt(at);
        switch (e.getErrorType()) {
            case TopologyValidationError.HOLE_OUTSIDE_SHELL:
                return problem(Kind.HOLE_OUTSIDE, part, hole, -1, at, "lies outside the outer boundary" + where);
            case TopologyValidationError.NESTED_HOLES:
                return problem(Kind.HOLES_OVERLAP, part, hole, -1, at, "lies inside another void" + where);
            case TopologyValidationError.DISCONNECTED_INTERIOR:
                return problem(Kind.DISCONNECTED_INTERIOR, part, hole, -1, at,
                        "touches " + (other == 0 ? "the " : "") + label(other)
                                + " so that the material is cut into pieces" + where);
            case TopologyValidationError.SELF_INTERSECTION:
            case TopologyValidationError.DUPLICATE_RINGS:
                if (near.size() >= 2 && near.get(0) == 0) {
                    return problem(Kind.HOLE_OUTSIDE, part, hole, -1, at,
                            "crosses or runs along the outer boundary" + where);
                }
                if (near.size() >= 2) {
                    return problem(Kind.HOLES_OVERLAP, part, hole, -1, at,
                            "overlaps or runs along " + label(other) + where);
                }
                return problem(Kind.INVALID, part, hole, -1, at, e.getMessage() + where);
            default:
                return problem(Kind.INVALID, part, hole, -1, at, e.getMessage() + where);
        }
    }

    private Problem checkOverlap(int i, int j, Polygon a, Polygon b, double areaA, double areaB) {
        Envelope ea = a.getEnvelopeInternal();
        Envelope eb = b.getEnvelopeInternal();
        if (!ea.intersects(eb)) {
            return null;
        }
        try {
            if (!a.intersects(b)) {
                return null;
            }
            Geometry x = a.intersection(b);
            double area = x.getArea();
            double limit = OVERLAP * Math.min(Math.abs(areaA), Math.abs(areaB));
            if (area > limit && area > chordError * x.getLength()) {
                Point2 at = point(x.getInteriorPoint().getCoordinate());
                return problem(Kind.PARTS_OVERLAP, j, WHOLE_PART, i, at,
                        "overlaps part " + i + " by an area of " + fmt(area)
                                + (at == null ? "" : " around " + fmt(at)));
            }
            return null;
        } catch (RuntimeException ex) {
            return problem(Kind.CHECK_FAILED, j, WHOLE_PART, i, null,
                    "could not be checked for overlap with part " + i + " (" + ex.getMessage() + ")");
        }
    }

    /** @return indices of the rings that pass within a small distance of c, in ring order */
    private List<Integer> ringsNear(LinearRing[] rings, Coordinate c) {
        List<Integer> near = new ArrayList<>();
        if (c == null) {
            return near;
        }
        double tol = 10 * chordError;
        for (int k = 0; k < rings.length; k++) {
            if (distance(c, rings[k].getCoordinates()) <= tol) {
                near.add(k);
            }
        }
        return near;
    }

    private static double distance(Coordinate p, Coordinate[] ring) {
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i + 1 < ring.length; i++) {
            Coordinate a = ring[i], b = ring[i + 1];
            double dx = b.x - a.x, dy = b.y - a.y;
            double len2 = dx * dx + dy * dy;
            double u = len2 > 0 ? ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2 : 0;
            u = Math.max(0, Math.min(1, u));
            best = Math.min(best, Math.hypot(p.x - (a.x + u * dx), p.y - (a.y + u * dy)));
        }
        return best;
    }

    /** @return the closed ring of chord points of c, or null when the point budget is exceeded */
    private Coordinate[] densify(Contour c) {
        List<Coordinate> out = new ArrayList<>();
        for (Segment s : c.segments()) {
            add(out, s.start().x(), s.start().y());
            if (s instanceof ArcSegment arc && !chords(arc, out)) {
                return null;
            }
        }
        Coordinate first = out.get(0);
        add(out, first.x, first.y);
        if (out.size() == 1) {
            out.add(new Coordinate(first));
        }
        points += out.size();
        if (points > MAX_POINTS) {
            return null;
        }
        return out.toArray(new Coordinate[0]);
    }

    /** Adds the interior chord points of arc (its start already added); false when over budget. */
    private boolean chords(ArcSegment arc, List<Coordinate> out) {
        double r = Math.max(arc.a(), arc.b());
        double t0 = arc.startParam();
        double t1 = arc.endParam();
        // sagitta r (1 − cos(h/2)) = 2 r sin²(h/4) ≤ chordError, in the form that stays accurate for tiny ratios
        double sagittaStep = 4 * Math.asin(Math.min(1, Math.sqrt(chordError / (2 * r))));
        double step = Math.min(Math.toRadians(MAX_STEP_DEG), sagittaStep);
        if (Math.abs(t1 - t0) <= step) {
            return true; // the chord between the end points is already within both limits
        }
        long n = 1024;
        while (2 * Math.PI / n > step && n < (1L << 50)) {
            n *= 2;
        }
        double h = 2 * Math.PI / n;
        double eps = 0.01 * h;
        double cx = arc.centre().x(), cy = arc.centre().y(), a = arc.a(), b = arc.b();
        double count = Math.ceil(Math.abs(t1 - t0) / h) + 1;
        if (points + out.size() + count > MAX_POINTS) {
            return false;
        }
        if (t1 > t0) {
            for (long k = (long) Math.floor(t0 / h) + 1; k * h < t1 - eps; k++) {
                double t = k * h;
                if (t > t0 + eps) {
                    add(out, cx + a * Math.cos(t), cy + b * Math.sin(t));
                }
            }
        } else {
            for (long k = (long) Math.ceil(t0 / h) - 1; k * h > t1 + eps; k--) {
                double t = k * h;
                if (t < t0 - eps) {
                    add(out, cx + a * Math.cos(t), cy + b * Math.sin(t));
                }
            }
        }
        return true;
    }

    private static void add(List<Coordinate> out, double x, double y) {
        if (!out.isEmpty()) {
            Coordinate last = out.get(out.size() - 1);
            if (last.x == x && last.y == y) {
                return;
            }
        }
        out.add(new Coordinate(x, y));
    }

    private Problem problem(Kind kind, int part, int contour, int other, Point2 at, String what) {
        StringBuilder sb = new StringBuilder("section '").append(section.name()).append("'");
        if (section.parts().size() > 1) {
            sb.append(", part ").append(part);
        }
        sb.append(": ");
        if (contour != WHOLE_PART) {
            sb.append(label(contour)).append(' ');
        }
        sb.append(what);
        return new Problem(kind, part, contour, other, at, sb.toString());
    }

    private static String label(int contour) {
        if (contour == 0) {
            return "outer boundary";
        }
        if (contour > 0) {
            return "void " + (contour - 1);
        }
        return "other boundary";
    }

    private static Point2 point(Coordinate c) {
        if (c == null || !Double.isFinite(c.x) || !Double.isFinite(c.y)) {
            return null;
        }
        return new Point2(c.x, c.y);
    }

    private static String fmt(Point2 p) {
        return "(" + fmt(p.x()) + ", " + fmt(p.y()) + ")";
    }

    /** @return value with at most 7 significant digits, no trailing zeros */
    static String fmt(double value) {
        if (!Double.isFinite(value)) {
            return Double.toString(value);
        }
        if (value == 0) {
            return "0";
        }
        BigDecimal v = new BigDecimal(value).round(new MathContext(7)).stripTrailingZeros();
        return Math.abs(value) >= 1e-6 && Math.abs(value) < 1e15 ? v.toPlainString() : v.toString();
    }
}
