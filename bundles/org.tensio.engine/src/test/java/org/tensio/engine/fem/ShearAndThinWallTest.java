package org.tensio.engine.fem;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.mesh.MeshGenerator;
import org.tensio.engine.mesh.MeshOptions;
import org.tensio.engine.profile.ArbitraryProfileWithVoids;
import org.tensio.engine.profile.CircleProfile;
import org.tensio.engine.profile.IShapeProfile;
import org.tensio.engine.profile.LShapeProfile;
import org.tensio.engine.profile.ProfileDef;
import org.tensio.engine.profile.RectangleProfile;
import org.tensio.engine.profile.UShapeProfile;
import org.tensio.engine.section.Material;
import org.tensio.engine.section.Section;

/** Transverse shear, shear centre, warping constant and thin-walled limits against published closed forms. */
class ShearAndThinWallTest {

    private static FiniteElementSolution solve(ProfileDef p, Material m, int elements) {
        Section s = FemFixtures.of(p, m);
        return SectionSolver.solve(s, MeshGenerator.generate(s, MeshOptions.elements(elements), null), null);
    }

    @Test
    void rectangleAtZeroPoissonIsTheElementaryParabola() {
        // with ν = 0 the exact flexure field of a rectangle is τ = 1.5 V/A at the neutral axis
        // (Timoshenko & Goodier, Theory of Elasticity, 3rd ed., §124 — from memory); energy shear coefficient 5/6
        FiniteElementSolution f = solve(new RectangleProfile(20, 40), FemFixtures.NU0, MeshOptions.DEFAULT_ELEMENTS);
        double a = 800;
        UnitShear[] u = f.unitStresses(new Point2(0, 0), false);
        assertEquals(1.5, u[2].tauZY() * a, 1e-3 * 1.5, "τzy per Vy at the centre × A");
        assertEquals(1.5, u[1].tauZX() * a, 1e-3 * 1.5, "τzx per Vx at the centre × A");
        assertEquals(5.0 / 6, f.shearAreas()[0] / a, 1e-4, "kx (Cowper 1966 at ν = 0: 10(1+ν)/(12+11ν) = 5/6)");
        assertEquals(5.0 / 6, f.shearAreas()[1] / a, 1e-4, "ky");
    }

    @Test
    void circleCentreWithPoisson() {
        // exact flexure of a circular section: τ at the centre = (3 + 2ν) / (2(1 + ν)) · V/A
        // (Timoshenko & Goodier §124 — from memory)
        double r = 20, a = Math.PI * r * r;
        for (Material m : List.of(FemFixtures.NU0, FemFixtures.STEEL)) {
            FiniteElementSolution f = solve(new CircleProfile(r), m, MeshOptions.DEFAULT_ELEMENTS);
            double nu = m.nu();
            double expected = (3 + 2 * nu) / (2 * (1 + nu));
            assertEquals(expected, f.unitStresses(new Point2(0, 0), false)[2].tauZY() * a, 1e-3 * expected, "ν = " + nu);
            // energy-method shear coefficient of the circle 6(1+ν)²/(7+14ν+8ν²) (from memory); at ν = 0 it equals
            // Cowper's (1966) 6(1+ν)/(7+6ν) = 6/7; for ν > 0 the two definitions differ (Cowper averages displacements)
            double k = 6 * (1 + nu) * (1 + nu) / (7 + 14 * nu + 8 * nu * nu);
            assertEquals(k, f.shearAreas()[1] / a, 1e-4, "energy shear coefficient, ν = " + nu);
        }
    }

    @Test
    void shearResultantsAndTorqueBalanceToSolverPrecision() {
        // runtime checks of every solve: ∫τ dA = V for unit Vx and Vy, ∫(x τzy − y τzx) dA = T (common practice)
        FiniteElementSolution f = solve(new LShapeProfile(120, 80, 10, 8, 0), FemFixtures.STEEL, 3000);
        for (double e : f.equilibriumErrors()) {
            assertEquals(0, e, 1e-9);
        }
    }

