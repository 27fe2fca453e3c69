package org.tensio.engine.properties;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

import org.tensio.engine.geometry.Moments;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.verification.Generators;
import org.tensio.engine.verification.Shapes;
import org.tensio.engine.verification.Verify;

/**
 * Invariants of centroidal section properties under rigid motions, similarity and reflection, and Steiner's
 * parallel-axis theorem (Gere &amp; Goodno, Mechanics of Materials, App. D/E "Moments of inertia of plane areas":
 * parallel-axis theorem, rotation of axes Ix1 = Ix cos²θ + Iy sin²θ − 2Ixy sinθ cosθ — from memory).
 * <p>
 * Tolerances: the transforms themselves round every coordinate once (relative 1.1e-16 of the coordinate
 * magnitude), so invariants can only hold to a few hundred ulps of the largest quantity involved: 1e-12
 * relative for rotation, scaling and reflection (coordinates of order the size). Translation by up to 1000
 * sizes rounds each coordinate by up to 1000 × 1.1e-16 of the size, hence 1e-10 relative. Quantities that
 * may vanish (Ixy, centroid of a symmetric shape) are compared absolutely against the matching scale
 * (Ixx + Iyy, size).
 */
class SectionPropertyInvariantsTest {

    @Provide
    Arbitrary<Region> regions() {
        return Generators.regions();
    }

    @Provide
    Arbitrary<Double> offsets() {
        return Arbitraries.doubles().between(-1000, 1000).ofScale(6);
    }

    private static SectionProperties props(Region r) {
        return SectionPropertiesOp.compute(Shapes.section(r));
    }

    @Property(tries = 150)
    void translationLeavesCentroidalPropertiesUnchanged(@ForAll("regions") Region r, @ForAll("offsets") double dx,
            @ForAll("offsets") double dy) {
        SectionProperties p = props(r), q = props(r.translated(dx, dy));
        double rel = 1e-10, polar = p.ixx() + p.iyy(), size = Math.sqrt(p.area());
        Verify.close(p.area(), q.area(), rel, "A");
        Verify.closeAbs(p.centroid().x() + dx, q.centroid().x(), rel * (size + Math.abs(dx)), "xc moves by dx");
        Verify.closeAbs(p.centroid().y() + dy, q.centroid().y(), rel * (size + Math.abs(dy)), "yc moves by dy");
        Verify.closeAbs(p.ixx(), q.ixx(), rel * polar, "Ixx");
        Verify.closeAbs(p.iyy(), q.iyy(), rel * polar, "Iyy");
        Verify.closeAbs(p.ixy(), q.ixy(), rel * polar, "Ixy");
        Verify.closeAbs(p.i1(), q.i1(), rel * polar, "I1");
        Verify.closeAbs(p.i2(), q.i2(), rel * polar, "I2");
        Verify.close(p.sxTop(), q.sxTop(), rel * 10, "Sx,top");
        Verify.close(p.syLeft(), q.syLeft(), rel * 10, "Sy,left");
        // Z is stationary at the plastic axis, so the bisection error enters only to second order
        Verify.close(p.zx(), q.zx(), rel * 10, "Zx");
        Verify.close(p.zy(), q.zy(), rel * 10, "Zy");
    }

    @Property(tries = 150)
    void rotationTransformsTheInertiaTensorAndKeepsPrincipalValues(@ForAll("regions") Region r,
            @ForAll("angles") double phi) {
        SectionProperties p = props(r), q = props(Shapes.rotated(r, phi));
        double rel = 1e-12, polar = p.ixx() + p.iyy();
        double c = Math.cos(phi), s = Math.sin(phi);
        Verify.close(p.area(), q.area(), rel, "A");
        // the body turns by φ: I'xx = Ixx cos²φ + Iyy sin²φ + 2 Ixy sinφ cosφ, etc. (tensor transformation)
        Verify.closeAbs(p.ixx() * c * c + p.iyy() * s * s + 2 * p.ixy() * s * c, q.ixx(), rel * polar, "I'xx");
        Verify.closeAbs(p.ixx() * s * s + p.iyy() * c * c - 2 * p.ixy() * s * c, q.iyy(), rel * polar, "I'yy");
        Verify.closeAbs((p.iyy() - p.ixx()) * s * c + p.ixy() * (c * c - s * s), q.ixy(), rel * polar, "I'xy");
        Verify.closeAbs(p.i1(), q.i1(), rel * polar, "I1 invariant");
        Verify.closeAbs(p.i2(), q.i2(), rel * polar, "I2 invariant");
        Verify.close(polar, q.ixx() + q.iyy(), rel, "polar moment about the centroid invariant");
        Verify.closeAbs(p.centroid().x() * c - p.centroid().y() * s, q.centroid().x(), 1e-12 * 4, "centroid turns");
        Verify.closeAbs(p.centroid().x() * s + p.centroid().y() * c, q.centroid().y(), 1e-12 * 4, "centroid turns");
        double separation = (p.i1() - p.i2()) / polar;
        if (separation > 1e-3) {
            // principal directions defined: the I1 axis turns with the body (mod 180°); the angle is as
            // well-conditioned as the Mohr circle is large: δθ ≈ δI / (I1 − I2)
            double turned = Math.toDegrees(Math.toRadians(p.principalAngleDeg()) + phi);
            double diff = Math.IEEEremainder(q.principalAngleDeg() - turned, 180);
            Verify.closeAbs(0.0, diff, Math.toDegrees(10 * rel / separation), "principal axis turns by φ");
        }
    }

