package org.tensio.engine.geometry;

/** Point-to-curve distances, length unit. */
final class Distances {

    private Distances() {
    }

    static double toSegment(Point2 p, Segment s) {
        if (s instanceof LineSegment l) {
            double ax = l.start().x(), ay = l.start().y();
            double dx = l.end().x() - ax, dy = l.end().y() - ay;
            double len2 = dx * dx + dy * dy;
            double u = len2 == 0 ? 0 : ((p.x() - ax) * dx + (p.y() - ay) * dy) / len2;
            u = Math.max(0, Math.min(1, u));
            return Math.hypot(p.x() - (ax + u * dx), p.y() - (ay + u * dy));
        }
        ArcSegment arc = (ArcSegment) s;
        double ends = Math.min(p.distance(arc.start()), p.distance(arc.end()));
        if (arc.isCircular()) {
            double t = Math.atan2(p.y() - arc.centre().y(), p.x() - arc.centre().x());
            if (Angles.inSweep(t, arc.startParam(), arc.sweep())) {
                return Math.min(ends, Math.abs(p.distance(arc.centre()) - arc.a()));
            }
            return ends;
        }
        // elliptic arc: coarse sampling then golden-section refinement of the parameter
        int n = 128;
        double best = Double.POSITIVE_INFINITY;
        int bi = 0;
        for (int i = 0; i <= n; i++) {
            double d = p.distance(arc.pointAt((double) i / n));
            if (d < best) {
                best = d;
                bi = i;
            }
        }
        double lo = Math.max(0, (bi - 1.0) / n), hi = Math.min(1, (bi + 1.0) / n);
        final double g = (Math.sqrt(5) - 1) / 2;
        for (int it = 0; it < 60; it++) {
            double m1 = hi - g * (hi - lo), m2 = lo + g * (hi - lo);
            if (p.distance(arc.pointAt(m1)) < p.distance(arc.pointAt(m2))) {
                hi = m2;
            } else {
                lo = m1;
            }
        }
        return Math.min(best, p.distance(arc.pointAt(0.5 * (lo + hi))));
    }
}
