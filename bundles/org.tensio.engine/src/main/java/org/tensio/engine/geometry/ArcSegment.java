package org.tensio.engine.geometry;

/**
 * An arc of an axis-aligned ellipse, {@code x = cx + a cos t, y = cy + b sin t}, for the parameter t
 * running from {@code startParam} to {@code startParam + sweep}. A positive sweep runs counter-clockwise.
 * With {@code a == b} the arc is circular and t is the polar angle about the centre.
 * <p>
 * The end points are stored as given (they must lie on the curve within {@link #TOLERANCE} relative to
 * the radius) so that neighbouring segments join exactly.
 *
 * @param centre     centre of the ellipse, length unit
 * @param a          semi-axis along x, length unit, &gt; 0
 * @param b          semi-axis along y, length unit, &gt; 0
 * @param startParam parameter at {@code start}, radians
 * @param sweep      signed parameter sweep, radians, 0 &lt; |sweep| &le; 2&pi;
 * @param start      first point
 * @param end        last point
 * @since 0.1
 */
public record ArcSegment(Point2 centre, double a, double b, double startParam, double sweep, Point2 start, Point2 end)
        implements Segment {

    /** Relative tolerance for end points lying on the curve. */
    public static final double TOLERANCE = 1e-7;

    /** Validates the radii, the sweep and that the end points lie on the curve. */
    public ArcSegment {
        if (centre == null || start == null || end == null) {
            throw new IllegalArgumentException("arc centre and end points must not be null");
        }
        if (!(a > 0) || !(b > 0) || !Double.isFinite(a) || !Double.isFinite(b)) {
            throw new IllegalArgumentException("arc semi-axes must be positive and finite, got a=" + a + ", b=" + b);
        }
        if (!Double.isFinite(startParam) || !Double.isFinite(sweep) || sweep == 0
                || Math.abs(sweep) > 2 * Math.PI * (1 + 1e-12)) {
            throw new IllegalArgumentException("arc sweep must be non-zero and at most a full turn, got " + sweep);
        }
        double size = Math.max(a, b);
        Point2 s = at(centre, a, b, startParam);
        Point2 e = at(centre, a, b, startParam + sweep);
        // slack for rounding of coordinates far from the origin (centre and end points round separately)
        double slack = 8 * Math.ulp(Math.max(Math.abs(centre.x()), Math.abs(centre.y())) + size);
        double tol = TOLERANCE * size + slack;
        if (s.distance(start) > tol || e.distance(end) > tol) {
            throw new IllegalArgumentException("arc end points " + start + " and " + end
                    + " do not lie on the arc about " + centre);
        }
    }

    /**
     * A circular arc about {@code centre} from {@code start} to {@code end}, turning counter-clockwise when
     * {@code ccw} is true. Equal start and end make a full circle.
     */
    public static ArcSegment circular(Point2 centre, Point2 start, Point2 end, boolean ccw) {
        double r0 = centre.distance(start);
        double r1 = centre.distance(end);
        if (!(r0 > 0) || Math.abs(r0 - r1) > TOLERANCE * Math.max(r0, r1) * 10) {
            throw new IllegalArgumentException("arc end points " + start + " and " + end
                    + " are not equidistant from centre " + centre);
        }
        double t0 = Math.atan2(start.y() - centre.y(), start.x() - centre.x());
        double t1 = Math.atan2(end.y() - centre.y(), end.x() - centre.x());
        double sweep = t1 - t0;
        if (ccw) {
            while (sweep <= 0) {
                sweep += 2 * Math.PI;
            }
        } else {
            while (sweep >= 0) {
                sweep -= 2 * Math.PI;
            }
        }
        double r = 0.5 * (r0 + r1);
        return new ArcSegment(centre, r, r, t0, sweep, start, end);
    }

    /**
     * The circular arc from {@code start} through {@code via} to {@code end}.
     *
     * @throws IllegalArgumentException when the three points are collinear or coincide
     */
    public static ArcSegment through(Point2 start, Point2 via, Point2 end) {
        double ax = start.x(), ay = start.y(), bx = via.x(), by = via.y(), cx = end.x(), cy = end.y();
        double d = 2 * (ax * (by - cy) + bx * (cy - ay) + cx * (ay - by));
        double scale = Math.max(start.distance(via), Math.max(via.distance(end), start.distance(end)));
        if (!(Math.abs(d) > 1e-12 * scale * scale)) {
            throw new IllegalArgumentException("arc through " + via + " from " + start + " to " + end
                    + " is degenerate: the three points are collinear or coincide");
        }
        double a2 = ax * ax + ay * ay, b2 = bx * bx + by * by, c2 = cx * cx + cy * cy;
        Point2 centre = new Point2((a2 * (by - cy) + b2 * (cy - ay) + c2 * (ay - by)) / d,
                (a2 * (cx - bx) + b2 * (ax - cx) + c2 * (bx - ax)) / d);
        // counter-clockwise when start, via, end turn left
        boolean ccw = d > 0;
        return circular(centre, start, end, ccw);
    }

    /** @return true when the arc is circular (equal semi-axes) */
    public boolean isCircular() {
        return a == b;
    }

    /** @return the end parameter, radians */
    public double endParam() {
        return startParam + sweep;
    }

    /** @return true when parameter t (mod 2π) lies within the closed sweep */
    public boolean inSweep(double t) {
        double u = Angles.offset(t, startParam, sweep);
        double eps = 1e-12;
        return u <= Math.abs(sweep) + eps || u >= 2 * Math.PI - eps;
    }

    /** @return t expressed as startParam + signed offset in the sweep direction (mod 2π) */
    public double unwrap(double t) {
        return Angles.unwrap(t, startParam, sweep);
    }

    /** @return the parameter of the point on the ellipse in the direction of p from the centre (scaled) */
    public double paramOf(Point2 p) {
        return Math.atan2((p.y() - centre.y()) / b, (p.x() - centre.x()) / a);
    }

    /** @return the tangent direction (not normalised) at parameter t, in the direction of travel */
    public Point2 tangentAt(double t) {
        double sg = Math.signum(sweep);
        return new Point2(-a * Math.sin(t) * sg, b * Math.cos(t) * sg);
    }

    /** @return the point at parameter t (not limited to the sweep) */
    public Point2 atParam(double t) {
        return at(centre, a, b, t);
    }

    private static Point2 at(Point2 c, double a, double b, double t) {
        return new Point2(c.x() + a * Math.cos(t), c.y() + b * Math.sin(t));
    }

    /**
     * @return the sub-arc between parameters {@code t0} and {@code t1} (both inside the sweep, in sweep
     *         order), with the given exact end points
     */
    public ArcSegment sub(double t0, double t1, Point2 p0, Point2 p1) {
        return new ArcSegment(centre, a, b, t0, t1 - t0, p0, p1);
    }

    @Override
    public ArcSegment reversed() {
        return new ArcSegment(centre, a, b, startParam + sweep, -sweep, end, start);
    }

    @Override
    public ArcSegment translated(double dx, double dy) {
        return new ArcSegment(centre.plus(dx, dy), a, b, startParam, sweep, start.plus(dx, dy), end.plus(dx, dy));
    }

    @Override
    public Point2 pointAt(double u) {
        if (u <= 0) {
            return start;
        }
        if (u >= 1) {
            return end;
        }
        return atParam(startParam + u * sweep);
    }

    @Override
    public double length() {
        if (isCircular()) {
            return a * Math.abs(sweep);
        }
        // composite Simpson on the speed |dp/dt|; smooth integrand, 256 panels is ample for reporting
        int n = 256;
        double h = sweep / n;
        double sum = 0;
        for (int i = 0; i <= n; i++) {
            double t = startParam + i * h;
            double f = Math.hypot(a * Math.sin(t), b * Math.cos(t));
            sum += (i == 0 || i == n) ? f : (i % 2 == 1 ? 4 * f : 2 * f);
        }
        return Math.abs(sum * h / 3);
    }
}
