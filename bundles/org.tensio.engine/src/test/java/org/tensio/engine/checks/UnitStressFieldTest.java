package org.tensio.engine.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.profile.CircleProfile;
import org.tensio.engine.profile.IShapeProfile;
import org.tensio.engine.profile.LShapeProfile;
import org.tensio.engine.profile.RectangleProfile;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.PointStressOp;
import org.tensio.engine.stress.ShearMethod;
import org.tensio.engine.stress.StressComponents;

/**
 * The unit fields against the reference {@link PointStressOp} at every sample, and the superposition identities.
 * Sources: linear elasticity (superposition, common practice, no source needed beyond linearity); the reference
 * implementation for the point values.
 */
class UnitStressFieldTest {

    /** All six components non-zero, of realistic size for the sections below (mm, N). */
    static final InternalForces ALL = CheckFixtures.f(2.0e4, -3.0e3, 4.5e3, 2.5e6, -1.8e6, 1.2e6);

    static Section angle() {
        // sharp root (no fillet): a re-entrant corner, flagged singular
        return CheckFixtures.single("angle", new LShapeProfile(120, 80, 10, 0, 0), CheckFixtures.STEEL);
    }

    static Section shaft() {
        return CheckFixtures.single("shaft", new CircleProfile(25), CheckFixtures.STEEL);
    }

    /** Steel plate 100 × 10 at −10 ≤ y ≤ 0 under an aluminium plate 100 × 10 at 0 ≤ y ≤ 10. */
    static Section sandwich() {
        return new Section("sandwich", List.of(
                SectionPart.of(new RectangleProfile(100, 10), 0, -5, CheckFixtures.STEEL),
                SectionPart.of(new RectangleProfile(100, 10), 0, 5, CheckFixtures.ALU)));
    }

    static UnitStressField field(Section s) {
        return UnitStressField.of(s, CheckFixtures.ENGINE.properties(s), CheckFixtures.ENGINE.solution(s));
    }

    /**
     * Tolerance 1e-9 of the largest single-force contribution at the point: both sides evaluate the same
     * expressions in a different order (round-off ~1e-15 of the largest term), PointStressOp reports
     * contributions below 1e-12 of the largest as zero, and at interface nodes the one-sided step of 1e-10 of
     * an element changes the finite-element values by about 1e-10 of their variation over the element.
     */
    private static void assertMatchesReference(Section s, InternalForces forces) {
        SectionProperties props = CheckFixtures.ENGINE.properties(s);
        FiniteElementSolution fe = CheckFixtures.ENGINE.solution(s);
        UnitStressField f = UnitStressField.of(s, props, fe);
        Map<Integer, List<Integer>> byNode = new HashMap<>();
        for (int i = 0; i < f.size(); i++) {
            byNode.computeIfAbsent(f.node(i), k -> new ArrayList<>()).add(i);
        }
        assertEquals(fe.mesh().nodeCount(), byNode.size(), "every mesh node is sampled");
        int compared = 0;
        for (List<Integer> samples : byNode.values()) {
            int i0 = samples.get(0);
            PointStress ref = PointStressOp.evaluate(s, props, fe, ShearMethod.finiteElement, forces, f.point(i0), "A", "LC");
            double scale = 0;
            for (StressComponents c : ref.contributions().values()) {
                scale = Math.max(scale, Math.max(Math.abs(c.sigmaZ()), Math.max(Math.abs(c.tauZX()), Math.abs(c.tauZY()))));
            }
            double tol = 1e-9 * scale;
            String at = s.name() + " node " + f.node(i0) + " (" + f.x(i0) + ", " + f.y(i0) + ")";
            // σz: the sample of the part PointStressOp assigns the point to
            int same = -1;
            for (int i : samples) {
                if (f.part(i) == ref.partIndex()) {
                    same = i;
                }
            }
            assertTrue(same >= 0, "a sample of part " + ref.partIndex() + " at " + at);
            assertEquals(ref.sigmaZ(), f.sigmaZ(same, forces), tol, "σz at " + at);
            assertEquals(ref.material(), f.material(same), "material at " + at);
            // τ: PointStressOp takes the element its locator finds; at a node of one part that is the only sample,
            // at an interface node it must be one of the parts' one-sided values
            boolean any = false;
            for (int i : samples) {
                any |= Math.abs(ref.total().tauZX() - f.tauZX(i, forces)) <= tol
                        && Math.abs(ref.total().tauZY() - f.tauZY(i, forces)) <= tol;
            }
            if (samples.size() == 1) {
                assertEquals(ref.total().tauZX(), f.tauZX(i0, forces), tol, "τzx at " + at);
                assertEquals(ref.total().tauZY(), f.tauZY(i0, forces), tol, "τzy at " + at);
            }
            assertTrue(any, "τ of one part's sample equals PointStressOp's at " + at + ": " + ref.total());
            compared++;
        }
        assertEquals(fe.mesh().nodeCount(), compared);
    }

