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
import org.tensio.engine.geometry.Moments;
import org.tensio.engine.geometry.Region;

/** Channel: web on −x, flanges towards +x. */
class UShapeProfileTest {

    private static final String HAND = "geometry, hand derivation written out here (Composite)";

    /** Web [−hx, −hx + tw] full depth, two flanges to +x, fillets added, flange-tip edges removed. */
    static Composite expected(double h, double bf, double tw, double tf, double r, double re) {
        double hx = bf / 2;
        double hy = h / 2;
        double xw = -hx + tw;
        double yf = hy - tf;
        return new Composite().rect(-hx, -hy, xw, hy, 1)
                .rect(xw, -hy, hx, -yf, 1).rect(xw, yf, hx, hy, 1)
                .spandrel(xw, -yf, r, 1, 1, 1).spandrel(xw, yf, r, 1, -1, 1)
                .spandrel(hx, -yf, re, -1, -1, -1).spandrel(hx, yf, re, -1, 1, -1);
    }

    @Test
    void areaAndMomentsWithFilletsAndEdgeRadii() {
        double h = 200;
        double bf = 80;
        double tw = 6;
        double tf = 11;
        double r = 13;
        double re = 5;
        Region region = new UShapeProfile(h, bf, tw, tf, r, re).region();
        Composite c = expected(h, bf, tw, tf, r, re);
        // A = 2 bf tf + (h − 2tf) tw + (2 − π/2)(r² − re²)
        assertRel(2 * bf * tf + (h - 2 * tf) * tw + (2 - Math.PI / 2) * (r * r - re * re), region.moments().area(),
                EXACT, 0, "A = 2bf·tf + (h − 2tf)·tw + (2 − π/2)(r² − re²); geometry, hand derivation");
        assertMoments(c, region, h, HAND);
        assertCentredBounds(region, bf, h);
        assertEquals(2, arcsOfRadius(region.outer(), r), "two true root fillets");
        assertEquals(2, arcsOfRadius(region.outer(), re), "two true edge roundings");
        assertTrue(region.moments().sx() < 0, "web on the −x side: centroid left of the bounding-box centre");
    }

    @Test
    void sharpChannelCentroid() {
        double h = 100;
        double bf = 50;
        double tw = 5;
        double tf = 8;
        Moments m = new UShapeProfile(h, bf, tw, tf).region().moments();
        // distance of the centroid from the web back: [h tw²/2 + 2 tf (bf² − tw²)/2] / A, A = h tw + 2 tf (bf − tw)
        double a = h * tw + 2 * tf * (bf - tw);
        double e = (h * tw * tw / 2 + tf * (bf * bf - tw * tw)) / a;
        assertRel(-bf / 2 + e, m.sx() / m.area(), EXACT, 0, "centroid x; geometry, hand derivation");
    }

    @Test
    void publishedChannel() {
        // UPE 200: h 200, b 80, tw 6, tf 11, r 13 → A 29.0 cm², Iy 1910 cm⁴, Iz 187 cm⁴, ys 2.56 cm from the web back
        // — ArcelorMittal sales programme, UPE 200 (from memory), 3 significant figures
        Moments m = new UShapeProfile(200, 80, 6, 11, 13, 0).region().moments();
        assertRel(29.0e2, m.area(), 2e-3, 0, "UPE 200 A (from memory)");
        assertRel(1910e4, m.syy(), 2e-3, 0, "UPE 200 Iy (from memory)");
        double xs = m.sx() / m.area();
        assertRel(187e4, m.sxx() - m.area() * xs * xs, 3e-3, 0, "UPE 200 Iz (from memory)");
        assertRel(25.6, xs + 40, 3e-3, 0, "UPE 200 ys (from memory)");
    }

    @Test
    void rejectsInvalidDimensions() {
        assertRejected("flangeThickness", "must be less than half the depth (100)", () -> new UShapeProfile(200, 80, 6, 100));
        assertRejected("webThickness", "webThickness: 80 must be less than the flangeWidth (80)",
                () -> new UShapeProfile(200, 80, 80, 11));
        assertRejected("edgeRadius", "edgeRadius: 12 does not fit on the flange tip", () -> new UShapeProfile(200, 80, 6, 11, 0, 12));
        assertRejected("edgeRadius", "does not fit on the flange outstand", () -> new UShapeProfile(200, 10, 6, 11, 0, 5));
        assertRejected("filletRadius", "filletRadius: 70 does not fit between the web and the flange tip (at most 69)",
                () -> new UShapeProfile(200, 80, 6, 11, 70, 5));
        assertRejected("filletRadius", "along the web between the flanges (at most 5)",
                () -> new UShapeProfile(200, 80, 6, 95, 6, 0));
    }
}
