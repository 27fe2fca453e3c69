package org.tensio.engine.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.tensio.engine.profile.ProfileAssertions.EXACT;
import static org.tensio.engine.profile.ProfileAssertions.arcs;
import static org.tensio.engine.profile.ProfileAssertions.arcsOfRadius;
import static org.tensio.engine.profile.ProfileAssertions.assertCentredBounds;
import static org.tensio.engine.profile.ProfileAssertions.assertMoments;
import static org.tensio.engine.profile.ProfileAssertions.assertRejected;
import static org.tensio.engine.profile.ProfileAssertions.assertRel;

import org.junit.jupiter.api.Test;
import org.tensio.engine.geometry.Moments;
import org.tensio.engine.geometry.Region;

/** I-section: closed forms with fillets, published rolled sections, validation. */
class IShapeProfileTest {

    private static final String HAND = "geometry, hand derivation written out here";
    private static final String EURONORM = "EN 10365:2017 section table, as in the ArcelorMittal sales programme (from memory), "
            + "4 significant figures";

    /**
     * Spandrel (fillet material in a corner, radius r) about a line through its corner parallel to one leg,
     * hand derivation: square r⁴/3 minus the quarter disc about that line,
     * πr⁴/16 + r²·πr²/4 − 2r·r³/3 (parallel axis at distance r from the disc centre) gives
     * J0 = r⁴/3 − (5π/16 − 2/3) r⁴ = (1 − 5π/16) r⁴; its first moment about the same line is
     * r³/2 − (πr²/4·r − r³/3) = (10 − 3π) r³/12; area (1 − π/4) r².
     * About a parallel axis at signed distance c from the corner line, with the spandrel on the side
     * {@code s = ±1}: ∫y² dA = (1 − π/4) r² c² + 2 s c (10 − 3π) r³/12 + (1 − 5π/16) r⁴.
     */
    private static double spandrelIx(double r, double c, int s) {
        return (1 - Math.PI / 4) * r * r * c * c + 2 * s * c * (10 - 3 * Math.PI) * r * r * r / 12
                + (1 - 5 * Math.PI / 16) * Math.pow(r, 4);
    }

    @Test
    void areaAndSecondMomentsWithRootFillets() {
        double b = 150;
        double h = 300;
        double tw = 7.1;
        double tf = 10.7;
        double r = 15;
        Region region = new IShapeProfile(b, h, tw, tf, r).region();
        Moments m = region.moments();
        // A = 2 b tf + (h − 2 tf) tw + (4 − π) r²  (four fillets of (1 − π/4) r² each)
        assertRel(2 * b * tf + (h - 2 * tf) * tw + (4 - Math.PI) * r * r, m.area(), EXACT, 0,
                "A = 2b·tf + (h − 2tf)·tw + (4 − π)r²; " + HAND);
        // Ix = [b h³ − (b − tw)(h − 2tf)³]/12 + 4 fillets, corner line at |y| = h/2 − tf, spandrel towards the web centre
        double ix = (b * h * h * h - (b - tw) * Math.pow(h - 2 * tf, 3)) / 12 + 4 * spandrelIx(r, h / 2 - tf, -1);
        assertRel(ix, m.syy(), EXACT, 0, "Ix = [bh³ − (b − tw)(h − 2tf)³]/12 + 4 spandrels; " + HAND);
        // Iy = [2 tf b³ + (h − 2tf) tw³]/12 + 4 fillets, corner line at |x| = tw/2, spandrel away from the web
        double iy = (2 * tf * b * b * b + (h - 2 * tf) * tw * tw * tw) / 12 + 4 * spandrelIx(r, tw / 2, 1);
        assertRel(iy, m.sxx(), EXACT, 0, "Iy = [2tf·b³ + (h − 2tf)·tw³]/12 + 4 spandrels; " + HAND);
        assertEquals(0, m.sxy(), EXACT * m.area() * h * h, "Ixy = 0 by symmetry");
        assertCentredBounds(region, b, h);
        assertEquals(4, arcsOfRadius(region.outer(), r), "four true circular root fillets");
        assertEquals(4, arcs(region.outer()), "no other arcs");
    }

    @Test
    void sharpCornersGiveTheTextbookFormula() {
        double b = 200;
        double h = 400;
        double tw = 10;
        double tf = 20;
        Moments m = new IShapeProfile(b, h, tw, tf).region().moments();
        assertRel(2 * b * tf + (h - 2 * tf) * tw, m.area(), EXACT, 0,
                "A = 2b·tf + (h − 2tf)·tw; closed form, Roark's Formulas for Stress and Strain, 8th ed., Table A.1 (from memory)");
        assertRel((b * h * h * h - (b - tw) * Math.pow(h - 2 * tf, 3)) / 12, m.syy(), EXACT, 0,
                "Ix = [bh³ − (b − tw)(h − 2tf)³]/12; Roark's Formulas, 8th ed., Table A.1 (from memory)");
    }