    @Test
    void homogeneousAngleMatchesPointStressOpAtEveryNode() {
        Section s = angle();
        assertMatchesReference(s, ALL);
        UnitStressField f = field(s);
        assertEquals(CheckFixtures.ENGINE.solution(s).mesh().nodeCount(), f.size(), "one sample per node");
        assertEquals(PointStressOp.SHEAR_FINITE_ELEMENT, f.shearMethod());
        assertEquals(PointStressOp.TORSION_FINITE_ELEMENT, f.torsionMethod());
        // the sharp root corner of the 80 wide × 120 deep angle, 10 thick, is at (−40 + 10, −60 + 10): bounding
        // box centred, vertical leg at −x, horizontal leg at the bottom (docs/file-format.md §6)
        boolean flagged = false;
        for (int i = 0; i < f.size(); i++) {
            if (Math.hypot(f.x(i) - (-30), f.y(i) - (-50)) < 1e-9) {
                flagged = f.singular(i);
            }
        }
        assertTrue(flagged, "the re-entrant root corner is flagged singular");
        assertTrue(f.warnings().isEmpty(), f.warnings().toString());
    }

    @Test
    void circleWithClosedFormTorsionMatchesPointStressOpAtEveryNode() {
        Section s = shaft();
        assertMatchesReference(s, ALL);
        UnitStressField f = field(s);
        assertEquals(PointStressOp.TORSION_EXACT_CIRCULAR, f.torsionMethod());
        for (int i = 0; i < f.size(); i++) {
            assertFalse(f.singular(i), "a circle has no re-entrant corner");
        }
    }

    @Test
    void compositeSectionMatchesPointStressOpAndSamplesInterfaceNodesOncePerMaterial() {
        Section s = sandwich();
        assertMatchesReference(s, ALL);
        UnitStressField f = field(s);
        assertEquals(PointStressOp.SHEAR_ELEMENTARY, f.shearMethod());
        assertEquals(1, f.warnings().size(), f.warnings().toString());
        int interfaceSamples = 0;
        Map<Integer, List<Integer>> byNode = new HashMap<>();
        for (int i = 0; i < f.size(); i++) {
            byNode.computeIfAbsent(f.node(i), k -> new ArrayList<>()).add(i);
        }
        for (List<Integer> samples : byNode.values()) {
            double y = f.y(samples.get(0));
            if (Math.abs(y) <= 1e-12) {
                assertEquals(2, samples.size(), "interface node at x = " + f.x(samples.get(0)));
                int st = samples.get(0), al = samples.get(1);
                assertEquals("steel", f.material(st));
                assertEquals("alu", f.material(al));
                // σz of a unit Mx jumps by n = E_alu / E_steel = 1/3 across the interface (exact)
                InternalForces mx = CheckFixtures.f(0, 0, 0, 1e6, 0, 0);
                assertEquals(f.sigmaZ(st, mx) / 3, f.sigmaZ(al, mx), 1e-12 * Math.abs(f.sigmaZ(st, mx)));
                // torsion: each part's own one-sided value. At a bonded interface y = 0 the warping displacement is
                // continuous, so γzx and hence τzx/G is continuous (τzx jumps by G_alu/G_steel = 0.3258), and
                // equilibrium keeps the traction τzy continuous (continuity of displacement and traction at a
                // bonded interface; common practice, no source). Away from the free edges (|x| ≤ 40 of 50, where
                // the bimaterial corner makes the field singular) the smoothed finite-element values meet both to
                // within 1 % (measured 0.1 %).
                InternalForces t = CheckFixtures.f(0, 0, 0, 0, 0, 1e6);
                if (Math.abs(f.x(st)) <= 40) {
                    double ratio = CheckFixtures.ALU.shearModulus() / CheckFixtures.STEEL.shearModulus();
                    double tau = Math.hypot(f.tauZX(st, t), f.tauZY(st, t));
                    assertEquals(ratio * f.tauZX(st, t), f.tauZX(al, t), 0.01 * ratio * tau, "τzx jump at x = " + f.x(st));
                    assertEquals(f.tauZY(st, t), f.tauZY(al, t), 0.01 * tau, "τzy continuous at x = " + f.x(st));
                }
                interfaceSamples += 2;
            } else {
                assertEquals(1, samples.size(), "node off the interface at y = " + y);
            }
        }
        assertTrue(interfaceSamples >= 2 * 20, "the interface carries nodes: " + interfaceSamples);
    }

