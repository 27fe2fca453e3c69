package org.tensio.engine.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.profile.CircleProfile;
import org.tensio.engine.profile.RectangleProfile;
import org.tensio.engine.project.Project;
import org.tensio.engine.section.Criterion;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.section.Section;
import org.tensio.engine.stress.StressComponents;

/** Static checks: governing points against closed forms, combinations, composite sections, utilisation. */
class CheckOpTest {

    /** Every result: utilisation is exactly the quotient demand / capacity, and passed ⇔ utilisation ≤ 1. */
    private static void assertExactUtilisations(CheckReport r) {
        double max = 0;
        boolean passed = true;
        for (CheckResult c : r.results()) {
            assertEquals(c.demand() / c.capacity(), c.utilisation(), 0.0, "utilisation = demand / capacity exactly");
            max = Math.max(max, c.utilisation());
            passed &= c.utilisation() <= 1;
        }
        assertEquals(max, r.maxUtilisation(), 0.0);
        assertEquals(passed, r.passed());
    }

    private static CheckResult only(CheckReport r, String station, String caseId, String criterion, String material) {
        CheckResult found = null;
        for (CheckResult c : r.results()) {
            if (c.station().equals(station) && c.caseId().equals(caseId) && c.criterion().equals(criterion)
                    && c.material().equals(material)) {
                assertEquals(null, found, "one result per station, case, criterion, material");
                found = c;
            }
        }
        assertTrue(found != null, "result " + station + "/" + caseId + "/" + criterion + "/" + material + " in " + r.results());
        return found;
    }

    /** Σ_{n = 1, 3, 5, ...} f(n) until the terms fall below 1e-17 of the sum. */
    private static double oddSeries(java.util.function.IntToDoubleFunction f) {
        double s = 0;
        for (int n = 1; n < 2001; n += 2) {
            double t = f.applyAsDouble(n);
            s += t;
            if (Math.abs(t) < 1e-17 * Math.abs(s)) {
                break;
            }
        }
        return s;
    }

