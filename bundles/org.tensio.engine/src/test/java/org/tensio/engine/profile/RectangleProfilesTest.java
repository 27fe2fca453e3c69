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

/** Rectangle and rectangular hollow section. */
class RectangleProfilesTest {

    private static final String ROARK = "closed form, Roark's Formulas for Stress and Strain, 8th ed., Table A.1 (from memory)";
    private static final String HAND = "geometry, hand derivation written out here (Composite)";

    @Test
    void rectangleAreaAndSecondMoments() {
        double b = 300;
        double h = 45.5;
        Region region = new RectangleProfile(b, h).region();
        Moments m = region.moments();
        assertRel(b * h, m.area(), EXACT, 0, "A = bh; " + ROARK);
        assertRel(b * h * h * h / 12, m.syy(), EXACT, 0, "Ix = bh³/12; " + ROARK);
        assertRel(h * b * b * b / 12, m.sxx(), EXACT, 0, "Iy = hb³/12; " + ROARK);
        assertEquals(0, m.sxy(), EXACT * b * h * b * b, "Ixy = 0 by symmetry");
        assertCentredBounds(region, b, h);
        assertEquals(4, region.outer().segments().size(), "four edges, no arcs");
    }

    @Test
    void sharpHollowRectangle() {
        double b = 200;
        double h = 100;
        double t = 8;
        Region region = new RectangleHollowProfile(b, h, t).region();
        Moments m = region.moments();
        double bi = b - 2 * t;
        double hi = h - 2 * t;
        assertRel(b * h - bi * hi, m.area(), EXACT, 0, "A = bh − bi hi; " + ROARK);
        assertRel((b * h * h * h - bi * hi * hi * hi) / 12, m.syy(), EXACT, 0, "Ix = (bh³ − bi hi³)/12; " + ROARK);
        assertRel((h * b * b * b - hi * bi * bi * bi) / 12, m.sxx(), EXACT, 0, "Iy = (hb³ − hi bi³)/12; " + ROARK);
        assertCentredBounds(region, b, h);
    }

    @Test
    void roundedHollowRectangle() {
        double b = 200;
        double h = 100;
        double t = 10;
        double ri = 10;
        double ro = 20;
        Region region = new RectangleHollowProfile(b, h, t, ri, ro).region();
        // rounded rectangle area = b·h − (4 − π) r²; section = outer rounded − inner rounded
        double expectedArea = b * h - (4 - Math.PI) * ro * ro - ((b - 2 * t) * (h - 2 * t) - (4 - Math.PI) * ri * ri);
        assertRel(expectedArea, region.moments().area(), EXACT, 0,
                "A = [bh − (4 − π)ro²] − [bi hi − (4 − π)ri²]; geometry, hand derivation");
        Composite c = new Composite().roundedRect(b / 2, h / 2, ro, 1).roundedRect(b / 2 - t, h / 2 - t, ri, -1);
        assertMoments(c, region, b, HAND);
        assertCentredBounds(region, b, h);
        assertEquals(4, arcsOfRadius(region.outer(), ro), "four true outer corner arcs");
        assertEquals(4, arcsOfRadius(region.holes().get(0), ri), "four true inner corner arcs");
    }

    @Test
    void publishedRectangularHollowSection() {
        // RHS 200x100x10 (EN 10210-2, hot finished, section properties with ro = 1.5 t, ri = 1.0 t):
        // A = 54.9 cm², I about the axis parallel to the short side = 2664 cm⁴ — EN 10210-2 section table
        // (from memory), 3-4 significant figures. The other second moment is not checked: not recalled reliably.
        Moments m = new RectangleHollowProfile(200, 100, 10, 10, 15).region().moments();
        assertRel(54.9e2, m.area(), 2e-3, 0, "A; EN 10210-2 RHS 200x100x10 (from memory)");
        assertRel(2664e4, m.sxx(), 2e-3, 0, "I about the y axis (200 mm along x); EN 10210-2 (from memory)");
    }

    @Test
    void radiiThatUseUpTheSidesGiveCircles() {
        // square 100, wall 10, ro = 50, ri = 40: two concentric circles (each four quarter arcs, no lines)
        Region region = new RectangleHollowProfile(100, 100, 10, 40, 50).region();
        assertEquals(4, region.outer().segments().size(), "outer: four quarter arcs");
        assertEquals(4, arcs(region.outer()), "outer: arcs only");
        assertEquals(4, arcs(region.holes().get(0)), "inner: arcs only");
        assertRel(Math.PI * (50 * 50 - 40 * 40), region.moments().area(), EXACT, 0, "A = π(R² − r²); " + ROARK);
        assertRel(Math.PI * (Math.pow(50, 4) - Math.pow(40, 4)) / 4, region.moments().syy(), EXACT, 0,
                "I = π(R⁴ − r⁴)/4; " + ROARK);
    }

    @Test
    void rejectsInvalidDimensions() {
        assertRejected("xDim", "xDim: -2 must be positive", () -> new RectangleProfile(-2, 1));
        assertRejected("yDim", "yDim: NaN must be a finite number", () -> new RectangleProfile(2, Double.NaN));
        assertRejected("wallThickness", "must be less than half the xDim (100)",
                () -> new RectangleHollowProfile(200, 300, 100));
        assertRejected("wallThickness", "must be less than half the yDim (50)",
                () -> new RectangleHollowProfile(200, 100, 50));
        assertRejected("outerFilletRadius", "outerFilletRadius: 51 does not fit the outer corners",
                () -> new RectangleHollowProfile(200, 100, 10, 0, 51));
        assertRejected("innerFilletRadius", "innerFilletRadius: 41 does not fit the inner corners",
                () -> new RectangleHollowProfile(200, 100, 10, 41, 0));
        assertRejected("innerFilletRadius", "(at most 40)", () -> new RectangleHollowProfile(200, 100, 10, 41, 0));
        assertRejected("innerFilletRadius", "must not be negative", () -> new RectangleHollowProfile(200, 100, 10, -1, 0));
        // (2 + √2)·5 + 0 = 17.07: a larger outer radius with a sharp inner corner cuts through the wall
        assertRejected("outerFilletRadius", "so that the wall does not vanish at the corners (17.07106781)",
                () -> new RectangleHollowProfile(200, 100, 5, 0, 20));
    }
}
