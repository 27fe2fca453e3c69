package org.tensio.engine.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.profile.LShapeProfile;
import org.tensio.engine.project.Project;
import org.tensio.engine.section.Section;
import org.tensio.engine.stress.PrincipalStresses;
import org.tensio.engine.stress.StressComponents;

/**
 * Envelopes against a brute-force loop over the cases with the independent formulas of
 * {@link PrincipalStresses} (von Mises √(σ² + 3τ²), τmax = √((σ/2)² + τ²); common practice, no source).
 */
class EnvelopeOpTest {

    @Test
    void envelopeIsTheExtremeOverCasesAndCombinationsWithTheCaseThatGivesIt() {
        Section s = CheckFixtures.single("angle", new LShapeProfile(100, 100, 10, 10, 0), CheckFixtures.STEEL);
        InternalForces g = CheckFixtures.f(2e4, 0, -3e3, -4e6, 1e6, 0);
        InternalForces q = CheckFixtures.f(-1e4, 2e3, 5e3, 3e6, -2e6, 3e5);
        InternalForces w = CheckFixtures.f(0, -4e3, 0, 0, 5e5, -6e5);
        Project p = new CheckFixtures.ProjectBuilder().section(s)
                .station("E", "angle", "G", g, "Q", q, "W", w)
                .station("F", "angle", "G", g)
                .combination("ULS", "G", 1.35, "Q", 1.5, "W", 0.9)
                .combination("ACC", "G", 1.0, "W", -1.0)
                .build();
        StationEnvelope e = EnvelopeOp.envelope(p, "E", CheckFixtures.ENGINE);
        List<String> cases = List.of("G", "Q", "W", "ULS", "ACC");
        assertEquals(cases, e.cases());
        assertEquals("angle", e.section());
        // internal forces: per component max and min over the five, with the case (exact: the same numbers)
        for (ForceComponent c : ForceComponent.values()) {
            double hi = Double.NEGATIVE_INFINITY, lo = Double.POSITIVE_INFINITY;
            String hiC = null, loC = null;
            for (String id : cases) {
                double v = p.forces("E", id).get(c);
                if (v > hi) {
                    hi = v;
                    hiC = id;
                }
                if (v < lo) {
                    lo = v;
                    loC = id;
                }
            }
            Range r = e.forces().get(c);
            assertEquals(new Range(hi, hiC, lo, loC), r, c.key());
        }
        // by hand: T of ACC = 0 − (−6e5) = 6e5 is the largest (a combination with a negative factor); N = 2e4 in
        // G and in ACC: the first in project order is named
        assertEquals(new Range(6e5, "ACC", -6e5, "W"), e.forces().get(ForceComponent.T));
        assertEquals(2e4, e.forces().get(ForceComponent.N).max(), 0.0);
        assertEquals("G", e.forces().get(ForceComponent.N).maxCase());
        // stresses: brute force at every sample
        UnitStressField f = UnitStressFieldTest.field(s);
        assertEquals(f.size(), e.points().size());
        for (int i = 0; i < f.size(); i++) {
            PointEnvelope pe = e.points().get(i);
            assertEquals(f.point(i), pe.point());
            assertEquals(f.material(i), pe.material());
            double[] hi = {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
            double[] lo = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
            String[] hiC = new String[3], loC = new String[3];
            double vm = -1, tm = -1;
            String vmC = null, tmC = null;
            for (String id : cases) {
                StressComponents sc = f.stress(i, p.forces("E", id));
                double[] v = {sc.sigmaZ(), sc.tauZX(), sc.tauZY()};
                for (int k = 0; k < 3; k++) {
                    if (v[k] > hi[k]) {
                        hi[k] = v[k];
                        hiC[k] = id;
                    }
                    if (v[k] < lo[k]) {
                        lo[k] = v[k];
                        loC[k] = id;
                    }
                }
                PrincipalStresses ps = PrincipalStresses.of(sc);
                if (ps.vonMises() > vm) {
                    vm = ps.vonMises();
                    vmC = id;
                }
                if (ps.tauMax() > tm) {
                    tm = ps.tauMax();
                    tmC = id;
                }
            }
            Range[] got = {pe.sigmaZ(), pe.tauZX(), pe.tauZY()};
            for (int k = 0; k < 3; k++) {
                // the op sums in the same order as UnitStressField.stress: identical doubles
                assertEquals(hi[k], got[k].max(), 0.0);
                assertEquals(lo[k], got[k].min(), 0.0);
                assertEquals(hiC[k], got[k].maxCase());
                assertEquals(loC[k], got[k].minCase());
            }
            // von Mises and τmax by PrincipalStresses (hypot-based) vs the op's square roots: round-off only
            assertEquals(vm, pe.vonMises().max(), 1e-12 * vm + 1e-300);
            assertEquals(tm, pe.tauMax().max(), 1e-12 * tm + 1e-300);
            if (Math.abs(vm - pe.vonMises().max()) == 0) {
                assertEquals(vmC, pe.vonMises().maxCase());
            }
        }
        // station F lacks Q and W: both combinations that need them are left out, with a warning each
        StationEnvelope ef = EnvelopeOp.envelope(p, "F", CheckFixtures.ENGINE);
        assertEquals(List.of("G"), ef.cases());
        assertEquals(2, ef.warnings().stream().filter(x -> x.contains("skipped")).count(), ef.warnings().toString());
        assertEquals(new Range(g.mx(), "G", g.mx(), "G"), ef.forces().get(ForceComponent.MX));
    }

    @Test
    void unknownStationIsNamed() {
        Section s = CheckFixtures.single("angle", new LShapeProfile(100, 100, 10, 10, 0), CheckFixtures.STEEL);
        Project p = new CheckFixtures.ProjectBuilder().section(s).station("E", "angle", "G", InternalForces.ZERO).build();
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class,
                () -> EnvelopeOp.envelope(p, "nowhere", CheckFixtures.ENGINE));
        assertTrue(ex.getMessage().contains("nowhere"), ex.getMessage());
    }
}
