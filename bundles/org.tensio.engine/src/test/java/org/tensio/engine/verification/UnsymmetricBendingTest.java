package org.tensio.engine.verification;

import org.junit.jupiter.api.Test;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.profile.ZShapeProfile;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.properties.SectionPropertiesOp;
import org.tensio.engine.section.Section;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.PointStressOp;

/**
 * Unsymmetric (oblique) bending of sections without an axis of symmetry, by two routes written out here:
 * <ol>
 * <li>the generalized flexure formula in centroidal axes, σ = [(Mx·Iyy + My·Ixy)·Y − (Mx·Ixy + My·Ixx)·X] / (Ixx·Iyy − Ixy²)
 * (Boresi &amp; Schmidt, Advanced Mechanics of Materials, 6th ed., ch. 7 "Nonsymmetrical bending of straight beams",
 * in its own sign convention — from memory; signs here follow Tensio's: positive Mx stretches +y,
 * positive My stretches −x);</li>
 * <li>resolution into principal axes (same chapter, "principal axes method"): with θ the I1 axis from Mohr's
 * circle, u = X cos θ + Y sin θ, v = −X sin θ + Y cos θ, M1 = Mx cos θ + My sin θ, M2 = −Mx sin θ + My cos θ,
 * σ = M1·v/I1 − M2·u/I2.</li>
 * </ol>
 * The section constants come from the same hand calculation by rectangles and Steiner's theorem, never from
 * the engine. Neutral axis for Mx alone: σ = 0 on Iyy·Y = Ixy·X, i.e. tan β = Ixy/Iyy (β from +x).
 * <p>
 * Tolerance: 1e-12 relative to the largest |σ| of the section for every point (both routes are exact
 * algebra on exact constants; the scale is the largest stress because the principal route sums terms
 * of opposite sign).
 */
class UnsymmetricBendingTest {

    private static final double REL = 1e-12;

    /** Hand-calculated centroidal constants of a section made of rectangles. */
    private record Hand(double xc, double yc, double ixx, double iyy, double ixy) {
        double d() {
            return ixx * iyy - ixy * ixy;
        }

        double theta() {
            return 0.5 * Math.atan2(-2 * ixy, ixx - iyy);
        }

        double i1() {
            return 0.5 * (ixx + iyy) + Math.hypot(0.5 * (ixx - iyy), ixy);
        }

        double i2() {
            return 0.5 * (ixx + iyy) - Math.hypot(0.5 * (ixx - iyy), ixy);
        }

        double generalized(double mx, double my, double x, double y) {
            double bx = x - xc, by = y - yc;
            return ((mx * iyy + my * ixy) * by - (mx * ixy + my * ixx) * bx) / d();
        }

        double principal(double mx, double my, double x, double y) {
            double bx = x - xc, by = y - yc, c = Math.cos(theta()), s = Math.sin(theta());
            double u = bx * c + by * s, v = -bx * s + by * c;
            double m1 = mx * c + my * s, m2 = -mx * s + my * c;
            return m1 * v / i1() - m2 * u / i2();
        }
    }

