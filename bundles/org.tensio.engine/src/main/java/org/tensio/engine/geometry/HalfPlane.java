package org.tensio.engine.geometry;

import java.util.ArrayList;
import java.util.List;

/**
 * The closed half-plane {@code nx·x + ny·y ≥ c} with a unit normal (nx, ny), and exact clipping of
 * boundaries against it.
 * <p>
 * Clipping keeps every piece of a contour that lies in the half-plane (lines cut at their crossing, arcs
 * cut at their exact crossing parameters) and closes the gaps with straight pieces along the cut line. A
 * clipped non-convex contour may come back as one chain with zero-width bridges along the cut line; its
 * {@link Moments} are nevertheless exact, because the contribution of any chain along a straight line
 * depends only on its end points.
 *
 * @param nx unit normal x
 * @param ny unit normal y
 * @param c  offset, length unit
 * @since 0.1
 */
public record HalfPlane(double nx, double ny, double c) {

    /** Normalises the normal; rejects a zero or non-finite one. */
    public HalfPlane {
        double len = Math.hypot(nx, ny);
        if (!(len > 0) || !Double.isFinite(len) || !Double.isFinite(c)) {
            throw new IllegalArgumentException("half-plane normal (" + nx + ", " + ny + ") and offset " + c
                    + " must be finite and non-zero");
        }
        nx /= len;
        ny /= len;
        c /= len;
    }

    /** @return {y ≥ y0} */
    public static HalfPlane above(double y0) {
        return new HalfPlane(0, 1, y0);
    }

    /** @return {y ≤ y0} */
    public static HalfPlane below(double y0) {
        return new HalfPlane(0, -1, -y0);
    }

    /** @return {x ≥ x0} */
    public static HalfPlane rightOf(double x0) {
        return new HalfPlane(1, 0, x0);
    }

    /** @return {x ≤ x0} */
    public static HalfPlane leftOf(double x0) {
        return new HalfPlane(-1, 0, -x0);
    }

    /** @return the signed distance of p from the boundary line, positive inside */
    public double height(Point2 p) {
        return nx * p.x() + ny * p.y() - c;
    }

    /** @return the complementary half-plane (sharing the boundary line) */
    public HalfPlane complement() {
        return new HalfPlane(-nx, -ny, -c);
    }

    /** @return exact moments of {@code region ∩ this} */
    public Moments clippedMoments(Region region) {
        Moments m = Moments.ZERO;
        for (Contour k : region.contours()) {
            m = m.plus(Moments.of(clip(k)));
        }
        return m;
    }

    /**
     * @return the chain bounding {@code contour ∩ this} (empty when nothing is inside; see the class comment on
     *         bridges)
     */
    public List<Segment> clip(Contour contour) {
        List<Segment> pieces = new ArrayList<>();
        for (Segment s : contour.segments()) {
            for (Segment piece : splitAtLine(s)) {
                if (height(piece.pointAt(0.5)) >= 0) {
                    pieces.add(piece);
                }
            }
        }
        List<Segment> out = new ArrayList<>(pieces.size() + 4);
        for (Segment p : pieces) {
            if (!out.isEmpty() && !out.get(out.size() - 1).end().equals(p.start())) {
                out.add(new LineSegment(out.get(out.size() - 1).end(), p.start()));
            }
            out.add(p);
        }
        if (!out.isEmpty() && !out.get(out.size() - 1).end().equals(out.get(0).start())) {
            out.add(new LineSegment(out.get(out.size() - 1).end(), out.get(0).start()));
        }
        return out;
    }

    /** @return the segment cut into pieces at its strict crossings of the boundary line */
    List<Segment> splitAtLine(Segment s) {
        if (s instanceof LineSegment l) {
            double h0 = height(l.start()), h1 = height(l.end());
            if ((h0 < 0 && h1 > 0) || (h0 > 0 && h1 < 0)) {
                double u = h0 / (h0 - h1);
                Point2 m = l.pointAt(u);
                return List.of(new LineSegment(l.start(), m), new LineSegment(m, l.end()));
            }
            return List.of(l);
        }
        ArcSegment arc = (ArcSegment) s;
        return splitArc(arc, arcRoots(arc));
    }

    /** Parameters (in sweep order, strictly inside the sweep) where the arc meets the boundary line. */
    double[] arcRoots(ArcSegment arc) {
        double r = Math.hypot(nx * arc.a(), ny * arc.b());
        double phi = Math.atan2(ny * arc.b(), nx * arc.a());
        double k = nx * arc.centre().x() + ny * arc.centre().y() - c;
        double q = -k / r;
        if (!(Math.abs(q) < 1)) {
            return new double[0];
        }
        double w = Math.acos(q);
        return sortedInside(arc, new double[] {phi + w, phi - w});
    }

    /** Parameters of the extremes of the height along the arc (where it turns), inside the sweep. */
    double[] arcExtremes(ArcSegment arc) {
        double phi = Math.atan2(ny * arc.b(), nx * arc.a());
        return sortedInside(arc, new double[] {phi, phi + Math.PI});
    }

    static double[] sortedInside(ArcSegment arc, double[] candidates) {
        double[] off = new double[candidates.length];
        int n = 0;
        for (double t : candidates) {
            double u = Angles.offset(t, arc.startParam(), arc.sweep());
            if (u > 1e-14 && u < Math.abs(arc.sweep()) - 1e-14) {
                off[n++] = u;
            }
        }
        double[] out = java.util.Arrays.copyOf(off, n);
        java.util.Arrays.sort(out);
        double sign = Math.signum(arc.sweep());
        double[] params = new double[n];
        for (int i = 0; i < n; i++) {
            params[i] = arc.startParam() + sign * out[i];
        }
        return params;
    }

    static List<Segment> splitArc(ArcSegment arc, double[] params) {
        if (params.length == 0) {
            return List.of(arc);
        }
        List<Segment> out = new ArrayList<>(params.length + 1);
        double t0 = arc.startParam();
        Point2 p0 = arc.start();
        for (double t : params) {
            Point2 p = arc.atParam(t);
            out.add(arc.sub(t0, t, p0, p));
            t0 = t;
            p0 = p;
        }
        out.add(arc.sub(t0, arc.endParam(), p0, arc.end()));
        return out;
    }
}
