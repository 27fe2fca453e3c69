package org.tensio.engine.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tensio.engine.profile.ProfileAssertions.EXACT;
import static org.tensio.engine.profile.ProfileAssertions.arcsOfRadius;
import static org.tensio.engine.profile.ProfileAssertions.assertCentredBounds;
import static org.tensio.engine.profile.ProfileAssertions.assertMoments;
import static org.tensio.engine.profile.ProfileAssertions.assertRejected;
import static org.tensio.engine.profile.ProfileAssertions.assertRel;

import org.junit.jupiter.api.Test;
import org.tensio.engine.geometry.Bounds;
import org.tensio.engine.geometry.Moments;
import org.tensio.engine.geometry.Region;

/** Z-section: web centred, top flange to −x, bottom flange to +x, flangeWidth includes the web. */
class ZShapeProfileTest {

    private static final String HAND = "geometry, hand derivation written out here (Composite)";

    /** Web between the flanges, each flange from the far web face to its tip, fillets added, tip edges removed. */
    static Composite expected(double d, double bf, double tw, double tf, double r, double re) {
        double w = tw / 2;
        double tip = bf - w;
        double hy = d / 2;
        double yf = hy - tf;
        return new Composite().rect(-w, -hy, tip, -yf, 1).rect(-tip, yf, w, hy, 1).rect(-w, -yf, w, yf, 1)
                .spandrel(w, -yf, r, 1, 1, 1).spandrel(-w, yf, r, -1, -1, 1)
                .spandrel(tip, -yf, re, -1, -1, -1).spandrel(-tip, yf, re, 1, 1, -1);
    }

    @Test
    void areaAndMomentsWithRadii() {
        double d = 200;
        double bf = 80;
        double tw = 8;
        double tf = 10;
        double r = 10;
        double re = 5;
        Region region = new ZShapeProfile(d, bf, tw, tf, r, re).region();
        // A = 2 bf tf + (d − 2tf) tw + (2 − π/2)(r² − re²); flangeWidth includes the web thickness
        assertRel(2 * bf * tf + (d - 2 * tf) * tw + (2 - Math.PI / 2) * (r * r - re * re), region.moments().area(),
                EXACT, 0, "A = 2bf·tf + (d − 2tf)·tw + (2 − π/2)(r² − re²); geometry, hand derivation");
        assertMoments(expected(d, bf, tw, tf, r, re), region, d, HAND);
        assertCentredBounds(region, 2 * bf - tw, d);
        assertEquals(2, arcsOfRadius(region.outer(), r), "two true root fillets");
        assertEquals(2, arcsOfRadius(region.outer(), re), "two true edge roundings");
    }

    @Test
    void orientationLikeTheLetterZ() {
        Region region = new ZShapeProfile(100, 50, 6, 8).region();
        Moments m = region.moments();
        // top flange to −x, bottom to +x: material in quadrants II and IV, so ∫xy dA < 0; point symmetry: centroid at 0
        assertTrue(m.sxy() < 0, "∫xy dA < 0 for a Z (top flange towards −x)");
        assertEquals(0, m.sx(), EXACT * m.area() * 100, "centroid x = 0 by point symmetry");
        assertEquals(0, m.sy(), EXACT * m.area() * 100, "centroid y = 0 by point symmetry");
        Bounds b = region.bounds();
        assertEquals(2 * 50 - 6, b.width(), EXACT * 100, "overall width = 2·flangeWidth − webThickness");
    }

    @Test
    void sharpZProductOfArea() {
        double d = 100;
        double bf = 50;
        double tw = 6;
        double tf = 8;
        Moments m = new ZShapeProfile(d, bf, tw, tf).region().moments();
        // each flange: area bf·tf, centroid at (∓(bf/2 − tw/2), ±(d/2 − tf/2)); own Ixy 0; the web adds nothing
        double ixy = -2 * bf * tf * (bf - tw) / 2 * (d - tf) / 2;
        assertRel(ixy, m.sxy(), EXACT, 0, "Ixy = −2 bf tf · (bf − tw)/2 · (d − tf)/2; geometry, hand derivation");
    }

    @Test
    void rejectsInvalidDimensions() {
        assertRejected("flangeThickness", "must be less than half the depth (100)", () -> new ZShapeProfile(200, 80, 8, 100));
        assertRejected("webThickness", "webThickness: 80 must be less than the flangeWidth (80)",
                () -> new ZShapeProfile(200, 80, 80, 10));
        assertRejected("edgeRadius", "edgeRadius: 11 does not fit on the flange tip", () -> new ZShapeProfile(200, 80, 8, 10, 0, 11));
        assertRejected("edgeRadius", "on the flange outstand", () -> new ZShapeProfile(200, 10, 8, 10, 0, 3));
        assertRejected("filletRadius", "between the web and the flange tip (at most 67)",
                () -> new ZShapeProfile(200, 80, 8, 10, 68, 5));
        assertRejected("filletRadius", "along the web, depth - flangeThickness (at most 16)",
                () -> new ZShapeProfile(30, 100, 8, 14, 17, 0));
    }
}