    @Test
    void rectangleUnderTorsionAndShearGovernsOnTheNeutralAxisAtTheLongSide() {
        // A 20 wide × 40 deep bar (x ∈ [−10, 10], y ∈ [−20, 20]), ν = 0, under T = 1e6 N·mm and Vy = 5e4 N, no
        // bending: σz = 0 everywhere; the critical point is NOT at an extreme fibre but at the middle of the long
        // side x = +10 on the neutral axis y = 0, where the torsion peak and the shear peak add (at x = −10
        // torsion runs in −y and the two partly cancel).
        //
        // Torsion (Timoshenko & Goodier, Theory of Elasticity, 3rd ed., §109 — from memory), w = 40, t = 20:
        //   J = w t³/3 · (1 − 192 t/(π⁵ w) Σ tanh(nπw/2t)/n⁵) = 106 666.7 × 0.686045 ≈ 73 178 mm⁴,
        //   τmax = T t (1 − 8/π² Σ 1/(n² cosh(nπw/2t))) / J = 1e6 × 20 × 0.930060 / 73 178 ≈ 254.19 MPa,
        //   directed +y at x = +10 for positive (counter-clockwise) T.
        // Shear (same book §124 — from memory): at ν = 0 the exact flexure field of a rectangle is the elementary
        //   parabola, τzy = 1.5 Vy/A = 1.5 × 5e4 / 800 = 93.75 MPa on the neutral axis, uniform across the width.
        // Sum τzy ≈ 347.94 MPa; von Mises √3 τ ≈ 602.65 MPa; shear criterion demand τ itself.
        double w = 40, t = 20, torque = 1e6, vy = 5e4, a = w * t;
        double j = w * t * t * t / 3 * (1 - 192 * t / (Math.pow(Math.PI, 5) * w)
                * oddSeries(n -> Math.tanh(n * Math.PI * w / (2 * t)) / Math.pow(n, 5)));
        double tauT = torque * t * (1 - 8 / (Math.PI * Math.PI)
                * oddSeries(n -> 1 / (n * n * Math.cosh(n * Math.PI * w / (2 * t))))) / j;
        double expected = tauT + 1.5 * vy / a;
        assertEquals(347.94, expected, 0.01, "the hand numbers written out above");

        Section bar = CheckFixtures.single("bar", new RectangleProfile(20, 40), CheckFixtures.NU0);
        MaterialLimits lim = new MaterialLimits("nu0", List.of(Criterion.vonMises, Criterion.shear), 1.0, 300.0, null,
                null, null, null);
        Project p = new CheckFixtures.ProjectBuilder().section(bar).limits(lim)
                .station("A", "bar", "TV", CheckFixtures.f(0, 0, vy, 0, 0, torque)).build();
        CheckReport r = CheckOp.check(p, CheckFixtures.ENGINE);
        assertExactUtilisations(r);
        assertEquals(2, r.results().size());
        for (CheckResult c : r.results()) {
            // location: on the boundary x = +10 exactly (a boundary node), within 2 % of the depth (0.8 mm, about
            // one element edge on the default mesh) of the neutral axis, i.e. the mesh node nearest the mid-side
            assertEquals(10.0, c.point().x(), 1e-9, c.criterion() + " governing x");
            assertEquals(0.0, c.point().y(), 0.02 * w, c.criterion() + " governing y (neutral axis, not an extreme fibre)");
            assertEquals(0.0, c.sigmaZ(), 0.0, "no bending: σz = 0");
            // value: the default mesh gives the peak torsion stress within 1 % (README accuracy notes,
            // fem.TorsionAccuracyTest) and 1.5 V/A within 0.1 % (fem.ShearAndThinWallTest); both fields are
            // stationary at the mid-side, so a node up to 0.8 mm off it loses at most 4(0.8/40)² = 0.16 % of the
            // shear parabola: 1 % covers all of it
            double tau = Math.hypot(c.tauZX(), c.tauZY());
            assertEquals(expected, tau, 0.01 * expected, c.criterion() + " |τ| at the governing point");
            assertTrue(c.tauZY() > 0, "τzy positive at x = +10");
        }
        CheckResult vm = only(r, "A", "TV", "vonMises", "nu0");
        assertEquals(300.0, vm.capacity(), 0.0, "capacity fy/γ, γ = 1");
        assertEquals(Math.sqrt(3) * Math.hypot(vm.tauZX(), vm.tauZY()), vm.demand(), 1e-12 * vm.demand());
        CheckResult sh = only(r, "A", "TV", "shear", "nu0");
        assertEquals(300.0 / Math.sqrt(3), sh.capacity(), 1e-12 * sh.capacity(), "capacity fy/(√3 γ)");
        assertFalse(r.passed(), "602 MPa von Mises exceeds 300 MPa");
        assertFalse(vm.singular(), "a rectangle has no re-entrant corner");
    }

