package org.tensio.engine.profile;

import java.util.ArrayList;
import java.util.List;

import org.tensio.engine.geometry.ArcSegment;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.LineSegment;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Segment;

/**
 * Builds a closed {@link Contour} from the corners of a polygon, each corner optionally rounded by a true
 * circular arc tangent to both of its edges (a fillet at a re-entrant corner, an edge rounding at a convex
 * one). Corners are given in traversal order; the closing edge is implied.
 * <p>
 * Geometry of one rounded corner V with unit edge directions {@code dIn} (arriving) and {@code dOut}
 * (leaving) and turn angle φ: tangent points {@code T1 = V - L dIn}, {@code T2 = V + L dOut} with
 * {@code L = r tan(φ/2)} ({@code L = r} exactly for a right angle, so that axis-aligned edges stay exactly
 * axis-aligned), centre at distance r from both edges on the inside of the turn. The arc runs
 * counter-clockwise at a left turn and clockwise at a right turn.
 * <p>
 * Exact joints: each tangent point is one {@link Point2} object used as the end of one segment and the
 * start of the next. When two roundings use up an edge completely (the straight rest is within
 * {@code 4e-12} times the outline's size of zero, or overlaps by less than that) the straight piece is
 * dropped and both arcs share the tangent point of the smaller rounding. Zero radii give sharp corners
 * (no arc). Overlaps beyond that tolerance are rejected: the profile records validate their radii first,
 * so this is a safety net, not the user-facing check.
 */
final class RoundedOutline {

    private static final double JOIN_TOLERANCE = 4e-12;

    private final List<double[]> corners = new ArrayList<>();

    /** Adds a sharp corner at (x, y). */
    RoundedOutline corner(double x, double y) {
        return corner(x, y, 0);
    }

    /** Adds a corner at (x, y) rounded with radius {@code r} (0: sharp). */
    RoundedOutline corner(double x, double y, double r) {
        corners.add(new double[] {x, y, r});
        return this;
    }

    /**
     * Adds the end of a flange walked from its outer face towards the web: the sharp outer corner of the tip
     * (tipX, outerY), the tip's inner corner (tipX, innerY) rounded with {@code edgeRadius} and the root corner
     * (rootX, innerY) with {@code filletRadius}, where the flange's inner face meets the web.
     */
    RoundedOutline flangeToWeb(double tipX, double outerY, double innerY, double rootX, double edgeRadius,
            double filletRadius) {
        return corner(tipX, outerY).corner(tipX, innerY, edgeRadius).corner(rootX, innerY, filletRadius);
    }

    /** The same flange end as {@link #flangeToWeb} walked the other way: root, tip's inner corner, outer corner. */
    RoundedOutline webToFlange(double rootX, double innerY, double tipX, double outerY, double filletRadius,
            double edgeRadius) {
        return corner(rootX, innerY, filletRadius).corner(tipX, innerY, edgeRadius).corner(tipX, outerY);
    }

    /**
     * The fit of a flange's roundings as the profile records check it, in this order: the edge rounding on the
     * tip (at most the flange thickness), on the outstand (at most the outstand), and the root fillet between the
     * web and the tip's rounding (at most outstand − edge radius).
     *
     * @param edgeName      the edge radius's parameter name
     * @param outstandWhere how the outstand is measured, for the message (e.g. "(flangeWidth - webThickness)/2")
     * @param scale         the profile's size, for the tolerance of {@link Check#atMost}
     * @throws IllegalArgumentException naming the parameter when a rounding does not fit
     */
    static void checkFlangeRoundings(String edgeName, double edgeRadius, double filletRadius, double flangeThickness,
            double outstand, String outstandWhere, double scale) {
        Check.atMost(edgeName, edgeRadius, flangeThickness, scale, "on the flange tip, whose height is the flangeThickness");
        Check.atMost(edgeName, edgeRadius, outstand, scale, "on the flange outstand, " + outstandWhere);
        Check.atMost("filletRadius", filletRadius, outstand - edgeRadius, scale, "between the web and the flange tip");
    }