    @Test
    void flangeEdgeRadiiAreRemovedAtTheTips() {
        double b = 160;
        double h = 240;
        double tw = 9;
        double tf = 14;
        double r = 12;
        double re = 6;
        Region region = new IShapeProfile(b, h, tw, tf, r, re).region();
        double hx = b / 2;
        double hy = h / 2;
        double w = tw / 2;
        double yf = hy - tf;
        Composite c = new Composite().rect(-hx, -hy, hx, hy, 1)
                .rect(w, -yf, hx, yf, -1).rect(-hx, -yf, -w, yf, -1)
                .spandrel(w, yf, r, 1, -1, 1).spandrel(w, -yf, r, 1, 1, 1)
                .spandrel(-w, yf, r, -1, -1, 1).spandrel(-w, -yf, r, -1, 1, 1)
                .spandrel(hx, yf, re, -1, 1, -1).spandrel(hx, -yf, re, -1, -1, -1)
                .spandrel(-hx, yf, re, 1, 1, -1).spandrel(-hx, -yf, re, 1, -1, -1);
        assertRel(2 * b * tf + (h - 2 * tf) * tw + (4 - Math.PI) * (r * r - re * re), c.area, EXACT, 0,
                "composite self-check: A = 2b·tf + (h − 2tf)·tw + (4 − π)(r² − re²)");
        assertMoments(c, region, h, HAND + " (Composite)");
        assertEquals(4, arcsOfRadius(region.outer(), re), "four true edge roundings");
        assertCentredBounds(region, b, h);
    }

    @Test
    void publishedRolledSections() {
        // IPE 300: h 300, b 150, tw 7.1, tf 10.7, r 15 → A 53.81 cm², Iy 8356 cm⁴, Iz 603.8 cm⁴
        Moments ipe300 = new IShapeProfile(150, 300, 7.1, 10.7, 15).region().moments();
        assertRel(53.81e2, ipe300.area(), 5e-4, 0, "IPE 300 A; " + EURONORM);
        assertRel(8356e4, ipe300.syy(), 5e-4, 0, "IPE 300 Iy; " + EURONORM);
        assertRel(603.8e4, ipe300.sxx(), 5e-4, 0, "IPE 300 Iz; " + EURONORM);
        // IPE 200: h 200, b 100, tw 5.6, tf 8.5, r 12 → A 28.48 cm², Iy 1943 cm⁴, Iz 142.4 cm⁴
        Moments ipe200 = new IShapeProfile(100, 200, 5.6, 8.5, 12).region().moments();
        assertRel(28.48e2, ipe200.area(), 5e-4, 0, "IPE 200 A; " + EURONORM);
        assertRel(1943e4, ipe200.syy(), 5e-4, 0, "IPE 200 Iy; " + EURONORM);
        assertRel(142.4e4, ipe200.sxx(), 5e-4, 0, "IPE 200 Iz; " + EURONORM);
        // HE 200 A: h 190, b 200, tw 6.5, tf 10, r 18 → A 53.83 cm², Iy 3692 cm⁴, Iz 1336 cm⁴
        Moments hea200 = new IShapeProfile(200, 190, 6.5, 10, 18).region().moments();
        assertRel(53.83e2, hea200.area(), 5e-4, 0, "HE 200 A A; " + EURONORM);
        assertRel(3692e4, hea200.syy(), 5e-4, 0, "HE 200 A Iy; " + EURONORM);
        assertRel(1336e4, hea200.sxx(), 5e-4, 0, "HE 200 A Iz; " + EURONORM);
    }

    @Test
    void filletsThatUseUpTheWebLeaveNoStraightWebSegment() {
        // h − 2 tf = 2 r: the two fillets on each web face meet, so each face is two arcs and no line
        double r = 10;
        Region region = new IShapeProfile(100, 2 * 10 + 2 * r, 6, 10, r).region();
        // 12 corners, 4 of them rounded; 12 edges, the 2 web faces vanish: 4 arcs + 10 lines
        assertEquals(14, region.outer().segments().size(), "two web lines dropped");
        assertRel(2 * 100 * 10 + 2 * r * 6 + (4 - Math.PI) * r * r, region.moments().area(), EXACT, 0,
                "A = 2b·tf + (h − 2tf)·tw + (4 − π)r²; " + HAND);
    }

    @Test
    void rejectsInvalidDimensions() {
        assertRejected("filletRadius", "filletRadius: 20 does not fit between the web and the flange tip (at most 14.45)",
                () -> new IShapeProfile(40, 200, 11.1, 10, 20));
        assertRejected("webThickness", "webThickness: 100 must be less than the overallWidth (100)",
                () -> new IShapeProfile(100, 200, 100, 10));
        assertRejected("flangeThickness", "flangeThickness: 100 must be less than half the overallDepth (100)",
                () -> new IShapeProfile(100, 200, 6, 100));
        assertRejected("overallDepth", "overallDepth: 0 must be positive", () -> new IShapeProfile(100, 0, 6, 10));
        assertRejected("flangeEdgeRadius", "must not be negative", () -> new IShapeProfile(100, 200, 6, 10, 0, -0.5));
    }
}