    @Test
    void circleUnderTorsionAndShearGovernsAtTheNeutralAxisOnTheBoundary() {
        // Solid circle R = 25 mm, steel ν = 0.3, T = 1e6 N·mm, Vy = 2e4 N. Torsion exact: τ = T r / J with
        // J = πR⁴/2 = 613 592 mm⁴, at r = R: 40.744 MPa, tangential (+y at (R, 0)). Shear: exact flexure of the
        // circle (Timoshenko & Goodier, Theory of Elasticity, 3rd ed., §124 — from memory)
        //   τzy = (3+2ν)/(8(1+ν)) · V/I · (R² − y² − (1−2ν)/(3+2ν) x²),
        // at (R, 0): (1+2ν)/(1+ν) · V/A = 1.2308 × 10.186 = 12.537 MPa (the elementary 4V/(3A) = 13.58 MPa is the
        // average across the diameter, not this value). Both peak at (R, 0): τ = 53.28 MPa.
        double rad = 25, torque = 1e6, vy = 2e4, nu = 0.3;
        double jj = Math.PI * Math.pow(rad, 4) / 2, a = Math.PI * rad * rad;
        double expected = torque * rad / jj + (1 + 2 * nu) / (1 + nu) * vy / a;
        assertEquals(53.28, expected, 0.01, "hand numbers above");
        Section shaft = CheckFixtures.single("shaft", new CircleProfile(rad), CheckFixtures.STEEL);
        Project p = new CheckFixtures.ProjectBuilder().section(shaft).limits(CheckFixtures.vonMises(CheckFixtures.STEEL))
                .station("S", "shaft", "TV", CheckFixtures.f(0, 0, vy, 0, 0, torque)).build();
        CheckReport r = CheckOp.check(p, CheckFixtures.ENGINE);
        assertExactUtilisations(r);
        CheckResult c = only(r, "S", "TV", "vonMises", "steel");
        // location: on the boundary, within 2° of the +x axis (the boundary nodes lie at most 10°/2 apart on
        // the default mesh; the sum is stationary at θ = 0)
        assertEquals(rad, Math.hypot(c.point().x(), c.point().y()), 1e-9 * rad, "on the boundary");
        assertEquals(0.0, Math.atan2(c.point().y(), c.point().x()), Math.toRadians(5.0), "on the neutral axis y = 0, +x side");
        // value: torsion exact; the smoothed finite-element shear at the boundary within 1 % of 12.54 MPa is
        // 0.25 % of the total; allow 0.5 %
        double tau = Math.hypot(c.tauZX(), c.tauZY());
        assertEquals(expected, tau, 0.005 * expected);
        assertEquals(Math.sqrt(3) * tau, c.demand(), 1e-12 * c.demand());
        assertTrue(r.passed(), "92 MPa von Mises is below 355 MPa");
    }

