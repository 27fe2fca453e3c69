package org.tensio.engine.geometry;

import java.util.ArrayList;
import java.util.List;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

import org.tensio.engine.verification.Generators;
import org.tensio.engine.verification.Verify;

/**
 * Exact half-plane clipping ({@link HalfPlane#clippedMoments}) against independent facts:
 * <ul>
 * <li>additivity: clip + complementary clip = whole region (the common boundary line has no area);</li>
 * <li>translation covariance, i.e. the parallel-axis theorem applied to the clipped piece;</li>
 * <li>an independent Sutherland–Hodgman clip of star polygons (Sutherland &amp; Hodgman, "Reentrant polygon
 * clipping", CACM 17(1), 1974 — from memory), whose degenerate bridge edges along the cut line carry no area,
 * integrated with the shoelace-type polygon moment formulas (Steger, "On the calculation of arbitrary
 * moments of polygons", 1996 — from memory);</li>
 * <li>the circular segment: area r²·acos(d/r) − d·√(r² − d²) for a cut at distance d from the centre (Roark,
 * 8th ed., Table A.1, circular segment — from memory).</li>
 * </ul>
 * Tolerance: all of these are exact, so the differences are rounding of sums of O(size^k) terms: 1e-12 times
 * the matching power of the size (size ≤ 2 for the generated regions, moments about the origin).
 */
class HalfPlaneClipPropertiesTest {

    private static final double REL = 1e-12;

    @Provide
    Arbitrary<Region> regions() {
        return Generators.regions();
    }

    @Provide
    Arbitrary<HalfPlane> halfPlanes() {
        // offsets reach beyond the generated regions (size ≤ 2 about the origin) so empty and full clips occur
        return net.jqwik.api.Combinators.combine(Arbitraries.doubles().between(0, 6.283185).ofScale(6),
                Arbitraries.doubles().between(-2.5, 2.5).ofScale(6))
                .as((t, c) -> new HalfPlane(Math.cos(t), Math.sin(t), c));
    }

    private static void sameMoments(Moments expected, Moments actual, double size, String what) {
        double s2 = size * size, s3 = s2 * size, s4 = s3 * size;
        Verify.closeAbs(expected.area(), actual.area(), REL * s2, what + ": area");
        Verify.closeAbs(expected.sx(), actual.sx(), REL * s3, what + ": ∫x");
        Verify.closeAbs(expected.sy(), actual.sy(), REL * s3, what + ": ∫y");
        Verify.closeAbs(expected.sxx(), actual.sxx(), REL * s4, what + ": ∫x²");
        Verify.closeAbs(expected.syy(), actual.syy(), REL * s4, what + ": ∫y²");
        Verify.closeAbs(expected.sxy(), actual.sxy(), REL * s4, what + ": ∫xy");
    }

    private static double size(Region r) {
        Bounds b = r.bounds();
        return Math.max(Math.max(Math.abs(b.minX()), Math.abs(b.maxX())), Math.max(Math.abs(b.minY()), Math.abs(b.maxY())));
    }

    @Property(tries = 200)
    void clipPlusComplementIsTheWhole(@ForAll("regions") Region r, @ForAll("halfPlanes") HalfPlane h) {
        Moments sum = h.clippedMoments(r).plus(h.complement().clippedMoments(r));
        sameMoments(r.moments(), sum, size(r), "clip + complement");
    }

    @Property(tries = 200)
    void clipThroughAVertexPlusComplementIsTheWhole(@ForAll("starVertices") List<Point2> v, @ForAll int pick,
            @ForAll("directions") double t) {
        // the cut line passes exactly through one vertex: the degenerate case of the h ≥ 0 rule
        Region r = new Region(Contour.polygon(v));
        Point2 p = v.get(Math.floorMod(pick, v.size()));
        HalfPlane h = new HalfPlane(Math.cos(t), Math.sin(t), Math.cos(t) * p.x() + Math.sin(t) * p.y());
        Moments sum = h.clippedMoments(r).plus(h.complement().clippedMoments(r));
        sameMoments(r.moments(), sum, 1, "clip through a vertex + complement");
    }

    @Provide
    Arbitrary<List<Point2>> starVertices() {
        return Generators.starVertices();
    }

    @Provide
    Arbitrary<Double> directions() {
        return Arbitraries.doubles().between(0, 6.283185).ofScale(6);
    }

