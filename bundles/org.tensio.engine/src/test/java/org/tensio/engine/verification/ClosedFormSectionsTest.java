package org.tensio.engine.verification;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tensio.engine.geometry.ArcSegment;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.LineSegment;
import org.tensio.engine.geometry.Moments;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.profile.CircleHollowProfile;
import org.tensio.engine.profile.CircleProfile;
import org.tensio.engine.profile.EllipseProfile;
import org.tensio.engine.profile.RectangleProfile;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.properties.SectionPropertiesOp;

/**
 * Closed-form section properties of elementary shapes.
 * <p>
 * Sources: W. C. Young, R. G. Budynas, A. M. Sadegh, <i>Roark's Formulas for Stress and Strain</i>, 8th ed.,
 * Appendix A, Table A.1 "Properties of plane areas"; J. M. Gere, B. J. Goodno, <i>Mechanics of Materials</i>,
 * Appendix E "Properties of plane areas" — formulas quoted from memory (case numbers not recalled, so not
 * cited). The plastic moduli are the first moments of the two equal-area halves (common practice, no source
 * beyond the definition). Torsion constants of the circle and the tube are Saint-Venant's exact
 * J = πr⁴/2 and π(ro⁴ − ri⁴)/2 (Roark 8th ed., ch. 10 "Torsion", from memory).
 * <p>
 * Tolerance: the engine integrates the boundary exactly (arcs as arcs), so results may differ from the closed
 * forms only by floating-point rounding: 1e-12 relative. Product moments that vanish by symmetry are compared
 * absolutely, against 1e-12 times the larger second moment.
 */
class ClosedFormSectionsTest {

    private static final double REL = 1e-12;

    private static void close(double expected, double actual, String what) {
        Verify.close(expected, actual, REL, what);
    }

    @Test
    void rectangle() {
        // b = 120 along x, h = 300 along y, placed off the origin to exercise the centroid
        double b = 120, h = 300;
        SectionProperties p = SectionPropertiesOp.compute(Shapes.section(new RectangleProfile(b, h), 40 + b / 2, -70 + h / 2));
        close(b * h, p.area(), "A = bh");
        close(40 + b / 2, p.centroid().x(), "xc");
        close(-70 + h / 2, p.centroid().y(), "yc");
        close(b * h * h * h / 12, p.ixx(), "Ixx = bh³/12 (Roark Table A.1)");
        close(h * b * b * b / 12, p.iyy(), "Iyy = hb³/12");
        Verify.closeAbs(0.0, p.ixy(), REL * p.ixx(), "Ixy = 0 by symmetry");
        close(b * h * h / 6, p.sxTop(), "Sx = bh²/6");
        close(b * h * h / 6, p.sxBottom(), "Sx = bh²/6");
        close(h * b * b / 6, p.syRight(), "Sy = hb²/6");
        close(h * b * b / 6, p.syLeft(), "Sy = hb²/6");
        close(b * h * h / 4, p.zx(), "Zx = bh²/4");
        close(h * b * b / 4, p.zy(), "Zy = hb²/4");
        close(h / Math.sqrt(12), p.rx(), "rx = h/√12");
        close(b / Math.sqrt(12), p.ry(), "ry = b/√12");
        close(b * h * h * h / 12, p.i1(), "I1 = Ixx (h > b)");
        close(h * b * b * b / 12, p.i2(), "I2 = Iyy");
        assertEquals(0.0, p.principalAngleDeg(), 1e-9, "principal axis along x");
        assertNull(p.j(), "no closed-form J is claimed for a rectangle");
    }

    @Test
    void solidCircle() {
        double r = 37.5;
        SectionProperties p = SectionPropertiesOp.compute(Shapes.section(new CircleProfile(r)));
        close(Math.PI * r * r, p.area(), "A = πr²");
        close(Math.PI * Math.pow(r, 4) / 4, p.ixx(), "Ixx = πr⁴/4 (Roark Table A.1)");
        close(Math.PI * Math.pow(r, 4) / 4, p.iyy(), "Iyy = πr⁴/4");
        Verify.closeAbs(0.0, p.ixy(), REL * p.ixx(), "Ixy = 0");
        close(Math.PI * r * r * r / 4, p.sxTop(), "S = πr³/4");
        close(Math.PI * r * r * r / 4, p.syLeft(), "S = πr³/4");
        close(4 * r * r * r / 3, p.zx(), "Z = 4r³/3 (two half-discs, centroid 4r/3π)");
        close(4 * r * r * r / 3, p.zy(), "Z = 4r³/3");
        close(r / 2, p.rx(), "r_g = r/2");
        assertNotNull(p.j(), "J from the closed form for CircleProfile");
        close(Math.PI * Math.pow(r, 4) / 2, p.j(), "J = πr⁴/2");
        assertEquals("closedFormCircle", p.torsionSource());
        assertEquals(0.0, p.shearCentre().distance(new Point2(0, 0)), REL * r, "shear centre at the centre");
    }