    @Test
    void combinationsAreTheFactoredSumOfTheirCasesAndFollowTheCases() {
        Section bar = CheckFixtures.single("bar", new RectangleProfile(30, 60), CheckFixtures.STEEL);
        InternalForces g = CheckFixtures.f(1e4, 0, 0, 2e6, 0, 0);
        InternalForces q = CheckFixtures.f(-5e3, 2e3, 1e4, 1e6, -4e5, 2e5);
        Project p = new CheckFixtures.ProjectBuilder().section(bar).limits(CheckFixtures.vonMises(CheckFixtures.STEEL))
                .station("A", "bar", "G", g, "Q", q)
                .station("B", "bar", "G", g)
                .combination("ULS", "G", 1.35, "Q", 1.5)
                .combination("SLS", "G", 1.0, "Q", 1.0)
                .build();
        CheckReport r = CheckOp.check(p, CheckFixtures.ENGINE);
        assertExactUtilisations(r);
        // project order: station A's cases, then the combinations; B cannot evaluate ULS nor SLS
        List<String> order = r.results().stream().map(c -> c.station() + "/" + c.caseId()).toList();
        assertEquals(List.of("A/G", "A/Q", "A/ULS", "A/SLS", "B/G"), order);
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("station 'B'") && w.contains("'ULS' skipped")
                && w.contains("'Q'")), r.warnings().toString());
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("station 'B'") && w.contains("'SLS' skipped")),
                r.warnings().toString());
        // forces of the combination: Σ factor × case, component by component (exact arithmetic on these numbers
        // up to one rounding each)
        InternalForces uls = p.forces("A", "ULS");
        assertEquals(1.35 * 2e6 + 1.5 * 1e6, uls.mx(), 1e-9);
        assertEquals(1.35 * 1e4 + 1.5 * -5e3, uls.n(), 1e-12);
        assertEquals(1.5 * 2e5, uls.t(), 1e-12);
        // the stresses of the combination at every sample = 1.35 × those of G + 1.5 × those of Q, and the
        // governing point is the brute-force maximum of the combined von Mises stress
        UnitStressField f = UnitStressFieldTest.field(bar);
        double best = -1;
        for (int i = 0; i < f.size(); i++) {
            StressComponents sg = f.stress(i, g), sq = f.stress(i, q), su = f.stress(i, uls);
            double scale = 1e-12 * (Math.abs(sg.sigmaZ()) + Math.abs(sq.sigmaZ()) + Math.hypot(sg.tauZX(), sg.tauZY())
                    + Math.hypot(sq.tauZX(), sq.tauZY()) + 1);
            assertEquals(1.35 * sg.sigmaZ() + 1.5 * sq.sigmaZ(), su.sigmaZ(), scale);
            assertEquals(1.35 * sg.tauZX() + 1.5 * sq.tauZX(), su.tauZX(), scale);
            assertEquals(1.35 * sg.tauZY() + 1.5 * sq.tauZY(), su.tauZY(), scale);
            best = Math.max(best, MaterialLimits.demand(Criterion.vonMises, su.sigmaZ(), su.tauZX(), su.tauZY()));
        }
        CheckResult cu = only(r, "A", "ULS", "vonMises", "steel");
        assertEquals(best, cu.demand(), 0.0, "governing = maximum over every sample");
        assertEquals(MaterialLimits.demand(Criterion.vonMises, cu.sigmaZ(), cu.tauZX(), cu.tauZY()), cu.demand(), 0.0);
        // the SLS combination with both factors 1 is the sum of the cases
        InternalForces sls = p.forces("A", "SLS");
        assertEquals(g.mx() + q.mx(), sls.mx(), 0.0);
        assertEquals(r.results().get(r.governingIndex()).utilisation(), r.maxUtilisation(), 0.0);
        // G alone: pure bending + tension, von Mises = max |σz| = N/A + Mx·(h/2)/I at the top fibre (exact):
        // 1e4/1800 + 2e6 × 30 / (30 × 60³/12) = 5.5556 + 111.11 = 116.67 MPa
        CheckResult cg = only(r, "A", "G", "vonMises", "steel");
        assertEquals(1e4 / 1800 + 2e6 * 30 / (30 * Math.pow(60, 3) / 12), cg.demand(), 1e-12 * cg.demand());
        assertEquals(30.0, cg.point().y(), 1e-12, "top fibre");
        assertEquals(cg.demand(), only(r, "B", "G", "vonMises", "steel").demand(), 0.0, "same section, same case");
    }

    @Test
    void compositeSectionChecksEachMaterialAgainstItsOwnAllowable() {
        // Steel plate 100 × 10 (−10 ≤ y ≤ 0, E = 210 000, fy = 355, γ = 1.1) under an aluminium plate 100 × 10
        // (0 ≤ y ≤ 10, E = 70 000, given equivalent allowable 120 MPa), Mx = 1e6 N·mm. Transformed section
        // (n = 1/3, hand calculation, parallel-axis theorem): A = 1000 + 1000/3 = 1333.33 mm²,
        // yc = (1000 × (−5) + 333.33 × 5) / 1333.33 = −2.5 mm,
        // Ixx = 100·10³/12 + 1000·2.5² + (100·10³/12 + 1000·7.5²)/3 = 14 583.33 + 21 527.78 = 325 000/9 mm⁴.
        // Steel extreme fibre y = −10 (Y = −7.5): σ = −1e6 × 7.5 / Ixx = −207.692 MPa, capacity 355/1.1 = 322.727.
        // Aluminium extreme fibre y = +10 (Y = 12.5): σ = (1/3) × 1e6 × 12.5 / Ixx = 115.385 MPa, capacity 120.
        // At the interface the steel sees 69.2 MPa and the aluminium 23.1 MPa: the extreme fibres govern.
        double ixx = 325000.0 / 9;
        double steel = 1e6 * 7.5 / ixx, alu = 1e6 * 12.5 / (3 * ixx);
        assertEquals(207.692, steel, 1e-3);
        assertEquals(115.385, alu, 1e-3);
        Section s = UnitStressFieldTest.sandwich();
        MaterialLimits ls = new MaterialLimits("steel", List.of(Criterion.vonMises), 1.1, 355.0, null, null, null, null);
        MaterialLimits la = new MaterialLimits("alu", List.of(Criterion.vonMises, Criterion.normal), 1.0, 160.0, null,
                null, null, 120.0);
        Project p = new CheckFixtures.ProjectBuilder().section(s).limits(ls).limits(la)
                .station("C", "sandwich", "M", CheckFixtures.f(0, 0, 0, 1e6, 0, 0)).build();
        CheckReport r = CheckOp.check(p, CheckFixtures.ENGINE);
        assertExactUtilisations(r);
        assertEquals(List.of("steel/vonMises", "alu/vonMises", "alu/normal"),
                r.results().stream().map(c -> c.material() + "/" + c.criterion()).toList(), "part order, then criteria");
        // σz is exact (exact section properties, no finite elements): 1e-12 relative
        CheckResult cs = only(r, "C", "M", "vonMises", "steel");
        assertEquals(steel, cs.demand(), 1e-12 * steel);
        assertEquals(-steel, cs.sigmaZ(), 1e-12 * steel);
        assertEquals(355.0 / 1.1, cs.capacity(), 0.0);
        assertEquals(-10.0, cs.point().y(), 1e-12, "steel's extreme fibre");
        CheckResult ca = only(r, "C", "M", "vonMises", "alu");
        assertEquals(alu, ca.demand(), 1e-12 * alu);
        assertEquals(120.0, ca.capacity(), 0.0, "a given allowable wins over fy/γ");
        assertEquals(10.0, ca.point().y(), 1e-12, "aluminium's extreme fibre");
        CheckResult cn = only(r, "C", "M", "normal", "alu");
        assertEquals(160.0, cn.capacity(), 0.0, "normal: fy/γ (no normal allowable given)");
        assertEquals(alu, cn.demand(), 1e-12 * alu);
        assertEquals(alu / 120.0, r.maxUtilisation(), 1e-12, "the aluminium governs although its stress is lower");
        assertEquals(1, r.governingIndex());
        assertTrue(r.passed());
        assertTrue(r.warnings().isEmpty(), "pure bending: the shear method does not matter " + r.warnings());
        // with a shear force the report says the composite's shear is elementary
        Project pv = new CheckFixtures.ProjectBuilder().section(s).limits(ls).limits(la)
                .station("D", "sandwich", "V", CheckFixtures.f(0, 0, 1e4, 0, 0, 0)).build();
        CheckReport rv = CheckOp.check(pv, CheckFixtures.ENGINE);
        assertExactUtilisations(rv);
        assertTrue(rv.warnings().stream().anyMatch(w -> w.contains("elementary")), rv.warnings().toString());
    }

    @Test
    void materialsWithoutLimitsAreNotCheckedAndSayWhy() {
        Section bar = CheckFixtures.single("bar", new RectangleProfile(30, 60), CheckFixtures.STEEL);
        Project p = new CheckFixtures.ProjectBuilder().section(bar).station("A", "bar", "G", CheckFixtures.f(0, 0, 0, 1e9, 0, 0))
                .build();
        CheckReport r = CheckOp.check(p, CheckFixtures.ENGINE);
        assertTrue(r.results().isEmpty());
        assertEquals(0.0, r.maxUtilisation(), 0.0);
        assertEquals(-1, r.governingIndex());
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("'steel'") && w.contains("not checked")), r.warnings().toString());
    }

    @Test
    void overloadedSectionFailsWithUtilisationAboveOne() {
        // 30 × 60 rectangle, Mx = 2e7 N·mm: σ = M (h/2) / I = 2e7 × 30 / 540 000 = 1111.1 MPa > 355 (exact)
        Section bar = CheckFixtures.single("bar", new RectangleProfile(30, 60), CheckFixtures.STEEL);
        Project p = new CheckFixtures.ProjectBuilder().section(bar).limits(CheckFixtures.vonMises(CheckFixtures.STEEL))
                .station("A", "bar", "G", CheckFixtures.f(0, 0, 0, 2e7, 0, 0), "H", CheckFixtures.f(0, 0, 0, 1e6, 0, 0)).build();
        CheckOp op = new CheckOp(p, CheckFixtures.ENGINE);
        CheckReport r = op.report();
        assertSame(r, op.report(), "single-use object keeps its report");
        assertExactUtilisations(r);
        assertFalse(r.passed());
        assertEquals(1, r.failedCount());
        assertEquals(2e7 * 30 / 540000.0 / 355.0, r.maxUtilisation(), 1e-12 * r.maxUtilisation());
        assertFalse(r.results().get(0).passed());
        assertTrue(r.results().get(1).passed());
    }
}
