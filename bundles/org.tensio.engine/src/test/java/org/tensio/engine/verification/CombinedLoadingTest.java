package org.tensio.engine.verification;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.profile.CircleProfile;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.properties.SectionPropertiesOp;
import org.tensio.engine.section.Section;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.PointStressOp;
import org.tensio.engine.stress.PrincipalStresses;

/**
 * All six internal forces on a solid round bar, one off-axis point, against a hand calculation written out line
 * by line: Navier for σz, Saint-Venant torsion τ = T·r/J (exact for the circle), Jourawski shear VQ/(It) with
 * the circular segment beyond the cut, Q = (2/3)(r² − c²)^{3/2}, t = 2√(r² − c²) (so τ = V(r² − c²)/(3I)),
 * then the principal stresses of the plane state (σz, τ) by Mohr's circle, von Mises √(σ² + 3τ²) and Tresca
 * σ1 − σ3. Sources: Gere &amp; Goodno, Mechanics of Materials, ch. 3 (torsion), 5 (shear in circular beams),
 * 7 (Mohr's circle) and 8 (combined loadings) — from memory; the load case and numbers are our own.
 * <p>
 * Tolerance 1e-12 relative to the sum of the magnitudes of the terms added (exact algebra on both sides).
 */
class CombinedLoadingTest {