    @Test
    void thinChannelShearCentreAndWarpingConstant() {
        // thin-walled theory for a channel of centre-line depth h, flange width b, uniform t: shear centre
        // e = b²h²t / (4 Ix) behind the web centre line, Cw = t b³ h² (3b + 2h) / (12 (6b + h))
        // (Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., §5.3 — from memory); t/h = 0.01 so the
        // thin-wall error is O(t/b) ~ 2 %; measured agreement is better.
        double t = 1, h = 100, b = 50;
        FiniteElementSolution f = solve(new UShapeProfile(h + t, b + t / 2, t, t, 0, 0), FemFixtures.STEEL, 4000);
        double ix = t * h * h * h / 12 + 2 * b * t * h * h / 4;
        double e = b * b * h * h * t / (4 * ix);
        double webX = -(b + t / 2) / 2 + t / 2;
        assertEquals(webX - e, f.shearCentre().x(), 0.005 * e, "shear centre x");
        assertEquals(0, f.shearCentre().y(), 1e-6 * h, "shear centre on the axis of symmetry");
        double cw = t * b * b * b * h * h / 12 * (3 * b + 2 * h) / (6 * b + h);
        assertEquals(cw, f.cw(), 0.01 * cw, "Cw");
        // open thin-walled section: J → Σ b t³ / 3 (Saint-Venant, thin-wall limit; end effects O(t/b))
        double jOpen = (2 * b + h) * t * t * t / 3;
        assertEquals(jOpen, f.jWarping(), 0.02 * jOpen, "J open section");
    }

    @Test
    void thinIWarpingConstant() {
        // doubly symmetric I: Cw = If h² / 2 = t b³ h² / 24 (thin-walled theory, same source)
        double t = 2, b = 100, h = 200;
        FiniteElementSolution f = solve(new IShapeProfile(b, h + t, t, t, 0, 0), FemFixtures.STEEL, 4000);
        double cw = t * b * b * b / 12 * h * h / 2;
        assertEquals(cw, f.cw(), 0.005 * cw);
        assertEquals(0, f.shearCentre().distance(new Point2(0, 0)), 1e-6 * h, "shear centre at the centroid");
    }

    @Test
    void closedThinTubeApproachesBredtBatho() {
        // square box of centre-line side a, wall t: Bredt–Batho J = 4 A_m² t / s = a³ t
        // (Bredt 1896; e.g. Roark 8th ed. Table 10.7 — from memory); t/a = 0.02: wall-thickness error O(t/a)
        double a = 100, t = 2, o = (a + t) / 2, i = (a - t) / 2;
        Contour outer = Contour.polygon(List.of(new Point2(-o, -o), new Point2(o, -o), new Point2(o, o), new Point2(-o, o)));
        Contour hole = Contour.polygon(List.of(new Point2(-i, -i), new Point2(i, -i), new Point2(i, i), new Point2(-i, i)));
        FiniteElementSolution f = solve(new ArbitraryProfileWithVoids(outer, List.of(hole)), FemFixtures.STEEL, 4000);
        double j = a * a * a * t;
        assertEquals(j, f.jWarping(), 0.01 * j, "warping J");
        assertEquals(j, f.jPrandtl(), 0.01 * j, "stress-function J with the hole's circulation condition");
        assertTrue(f.jBracket() < 1e-3, "bracket " + f.jBracket());
    }

    @Test
    void sharpReentrantCornersAreFlagged() {
        FiniteElementSolution sharp = solve(new LShapeProfile(100, 100, 10, 0, 0), FemFixtures.STEEL, 2000);
        assertEquals(1, sharp.mesh().singularities().size(), "the inner corner of a sharp angle");
        assertEquals(270, sharp.mesh().singularities().get(0).interiorAngleDeg(), 1e-9);
        FiniteElementSolution filleted = solve(new LShapeProfile(100, 100, 10, 8, 0), FemFixtures.STEEL, 2000);
        assertFalse(filleted.mesh().singularities().size() > 0, "a filleted angle has no singular corner");
        assertTrue(sharp.mesh().minAngleDeg() >= 20, "minimum angle " + sharp.mesh().minAngleDeg());
    }
}
