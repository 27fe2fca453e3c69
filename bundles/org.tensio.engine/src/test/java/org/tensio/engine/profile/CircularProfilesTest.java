package org.tensio.engine.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.tensio.engine.profile.ProfileAssertions.EXACT;
import static org.tensio.engine.profile.ProfileAssertions.assertCentredBounds;
import static org.tensio.engine.profile.ProfileAssertions.assertRejected;
import static org.tensio.engine.profile.ProfileAssertions.assertRel;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tensio.engine.geometry.Moments;
import org.tensio.engine.geometry.Region;

/** Circle, hollow circle and ellipse against the textbook closed forms. */
class CircularProfilesTest {

    private static final String ROARK = "closed form, Roark's Formulas for Stress and Strain, 8th ed., Table A.1 (from memory)";

    @Test
    void circleAreaAndSecondMoments() {
        double r = 37.5;
        Region region = new CircleProfile(r).region();
        Moments m = region.moments();
        // A = π r², I = π r⁴ / 4 about any diameter, Ixy = 0
        assertRel(Math.PI * r * r, m.area(), EXACT, 0, "A = πr²; " + ROARK);
        assertRel(Math.PI * Math.pow(r, 4) / 4, m.syy(), EXACT, 0, "Ix = πr⁴/4; " + ROARK);
        assertRel(Math.PI * Math.pow(r, 4) / 4, m.sxx(), EXACT, 0, "Iy = πr⁴/4; " + ROARK);
        assertEquals(0, m.sxy(), EXACT * m.area() * r * r, "Ixy = 0 by symmetry");
        assertEquals(0, m.sx(), EXACT * m.area() * r, "centroid at the origin");
        assertCentredBounds(region, 2 * r, 2 * r);
    }

    @Test
    void hollowCircleAreaAndSecondMoments() {
        double ro = 84.15;
        double t = 6.3;
        double ri = ro - t;
        Region region = new CircleHollowProfile(ro, t).region();
        Moments m = region.moments();
        // A = π (R² − r²), I = π (R⁴ − r⁴) / 4; IFC4 radius is the outer radius
        assertRel(Math.PI * (ro * ro - ri * ri), m.area(), EXACT, 0, "A = π(R² − r²); " + ROARK);
        assertRel(Math.PI * (Math.pow(ro, 4) - Math.pow(ri, 4)) / 4, m.syy(), EXACT, 0, "I = π(R⁴ − r⁴)/4; " + ROARK);
        assertRel(Math.PI * (Math.pow(ro, 4) - Math.pow(ri, 4)) / 4, m.sxx(), EXACT, 0, "I = π(R⁴ − r⁴)/4; " + ROARK);
        assertEquals(1, region.holes().size(), "one bore");
        assertCentredBounds(region, 2 * ro, 2 * ro);
    }

    @Test
    void hollowCircleMatchesPublishedTube() {
        // CHS 168.3 x 8.0: A = 40.3 cm², I = 1297 cm⁴ — EN 10210-2 section table (from memory), 3-4 significant figures
        Moments m = new CircleHollowProfile(168.3 / 2, 8.0).region().moments();
        assertRel(40.3e2, m.area(), 2e-3, 0, "A; EN 10210-2 CHS 168.3x8 (from memory)");
        assertRel(1297e4, m.syy(), 1e-3, 0, "I; EN 10210-2 CHS 168.3x8 (from memory)");
    }

    @Test
    void ellipseAreaAndSecondMoments() {
        double a = 120;
        double b = 45;
        Region region = new EllipseProfile(a, b).region();
        Moments m = region.moments();
        // semiAxis1 = a along x: A = π a b, Ix = ∫y² dA = π a b³ / 4, Iy = ∫x² dA = π a³ b / 4
        assertRel(Math.PI * a * b, m.area(), EXACT, 0, "A = πab; " + ROARK);
        assertRel(Math.PI * a * b * b * b / 4, m.syy(), EXACT, 0, "Ix = πab³/4; " + ROARK);
        assertRel(Math.PI * a * a * a * b / 4, m.sxx(), EXACT, 0, "Iy = πa³b/4; " + ROARK);
        assertEquals(0, m.sxy(), EXACT * m.area() * a * a, "Ixy = 0 by symmetry");
        assertCentredBounds(region, 2 * a, 2 * b);
    }

    @Test
    void parametersInIfcOrder() {
        assertEquals(List.of("radius", "wallThickness"),
                List.copyOf(new CircleHollowProfile(10, 1).parameters().keySet()));
        assertEquals(List.of("semiAxis1", "semiAxis2"), List.copyOf(new EllipseProfile(2, 1).parameters().keySet()));
        assertEquals("CircleProfile", new CircleProfile(1).type());
    }

    @Test
    void rejectsInvalidDimensions() {
        assertRejected("radius", "radius: 0 must be positive", () -> new CircleProfile(0));
        assertRejected("radius", "must be a finite number", () -> new CircleProfile(Double.NaN));
        assertRejected("wallThickness", "wallThickness: 10 must be less than the radius (10)",
                () -> new CircleHollowProfile(10, 10));
        assertRejected("wallThickness", "must be positive", () -> new CircleHollowProfile(10, -1));
        assertRejected("semiAxis2", "semiAxis2: Infinity must be a finite number",
                () -> new EllipseProfile(1, Double.POSITIVE_INFINITY));
    }
}