    @Provide
    Arbitrary<Double> angles() {
        return Arbitraries.doubles().between(-6.28318531, 6.28318531).ofScale(8);
    }

    @Property(tries = 150)
    void scalingLaws(@ForAll("regions") Region r, @ForAll("factors") double f) {
        SectionProperties p = props(r), q = props(Shapes.scaled(r, f));
        double rel = 1e-12, f2 = f * f, f3 = f2 * f, f4 = f2 * f2, polar = p.ixx() + p.iyy();
        Verify.close(p.area() * f2, q.area(), rel, "A ∝ s²");
        Verify.closeAbs(p.ixx() * f4, q.ixx(), rel * polar * f4, "Ixx ∝ s⁴");
        Verify.closeAbs(p.iyy() * f4, q.iyy(), rel * polar * f4, "Iyy ∝ s⁴");
        Verify.closeAbs(p.ixy() * f4, q.ixy(), rel * polar * f4, "Ixy ∝ s⁴");
        Verify.close(p.sxTop() * f3, q.sxTop(), rel * 10, "S ∝ s³");
        Verify.close(p.syRight() * f3, q.syRight(), rel * 10, "S ∝ s³");
        Verify.close(p.zx() * f3, q.zx(), rel * 10, "Z ∝ s³");
        Verify.close(p.zy() * f3, q.zy(), rel * 10, "Z ∝ s³");
        Verify.close(p.rx() * f, q.rx(), rel * 10, "r ∝ s");
    }

    @Provide
    Arbitrary<Double> factors() {
        return Arbitraries.doubles().between(-3, 3).ofScale(6).map(e -> Math.pow(10, e));
    }

    @Property(tries = 150)
    void mirrorFlipsTheProductMoment(@ForAll("regions") Region r) {
        SectionProperties p = props(r), q = props(Shapes.mirroredX(r));
        double rel = 1e-12, polar = p.ixx() + p.iyy();
        Verify.close(p.area(), q.area(), rel, "A");
        Verify.closeAbs(-p.centroid().x(), q.centroid().x(), 4 * rel, "xc → −xc");
        Verify.closeAbs(p.ixx(), q.ixx(), rel * polar, "Ixx");
        Verify.closeAbs(p.iyy(), q.iyy(), rel * polar, "Iyy");
        Verify.closeAbs(-p.ixy(), q.ixy(), rel * polar, "Ixy → −Ixy");
        Verify.close(p.syRight(), q.syLeft(), rel * 10, "right and left moduli swap");
        Verify.close(p.zy(), q.zy(), rel * 10, "Zy");
    }

    @Property(tries = 150)
    void parallelAxisTheorem(@ForAll("regions") Region r, @ForAll("offsets") double dx, @ForAll("offsets") double dy) {
        // moments about the origin of the region moved to (dx, dy) = centroidal values + Steiner terms
        Region moved = r.translated(dx / 100, dy / 100);
        SectionProperties p = props(moved);
        Moments m = moved.moments();
        double xc = p.centroid().x(), yc = p.centroid().y(), a = p.area();
        double scale = m.sxx() + m.syy();
        Verify.close(a, m.area(), 1e-12, "A");
        Verify.closeAbs(p.ixx() + a * yc * yc, m.syy(), 1e-11 * scale, "∫y² = Ixx + A·yc²");
        Verify.closeAbs(p.iyy() + a * xc * xc, m.sxx(), 1e-11 * scale, "∫x² = Iyy + A·xc²");
        Verify.closeAbs(p.ixy() + a * xc * yc, m.sxy(), 1e-11 * scale, "∫xy = Ixy + A·xc·yc");
    }
}
