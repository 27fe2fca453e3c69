package org.tensio.engine.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.tensio.engine.checks.EnvelopeKernel.Options;
import org.tensio.engine.checks.EnvelopeKernel.Result;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.profile.LShapeProfile;
import org.tensio.engine.project.Project;
import org.tensio.engine.section.Section;

/**
 * The envelope kernel against a straightforward reference loop (cases outside, points inside, branches, von
 * Mises √(σ² + 3τ²) and τmax = √((σ/2)² + τ²) per case, common practice, no source) and against
 * {@link EnvelopeOp} on a real section. Tolerances: values 1e-12 relative to the largest stress of the point
 * (the reference compares square roots, the kernel squares: the same rounding apart from the final √, far
 * below 1e-12); governing cases equal wherever the reference's runner-up is more than 1e-12 relative below the
 * extreme (otherwise both answers are correct to round-off). Results of different tilings, thread counts and
 * skipping are compared bit for bit: the class promises identical results.
 */
class EnvelopeKernelTest {

    private static final double REL = 1e-12;

    /** Reference envelope: sMax, sMin, vm, tm and the runner-up gaps, the straightforward way. */
    static final class Reference {
        final double[][] value;
        final int[][] governing;
        final double[][] runnerUp;

        Reference(double[][] c, double[] f) {
            int n = c[0].length, nc = f.length / 6;
            value = new double[4][n];
            governing = new int[4][n];
            runnerUp = new double[4][n];
            for (int q = 0; q < 4; q++) {
                java.util.Arrays.fill(value[q], Double.NaN);
                java.util.Arrays.fill(runnerUp[q], Double.NaN);
            }
            for (int k = 0; k < nc; k++) {
                double fn = f[6 * k], vx = f[6 * k + 1], vy = f[6 * k + 2], mx = f[6 * k + 3], my = f[6 * k + 4],
                        t = f[6 * k + 5];
                for (int i = 0; i < n; i++) {
                    double s = c[0][i] * fn + c[1][i] * mx + c[2][i] * my;
                    double tx = c[3][i] * t + c[4][i] * vx + c[5][i] * vy;
                    double ty = c[6][i] * t + c[7][i] * vx + c[8][i] * vy;
                    double vm = Math.sqrt(s * s + 3 * (tx * tx + ty * ty));
                    double tm = Math.sqrt(s * s / 4 + tx * tx + ty * ty);
                    // q = 1 is the minimum: compare −σ
                    double[] v = {s, -s, vm, tm};
                    for (int q = 0; q < 4; q++) {
                        if (k == 0 || v[q] > value[q][i]) {
                            runnerUp[q][i] = k == 0 ? Double.NEGATIVE_INFINITY : value[q][i];
                            value[q][i] = v[q];
                            governing[q][i] = k;
                        } else if (v[q] > runnerUp[q][i]) {
                            runnerUp[q][i] = v[q];
                        }
                    }
                }
            }
        }
    }

