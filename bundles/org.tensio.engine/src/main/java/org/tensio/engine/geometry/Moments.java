package org.tensio.engine.geometry;

/**
 * Area moments up to second order of a plane region about the frame's origin, all exact (no polygon
 * approximation of arcs): {@code area = ∫dA}, {@code sx = ∫x dA}, {@code sy = ∫y dA}, {@code sxx = ∫x² dA},
 * {@code syy = ∫y² dA}, {@code sxy = ∫xy dA}. Units: length², length³, length⁴.
 * <p>
 * Values are signed: a clockwise contour gives negative moments, so holes (clockwise) subtract. The sums
 * are accumulated segment by segment from Green's theorem; each straight segment contributes the signed
 * triangle (origin, start, end), each arc additionally its signed elliptic sector.
 *
 * @param area area
 * @param sx   first moment ∫x dA
 * @param sy   first moment ∫y dA
 * @param sxx  ∫x² dA
 * @param syy  ∫y² dA
 * @param sxy  ∫xy dA
 * @since 0.1
 */
public record Moments(double area, double sx, double sy, double sxx, double syy, double sxy) {

    /** No region. */
    public static final Moments ZERO = new Moments(0, 0, 0, 0, 0, 0);

    /** @return the componentwise sum */
    public Moments plus(Moments o) {
        return new Moments(area + o.area, sx + o.sx, sy + o.sy, sxx + o.sxx, syy + o.syy, sxy + o.sxy);
    }

    /** @return every moment multiplied by {@code f} (e.g. a modular ratio) */
    public Moments times(double f) {
        return new Moments(f * area, f * sx, f * sy, f * sxx, f * syy, f * sxy);
    }

    /** @return the moments of a contour (closed chain of segments) */
    public static Moments of(Iterable<? extends Segment> segments) {
        double[] acc = new double[6];
        for (Segment s : segments) {
            accumulate(s, acc);
        }
        return new Moments(acc[0], acc[1], acc[2], acc[3], acc[4], acc[5]);
    }

    /** @return the moments of one segment's signed fan region (origin, segment); meaningful summed over a closed chain */
    public static Moments ofSegment(Segment s) {
        double[] acc = new double[6];
        accumulate(s, acc);
        return new Moments(acc[0], acc[1], acc[2], acc[3], acc[4], acc[5]);
    }

    private static void accumulate(Segment s, double[] acc) {
        if (s instanceof LineSegment l) {
            triangle(l.start(), l.end(), acc);
        } else if (s instanceof ArcSegment arc) {
            // fan (O, P0, arc, P1) = triangle(O, P0, C) + triangle(O, C, P1) + sector(C; P0 -> P1)
            triangle(arc.start(), arc.centre(), acc);
            triangle(arc.centre(), arc.end(), acc);
            sector(arc, acc);
        }
    }

    /** Signed triangle (origin, p, q). */
    private static void triangle(Point2 p, Point2 q, double[] acc) {
        double x0 = p.x(), y0 = p.y(), x1 = q.x(), y1 = q.y();
        double c = x0 * y1 - x1 * y0;
        acc[0] += c / 2;
        acc[1] += (x0 + x1) * c / 6;
        acc[2] += (y0 + y1) * c / 6;
        acc[3] += (x0 * x0 + x0 * x1 + x1 * x1) * c / 12;
        acc[4] += (y0 * y0 + y0 * y1 + y1 * y1) * c / 12;
        acc[5] += (x0 * y1 + 2 * x0 * y0 + 2 * x1 * y1 + x1 * y0) * c / 24;
    }

    /**
     * Signed elliptic sector between the centre and the arc: the affine image (x = a u, y = b v) of a unit
     * circular sector, so ∫x^m y^n dA = a^(m+1) b^(n+1) ∫u^m v^n du dv, then shifted to the centre.
     */
    private static void sector(ArcSegment arc, double[] acc) {
        double a = arc.a(), b = arc.b();
        double t0 = arc.startParam(), t1 = arc.endParam(), dt = arc.sweep();
        double s0 = Math.sin(t0), s1 = Math.sin(t1), c0 = Math.cos(t0), c1 = Math.cos(t1);
        double sin2d = Math.sin(2 * t1) - Math.sin(2 * t0);
        double cos2d = Math.cos(2 * t0) - Math.cos(2 * t1);
        double uA = dt / 2;
        double uX = (s1 - s0) / 3;
        double uY = (c0 - c1) / 3;
        double uXX = (dt + sin2d / 2) / 8;
        double uYY = (dt - sin2d / 2) / 8;
        double uXY = cos2d / 16;
        double area = a * b * uA;
        double mx = a * a * b * uX;
        double my = a * b * b * uY;
        double mxx = a * a * a * b * uXX;
        double myy = a * b * b * b * uYY;
        double mxy = a * a * b * b * uXY;
        double cx = arc.centre().x(), cy = arc.centre().y();
        acc[0] += area;
        acc[1] += mx + cx * area;
        acc[2] += my + cy * area;
        acc[3] += mxx + 2 * cx * mx + cx * cx * area;
        acc[4] += myy + 2 * cy * my + cy * cy * area;
        acc[5] += mxy + cx * my + cy * mx + cx * cy * area;
    }
}
