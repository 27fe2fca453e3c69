package org.tensio.engine.verification;

import org.junit.jupiter.api.Test;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.profile.LShapeProfile;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.properties.SectionPropertiesOp;

/**
 * A sharp-cornered unequal angle 150 × 90 × 12 (no root or toe radii), heel at the origin, long leg along +y,
 * short leg along +x, against a hand calculation written out below: two rectangles, the parallel-axis theorem
 * (Steiner) and Mohr's circle for the principal moments, I1,2 = (Ixx + Iyy)/2 ± √(((Ixx − Iyy)/2)² + Ixy²),
 * tan 2θ = −2Ixy/(Ixx − Iyy) (Gere &amp; Goodno, Mechanics of Materials, §12.8–12.9, "Principal axes and principal
 * moments of inertia" — from memory). Plausibility only, not asserted: producer tables give tan α ≈ 0.36 for the
 * rolled 150 × 90 angles (from memory); this sharp section gives 0.3629.
 * <p>
 * Tolerance 1e-12 relative: both sides are exact up to rounding. Angle: 1e-9°.
 */
class UnequalAngleTest {

    private static final double REL = 1e-12;

    @Test
    void sharpAngle150x90x12AgainstTwoRectanglesAndMohrsCircle() {
        double h = 150, b = 90, t = 12;
        Region angle = new Region(Shapes.polygon(0, 0, b, 0, b, t, t, t, t, h, 0, h));
        SectionProperties p = SectionPropertiesOp.compute(Shapes.section(angle));

        // rectangle 1: the long leg, full height, x in [0, 12], y in [0, 150]
        double a1 = t * h;                          // 1800 mm²
        double x1 = t / 2, y1 = h / 2;              // (6, 75)
        double ix1 = t * h * h * h / 12;            // 3 375 000 mm⁴ about its own x axis
        double iy1 = h * t * t * t / 12;            // 21 600 mm⁴
        // rectangle 2: the rest of the short leg, x in [12, 90], y in [0, 12]
        double a2 = (b - t) * t;                    // 936 mm²
        double x2 = t + (b - t) / 2, y2 = t / 2;    // (51, 6)
        double ix2 = (b - t) * t * t * t / 12;      // 11 232 mm⁴
        double iy2 = t * Math.pow(b - t, 3) / 12;   // 474 552 mm⁴
        // centroid
        double a = a1 + a2;                         // 2736 mm²
        double xc = (a1 * x1 + a2 * x2) / a;        // 21.3947 mm
        double yc = (a1 * y1 + a2 * y2) / a;        // 51.3947 mm
        // parallel-axis theorem; own product moments of the rectangles vanish
        double ixx = ix1 + a1 * sq(y1 - yc) + ix2 + a2 * sq(y2 - yc);             // 6.318006e6 mm⁴
        double iyy = iy1 + a1 * sq(x1 - xc) + iy2 + a2 * sq(x2 - xc);             // 1.743126e6 mm⁴
        double ixy = a1 * (x1 - xc) * (y1 - yc) + a2 * (x2 - xc) * (y2 - yc);      // −1.912026e6 mm⁴
        // Mohr's circle
        double centre = (ixx + iyy) / 2, radius = Math.hypot((ixx - iyy) / 2, ixy);
        double i1 = centre + radius;                                               // 7.011879e6 mm⁴
        double i2 = centre - radius;                                               // 1.049253e6 mm⁴
        double theta = Math.toDegrees(0.5 * Math.atan2(-2 * ixy, ixx - iyy));     // 19.9458°

        Verify.close(a, p.area(), REL, "A");
        Verify.close(xc, p.centroid().x(), REL, "xc");
        Verify.close(yc, p.centroid().y(), REL, "yc");
        Verify.close(ixx, p.ixx(), REL, "Ixx");
        Verify.close(iyy, p.iyy(), REL, "Iyy");
        Verify.close(ixy, p.ixy(), REL, "Ixy");
        Verify.close(i1, p.i1(), REL, "I1");
        Verify.close(i2, p.i2(), REL, "I2");
        Verify.closeAbs(theta, p.principalAngleDeg(), 1e-9, "principal angle, degrees from +x to the I1 axis");
        // the I1 axis really is the one of maximum moment: rotate the hand values by θ
        double c = Math.cos(Math.toRadians(theta)), s = Math.sin(Math.toRadians(theta));
        double iu = ixx * c * c + iyy * s * s - 2 * ixy * s * c;
        double iuv = (ixx - iyy) * s * c + ixy * (c * c - s * s);
        Verify.close(iu, p.i1(), REL, "I about the u axis at θ equals I1");
        Verify.closeAbs(0.0, iuv, REL * i1, "product moment vanishes in the principal frame");
        // elastic moduli: extreme fibres at y = 150 and y = 0, x = 90 and x = 0
        Verify.close(ixx / (h - yc), p.sxTop(), REL, "Sx,top");
        Verify.close(ixx / yc, p.sxBottom(), REL, "Sx,bottom");
        Verify.close(iyy / (b - xc), p.syRight(), REL, "Sy,right");
        Verify.close(iyy / xc, p.syLeft(), REL, "Sy,left");
        // plastic axis parallel to x: half the area, 1368 mm², lies above y = yp inside the long leg (yp > 12):
        // t·(h − yp) = a/2 → yp = h − a/(2t) = 36
        double yp = h - a / (2 * t);
        Verify.close(yp, p.plasticAxisY(), REL, "plastic neutral axis y");
        double zx = t * sq(h - yp) / 2 + (t * sq(yp) / 2 + (b - t) * t * (yp - t / 2));
        Verify.close(zx, p.zx(), REL, "Zx = first moments of the two halves about y = yp");
    }

    @Test
    void lShapeProfileGivesTheSameSection() {
        // LShapeProfile: heel at (−width/2, −depth/2) in the profile frame; place it so the heel is at the origin
        SectionProperties profile = SectionPropertiesOp.compute(
                Shapes.section(new LShapeProfile(150, 90, 12, 0, 0), 45, 75));
        SectionProperties polygon = SectionPropertiesOp.compute(
                Shapes.section(new Region(Shapes.polygon(0, 0, 90, 0, 90, 12, 12, 12, 12, 150, 0, 150))));
        Verify.close(polygon.area(), profile.area(), REL, "A");
        Verify.close(polygon.centroid().x(), profile.centroid().x(), REL, "xc");
        Verify.close(polygon.centroid().y(), profile.centroid().y(), REL, "yc");
        Verify.close(polygon.ixx(), profile.ixx(), REL, "Ixx");
        Verify.close(polygon.iyy(), profile.iyy(), REL, "Iyy");
        Verify.close(polygon.ixy(), profile.ixy(), REL, "Ixy");
    }

    private static double sq(double v) {
        return v * v;
    }
}