    static double[][] coefficients(Random r, int n) {
        // σz per N ~ 1/A, per M ~ y/I: one scale each, with points spread over the section (some near zero);
        // τ per T, V: another scale; all of realistic relative size (mm, N: A ~ 1e4, I ~ 1e8)
        double[][] c = new double[9][n];
        double[] scale = {1e-4, 1e-6, 1e-6, 1e-6, 1e-4, 1e-4, 1e-6, 1e-4, 1e-4};
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < 9; k++) {
                c[k][i] = scale[k] * (k == 0 ? 1 + 0.1 * r.nextDouble() : 2 * r.nextDouble() - 1);
            }
        }
        return c;
    }

    static double[] cases(Random r, int nc, boolean spreadMagnitudes) {
        double[] f = new double[6 * nc];
        double[] scale = {1e5, 1e4, 1e4, 1e8, 1e8, 1e7}; // N, Vx, Vy, Mx, My, T in N and N·mm
        for (int k = 0; k < nc; k++) {
            double m = spreadMagnitudes ? Math.pow(10, -2 * r.nextDouble()) : 1; // 0.01 .. 1
            for (int j = 0; j < 6; j++) {
                f[6 * k + j] = m * scale[j] * (2 * r.nextDouble() - 1);
            }
        }
        return f;
    }

    static EnvelopeKernel kernel(double[][] c) {
        return new EnvelopeKernel(c[0], c[1], c[2], c[3], c[4], c[5], c[6], c[7], c[8]);
    }

    static void assertMatchesReference(Reference ref, Result e) {
        int unambiguous = 0;
        for (int i = 0; i < e.size(); i++) {
            double[] got = {e.sigmaZMax(i), -e.sigmaZMin(i), e.vonMises(i), e.hasTauMax() ? e.tauMax(i) : Double.NaN};
            int[] gov = {e.sigmaZMaxCase(i), e.sigmaZMinCase(i), e.vonMisesCase(i),
                e.hasTauMax() ? e.tauMaxCase(i) : -1};
            double scale = Math.max(Math.abs(ref.value[0][i]), Math.max(Math.abs(ref.value[1][i]), ref.value[2][i]));
            for (int q = 0; q < (e.hasTauMax() ? 4 : 3); q++) {
                double want = ref.value[q][i];
                assertEquals(want, got[q], REL * scale, "point " + i + " quantity " + q);
                if (want - ref.runnerUp[q][i] > REL * scale) {
                    assertEquals(ref.governing[q][i], gov[q], "governing case, point " + i + " quantity " + q);
                    unambiguous++;
                }
            }
        }
        assertTrue(unambiguous > e.size(), "most extremes are unambiguous on random data, got " + unambiguous);
    }

    static void assertIdentical(Result a, Result b) {
        assertEquals(a.size(), b.size());
        assertEquals(a.hasTauMax(), b.hasTauMax());
        for (int i = 0; i < a.size(); i++) {
            String at = "point " + i;
            assertEquals(Double.doubleToRawLongBits(a.sigmaZMax(i)), Double.doubleToRawLongBits(b.sigmaZMax(i)), at);
            assertEquals(Double.doubleToRawLongBits(a.sigmaZMin(i)), Double.doubleToRawLongBits(b.sigmaZMin(i)), at);
            assertEquals(Double.doubleToRawLongBits(a.vonMises(i)), Double.doubleToRawLongBits(b.vonMises(i)), at);
            assertEquals(a.sigmaZMaxCase(i), b.sigmaZMaxCase(i), at);
            assertEquals(a.sigmaZMinCase(i), b.sigmaZMinCase(i), at);
            assertEquals(a.vonMisesCase(i), b.vonMisesCase(i), at);
            if (a.hasTauMax()) {
                assertEquals(Double.doubleToRawLongBits(a.tauMax(i)), Double.doubleToRawLongBits(b.tauMax(i)), at);
                assertEquals(a.tauMaxCase(i), b.tauMaxCase(i), at);
            }
        }
    }

    @Test
    void randomDataMatchesTheReferenceLoop() {
        Random r = new Random(20240611);
        double[][] c = coefficients(r, 3000);
        double[] f = cases(r, 300, false); // 300 cases: several chunks of 64 and a partial one
        Reference ref = new Reference(c, f);
        EnvelopeKernel k = kernel(c);
        assertMatchesReference(ref, k.envelope(f, Options.defaults().withTauMax(true)));
        assertMatchesReference(ref, k.envelope(f, Options.defaults().withSkip(false)));
        Result plain = k.envelope(f);
        assertFalse(plain.hasTauMax());
        assertThrows(IllegalStateException.class, () -> plain.tauMax(0));
        assertEquals(3000L * 300, plain.evaluatedPointCases() + plain.skippedPointCases());
    }

    @Test
    void governingCaseReproducesTheExtreme() {
        // independent of the reference: the named case's own stresses give the reported value, exactly with the
        // kernel's expressions and to 1e-12 with the textbook ones (the kernel uses fused multiply-adds)
        Random r = new Random(7);
        double[][] c = coefficients(r, 700);
        double[] f = cases(r, 129, true);
        EnvelopeKernel k = kernel(c);
        Result e = k.envelope(f, Options.defaults().withTauMax(true));
        for (int i = 0; i < e.size(); i++) {
            assertEquals(e.sigmaZMax(i), k.sigmaZ(i, f, e.sigmaZMaxCase(i)), 0.0);
            assertEquals(e.sigmaZMin(i), k.sigmaZ(i, f, e.sigmaZMinCase(i)), 0.0);
            int v = e.vonMisesCase(i), t = e.tauMaxCase(i);
            assertEquals(Math.sqrt(k.vonMisesSquare(i, f, v)), e.vonMises(i), 0.0);
            assertEquals(Math.sqrt(k.tauMaxSquare(i, f, t)), e.tauMax(i), 0.0);
            double s = c[0][i] * f[6 * v] + c[1][i] * f[6 * v + 3] + c[2][i] * f[6 * v + 4];
            double x = c[3][i] * f[6 * v + 5] + c[4][i] * f[6 * v + 1] + c[5][i] * f[6 * v + 2];
            double y = c[6][i] * f[6 * v + 5] + c[7][i] * f[6 * v + 1] + c[8][i] * f[6 * v + 2];
            assertEquals(Math.sqrt(s * s + 3 * (x * x + y * y)), e.vonMises(i), REL * e.vonMises(i));
        }
    }

    @Test
    void tilingBoundariesDoNotChangeTheResult() {
        Random r = new Random(11);
        // 1037 points: no tile size below divides it; 1 and 17 points: a single partial tile
        for (int n : new int[] {1, 17, 1037}) {
            double[][] c = coefficients(r, n);
            double[] f = cases(r, 97, true);
            Reference ref = new Reference(c, f);
            EnvelopeKernel k = kernel(c);
            Result base = k.envelope(f, Options.defaults().withTile(2048).withTauMax(true));
            if (n > 1) {
                assertMatchesReference(ref, base);
            }
            for (int tile : new int[] {16, 33, 100, 512, 1024}) {
                assertIdentical(base, k.envelope(f, Options.defaults().withTile(tile).withTauMax(true)));
            }
        }
    }

    @Test
    void oneAndTwoThreadsGiveIdenticalResults() {
        Random r = new Random(3);
        double[][] c = coefficients(r, 5000);
        double[] f = cases(r, 200, true);
        EnvelopeKernel k = kernel(c);
        Options o = Options.defaults().withTile(256).withTauMax(true);
        Result one = k.envelope(f, o);
        Result two = k.envelope(f, o.withThreads(2));
        assertIdentical(one, two);
        assertIdentical(one, k.envelope(f, o.withThreads(7))); // more threads than cores
        assertEquals(one.skippedPointCases(), two.skippedPointCases());
        // more threads than tiles
        assertIdentical(k.envelope(f, o.withTile(4096)), k.envelope(f, o.withTile(4096).withThreads(4)));
    }

    @Test
    void skippingNeverChangesTheAnswerAndDoesSkip() {
        Random r = new Random(5);
        double[][] c = coefficients(r, 4000);
        for (boolean tau : new boolean[] {false, true}) {
            double[] f = cases(r, 500, true); // magnitudes over two decades: the small cases cannot govern
            EnvelopeKernel k = kernel(c);
            Options o = Options.defaults().withTile(128).withTauMax(tau);
            Result on = k.envelope(f, o);
            Result off = k.envelope(f, o.withSkip(false));
            assertIdentical(off, on);
            assertEquals(0, off.skippedPointCases());
            assertTrue(on.skippedPointCases() > 0.1 * 4000 * 500, "skipped " + on.skippedPointCases());
            assertMatchesReference(new Reference(c, f), on);
        }
    }

    @Test
    void skippingAtExactTiesKeepsTheFirstCase() {
        // case 1 = case 3 = case 70 (in the second chunk) exactly and dominates, case 4 = −case 1 (the same von
        // Mises square, opposite σz); 0 and 2 are tiny. The first of each tie governs, with and without skipping;
        // the 99 copies of a small case after them cannot govern and are skipped
        Random r = new Random(13);
        double[][] c = coefficients(r, 300);
        double[] big = {2e5, 3e4, -2e4, 3e8, -1e8, 2e7};
        double[] neg = new double[6];
        for (int j = 0; j < 6; j++) {
            neg[j] = -big[j];
        }
        List<double[]> rows = new ArrayList<>();
        rows.add(new double[] {1, 1, 1, 1, 1, 1});
        rows.add(big);
        rows.add(new double[] {-1, 2, 1, -3, 1, 1});
        rows.add(big.clone());
        rows.add(neg);
        for (int k = 0; k < 100; k++) {
            rows.add(k == 65 ? big.clone() : new double[] {10, -5, 3, 1e3, 2e3, -1e2});
        }
        double[] f = new double[6 * rows.size()];
        for (int k = 0; k < rows.size(); k++) {
            System.arraycopy(rows.get(k), 0, f, 6 * k, 6);
        }
        EnvelopeKernel k = kernel(c);
        for (boolean skip : new boolean[] {false, true}) {
            Result e = k.envelope(f, Options.defaults().withTile(64).withSkip(skip).withTauMax(true));
            for (int i = 0; i < 300; i++) {
                assertEquals(1, e.vonMisesCase(i));
                assertEquals(1, e.tauMaxCase(i));
                boolean up = k.sigmaZ(i, f, 1) > 0;
                assertEquals(up ? 1 : 4, e.sigmaZMaxCase(i), "point " + i);
                assertEquals(up ? 4 : 1, e.sigmaZMinCase(i), "point " + i);
            }
            if (skip) {
                // the seeds (the largest bounds: 1, 3, 4, 70 first) lift the thresholds before case 0 is reached,
                // so the two tiny cases are skipped as well as the 99 small ones; case 70 is not (its bound is not
                // below its own value)
                assertEquals(101L * 300, e.skippedPointCases());
            } else {
                assertEquals(0, e.skippedPointCases());
            }
        }
    }

    @Test
    void realSectionAgreesWithEnvelopeOp() {
        Section s = CheckFixtures.single("angle", new LShapeProfile(100, 100, 10, 10, 0), CheckFixtures.STEEL);
        InternalForces g = CheckFixtures.f(2e4, 0, -3e3, -4e6, 1e6, 0);
        InternalForces q = CheckFixtures.f(-1e4, 2e3, 5e3, 3e6, -2e6, 3e5);
        InternalForces w = CheckFixtures.f(0, -4e3, 0, 0, 5e5, -6e5);
        Project p = new CheckFixtures.ProjectBuilder().section(s)
                .station("E", "angle", "G", g, "Q", q, "W", w)
                .combination("ULS", "G", 1.35, "Q", 1.5, "W", 0.9)
                .combination("ACC", "G", 1.0, "W", -1.0)
                .build();
        StationEnvelope op = EnvelopeOp.envelope(p, "E", CheckFixtures.ENGINE);
        List<InternalForces> forces = new ArrayList<>();
        for (String id : op.cases()) {
            forces.add(p.forces("E", id));
        }
        UnitStressField field = UnitStressFieldTest.field(s);
        Result e = field.envelopeKernel().envelope(EnvelopeKernel.caseTable(forces),
                Options.defaults().withTile(64).withThreads(2).withTauMax(true));
        assertEquals(field.size(), e.size());
        assertEquals(op.points().size(), e.size());
        for (int i = 0; i < e.size(); i++) {
            PointEnvelope pe = op.points().get(i);
            double scale = pe.vonMises().max();
            String at = "sample " + i;
            // EnvelopeOp evaluates with UnitStressField.evaluate: the same expressions, the same bits
            assertEquals(pe.sigmaZ().max(), e.sigmaZMax(i), REL * scale, at);
            assertEquals(pe.sigmaZ().min(), e.sigmaZMin(i), REL * scale, at);
            assertEquals(pe.vonMises().max(), e.vonMises(i), REL * scale, at);
            assertEquals(pe.tauMax().max(), e.tauMax(i), REL * scale, at);
            assertEquals(pe.vonMises().maxCase(), op.cases().get(e.vonMisesCase(i)), at);
        }
    }

    @Test
    void badInputIsRejectedNamingTheField() {
        double[] a = {1, 2}, b = {1, 2, 3};
        IllegalArgumentException x = assertThrows(IllegalArgumentException.class,
                () -> new EnvelopeKernel(a, a, a, a, b, a, a, a, a));
        assertTrue(x.getMessage().startsWith("b2: length 3"), x.getMessage());
        x = assertThrows(IllegalArgumentException.class,
                () -> new EnvelopeKernel(a, a, a, a, a, a, a, new double[] {0, Double.NaN}, a));
        assertEquals("c2[1] must be finite, got NaN", x.getMessage());
        x = assertThrows(IllegalArgumentException.class, () -> new EnvelopeKernel(a, a, null, a, a, a, a, a, a));
        assertEquals("a3 must not be null", x.getMessage());
        EnvelopeKernel k = new EnvelopeKernel(a, a, a, a, a, a, a, a, a);
        x = assertThrows(IllegalArgumentException.class, () -> k.envelope(new double[5]));
        assertTrue(x.getMessage().contains("6 values per case"), x.getMessage());
        x = assertThrows(IllegalArgumentException.class, () -> k.envelope(new double[0]));
        assertTrue(x.getMessage().contains("at least one case"), x.getMessage());
        x = assertThrows(IllegalArgumentException.class,
                () -> k.envelope(new double[] {0, 0, 0, 0, 0, 0, 0, 0, 0, Double.POSITIVE_INFINITY, 0, 0}));
        assertEquals("cases[1].Mx must be finite, got Infinity", x.getMessage());
        x = assertThrows(IllegalArgumentException.class, () -> new Options(8, 1, false, true));
        assertEquals("tile must be 16..65536 points, got 8", x.getMessage());
        x = assertThrows(IllegalArgumentException.class, () -> new Options(512, 0, false, true));
        assertEquals("threads must be 1..256, got 0", x.getMessage());
        // 1e200² overflows the von Mises square
        assertThrows(ArithmeticException.class, () -> k.envelope(new double[] {1e200, 0, 0, 0, 0, 0}));
        assertThrows(ArithmeticException.class,
                () -> k.envelope(new double[] {1e200, 0, 0, 0, 0, 0}, Options.defaults().withThreads(2)));
    }

    @Test
    void emptyKernelGivesAnEmptyEnvelope() {
        double[] z = {};
        Result e = new EnvelopeKernel(z, z, z, z, z, z, z, z, z).envelope(new double[6], Options.defaults()
                .withThreads(2));
        assertEquals(0, e.size());
        assertEquals(1, e.cases());
    }
}
