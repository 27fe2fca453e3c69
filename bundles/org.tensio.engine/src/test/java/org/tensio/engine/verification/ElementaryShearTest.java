package org.tensio.engine.verification;

import org.junit.jupiter.api.Test;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.profile.CircleHollowProfile;
import org.tensio.engine.profile.CircleProfile;
import org.tensio.engine.profile.IShapeProfile;
import org.tensio.engine.profile.RectangleProfile;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.properties.SectionPropertiesOp;
import org.tensio.engine.section.Section;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.PointStressOp;
import org.tensio.engine.stress.StressComponents;

/**
 * Elementary (Jourawski / Collignon) shear stress τ = V·Q/(I·t), averaged over the cut through the point.
 * Source: Gere &amp; Goodno, Mechanics of Materials, ch. 5 "Shear stresses in beams": rectangular sections
 * τ = (V/2I)(h²/4 − y²), τmax = 3V/(2A); circular sections τmax = 4V/(3A); hollow circular sections, thin-walled
 * limit τmax = 2V/A; webs of I-beams τ = VQ/(I·tw) — all from memory. Q, I and t are computed by hand below,
 * never taken from the engine.
 * <p>
 * Tolerance 1e-12 relative wherever the elementary value is exact algebra. The only approximate comparison is
 * the thin-tube limit 2V/A, allowed 2 %: the exact elementary value for a tube is
 * V·(2/3)(ro³ − ri³) / (π(ro⁴ − ri⁴)/4 · 2t), and it tends to 2V/A with a relative difference of order
 * (t/r)² — about 7e-5 at t/r = 1/50, far inside 2 %.
 */
class ElementaryShearTest {

    private static final double REL = 1e-12;

    private static PointStress at(Section s, SectionProperties p, InternalForces f, double x, double y) {
        return PointStressOp.evaluate(s, p, f, new Point2(x, y), "st", "V");
    }

    @Test
    void rectangleParabolicDistribution() {
        double b = 40, h = 100, v = 10e3, a = b * h, i = b * h * h * h / 12;
        Section s = Shapes.section(new RectangleProfile(b, h));
        SectionProperties p = SectionPropertiesOp.compute(s);
        InternalForces vy = new InternalForces(0, 0, v, 0, 0, 0);
        PointStress na = at(s, p, vy, 0, 0);
        Verify.close(1.5 * v / a, na.total().tauZY(), REL, "τmax = 3V/(2A) at the neutral axis");
        Verify.closeAbs(0.0, na.total().tauZX(), REL * v / a, "no τzx from Vy in a doubly symmetric rectangle");
        PointStress off = at(s, p, vy, 7, 25);
        Verify.close(v / (2 * i) * (h * h / 4 - 25 * 25), off.total().tauZY(), REL, "τ = (V/2I)(h²/4 − y²) at y = 25");
        Verify.close(1.5 * v / a * (1 - 4.0 * 25 * 25 / (h * h)), off.total().tauZY(), REL, "same, as (3V/2A)(1 − 4y²/h²)");
        // the same along x for Vx: cut parallel to y through the centroid, width h
        PointStress vx = at(s, p, new InternalForces(0, v, 0, 0, 0, 0), 0, 12);
        Verify.close(1.5 * v / a, vx.total().tauZX(), REL, "τzx = 3Vx/(2A) on the centroidal y axis");
    }

    @Test
    void solidCircleAtTheCentre() {
        double r = 50, v = 25e3, a = Math.PI * r * r;
        Section s = Shapes.section(new CircleProfile(r));
        SectionProperties p = SectionPropertiesOp.compute(s);
        PointStress c = at(s, p, new InternalForces(0, 0, v, 0, 0, 0), 0, 0);
        // Q = 2r³/3 (half-disc), t = 2r, I = πr⁴/4 → τ = 4V/(3A)
        Verify.close(4 * v / (3 * a), c.total().tauZY(), REL, "τ = 4V/(3A) at the centre");
        Verify.close(2 * r * r * r / 3, c.shearCuts().qxHorizontal(), REL, "Q of the half-disc = 2r³/3");
        Verify.close(2 * r, c.shearCuts().widthHorizontal(), REL, "cut width = diameter");
    }

