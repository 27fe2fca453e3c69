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

/** Angle: vertical leg on −x, horizontal leg at the bottom. */
class LShapeProfileTest {

    private static final String HAND = "geometry, hand derivation written out here (Composite)";

    /** Horizontal leg full width, vertical leg above it, root fillet added, both toe edges removed. */
    static Composite expected(double d, double w, double t, double r, double re) {
        double hx = w / 2;
        double hy = d / 2;
        return new Composite().rect(-hx, -hy, hx, -hy + t, 1).rect(-hx, -hy + t, -hx + t, hy, 1)
                .spandrel(-hx + t, -hy + t, r, 1, 1, 1)
                .spandrel(hx, -hy + t, re, -1, -1, -1)
                .spandrel(-hx + t, hy, re, -1, -1, -1);
    }

    @Test
    void unequalAngleWithRadii() {
        double d = 150;
        double w = 90;
        double t = 10;
        double r = 12;
        double re = 6;
        Region region = new LShapeProfile(d, w, t, r, re).region();
        // A = t (d + w − t) + (1 − π/4)(r² − 2 re²)
        assertRel(t * (d + w - t) + (1 - Math.PI / 4) * (r * r - 2 * re * re), region.moments().area(), EXACT, 0,
                "A = t(d + w − t) + (1 − π/4)(r² − 2re²); geometry, hand derivation");
        assertMoments(expected(d, w, t, r, re), region, d, HAND);
        assertCentredBounds(region, w, d);
        assertEquals(1, arcsOfRadius(region.outer(), r), "one true root fillet");
        assertEquals(2, arcsOfRadius(region.outer(), re), "two true toe roundings");
    }

    @Test
    void sharpEqualAngleCentroid() {
        double b = 100;
        double t = 10;
        Moments m = new LShapeProfile(b, t).region().moments();
        // distance of the centroid from the heel: e = (b² + b t − t²) / (2 (2b − t)); geometry, hand derivation
        double e = (b * b + b * t - t * t) / (2 * (2 * b - t));
        assertRel(-b / 2 + e, m.sx() / m.area(), EXACT, 0, "x of the centroid; hand derivation");
        assertRel(-b / 2 + e, m.sy() / m.area(), EXACT, 0, "y of the centroid; hand derivation");
        assertEquals(b, new LShapeProfile(b, t).width(), "width 0 / omitted means equal legs");
        assertEquals(b, new LShapeProfile(b, 0, t, 0, 0).parameters().get("width"), "width 0 stored as depth");
    }

    @Test
    void publishedEqualAngle() {
        // L 100x100x10 (r1 12, r2 6): A 19.2 cm², Iy = Iz 177 cm⁴, Iu 280 cm⁴, Iv 73.0 cm⁴, e 2.82 cm
        // — EN 10056-1 / ArcelorMittal sales programme (from memory), 3 significant figures
        Moments m = new LShapeProfile(100, 10, 12, 6).region().moments();
        double a = m.area();
        double xs = m.sx() / a;
        double ys = m.sy() / a;
        double iy = m.syy() - a * ys * ys;
        double ixy = m.sxy() - a * xs * ys;
        assertRel(19.2e2, a, 3e-3, 0, "A; EN 10056-1 (from memory)");
        assertRel(177e4, iy, 3e-3, 0, "Iy; EN 10056-1 (from memory)");
        assertRel(280e4, iy - ixy, 3e-3, 0, "Iu = I + |Ixy|; EN 10056-1 (from memory)");
        assertRel(73.0e4, iy + ixy, 3e-3, 0, "Iv = I − |Ixy|; EN 10056-1 (from memory)");
        assertRel(28.2, xs + 50, 3e-3, 0, "e from the heel; EN 10056-1 (from memory)");
    }

    @Test
    void rejectsInvalidDimensions() {
        assertRejected("thickness", "thickness: 80 must be less than the width (80)", () -> new LShapeProfile(100, 80, 80, 0, 0));
        assertRejected("thickness", "must be less than the depth (100)", () -> new LShapeProfile(100, 150, 100, 0, 0));
        assertRejected("width", "width: -1 must not be negative", () -> new LShapeProfile(100, -1, 10, 0, 0));
        assertRejected("edgeRadius", "edgeRadius: 11 does not fit on the leg ends", () -> new LShapeProfile(100, 80, 10, 0, 11));
        assertRejected("edgeRadius", "along the inner face of the shorter leg (at most 5)",
                () -> new LShapeProfile(15, 100, 10, 0, 6));
        assertRejected("filletRadius", "between the vertical leg and the toe of the horizontal leg (at most 65)",
                () -> new LShapeProfile(100, 80, 10, 66, 5));
        assertRejected("filletRadius", "between the horizontal leg and the toe of the vertical leg (at most 45)",
                () -> new LShapeProfile(60, 100, 10, 46, 5));
    }
}