    /**
     * Z-section 200 deep, flanges 75 wide including the 10 mm web, flanges 10 thick, sharp corners, as
     * {@link ZShapeProfile} places it (top flange towards −x). Rectangles: web x ∈ [−5, 5], y ∈ [−100, 100];
     * top outstand x ∈ [−70, −5], y ∈ [90, 100]; bottom outstand its point reflection.
     */
    @Test
    void zSectionUnderMxAlone() {
        double webA = 10 * 200, flA = 65 * 10, fx = 37.5, fy = 95;   // outstand centroids at (∓37.5, ±95)
        double ixx = 10 * Math.pow(200, 3) / 12 + 2 * (65 * Math.pow(10, 3) / 12 + flA * fy * fy); // 18 410 000 mm⁴
        double iyy = 200 * Math.pow(10, 3) / 12 + 2 * (10 * Math.pow(65, 3) / 12 + flA * fx * fx); //  2 302 500 mm⁴
        double ixy = 2 * flA * (-fx) * fy;                                                          // −4 631 250 mm⁴
        Hand hand = new Hand(0, 0, ixx, iyy, ixy);

        Section section = Shapes.section(new ZShapeProfile(200, 75, 10, 10, 0, 0));
        SectionProperties p = SectionPropertiesOp.compute(section);
        Verify.close(webA + 2 * flA, p.area(), REL, "A = 3300 mm²");
        Verify.close(ixx, p.ixx(), REL, "Ixx");
        Verify.close(iyy, p.iyy(), REL, "Iyy");
        Verify.close(ixy, p.ixy(), REL, "Ixy");

        double mx = 20e6; // 20 kN·m in N·mm
        InternalForces f = new InternalForces(0, 0, 0, mx, 0, 0);
        Point2[] corners = {new Point2(-70, 100), new Point2(-70, 90), new Point2(5, 100), new Point2(-5, 90),
            new Point2(70, -100), new Point2(70, -90), new Point2(-5, -100), new Point2(5, -90)};
        double scale = 0;
        for (Point2 c : corners) {
            scale = Math.max(scale, Math.abs(hand.generalized(mx, 0, c.x(), c.y())));
        }
        for (Point2 c : corners) {
            double engine = PointStressOp.evaluate(section, p, f, c, "s", "Mx").sigmaZ();
            Verify.closeAbs(hand.generalized(mx, 0, c.x(), c.y()), engine, REL * scale, "generalized flexure at " + c);
            Verify.closeAbs(hand.principal(mx, 0, c.x(), c.y()), engine, REL * scale, "principal-axes route at " + c);
        }
        // point symmetry: σ(−P) = −σ(P)
        double a = PointStressOp.evaluate(section, p, f, new Point2(-70, 100), "s", "Mx").sigmaZ();
        double b = PointStressOp.evaluate(section, p, f, new Point2(70, -100), "s", "Mx").sigmaZ();
        Verify.closeAbs(-a, b, REL * scale, "point symmetry of σ");

        // neutral axis: Y = (Ixy/Iyy)·X, tan β = Ixy/Iyy = −2.011 (β = −63.6°); two points on it, in web and flange
        double tanBeta = ixy / iyy;
        for (Point2 q : new Point2[] {new Point2(2, 2 * tanBeta), new Point2(95 / tanBeta, 95)}) {
            double s = PointStressOp.evaluate(section, p, f, q, "s", "Mx").sigmaZ();
            Verify.closeAbs(0.0, s, REL * scale, "σ = 0 on the neutral axis tan β = Ixy/Iyy at " + q);
        }
    }

    /** The sharp 150 × 90 × 12 angle of {@link UnequalAngleTest}, heel at the origin, under Mx and My together. */
    @Test
    void angleUnderBiaxialMoments() {
        double a1 = 1800, a2 = 936, a = a1 + a2;
        double xc = (a1 * 6 + a2 * 51) / a, yc = (a1 * 75 + a2 * 6) / a;
        double ixx = 12 * Math.pow(150, 3) / 12 + a1 * sq(75 - yc) + 78 * Math.pow(12, 3) / 12 + a2 * sq(6 - yc);
        double iyy = 150 * Math.pow(12, 3) / 12 + a1 * sq(6 - xc) + 12 * Math.pow(78, 3) / 12 + a2 * sq(51 - xc);
        double ixy = a1 * (6 - xc) * (75 - yc) + a2 * (51 - xc) * (6 - yc);
        Hand hand = new Hand(xc, yc, ixx, iyy, ixy);

        Region r = new Region(Shapes.polygon(0, 0, 90, 0, 90, 12, 12, 12, 12, 150, 0, 150));
        Section section = Shapes.section(r);
        SectionProperties p = SectionPropertiesOp.compute(section);
        double mx = 12e6, my = -4.5e6; // N·mm
        InternalForces f = new InternalForces(0, 0, 0, mx, my, 0);
        Point2[] corners = {new Point2(0, 0), new Point2(90, 0), new Point2(90, 12), new Point2(12, 12),
            new Point2(12, 150), new Point2(0, 150)};
        double scale = 0;
        for (Point2 c : corners) {
            scale = Math.max(scale, Math.abs(hand.generalized(mx, my, c.x(), c.y())));
        }
        for (Point2 c : corners) {
            PointStress ps = PointStressOp.evaluate(section, p, f, c, "s", "MxMy");
            Verify.closeAbs(hand.generalized(mx, my, c.x(), c.y()), ps.sigmaZ(), REL * scale, "generalized at " + c);
            Verify.closeAbs(hand.principal(mx, my, c.x(), c.y()), ps.sigmaZ(), REL * scale, "principal at " + c);
        }
        // neutral axis through the centroid: (Mx·Iyy + My·Ixy)·Y = (Mx·Ixy + My·Ixx)·X, slope −1.740; the centroid
        // itself lies in the void of the angle, so take the axis's crossings of the two leg centre lines
        double slope = (mx * ixy + my * ixx) / (mx * iyy + my * ixy);
        for (Point2 q : new Point2[] {new Point2(6, yc + slope * (6 - xc)), new Point2(xc + (6 - yc) / slope, 6)}) {
            Verify.closeAbs(0.0, PointStressOp.evaluate(section, p, f, q, "s", "MxMy").sigmaZ(), REL * scale,
                    "σ = 0 on the neutral axis at " + q);
        }
    }

    private static double sq(double v) {
        return v * v;
    }
}
