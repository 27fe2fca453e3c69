package org.tensio.engine.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.tensio.engine.checks.EnvelopeKernel.Implementation;
import org.tensio.engine.checks.EnvelopeKernel.Options;
import org.tensio.engine.checks.EnvelopeKernel.Result;
import org.tensio.engine.profile.LShapeProfile;
import org.tensio.engine.section.Section;

/**
 * The envelope kernel's two implementations give the same envelope bit for bit (values compared as raw bits, so a
 * zero extreme must have the same sign; governing cases equal): the class comment promises it and the vector path
 * is chosen automatically, so any difference would change what a user sees. This test JVM runs with
 * {@code --add-modules jdk.incubator.vector} (the engine pom's surefire argLine), so the vector path is really
 * exercised; the scalar path is the fallback without the module, checked in a child JVM.
 */
class VectorEnvelopeKernelTest {

    private static Options scalar(Options o) {
        return o.withImplementation(Implementation.SCALAR);
    }

    private static Options vector(Options o) {
        return o.withImplementation(Implementation.VECTOR);
    }

    /** Both paths on the same table, asserting which one ran and that they agree. */
    private static Result both(EnvelopeKernel k, double[] f, Options o) {
        Result s = k.envelope(f, scalar(o));
        Result v = k.envelope(f, vector(o));
        assertEquals(Implementation.SCALAR, s.implementation());
        assertEquals(Implementation.VECTOR, v.implementation());
        EnvelopeKernelTest.assertIdentical(s, v);
        assertEquals((long) k.size() * (f.length / 6), v.evaluatedPointCases() + v.skippedPointCases());
        return v;
    }

    @Test
    void theTestJvmHasTheVectorPathAndUsesItByDefault() {
        assertTrue(EnvelopeKernel.vectorAvailable(), EnvelopeKernel.vectorStatus());
        assertTrue(EnvelopeKernel.vectorStatus().startsWith("vector path"), EnvelopeKernel.vectorStatus());
        double[] a = {1, 2, 3};
        Result r = new EnvelopeKernel(a, a, a, a, a, a, a, a, a).envelope(new double[] {1, 2, 3, 4, 5, 6});
        assertEquals(Implementation.VECTOR, r.implementation());
    }

    @Test
    void randomFieldsAgreeOverSizesChunksTilesThreadsSkippingAndTauMax() {
        Random r = new Random(2026);
        // points: a single partial vector, a partial tile, several tiles with a tail; cases: one chunk of 16,
        // several chunks with a partial one, chunks of 64
        for (int n : new int[] {1, 7, 17, 1037, 3001}) {
            double[][] c = EnvelopeKernelTest.coefficients(r, n);
            EnvelopeKernel k = EnvelopeKernelTest.kernel(c);
            for (int nc : new int[] {1, 5, 300, 2100}) {
                if ((long) n * nc > 3_000_000) {
                    continue;
                }
                double[] f = EnvelopeKernelTest.cases(r, nc, nc % 2 == 0);
                for (boolean tau : new boolean[] {false, true}) {
                    for (boolean skip : new boolean[] {false, true}) {
                        both(k, f, new Options(n > 100 ? 128 : 16, 1, tau, skip));
                    }
                }
                both(k, f, new Options(100, 2, true, true));
                both(k, f, new Options(512, 3, false, false));
            }
        }
    }

    @Test
    void vectorPathMatchesTheReferenceLoopAndSkips() {
        Random r = new Random(5);
        double[][] c = EnvelopeKernelTest.coefficients(r, 4000);
        double[] f = EnvelopeKernelTest.cases(r, 500, true); // magnitudes over two decades
        Result v = both(EnvelopeKernelTest.kernel(c), f, Options.defaults().withTile(128).withTauMax(true));
        EnvelopeKernelTest.assertMatchesReference(new EnvelopeKernelTest.Reference(c, f), v);
        // the seeds alone already exclude most of the small cases (the scalar path skips more)
        assertTrue(v.skippedPointCases() > 0.1 * 4000 * 500, "skipped " + v.skippedPointCases());
    }

    @Test
    void exactTiesAndSignedZerosResolveAlike() {
        Random r = new Random(13);
        double[][] c = EnvelopeKernelTest.coefficients(r, 301);
        double[] big = {2e5, 3e4, -2e4, 3e8, -1e8, 2e7};
        int nc = 140; // chunks of 16: ties within a chunk and across chunks
        double[] f = new double[6 * nc];
        for (int k = 0; k < nc; k++) {
            for (int j = 0; j < 6; j++) {
                double v;
                if (k == 1 || k == 3 || k == 70 || k == 139) {
                    v = big[j]; // equal cases, the first must govern
                } else if (k == 4) {
                    v = -big[j]; // the same squares, opposite σz
                } else if (k % 5 == 0) {
                    v = k % 10 == 0 ? 0.0 : -0.0; // σz and τ exactly ±0 everywhere
                } else {
                    v = 1e-3 * big[j] * (2 * r.nextDouble() - 1);
                }
                f[6 * k + j] = v;
            }
        }
        EnvelopeKernel k = EnvelopeKernelTest.kernel(c);
        for (boolean skip : new boolean[] {false, true}) {
            Result e = both(k, f, Options.defaults().withTile(64).withSkip(skip).withTauMax(true));
            for (int i = 0; i < 301; i++) {
                assertEquals(1, e.vonMisesCase(i));
                assertEquals(1, e.tauMaxCase(i));
            }
        }
        // only zero cases: every extreme is a signed zero and case 0 governs all of them
        double[] zeros = new double[6 * 40];
        for (int i = 0; i < zeros.length; i++) {
            zeros[i] = (i / 6) % 3 == 1 ? -0.0 : 0.0;
        }
        for (boolean skip : new boolean[] {false, true}) {
            Result e = both(k, zeros, Options.defaults().withTile(32).withSkip(skip).withTauMax(true));
            for (int i = 0; i < 301; i++) {
                assertEquals(0, e.sigmaZMaxCase(i));
                assertEquals(0, e.sigmaZMinCase(i));
                assertEquals(0, e.vonMisesCase(i));
            }
        }
    }