    @Test
    void hollowCircle() {
        // CHS 219.1 × 8 (nominal dimensions only; values here are the exact closed forms)
        double ro = 219.1 / 2, t = 8, ri = ro - t;
        SectionProperties p = SectionPropertiesOp.compute(Shapes.section(new CircleHollowProfile(ro, t)));
        double i = Math.PI * (Math.pow(ro, 4) - Math.pow(ri, 4)) / 4;
        close(Math.PI * (ro * ro - ri * ri), p.area(), "A = π(ro² − ri²)");
        close(i, p.ixx(), "I = π(ro⁴ − ri⁴)/4 (Roark Table A.1)");
        close(i, p.iyy(), "I");
        close(i / ro, p.sxTop(), "S = I/ro");
        close(4 * (ro * ro * ro - ri * ri * ri) / 3, p.zx(), "Z = 4(ro³ − ri³)/3");
        close(2 * i, p.j(), "J = π(ro⁴ − ri⁴)/2");
        assertEquals("closedFormTube", p.torsionSource());
    }

    @Test
    void rightTriangle() {
        // right angle at the origin, legs b along +x and h along +y
        double b = 90, h = 150;
        Region r = new Region(Shapes.polygon(0, 0, b, 0, 0, h));
        SectionProperties p = SectionPropertiesOp.compute(Shapes.section(r));
        close(b * h / 2, p.area(), "A = bh/2");
        close(b / 3, p.centroid().x(), "xc = b/3");
        close(h / 3, p.centroid().y(), "yc = h/3 (Gere & Goodno App. E)");
        close(b * h * h * h / 36, p.ixx(), "Ixx = bh³/36");
        close(h * b * b * b / 36, p.iyy(), "Iyy = hb³/36");
        close(-b * b * h * h / 72, p.ixy(), "Ixy = −b²h²/72 (Gere & Goodno App. E)");
        close(b * h * h / 24, p.sxTop(), "Sx,top = Ixx/(2h/3) = bh²/24");
        close(b * h * h / 12, p.sxBottom(), "Sx,bottom = Ixx/(h/3) = bh²/12");
        // plastic axis parallel to x halves the area: (h − y)² = h²/2 → y = h(1 − 1/√2)
        close(h * (1 - 1 / Math.sqrt(2)), p.plasticAxisY(), "equal-area axis y = h(1 − 1/√2)");
        // Zx = ∫|y − yp| dA over the two halves. Upper half: the similar triangle of height c = h/√2 above yp, whose
        // centroid is c/3 above its base. Lower half: its centroid follows from the whole triangle's first moment.
        double c = h / Math.sqrt(2), yp = h - c, aHalf = b * h / 4;
        double upper = aHalf * (c / 3);
        double lowerCentroid = (b * h / 2 * (h / 3) - aHalf * (yp + c / 3)) / aHalf;
        close(upper + aHalf * (yp - lowerCentroid), p.zx(), "Zx by two parts");
    }

    @Test
    void ellipse() {
        // semi-axes a = 80 along x, b = 45 along y
        double a = 80, b = 45;
        SectionProperties p = SectionPropertiesOp.compute(Shapes.section(new EllipseProfile(a, b), 10, 20));
        Verify.close(10, p.centroid().x(), REL, "xc at the placement");
        close(Math.PI * a * b, p.area(), "A = πab");
        close(Math.PI * a * b * b * b / 4, p.ixx(), "Ixx = πab³/4 (Roark Table A.1)");
        close(Math.PI * b * a * a * a / 4, p.iyy(), "Iyy = πba³/4");
        Verify.closeAbs(0.0, p.ixy(), REL * p.iyy(), "Ixy = 0");
        close(Math.PI * a * b * b / 4, p.sxTop(), "Sx = πab²/4");
        close(4 * a * b * b / 3, p.zx(), "Zx = 4ab²/3 (affine image of the circle's 4r³/3)");
        close(4 * b * a * a / 3, p.zy(), "Zy = 4ba²/3");
    }

    @Test
    void halfDiscFromAnArc() {
        double r = 60;
        // upper half-disc: arc through the top point, closed by the diameter along y = 0
        Point2 e = new Point2(r, 0), w = new Point2(-r, 0);
        Contour k = new Contour(List.of(ArcSegment.through(e, new Point2(0, r), w), new LineSegment(w, e)));
        Region region = new Region(k);
        Moments m = region.moments();
        close(Math.PI * r * r / 2, m.area(), "A = πr²/2");
        close(Math.PI * Math.pow(r, 4) / 8, m.syy(), "I about the diameter = πr⁴/8 (Gere & Goodno App. E)");
        close(Math.PI * Math.pow(r, 4) / 8, m.sxx(), "I about the axis of symmetry = πr⁴/8");
        SectionProperties p = SectionPropertiesOp.compute(Shapes.section(region));
        double ybar = 4 * r / (3 * Math.PI);
        close(ybar, p.centroid().y(), "centroid 4r/(3π) above the diameter");
        close((Math.PI / 8 - 8 / (9 * Math.PI)) * Math.pow(r, 4), p.ixx(), "Ixx,c = (π/8 − 8/(9π)) r⁴");
        close(Math.PI * Math.pow(r, 4) / 8, p.iyy(), "Iyy = πr⁴/8");
        close(p.ixx() / (r - ybar), p.sxTop(), "Sx,top");
        close(p.ixx() / ybar, p.sxBottom(), "Sx,bottom");
    }
}