    @Test
    void roundBarUnderSixForcesAtAnOffAxisPoint() {
        double r = 30;                                     // mm
        double n = 50e3, vx = 20e3, vy = -35e3;            // N
        double mx = 2e6, my = -1.5e6, t = 0.8e6;           // N·mm
        double x = 12, y = -15;                            // the point, mm from the centre (inside: √369 < 30)

        double a = Math.PI * r * r;                        // 2827.43 mm²
        double i = Math.PI * Math.pow(r, 4) / 4;           // 636 172.5 mm⁴
        double j = Math.PI * Math.pow(r, 4) / 2;           // 1 272 345 mm⁴

        double sN = n / a;                                 // +17.684 MPa
        double sMx = mx * y / i;                           // −47.157 MPa: positive Mx stretches +y
        double sMy = -my * x / i;                          // +28.294 MPa: positive My stretches −x
        double sigma = sN + sMx + sMy;                     //  −1.179 MPa

        // torsion: τ = T·ρ/J along ẑ × ρ = (−y, x) for positive (counter-clockwise) T
        double tTzx = -t * y / j;                          // +9.431 MPa
        double tTzy = t * x / j;                           // +7.545 MPa
        // Vy: cut parallel to x at y = −15; beyond it (y ≥ −15) a circular segment, Q about the centroid
        double hw = Math.sqrt(r * r - y * y);              // half chord 25.981 mm
        double qVy = 2.0 / 3 * Math.pow(r * r - y * y, 1.5);
        double tVy = vy * qVy / (i * 2 * hw);              // = Vy (r² − y²)/(3I) = −12.379 MPa
        // Vx: cut parallel to y at x = 12; beyond it (x ≥ 12) the mirror-image segment
        double hv = Math.sqrt(r * r - x * x);
        double qVx = 2.0 / 3 * Math.pow(r * r - x * x, 1.5);
        double tVx = vx * qVx / (i * 2 * hv);              // = Vx (r² − x²)/(3I) = +7.922 MPa
        double tauZx = tTzx + tVx;                         // +17.354 MPa
        double tauZy = tTzy + tVy;                         //  −4.834 MPa
        double tau = Math.hypot(tauZx, tauZy);

        double rMohr = Math.hypot(sigma / 2, tau);
        double s1 = sigma / 2 + rMohr, s3 = sigma / 2 - rMohr;
        double vm = Math.sqrt(sigma * sigma + 3 * tau * tau);
        double tresca = s1 - s3;

        Section section = Shapes.section(new CircleProfile(r));
        SectionProperties p = SectionPropertiesOp.compute(section);
        InternalForces f = new InternalForces(n, vx, vy, mx, my, t);
        PointStress ps = PointStressOp.evaluate(section, p, f, new Point2(x, y), "st", "combined");

        double sigScale = 1e-12 * (Math.abs(sN) + Math.abs(sMx) + Math.abs(sMy));
        double tauScale = 1e-12 * (Math.abs(tTzx) + Math.abs(tTzy) + Math.abs(tVx) + Math.abs(tVy));
        Verify.closeAbs(sN, ps.contributions().get(ForceComponent.N).sigmaZ(), sigScale, "N/A");
        Verify.closeAbs(sMx, ps.contributions().get(ForceComponent.MX).sigmaZ(), sigScale, "Mx·y/I");
        Verify.closeAbs(sMy, ps.contributions().get(ForceComponent.MY).sigmaZ(), sigScale, "−My·x/I");
        Verify.closeAbs(sigma, ps.sigmaZ(), sigScale, "σz total");
        Verify.closeAbs(tTzx, ps.contributions().get(ForceComponent.T).tauZX(), tauScale, "torsion τzx = −T·y/J");
        Verify.closeAbs(tTzy, ps.contributions().get(ForceComponent.T).tauZY(), tauScale, "torsion τzy = T·x/J");
        Verify.closeAbs(tVy, ps.contributions().get(ForceComponent.VY).tauZY(), tauScale, "Vy·Q/(I·t)");
        Verify.closeAbs(0.0, ps.contributions().get(ForceComponent.VY).tauZX(), tauScale, "Vy gives no τzx here");
        Verify.closeAbs(tVx, ps.contributions().get(ForceComponent.VX).tauZX(), tauScale, "Vx·Q/(I·t)");
        Verify.closeAbs(0.0, ps.contributions().get(ForceComponent.VX).tauZY(), tauScale, "Vx gives no τzy here");
        Verify.closeAbs(tauZx, ps.total().tauZX(), tauScale, "τzx total");
        Verify.closeAbs(tauZy, ps.total().tauZY(), tauScale, "τzy total");
        assertEquals(PointStressOp.TORSION_EXACT_CIRCULAR, ps.torsionMethod());

        PrincipalStresses pr = ps.principal();
        double scale = 1e-12 * (Math.abs(sigma) + tau) * 4;
        Verify.closeAbs(s1, pr.sigma1(), scale, "σ1 = σ/2 + √((σ/2)² + τ²)");
        Verify.closeAbs(0.0, pr.sigma2(), scale, "σ2 = 0 in the beam stress state");
        Verify.closeAbs(s3, pr.sigma3(), scale, "σ3 = σ/2 − √((σ/2)² + τ²)");
        Verify.closeAbs(rMohr, pr.tauMax(), scale, "τmax = Mohr radius");
        Verify.closeAbs(vm, pr.vonMises(), scale, "von Mises √(σ² + 3τ²)");
        Verify.closeAbs(tresca, pr.tresca(), scale, "Tresca σ1 − σ3");
        // the reported directions are eigenvectors of the full tensor [[0,0,τzx],[0,0,τzy],[τzx,τzy,σ]]
        double[][] dirs = {pr.dir1(), pr.dir2(), pr.dir3()};
        double[] vals = {pr.sigma1(), pr.sigma2(), pr.sigma3()};
        for (int k = 0; k < 3; k++) {
            double[] d = dirs[k];
            Verify.close(1.0, Math.sqrt(d[0] * d[0] + d[1] * d[1] + d[2] * d[2]), 1e-12, "unit direction " + (k + 1));
            double[] td = {tauZx * d[2], tauZy * d[2], tauZx * d[0] + tauZy * d[1] + sigma * d[2]};
            for (int c = 0; c < 3; c++) {
                Verify.closeAbs(vals[k] * d[c], td[c], scale, "eigenvector " + (k + 1) + " component " + c);
            }
        }
    }
}
