package org.tensio.cli.report;

import java.util.List;

import org.tensio.engine.stress.PrincipalStresses;
import org.tensio.engine.stress.StressComponents;

/**
 * The stress state at one point as a stress element and as Mohr's circle.
 * <p>
 * The beam stress state (σz, τzx, τzy; the other components zero) is plane in the plane spanned by the member
 * axis z and the direction t of the shear resultant τ = √(τzx² + τzy²) in the section plane: on the z faces act
 * σz and τ (along t), on the t faces the complementary τ (along z) and no normal stress. Its principal stresses
 * are σ1,3 = σz/2 ± √((σz/2)² + τ²); the third, normal to that plane, is σ2 = 0 (plane stress transformation and
 * Mohr's circle, any mechanics-of-materials text, e.g. Gere &amp; Goodno, Mechanics of Materials, ch. 7; from
 * memory). Mohr's circle is drawn with τ upward as it acts along +t on the z face: Z = (σz, τ), T = (0, −τ); the
 * two dashed circles through σ2 = 0 complete the three-dimensional picture.
 */
final class PointDrawings {

    private static final String INK = SectionDrawing.INK;
    private static final String MUTED = SectionDrawing.MUTED;
    private static final String SIG = "#1f6e78";
    private static final String TAU = "#9a2f22";

    private PointDrawings() {
    }

    static Scene element(StressComponents s, String unit) {
        double sz = s.sigmaZ(), tau = s.tauResultant();
        Scene sc = new Scene(330, 300, "Stress element: σz = " + Fmt.sig(sz, 4) + ", τ = " + Fmt.sig(tau, 4) + " " + unit);
        sc.bold(12, 20, "Stress element at G", 13, Scene.Anchor.START, INK);
        double cx = 160, cy = 128, a = 44;
        sc.polygon("#f3f1ea", INK, 1.4, cx - a, cy - a, cx + a, cy - a, cx + a, cy + a, cx - a, cy + a);
        sc.arrow(cx - 14, cy + 14, cx + 18, cy + 14, MUTED, 0.8, 6);
        sc.arrow(cx - 14, cy + 14, cx - 14, cy - 18, MUTED, 0.8, 6);
        sc.text(cx + 21, cy + 18, "z", 10.5, Scene.Anchor.START, MUTED);
        sc.text(cx - 10, cy - 16, "t", 10.5, Scene.Anchor.START, MUTED);
        if (sz != 0) {
            double in = a + 12, out = a + 50;
            if (sz > 0) {
                sc.arrow(cx + in, cy, cx + out, cy, SIG, 2.2, 10);
                sc.arrow(cx - in, cy, cx - out, cy, SIG, 2.2, 10);
            } else {
                sc.arrow(cx + out, cy, cx + in, cy, SIG, 2.2, 10);
                sc.arrow(cx - out, cy, cx - in, cy, SIG, 2.2, 10);
            }
            sc.bold(cx + a + 31, cy - 8, "σz", 11, Scene.Anchor.MIDDLE, SIG);
            sc.bold(cx - a - 31, cy - 8, "σz", 11, Scene.Anchor.MIDDLE, SIG);
        }
        if (tau != 0) {
            double g = a + 7, l = a - 8;
            sc.arrow(cx + g, cy + l, cx + g, cy - l, TAU, 2.2, 10);
            sc.arrow(cx - g, cy - l, cx - g, cy + l, TAU, 2.2, 10);
            sc.arrow(cx - l, cy - g, cx + l, cy - g, TAU, 2.2, 10);
            sc.arrow(cx + l, cy + g, cx - l, cy + g, TAU, 2.2, 10);
            sc.bold(cx, cy - a - 14, "τ", 11, Scene.Anchor.MIDDLE, TAU);
            sc.bold(cx, cy + a + 24, "τ", 11, Scene.Anchor.MIDDLE, TAU);
        }
        double phi = Math.toDegrees(Math.atan2(s.tauZY(), s.tauZX()));
        double ty = 228;
        sc.bold(12, ty, "σz = " + Fmt.sig(sz, 5) + " " + unit + (sz > 0 ? " (tension)" : sz < 0 ? " (compression)" : ""),
                11, Scene.Anchor.START, SIG);
        sc.bold(12, ty + 16, "τ = " + Fmt.sig(tau, 5) + " " + unit + " (τzx = " + Fmt.sig(s.tauZX(), 4) + ", τzy = "
                + Fmt.sig(s.tauZY(), 4) + ")", 11, Scene.Anchor.START, TAU);
        sc.text(12, ty + 33, tau == 0 ? "no shear: t is any direction in the section plane"
                : "t: direction of τ in the section plane, " + Fmt.fixed(phi, 1) + "° from +x", 10.5,
                Scene.Anchor.START, MUTED);
        sc.text(12, ty + 49, "z: member axis, normal to the section", 10.5, Scene.Anchor.START, MUTED);
        return sc;
    }

