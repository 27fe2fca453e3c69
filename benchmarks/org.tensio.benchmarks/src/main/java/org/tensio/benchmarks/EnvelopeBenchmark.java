package org.tensio.benchmarks;

import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.tensio.engine.checks.EnvelopeKernel;
import org.tensio.engine.checks.UnitStressField;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.profile.IShapeProfile;
import org.tensio.engine.section.Material;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * The envelope of {@link Data#cases} load cases over {@link Data#points} points (default 10 000 × 100 000 =
 * 1e9 point-cases per operation): the engine's {@link EnvelopeKernel} as shipped, both implementations
 * ({@link Run#implementation}: {@code VECTOR}, the Vector API path the engine picks automatically when the JVM has
 * {@code jdk.incubator.vector}, and {@code SCALAR}, its plain Java fallback), with 1 and 2 threads, with and
 * without skipping, against the straightforward loop. Point-cases per second = 1e9 / (s/op). The fork runs with
 * {@code --add-modules jdk.incubator.vector}; the setup fails the run when the requested implementation is not
 * the one that runs, or when it differs from the scalar one on a slice of the data.
 * <p>
 * <b>Data.</b> The unit stress field of a real section (an invented rolled-I-like section, 300 × 150 mm, web
 * 7.1, flanges 10.7, root radius 15; steel; its finite-element solution at the default mesh), its samples
 * repeated to the point count in node order (the kernel's data access does not depend on the values, only
 * the skipping does). Forces: independent uniform random values per component in ±(1000 kN, 150 kN, 300 kN,
 * 250 kN·m, 60 kN·m, 20 kN·m) for N, Vx, Vy, Mx, My, T ({@code uniform}); {@code spread} additionally scales
 * each case by 10^U(−2, 0), as in a load table where most cases are far from governing.
 * <p>
 * <b>FLOPs per point-case</b> (for the fraction of {@link PeakFlopsBenchmark}): 21 arithmetic (σz 3 mul + 2
 * add, τzx and τzy 6 mul + 4 add, σz² + 3(τzx² + τzy²) 4 mul + 2 add) and 3 comparisons (max and min of σz,
 * max of the von Mises square), 24 in all. The baseline does the same arithmetic plus a square root per
 * point-case.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 1)
@Fork(value = 1, jvmArgsAppend = {"-Xmx6g", "--add-modules=jdk.incubator.vector"})
public class EnvelopeBenchmark {

    /** Points, cases, coefficient arrays and case table; built once per fork. */
    @State(Scope.Benchmark)
    public static class Data {
        @Param("100000")
        public int points;
        @Param("10000")
        public int cases;
        @Param({"uniform", "spread"})
        public String forces;

        /** The nine coefficient arrays, a1..a3, b1..b3, c1..c3. */
        public double[][] c;
        public double[] table;
        public EnvelopeKernel kernel;
        public int fieldSamples;

        @Setup(Level.Trial)
        public void setup() {
            Material steel = new Material("steel", 210000, 0.3, 355.0);
            Section s = new Section("I300", List.of(SectionPart.of(new IShapeProfile(150, 300, 7.1, 10.7, 15), 0, 0,
                    steel)));
            SectionAnalysisService engine = SectionAnalysisService.create();
            UnitStressField f = UnitStressField.of(s, engine.properties(s), engine.solution(s));
            fieldSamples = f.size();
            // the coefficients, read back through unit forces (1 × a + 0 × b + 0 × c = a exactly)
            InternalForces[] unit = {new InternalForces(1, 0, 0, 0, 0, 0), new InternalForces(0, 0, 0, 1, 0, 0),
                new InternalForces(0, 0, 0, 0, 1, 0), new InternalForces(0, 0, 0, 0, 0, 1),
                new InternalForces(0, 1, 0, 0, 0, 0), new InternalForces(0, 0, 1, 0, 0, 0)};
            c = new double[9][points];
            for (int p = 0; p < points; p++) {
                int i = p % fieldSamples;
                c[0][p] = f.sigmaZ(i, unit[0]);
                c[1][p] = f.sigmaZ(i, unit[1]);
                c[2][p] = f.sigmaZ(i, unit[2]);
                c[3][p] = f.tauZX(i, unit[3]);
                c[4][p] = f.tauZX(i, unit[4]);
                c[5][p] = f.tauZX(i, unit[5]);
                c[6][p] = f.tauZY(i, unit[3]);
                c[7][p] = f.tauZY(i, unit[4]);
                c[8][p] = f.tauZY(i, unit[5]);
            }
            kernel = new EnvelopeKernel(c[0], c[1], c[2], c[3], c[4], c[5], c[6], c[7], c[8]);
            table = forces(cases, forces, new Random(20250611));
        }
    }