    /** @return the closed chain of line and arc segments */
    Contour contour() {
        int n = corners.size();
        if (n < 3) {
            throw new IllegalStateException("an outline needs at least 3 corners, got " + n);
        }
        double scale = 0;
        for (double[] c : corners) {
            scale = Math.max(scale, Math.max(Math.abs(c[0]), Math.abs(c[1])));
        }
        double tol = JOIN_TOLERANCE * scale;

        double[] tangentLength = new double[n];
        double[][] t1 = new double[n][];
        double[][] t2 = new double[n][];
        double[][] centre = new double[n][];
        boolean[] leftTurn = new boolean[n];
        for (int i = 0; i < n; i++) {
            double[] prev = corners.get((i + n - 1) % n);
            double[] v = corners.get(i);
            double[] next = corners.get((i + 1) % n);
            double[] dIn = unit(prev, v);
            double[] dOut = unit(v, next);
            double r = v[2];
            double cross = dIn[0] * dOut[1] - dIn[1] * dOut[0];
            double dot = dIn[0] * dOut[0] + dIn[1] * dOut[1];
            leftTurn[i] = cross > 0;
            if (r > 0) {
                if (cross == 0) {
                    throw new IllegalStateException("corner (" + v[0] + ", " + v[1] + ") is straight or a cusp"
                            + " and cannot be rounded");
                }
                double l = dot == 0 ? r : r * Math.tan(0.5 * Math.atan2(Math.abs(cross), dot));
                tangentLength[i] = l;
                t1[i] = new double[] {v[0] - l * dIn[0], v[1] - l * dIn[1]};
                t2[i] = new double[] {v[0] + l * dOut[0], v[1] + l * dOut[1]};
                double nx = leftTurn[i] ? -dIn[1] : dIn[1];
                double ny = leftTurn[i] ? dIn[0] : -dIn[0];
                centre[i] = new double[] {t1[i][0] + r * nx, t1[i][1] + r * ny};
            } else {
                t1[i] = new double[] {v[0], v[1]};
                t2[i] = t1[i];
            }
        }

        // edge i runs from corner i to corner i + 1
        boolean[] straight = new boolean[n];
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            double[] a = corners.get(i);
            double[] b = corners.get(j);
            double rest = Math.hypot(b[0] - a[0], b[1] - a[1]) - tangentLength[i] - tangentLength[j];
            if (rest < -tol) {
                throw new IllegalArgumentException("the roundings at (" + a[0] + ", " + a[1] + ") and (" + b[0]
                        + ", " + b[1] + ") overlap by " + (-rest) + " along their common edge");
            }
            straight[i] = rest > tol;
            if (!straight[i]) {
                if (tangentLength[i] == 0 && tangentLength[j] == 0) {
                    throw new IllegalStateException("corners " + i + " and " + j + " coincide");
                }
                if (tangentLength[i] <= tangentLength[j]) {
                    t1[j] = t2[i];
                } else {
                    t2[i] = t1[j];
                }
            }
        }

        Point2[] p1 = new Point2[n];
        Point2[] p2 = new Point2[n];
        for (int i = 0; i < n; i++) {
            p1[i] = new Point2(t1[i][0], t1[i][1]);
            p2[i] = t2[i] == t1[i] ? p1[i] : new Point2(t2[i][0], t2[i][1]);
        }
        // merged joints share one object, so segment ends are equal by construction
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            if (!straight[i]) {
                if (tangentLength[i] <= tangentLength[j]) {
                    p1[j] = p2[i];
                } else {
                    p2[i] = p1[j];
                }
            }
        }

        List<Segment> segments = new ArrayList<>(2 * n);
        for (int i = 0; i < n; i++) {
            if (corners.get(i)[2] > 0) {
                segments.add(ArcSegment.circular(new Point2(centre[i][0], centre[i][1]), p1[i], p2[i], leftTurn[i]));
            }
            if (straight[i]) {
                segments.add(new LineSegment(p2[i], p1[(i + 1) % n]));
            }
        }
        return new Contour(segments);
    }

    private static double[] unit(double[] from, double[] to) {
        double dx = to[0] - from[0];
        double dy = to[1] - from[1];
        double len = Math.hypot(dx, dy);
        if (!(len > 0)) {
            throw new IllegalStateException("corners (" + from[0] + ", " + from[1] + ") and (" + to[0] + ", "
                    + to[1] + ") coincide");
        }
        return new double[] {dx / len, dy / len};
    }
}
