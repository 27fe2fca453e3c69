package org.tensio.engine.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.tensio.engine.profile.ProfileAssertions.EXACT;
import static org.tensio.engine.profile.ProfileAssertions.arcsOfRadius;
import static org.tensio.engine.profile.ProfileAssertions.assertCentredBounds;
import static org.tensio.engine.profile.ProfileAssertions.assertMoments;
import static org.tensio.engine.profile.ProfileAssertions.assertRejected;
import static org.tensio.engine.profile.ProfileAssertions.assertRel;

import org.junit.jupiter.api.Test;
import org.tensio.engine.geometry.Moments;
import org.tensio.engine.geometry.Region;

/** Tee: flange at the top, web centred downwards. */
class TShapeProfileTest {

    private static final String HAND = "geometry, hand derivation written out here (Composite)";

    /** Flange across the top, web below it, fillets added, flange-tip and web-toe edges removed. */
    static Composite expected(double d, double bf, double tw, double tf, double r, double rfe, double rwe) {
        double hx = bf / 2;
        double hy = d / 2;
        double w = tw / 2;
        double yf = hy - tf;
        return new Composite().rect(-hx, yf, hx, hy, 1).rect(-w, -hy, w, yf, 1)
                .spandrel(w, yf, r, 1, -1, 1).spandrel(-w, yf, r, -1, -1, 1)
                .spandrel(hx, yf, rfe, -1, 1, -1).spandrel(-hx, yf, rfe, 1, 1, -1)
                .spandrel(w, -hy, rwe, -1, 1, -1).spandrel(-w, -hy, rwe, 1, 1, -1);
    }

    @Test
    void areaAndMomentsWithAllRadii() {
        double d = 100;
        double bf = 100;
        double tw = 11;
        double tf = 11;
        double r = 11;
        double rfe = 5.5;
        double rwe = 5.5;
        Region region = new TShapeProfile(d, bf, tw, tf, r, rfe, rwe).region();
        // A = bf tf + (d − tf) tw + (2 − π/2)(r² − rfe² − rwe²)
        assertRel(bf * tf + (d - tf) * tw + (2 - Math.PI / 2) * (r * r - rfe * rfe - rwe * rwe), region.moments().area(),
                EXACT, 0, "A = bf·tf + (d − tf)·tw + (2 − π/2)(r² − rfe² − rwe²); geometry, hand derivation");
        assertMoments(expected(d, bf, tw, tf, r, rfe, rwe), region, d, HAND);
        assertCentredBounds(region, bf, d);
        assertEquals(2, arcsOfRadius(region.outer(), r), "two true root fillets");
        assertEquals(4, arcsOfRadius(region.outer(), rfe), "two flange-tip and two web-toe roundings (same radius here)");
    }

    @Test
    void webEdgeRadiusOfHalfTheWebRoundsTheToeCompletely() {
        // rwe = tw/2: the toe becomes a half circle (two quarter arcs meeting on the axis, no toe line)
        Region region = new TShapeProfile(80, 60, 8, 9, 0, 0, 4).region();
        assertEquals(2, arcsOfRadius(region.outer(), 4), "two quarter arcs");
        assertEquals(8 + 2 - 1, region.outer().segments().size(), "8 edges + 2 arcs − the vanished toe line");
        assertCentredBounds(region, 60, 80);
    }

    @Test
    void sharpTeeCentroid() {
        double d = 120;
        double bf = 100;
        double tw = 10;
        double tf = 12;
        Moments m = new TShapeProfile(d, bf, tw, tf).region().moments();
        // y of the centroid from the top: [bf tf²/2 + (d − tf) tw (tf + (d − tf)/2)] / A
        double a = bf * tf + (d - tf) * tw;
        double fromTop = (bf * tf * tf / 2 + (d - tf) * tw * (tf + (d - tf) / 2)) / a;
        assertRel(d / 2 - fromTop, m.sy() / m.area(), EXACT, 0, "centroid y; geometry, hand derivation");
    }

    @Test
    void rejectsInvalidDimensions() {
        assertRejected("flangeThickness", "flangeThickness: 100 must be less than the depth (100)",
                () -> new TShapeProfile(100, 100, 10, 100));
        assertRejected("webThickness", "must be less than the flangeWidth (100)", () -> new TShapeProfile(100, 100, 100, 10));
        assertRejected("webEdgeRadius", "across the web toe, webThickness/2 (at most 5)",
                () -> new TShapeProfile(100, 100, 10, 10, 0, 0, 6));
        assertRejected("webEdgeRadius", "along the web, depth - flangeThickness (at most 30)",
                () -> new TShapeProfile(50, 100, 80, 20, 0, 0, 35));
        assertRejected("flangeEdgeRadius", "flangeEdgeRadius: 11 does not fit on the flange tip",
                () -> new TShapeProfile(100, 100, 10, 10, 0, 11, 0));
        assertRejected("flangeEdgeRadius", "on the flange outstand", () -> new TShapeProfile(100, 30, 10, 15, 0, 12, 0));
        assertRejected("filletRadius", "between the web and the flange tip (at most 40)",
                () -> new TShapeProfile(100, 100, 10, 10, 41, 5, 0));
        assertRejected("filletRadius", "between the flange and the web toe (at most 35)",
                () -> new TShapeProfile(50, 100, 10, 10, 36, 0, 5));
    }
}