    static Scene mohr(StressComponents s, String unit) {
        PrincipalStresses p = PrincipalStresses.of(s);
        double sz = s.sigmaZ(), tau = s.tauResultant();
        double c = sz / 2, r = p.tauMax();
        Scene sc = new Scene(400, 300, "Mohr's circle: σ1 = " + Fmt.sig(p.sigma1(), 4) + ", σ3 = "
                + Fmt.sig(p.sigma3(), 4) + ", τmax = " + Fmt.sig(r, 4) + " " + unit);
        sc.bold(12, 20, "Mohr's circle at G", 13, Scene.Anchor.START, INK);
        double left = 50, right = 360, top = 52, bottom = 222;
        double s0 = Math.min(p.sigma3(), 0), s1 = Math.max(p.sigma1(), 0);
        double span = s1 - s0;
        double k = span > 0 ? Math.min((right - left) / span, (bottom - top) / (2 * r)) : 1;
        double ox = left + ((right - left) - k * span) / 2 - k * s0;
        double oy = (top + bottom) / 2;
        sc.arrow(left - 16, oy, right + 22, oy, MUTED, 0.9, 7);
        sc.arrow(ox, bottom + 10, ox, top - 20, MUTED, 0.9, 7);
        sc.text(right + 22, oy - 7, "σ", 11, Scene.Anchor.END, MUTED);
        sc.text(ox + 6, top - 14, "τ", 11, Scene.Anchor.START, MUTED);
        if (span > 0) {
            sc.add(circle(ox + k * p.sigma1() / 2, oy, k * p.sigma1() / 2, "#8a959f", new double[] {3, 3}));
            sc.add(circle(ox + k * p.sigma3() / 2, oy, -k * p.sigma3() / 2, "#8a959f", new double[] {3, 3}));
            sc.add(circle(ox + k * c, oy, k * r, INK, null));
        }
        double zx = ox + k * sz, zy = oy - k * tau, tx = ox, tyy = oy + k * tau;
        sc.line(SIG, 1.2, null, zx, zy, tx, tyy);
        sc.circle(zx, zy, 3.8, SIG, null, 0);
        sc.circle(tx, tyy, 3.8, SIG, null, 0);
        boolean right0 = sz >= 0;
        // Z above its point; T below its point, or above the axis when τ is too small to keep it clear of σ1, σ3
        sc.bold(zx + (right0 ? 7 : -7), zy - 8, "Z (σz, τ)", 10.5, right0 ? Scene.Anchor.START : Scene.Anchor.END, SIG);
        boolean flat = k * tau < 16;
        sc.bold(tx + (right0 ? -7 : 7), flat ? oy - 8 : tyy + 15, "T (0, −τ)", 10.5,
                right0 ? Scene.Anchor.END : Scene.Anchor.START, SIG);
        double p1 = ox + k * p.sigma1(), p3 = ox + k * p.sigma3();
        sc.circle(p1, oy, 4, TAU, null, 0);
        sc.circle(p3, oy, 4, TAU, null, 0);
        sc.circle(ox + k * c, oy, 2.2, INK, null, 0);
        if (r > 0) {
            sc.line(TAU, 0.9, new double[] {2, 2}, ox + k * c, oy, ox + k * c, oy - k * r);
            sc.circle(ox + k * c, oy - k * r, 3.8, TAU, null, 0);
            sc.bold(ox + k * c, oy - k * r - 9, "τmax", 10.5, Scene.Anchor.MIDDLE, TAU);
        }
        sc.bold(p1 + 5, oy + 16, "σ1", 10.5, Scene.Anchor.START, TAU);
        sc.bold(p3 - 5, oy + 16, "σ3", 10.5, Scene.Anchor.END, TAU);
        sc.bold(12, 256, "σ1 = " + Fmt.sig(p.sigma1(), 5) + ",  σ2 = 0,  σ3 = " + Fmt.sig(p.sigma3(), 5) + " " + unit,
                11, Scene.Anchor.START, TAU);
        sc.text(12, 273, "τmax = (σ1 − σ3)/2 = " + Fmt.sig(r, 5) + " " + unit, 11, Scene.Anchor.START, INK);
        sc.text(12, 290, "von Mises = " + Fmt.sig(p.vonMises(), 5) + ",  Tresca = " + Fmt.sig(p.tresca(), 5) + " " + unit,
                11, Scene.Anchor.START, INK);
        return sc;
    }

    private static Scene.Shape circle(double cx, double cy, double r, String stroke, double[] dash) {
        int n = 120;
        double[] ring = new double[2 * n];
        for (int i = 0; i < n; i++) {
            double t = 2 * Math.PI * i / n;
            ring[2 * i] = cx + r * Math.cos(t);
            ring[2 * i + 1] = cy + r * Math.sin(t);
        }
        return new Scene.Shape(List.of(ring), true, false, null, stroke, dash == null ? 1.6 : 0.8, dash);
    }
}