    /**
     * The composite section's elementary shear, computed with one cut per distinct y and x, equals the per-node
     * path it replaced (PointStressOp with the elementary method and unit Vx, Vy at every sample, as the field was
     * built before) to 1e-9 of the largest unit shear at the point (both evaluate the same expressions; the
     * tolerance only allows for a different summation order, round-off ~1e-15). An invented steel I with an
     * aluminium cover plate on its top flange: nodes on the interface, on the flanges' horizontal edges and in the
     * fillets, and many nodes sharing a y or an x.
     */
    @Test
    void compositeElementaryShearEqualsThePerNodePointStressPath() {
        Section s = new Section("plated", List.of(
                SectionPart.of(new IShapeProfile(150, 300, 7.1, 10.7, 15), 0, 0, CheckFixtures.STEEL),
                SectionPart.of(new RectangleProfile(150, 10), 0, 155, CheckFixtures.ALU)));
        SectionProperties props = CheckFixtures.ENGINE.properties(s);
        UnitStressField f = field(s);
        assertEquals(PointStressOp.SHEAR_ELEMENTARY, f.shearMethod());
        InternalForces vx = CheckFixtures.f(0, 1, 0, 0, 0, 0), vy = CheckFixtures.f(0, 0, 1, 0, 0, 0);
        java.util.Set<Double> ys = new java.util.HashSet<>();
        int nonZero = 0;
        for (int i = 0; i < f.size(); i++) {
            PointStress ps = PointStressOp.evaluate(s, props, null, ShearMethod.elementary,
                    new InternalForces(0, 1, 1, 0, 0, 0), f.point(i), "", "");
            StressComponents rx = ps.contributions().get(ForceComponent.VX);
            StressComponents ry = ps.contributions().get(ForceComponent.VY);
            double[] want = {rx.tauZX(), rx.tauZY(), ry.tauZX(), ry.tauZY()};
            double[] got = {f.tauZX(i, vx), f.tauZY(i, vx), f.tauZX(i, vy), f.tauZY(i, vy)};
            double scale = 0;
            for (double w : want) {
                scale = Math.max(scale, Math.abs(w));
            }
            for (int k = 0; k < 4; k++) {
                assertEquals(want[k], got[k], 1e-9 * scale, "sample " + i + " at " + f.point(i) + ", coefficient " + k);
                nonZero += got[k] != 0 ? 1 : 0;
            }
            ys.add(f.y(i));
        }
        assertTrue(nonZero > f.size(), "the unit shear is not trivially zero: " + nonZero);
        assertTrue(ys.size() < f.size() / 2, "nodes share cuts: " + ys.size() + " distinct y of " + f.size());
    }

    @Test
    void fieldsOfASumAreTheSumOfTheFields() {
        // linearity: fields(F1 + F2) = fields(F1) + fields(F2) and fields(kF) = k fields(F) at every sample,
        // to round-off (1e-12 of the largest stress of either load at the point)
        Random rnd = new Random(20261201);
        for (Section s : List.of(angle(), sandwich(), shaft())) {
            UnitStressField f = field(s);
            for (int trial = 0; trial < 5; trial++) {
                InternalForces f1 = random(rnd), f2 = random(rnd);
                double k = rnd.nextGaussian() * 3;
                InternalForces sum = f1.plusScaled(1, f2);
                InternalForces scaled = InternalForces.ZERO.plusScaled(k, f1);
                double[] s12 = new double[f.size()], x12 = new double[f.size()], y12 = new double[f.size()];
                f.evaluate(sum, s12, x12, y12);
                for (int i = 0; i < f.size(); i++) {
                    StressComponents a = f.stress(i, f1), b = f.stress(i, f2);
                    double scale = 1e-12 * Math.max(1, Math.max(max(a), max(b)) * Math.max(1, Math.abs(k)));
                    assertEquals(a.sigmaZ() + b.sigmaZ(), s12[i], scale, "σz");
                    assertEquals(a.tauZX() + b.tauZX(), x12[i], scale, "τzx");
                    assertEquals(a.tauZY() + b.tauZY(), y12[i], scale, "τzy");
                    StressComponents ka = f.stress(i, scaled);
                    assertEquals(k * a.sigmaZ(), ka.sigmaZ(), scale);
                    assertEquals(k * a.tauZX(), ka.tauZX(), scale);
                    assertEquals(k * a.tauZY(), ka.tauZY(), scale);
                }
            }
        }
    }

    private static double max(StressComponents c) {
        return Math.max(Math.abs(c.sigmaZ()), Math.max(Math.abs(c.tauZX()), Math.abs(c.tauZY())));
    }

    private static InternalForces random(Random r) {
        return CheckFixtures.f(r.nextGaussian() * 1e4, r.nextGaussian() * 1e3, r.nextGaussian() * 1e3,
                r.nextGaussian() * 1e6, r.nextGaussian() * 1e6, r.nextGaussian() * 1e6);
    }
}
