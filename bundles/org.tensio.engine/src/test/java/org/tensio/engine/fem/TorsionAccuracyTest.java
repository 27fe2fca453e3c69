package org.tensio.engine.fem;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.mesh.Mesh;
import org.tensio.engine.mesh.MeshGenerator;
import org.tensio.engine.profile.CircleHollowProfile;
import org.tensio.engine.profile.CircleProfile;
import org.tensio.engine.profile.EllipseProfile;
import org.tensio.engine.profile.RectangleProfile;
import org.tensio.engine.section.Section;

/**
 * St. Venant torsion on the default mesh against exact solutions: J within 0.1 %, τmax within 1 % (the
 * accuracy the product promises on its default mesh), the warping and stress-function values bracketing the
 * exact J, and the runtime equilibrium check to solver precision.
 */
class TorsionAccuracyTest {

    private static FiniteElementSolution solve(Section s) {
        Mesh m = MeshGenerator.generate(s);
        return SectionSolver.solve(s, m, null);
    }

    private static void assertBracket(double exact, FiniteElementSolution f) {
        assertEquals(exact, f.jWarping(), 1e-3 * exact, "J (warping)");
        assertEquals(exact, f.jPrandtl(), 1e-3 * exact, "J (stress function)");
        // bounds: warping stiff (above), stress function flexible (below); 1e-5 slack: quadratic edges approximate arcs
        assertTrue(f.jWarping() >= exact * (1 - 1e-5), "warping J is an upper bound: " + f.jWarping() + " vs " + exact);
        assertTrue(f.jPrandtl() <= exact * (1 + 1e-5), "stress-function J is a lower bound: " + f.jPrandtl() + " vs " + exact);
        assertEquals(0, f.equilibriumErrors()[0], 1e-9, "∫(x τzy − y τzx) dA = T");
    }

    @Test
    void solidCircle() {
        // J = π r⁴ / 2, τmax = 2T / (π r³): closed form (Timoshenko & Goodier, Theory of Elasticity, 3rd ed., §104 — from memory)
        double r = 25;
        FiniteElementSolution f = solve(FemFixtures.of(new CircleProfile(r), FemFixtures.STEEL));
        assertBracket(Math.PI * Math.pow(r, 4) / 2, f);
        assertEquals(2 / (Math.PI * r * r * r), f.peakUnitTorsionStress(), 0.01 * 2 / (Math.PI * r * r * r));
        assertEquals(0, f.shearCentre().distance(new Point2(0, 0)), 1e-6 * r, "shear centre at the centre");
    }

    @Test
    void hollowCircle() {
        // J = π (ro⁴ − ri⁴) / 2, τmax = T ro / J: closed form (same source)
        double ro = 30, t = 5, ri = ro - t;
        double j = Math.PI * (Math.pow(ro, 4) - Math.pow(ri, 4)) / 2;
        FiniteElementSolution f = solve(FemFixtures.of(new CircleHollowProfile(ro, t), FemFixtures.STEEL));
        assertBracket(j, f);
        assertEquals(ro / j, f.peakUnitTorsionStress(), 0.01 * ro / j);
    }

    @Test
    void ellipse() {
        // J = π a³ b³ / (a² + b²), τmax = 2T / (π a b²) at the ends of the minor axis (Timoshenko & Goodier §106 — from memory)
        double a = 40, b = 20;
        FiniteElementSolution f = solve(FemFixtures.of(new EllipseProfile(a, b), FemFixtures.STEEL));
        assertBracket(Math.PI * Math.pow(a, 3) * Math.pow(b, 3) / (a * a + b * b), f);
        double tau = 2 / (Math.PI * a * b * b);
        assertEquals(tau, f.peakUnitTorsionStress(), 0.01 * tau);
    }

    @Test
    void equilateralTriangle() {
        // side s: J = √3 s⁴ / 80, τmax = 20 T / s³ at the mid-sides (Timoshenko & Goodier §110 — from memory)
        double s = 60, hgt = s * Math.sqrt(3) / 2;
        Section sec = FemFixtures.polygon(FemFixtures.STEEL, -s / 2, 0, s / 2, 0, 0, hgt);
        FiniteElementSolution f = solve(sec);
        assertBracket(Math.sqrt(3) * Math.pow(s, 4) / 80, f);
        assertEquals(20 / Math.pow(s, 3), f.peakUnitTorsionStress(), 0.01 * 20 / Math.pow(s, 3));
    }

    @ParameterizedTest(name = "rectangle aspect {0}")
    @ValueSource(doubles = {1, 1.5, 2, 3, 5, 10})
    void rectangleSeries(double aspect) {
        // series solution, Timoshenko & Goodier §109 (FemFixtures.rectangleJ)
        double t = 10, w = aspect * t;
        FiniteElementSolution f = solve(FemFixtures.of(new RectangleProfile(w, t), FemFixtures.STEEL));
        assertBracket(FemFixtures.rectangleJ(w, t), f);
        double tau = FemFixtures.rectangleTauMaxPerT(w, t);
        assertEquals(tau, f.peakUnitTorsionStress(), 0.01 * tau, "τmax");
    }
}