    /** Kernel options. */
    @State(Scope.Benchmark)
    public static class Run {
        @Param({"1", "2"})
        public int threads;
        @Param({"false", "true"})
        public boolean skip;
        @Param("512")
        public int tile;
        @Param({"VECTOR", "SCALAR"})
        public EnvelopeKernel.Implementation implementation;

        public EnvelopeKernel.Options options;

        @Setup(Level.Trial)
        public void setup(Data d) {
            options = new EnvelopeKernel.Options(tile, threads, false, skip, implementation);
            System.out.println("# " + EnvelopeKernel.vectorStatus());
            // a slice of the data (4 101 points: a partial last vector; 300 cases: a partial last chunk)
            int n = Math.min(4101, d.points), nc = Math.min(300, d.cases);
            double[][] c = new double[9][];
            for (int k = 0; k < 9; k++) {
                c[k] = Arrays.copyOf(d.c[k], n);
            }
            double[] f = Arrays.copyOf(d.table, 6 * nc);
            EnvelopeKernel k = new EnvelopeKernel(c[0], c[1], c[2], c[3], c[4], c[5], c[6], c[7], c[8]);
            EnvelopeKernel.Result got = k.envelope(f, options);
            if (got.implementation() != implementation) {
                throw new IllegalStateException("asked for " + implementation + ", ran " + got.implementation() + ": "
                        + EnvelopeKernel.vectorStatus());
            }
            EnvelopeKernel.Result want = k.envelope(f, options.withImplementation(EnvelopeKernel.Implementation.SCALAR));
            for (int i = 0; i < n; i++) {
                if (Double.compare(got.sigmaZMax(i), want.sigmaZMax(i)) != 0 || got.vonMisesCase(i) != want.vonMisesCase(i)
                        || Double.compare(got.vonMises(i), want.vonMises(i)) != 0
                        || got.sigmaZMinCase(i) != want.sigmaZMinCase(i)) {
                    throw new IllegalStateException(implementation + " differs from SCALAR at point " + i);
                }
            }
        }
    }

    /** Random case table, N, Vx, Vy, Mx, My, T per row (N, N·mm). */
    static double[] forces(int cases, String kind, Random r) {
        double[] range = {1e6, 1.5e5, 3e5, 2.5e8, 6e7, 2e7};
        double[] t = new double[6 * cases];
        for (int k = 0; k < cases; k++) {
            double m = switch (kind) {
                case "uniform" -> 1;
                case "spread" -> Math.pow(10, -2 * r.nextDouble());
                default -> throw new IllegalArgumentException("forces must be uniform or spread, got " + kind);
            };
            for (int j = 0; j < 6; j++) {
                t[6 * k + j] = m * range[j] * (2 * r.nextDouble() - 1);
            }
        }
        return t;
    }

    @Benchmark
    public EnvelopeKernel.Result kernel(Data d, Run r) {
        return d.kernel.envelope(d.table, r.options);
    }

    /**
     * The straightforward loop (the shape of a first implementation, as in the engine's per-station envelope):
     * cases outside, points inside; per case the three stresses of every point into arrays, then per point the
     * running extremes with branches and the case index, von Mises with a square root per point-case.
     */
    @Benchmark
    public Object straightforward(Data d) {
        double[][] c = d.c;
        double[] f = d.table;
        int n = d.points, nc = d.cases;
        double[] s = new double[n], tx = new double[n], ty = new double[n];
        double[] hi = new double[n], lo = new double[n], vm = new double[n];
        int[] hiCase = new int[n], loCase = new int[n], vmCase = new int[n];
        for (int k = 0; k < nc; k++) {
            double fn = f[6 * k], vx = f[6 * k + 1], vy = f[6 * k + 2], mx = f[6 * k + 3], my = f[6 * k + 4],
                    t = f[6 * k + 5];
            for (int i = 0; i < n; i++) {
                s[i] = c[0][i] * fn + c[1][i] * mx + c[2][i] * my;
                tx[i] = c[3][i] * t + c[4][i] * vx + c[5][i] * vy;
                ty[i] = c[6][i] * t + c[7][i] * vx + c[8][i] * vy;
            }
            for (int i = 0; i < n; i++) {
                double v = s[i];
                if (k == 0 || v > hi[i]) {
                    hi[i] = v;
                    hiCase[i] = k;
                }
                if (k == 0 || v < lo[i]) {
                    lo[i] = v;
                    loCase[i] = k;
                }
                double e = Math.sqrt(v * v + 3 * (tx[i] * tx[i] + ty[i] * ty[i]));
                if (k == 0 || e > vm[i]) {
                    vm[i] = e;
                    vmCase[i] = k;
                }
            }
        }
        return new Object[] {hi, lo, vm, hiCase, loCase, vmCase};
    }
}