    @Test
    void thinTubeAtTheNeutralAxis() {
        double ro = 50, t = 1, ri = ro - t, v = 10e3;
        double a = Math.PI * (ro * ro - ri * ri), i = Math.PI * (Math.pow(ro, 4) - Math.pow(ri, 4)) / 4;
        Section s = Shapes.section(new CircleHollowProfile(ro, t));
        SectionProperties p = SectionPropertiesOp.compute(s);
        PointStress w = at(s, p, new InternalForces(0, 0, v, 0, 0, 0), ro - t / 2, 0);
        double q = 2.0 / 3 * (ro * ro * ro - ri * ri * ri); // upper half of the ring
        Verify.close(2 * t, w.shearCuts().widthHorizontal(), REL, "the cut crosses both walls: width 2t");
        Verify.close(q, w.shearCuts().qxHorizontal(), REL, "Q = (2/3)(ro³ − ri³)");
        Verify.close(v * q / (i * 2 * t), w.total().tauZY(), REL, "exact elementary VQ/(It)");
        Verify.close(2 * v / a, w.total().tauZY(), 0.02, "thin-wall limit τmax = 2V/A (t/r = 1/50)");
    }

    @Test
    void sharpISectionWebAndFlange() {
        // IPE 300 dimensions without the root fillets: b = 150, h = 300, tw = 7.1, tf = 10.7
        double b = 150, h = 300, tw = 7.1, tf = 10.7, v = 100e3;
        Section s = Shapes.section(new IShapeProfile(b, h, tw, tf));
        SectionProperties p = SectionPropertiesOp.compute(s);
        double ixx = b * h * h * h / 12 - (b - tw) * Math.pow(h - 2 * tf, 3) / 12;
        double iyy = 2 * tf * b * b * b / 12 + (h - 2 * tf) * tw * tw * tw / 12;
        Verify.close(ixx, p.ixx(), REL, "Ixx by rectangles");
        InternalForces vy = new InternalForces(0, 0, v, 0, 0, 0);

        double yw = h / 2 - tf; // top of the web
        double qFlange = b * tf * (h - tf) / 2;
        double qNa = qFlange + tw * yw * yw / 2;
        Verify.close(v * qNa / (ixx * tw), at(s, p, vy, 0, 0).total().tauZY(), REL, "web, neutral axis: VQ/(I·tw)");
        double y = 100;
        double q100 = qFlange + tw * (yw * yw - y * y) / 2;
        Verify.close(v * q100 / (ixx * tw), at(s, p, vy, -1, y).total().tauZY(), REL, "web at y = 100: VQ/(I·tw)");
        // mid-thickness of the top flange: the cut runs across the full width b
        double yf = h / 2 - tf / 2;
        double qf = b * (tf / 2) * (h / 2 - tf / 4);
        Verify.close(v * qf / (ixx * b), at(s, p, vy, 30, yf).total().tauZY(), REL, "flange mid-thickness: VQ/(I·b)");

        // Vx: the cut parallel to y at x = 40 crosses both flange outstands (width 2·tf)
        double x0 = 40, out = b / 2 - x0;
        double qy = 2 * tf * out * (x0 + out / 2);
        PointStress fl = at(s, p, new InternalForces(0, v, 0, 0, 0, 0), x0, h / 2 - 3);
        Verify.close(2 * tf, fl.shearCuts().widthVertical(), REL, "vertical cut width 2·tf");
        Verify.close(v * qy / (iyy * 2 * tf), fl.total().tauZX(), REL, "flanges under Vx: VQ/(Iyy·2tf)");
        StressComponents vyPart = fl.contributions().get(ForceComponent.VY);
        Verify.closeAbs(0.0, vyPart.tauZX(), REL * v / p.area(), "no Vy contribution when Vy = 0");
    }
}
