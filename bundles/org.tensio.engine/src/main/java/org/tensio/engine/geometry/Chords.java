package org.tensio.engine.geometry;

import java.util.ArrayList;
import java.util.List;

/**
 * Exact crossings of a region's boundary with a straight line: the total chord width of the region along
 * the line, and the winding number used for point containment.
 * <p>
 * A point exactly on the line counts as lying on the positive side ({@code height ≥ 0}); arcs are first cut
 * where their height turns, so every piece crosses at most once. Tangent contacts therefore add no width.
 *
 * @since 0.1
 */
public final class Chords {

    /** One crossing: position s along the line direction, and whether the boundary goes up (+1) or down (−1). */
    record Crossing(double s, int sign) {
    }

    private Chords() {
    }

    /**
     * Total length of the line {@code line.height(p) = 0} that lies inside the region (sum over all
     * intervals, holes excluded). The line direction is (ny, −nx).
     */
    public static double width(Region region, HalfPlane line) {
        double w = 0;
        for (Crossing x : crossings(region, line)) {
            w += x.sign() * x.s();
        }
        return Math.abs(w);
    }

    /**
     * The intervals of the line {@code line.height(p) = 0} that lie inside the region, as positions
     * s = p·(ny, −nx) along the line direction, sorted. Each entry is {sIn, sOut}.
     */
    public static List<double[]> intervals(Region region, HalfPlane line) {
        List<Crossing> xs = new ArrayList<>(crossings(region, line));
        xs.sort((p, q) -> Double.compare(p.s(), q.s()));
        List<double[]> out = new ArrayList<>();
        int w = 0;
        double start = 0;
        for (Crossing x : xs) {
            int before = w;
            // walking along +s, a boundary going down (sign −1) is entered for a counter-clockwise outer contour
            w -= x.sign();
            if (before == 0 && w != 0) {
                start = x.s();
            } else if (before != 0 && w == 0 && x.s() > start) {
                out.add(new double[] {start, x.s()});
            }
        }
        return out;
    }

    /** @return winding number of the region's boundary about p: non-zero inside */
    static int winding(Region region, Point2 p) {
        HalfPlane ray = HalfPlane.above(p.y());
        int w = 0;
        for (Crossing x : crossings(region, ray)) {
            if (x.s() > p.x()) {
                w += x.sign();
            }
        }
        return w;
    }

    static List<Crossing> crossings(Region region, HalfPlane line) {
        List<Crossing> out = new ArrayList<>();
        double dx = line.ny(), dy = -line.nx();
        for (Contour k : region.contours()) {
            for (Segment s : k.segments()) {
                List<Segment> monotone = s instanceof ArcSegment arc
                        ? HalfPlane.splitArc(arc, line.arcExtremes(arc)) : List.of(s);
                for (Segment piece : monotone) {
                    double h0 = line.height(piece.start()), h1 = line.height(piece.end());
                    boolean in0 = h0 >= 0, in1 = h1 >= 0;
                    if (in0 == in1) {
                        continue;
                    }
                    Point2 at = crossingPoint(piece, line, h0, h1);
                    out.add(new Crossing(dx * at.x() + dy * at.y(), in1 ? 1 : -1));
                }
            }
        }
        return out;
    }

    private static Point2 crossingPoint(Segment piece, HalfPlane line, double h0, double h1) {
        if (piece instanceof ArcSegment arc) {
            double[] roots = line.arcRoots(arc);
            if (roots.length > 0) {
                return arc.atParam(roots[0]);
            }
            // the root lies at (within 1e-14 rad of) an end of the piece: take the end nearer the line
            return Math.abs(h0) <= Math.abs(h1) ? arc.start() : arc.end();
        }
        double u = h0 / (h0 - h1);
        return piece.pointAt(u);
    }
}