    @Test
    void realSectionFieldAgrees() {
        Section s = CheckFixtures.single("angle", new LShapeProfile(100, 100, 10, 10, 0), CheckFixtures.STEEL);
        EnvelopeKernel k = UnitStressFieldTest.field(s).envelopeKernel();
        double[] f = EnvelopeKernelTest.cases(new Random(17), 257, true);
        both(k, f, Options.defaults().withTauMax(true).withThreads(2));
        both(k, f, Options.defaults());
    }

    @Test
    void overflowFallsBackToTheScalarPathAndIsReported() {
        double[] a = {1, 2};
        EnvelopeKernel k = new EnvelopeKernel(a, a, a, a, a, a, a, a, a);
        // 1e200² overflows: the vector path does not check values, so the kernel hands this table to the scalar one
        assertThrows(ArithmeticException.class, () -> k.envelope(new double[] {1e200, 0, 0, 0, 0, 0}));
        assertThrows(ArithmeticException.class, () -> k.envelope(new double[] {1e200, 0, 0, 0, 0, 0},
                vector(Options.defaults())));
        // σz = 1e154 does not overflow (its square is 1e308 < 1.8e308) but the guard (2 × the bound, squared, × 4)
        // does: the scalar path runs and gives the exact value; 1e150 stays on the vector path
        Result big = k.envelope(new double[] {5e153, 0, 0, 0, 0, 0});
        assertEquals(Implementation.SCALAR, big.implementation());
        assertEquals(1e154, big.sigmaZMax(1), 0.0);
        assertEquals(Implementation.VECTOR, k.envelope(new double[] {1e150, 0, 0, 0, 0, 0}).implementation());
    }

    @Test
    void clientCompilerOnlyOptionsAreRecognised() {
        assertEquals("-XX:TieredStopAtLevel=1", VectorSupport.clientCompilerOnly(List.of("-XX:TieredStopAtLevel=1")));
        assertEquals("-Xint", VectorSupport.clientCompilerOnly(List.of("-Xmx1g", "-Xint")));
        assertNull(VectorSupport.clientCompilerOnly(List.of("-XX:TieredStopAtLevel=4")));
        assertNull(VectorSupport.clientCompilerOnly(List.of("-XX:TieredStopAtLevel=1", "-XX:-TieredCompilation")));
        assertNull(VectorSupport.clientCompilerOnly(List.of("-Xint", "-Xmixed")));
        assertNull(VectorSupport.clientCompilerOnly(List.of()));
    }

    @Test
    void optionsRejectANullImplementation() {
        IllegalArgumentException x = assertThrows(IllegalArgumentException.class,
                () -> new Options(512, 1, false, true, null));
        assertEquals("implementation must not be null", x.getMessage());
    }

    /**
     * A JVM started without the module (and one with it but -D{@value VectorSupport#PROPERTY}=false) falls back
     * to the scalar path and says why; an explicit VECTOR request fails there naming the reason.
     */
    @Test
    void withoutTheModuleTheScalarPathRuns() throws IOException, InterruptedException {
        String out = runChild(List.of());
        assertTrue(out.contains("SCALAR"), out);
        assertTrue(out.contains("module jdk.incubator.vector is not in the boot layer"), out);
        assertTrue(out.contains("VECTOR refused: implementation VECTOR: not available in this JVM"), out);
        out = runChild(List.of("--add-modules", "jdk.incubator.vector", "-D" + VectorSupport.PROPERTY + "=false"));
        assertTrue(out.contains("SCALAR") && out.contains("=false"), out);
        out = runChild(List.of("--add-modules", "jdk.incubator.vector", "-XX:TieredStopAtLevel=1"));
        assertTrue(out.contains("SCALAR") && out.contains("client compiler"), out);
    }

    private static String runChild(List<String> jvmOptions) throws IOException, InterruptedException {
        String java = System.getProperty("java.home") + File.separator + "bin" + File.separator + "java";
        List<String> cmd = new java.util.ArrayList<>(List.of(java));
        cmd.addAll(jvmOptions);
        cmd.addAll(List.of("-cp", System.getProperty("java.class.path"), VectorStatusMain.class.getName()));
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "child JVM did not finish");
        assertEquals(0, p.exitValue(), out);
        assertNotNull(out);
        return out;
    }
}