    @Property(tries = 200)
    void clippingCommutesWithTranslation(@ForAll("regions") Region r, @ForAll("halfPlanes") HalfPlane h,
            @ForAll("shifts") double dx, @ForAll("shifts") double dy) {
        Moments m = h.clippedMoments(r);
        HalfPlane moved = new HalfPlane(h.nx(), h.ny(), h.c() + h.nx() * dx + h.ny() * dy);
        Moments q = moved.clippedMoments(r.translated(dx, dy));
        // parallel-axis / Steiner terms for the shift (dx, dy)
        Moments expected = new Moments(m.area(), m.sx() + dx * m.area(), m.sy() + dy * m.area(),
                m.sxx() + 2 * dx * m.sx() + dx * dx * m.area(), m.syy() + 2 * dy * m.sy() + dy * dy * m.area(),
                m.sxy() + dx * m.sy() + dy * m.sx() + dx * dy * m.area());
        sameMoments(expected, q, size(r) + Math.max(Math.abs(dx), Math.abs(dy)), "shifted clip");
    }

    @Provide
    Arbitrary<Double> shifts() {
        return Arbitraries.doubles().between(-10, 10).ofScale(6);
    }

    @Property(tries = 200)
    void clipOfAPolygonMatchesSutherlandHodgman(@ForAll("starVertices") List<Point2> v, @ForAll("halfPlanes") HalfPlane h) {
        Region r = new Region(Contour.polygon(v));
        List<double[]> kept = new ArrayList<>();
        int n = v.size();
        for (int i = 0; i < n; i++) {
            Point2 p = v.get(i), q = v.get((i + 1) % n);
            double hp = h.height(p), hq = h.height(q);
            if (hp >= 0) {
                kept.add(new double[] {p.x(), p.y()});
            }
            if ((hp >= 0) != (hq >= 0)) {
                double u = hp / (hp - hq);
                kept.add(new double[] {p.x() + u * (q.x() - p.x()), p.y() + u * (q.y() - p.y())});
            }
        }
        sameMoments(polygonMoments(kept), h.clippedMoments(r), 1, "Sutherland–Hodgman");
    }

    /** Green's-theorem moments of a closed polygon (independent of the engine's Moments.of). */
    private static Moments polygonMoments(List<double[]> p) {
        double a = 0, sx = 0, sy = 0, sxx = 0, syy = 0, sxy = 0;
        for (int i = 0; i < p.size(); i++) {
            double x0 = p.get(i)[0], y0 = p.get(i)[1];
            double x1 = p.get((i + 1) % p.size())[0], y1 = p.get((i + 1) % p.size())[1];
            double c = x0 * y1 - x1 * y0;
            a += c / 2;
            sx += (x0 + x1) * c / 6;
            sy += (y0 + y1) * c / 6;
            sxx += (x0 * x0 + x0 * x1 + x1 * x1) * c / 12;
            syy += (y0 * y0 + y0 * y1 + y1 * y1) * c / 12;
            sxy += (x0 * y1 + 2 * x0 * y0 + 2 * x1 * y1 + x1 * y0) * c / 24;
        }
        return new Moments(a, sx, sy, sxx, syy, sxy);
    }

    @Property(tries = 200)
    void circularSegmentArea(@ForAll("discRadii") double r, @ForAll("directions") double t,
            @ForAll("fractions") double f) {
        // disc centred at (0.3, −0.2); cut at signed distance d = f·r from the centre, keeping the far side
        Point2 c = new Point2(0.3, -0.2);
        Region disc = new Region(Contour.circle(c, r));
        double d = f * r;
        HalfPlane h = new HalfPlane(Math.cos(t), Math.sin(t), Math.cos(t) * c.x() + Math.sin(t) * c.y() + d);
        double segment = r * r * Math.acos(d / r) - d * Math.sqrt(r * r - d * d);
        Verify.closeAbs(segment, h.clippedMoments(disc).area(), REL * 4 * r * r, "circular segment area");
        // its centroid lies on the normal through the centre at 2(r² − d²)^{3/2} / (3·segment) (Roark, from memory);
        // checked where the segment holds at least 1 % of r², so that dividing ∫x dA by the area amplifies the
        // rounding of the first moments by at most 100: 1e-9·r is then ample
        if (segment > 1e-2 * r * r) {
            Moments m = h.clippedMoments(disc);
            double dist = 2 * Math.pow(r * r - d * d, 1.5) / (3 * segment);
            double along = (m.sx() / m.area() - c.x()) * Math.cos(t) + (m.sy() / m.area() - c.y()) * Math.sin(t);
            Verify.closeAbs(dist, along, 1e-9 * r, "segment centroid distance from the centre");
        }
    }

    @Provide
    Arbitrary<Double> discRadii() {
        return Arbitraries.doubles().between(0.05, 2).ofScale(6);
    }

    @Provide
    Arbitrary<Double> fractions() {
        return Arbitraries.doubles().between(-0.999, 0.999).ofScale(6);
    }
}
