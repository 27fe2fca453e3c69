package org.tensio.engine.checks;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicInteger;

import org.tensio.engine.loads.InternalForces;

/**
 * The envelope of many load cases over many sample points, as a throughput kernel: per point the largest and
 * smallest σz, the largest von Mises stress √(σz² + 3(τzx² + τzy²)) and optionally the largest maximum shear
 * stress τmax = √(σz²/4 + τzx² + τzy²), each with the index of the case that governs it.
 * <p>
 * <b>Model.</b> Every case is the linear combination of nine unit fields, structure of arrays as in
 * {@link UnitStressField} (which hands its own arrays to {@link UnitStressField#envelopeKernel()}): at point p
 * <pre>
 *   σz  = a1[p]·N + a2[p]·Mx + a3[p]·My
 *   τzx = b1[p]·T + b2[p]·Vx + b3[p]·Vy
 *   τzy = c1[p]·T + c2[p]·Vx + c3[p]·Vy
 * </pre>
 * evaluated with fused multiply-adds in a fixed order, σz = fma(a3, My, fma(a2, Mx, a1·N)) and likewise for
 * τzx, τzy ({@link #sigmaZ}, {@link #tauZX}, {@link #tauZY} give exactly the kernel's values). They differ from
 * the unfused {@link UnitStressField#sigmaZ(int, InternalForces)} by at most a few units in the last place
 * of the largest term (relative 1e-15 of the stress magnitude). The von Mises and τmax comparisons are made
 * on the squares σz² + 3(τzx² + τzy²) and σz²/4 + (τzx² + τzy²) ({@link #vonMisesSquare},
 * {@link #tauMaxSquare}); the square root is taken once per point at the end. Stress unit = coefficient unit ×
 * force unit; the kernel does not convert units.
 * <p>
 * <b>Case table.</b> A flat {@code double[]} of {@code 6·cases} values, one row per case in the component order
 * of {@link InternalForces} and {@link org.tensio.engine.loads.ForceComponent}: N, Vx, Vy, Mx, My, T
 * ({@link #caseTable(List)} builds it). Every value must be finite.
 * <p>
 * <b>Governing case.</b> The smallest case index whose computed value equals the extreme exactly (the first
 * case in table order among exact ties; values compare with {@code ==}, so a zero extreme may be reported as
 * −0.0 or +0.0). It does not depend on the tile size, the thread count or skipping.
 * <p>
 * <b>Implementations</b> ({@link Implementation}, {@link Options#implementation()}). The scalar path described
 * below runs on every JVM; the vector path (the JDK's incubating Vector API) runs when the JVM has the module
 * {@code jdk.incubator.vector} ({@link #vectorAvailable()}) and is then chosen automatically. Both give the same
 * values bit for bit and the same governing cases: they evaluate the same fused expressions, take the cases in
 * the same chunks, merge chunks with the same strict comparison and use the same final pass. Only the number of
 * skipped point-cases differs. {@link Result#implementation()} says which one ran.
 * <p>
 * <b>Algorithm</b> (scalar path). Points are processed in tiles of {@link Options#tile()} consecutive points whose nine
 * coefficient slices are copied once per tile into tile-local arrays (never per case) that stay in the L1/L2
 * cache. Within a tile the cases are processed in chunks of {@link #chunkSize(int)}; per case three short loops run
 * over the tile's points (σz with its running max and min and σz²; τzx² + τzy²; the von Mises square and its
 * running max), plain {@code double[]} arrays indexed alike and {@link Math#max}/{@link Math#min} only, no
 * branch: loops HotSpot's C2 compiles to SIMD code under its default flags (measured: one fused loop with all
 * the operations exceeds C2's unrolling limit and runs scalar, 3–5 times slower). The running extremes record
 * only the chunk in which they were reached; a final scalar pass re-evaluates that chunk's cases at the point
 * and takes the first one whose value equals the extreme, which is exact because the same expression gives the
 * same bits.
 * <p>
 * <b>Skipping</b> ({@link Options#skip()}). Per tile, the extrema of each coefficient over the tile times the
 * forces bound σz, |τzx|, |τzy| and hence the squares for every case (a margin of 1e-12 of the bounded
 * magnitudes covers the rounding of both the bound and the evaluation, which is below 3.4e-16 of them). A
 * case is skipped in a tile when each of its bounds is strictly below the smallest running maximum (above the
 * largest running minimum for σz) over the tile: such a case is strictly below the envelope at every point of
 * the tile, so it can neither govern nor tie. The running extremes are seeded with the {@link #SEEDS} cases of
 * largest von Mises bound before the cases are taken in order. Skipping never changes the result.
 * <p>
 * <b>Threads.</b> {@link Options#threads()} worker threads take whole tiles; tile boundaries do not depend on the
 * thread count and each point's result depends only on its own tile, so results are bit-identical for any
 * thread count. A kernel instance is immutable and may be used from several threads at once.
 * <p>
 * <b>Cost.</b> Per point and case 21 floating-point operations (σz: 3 mul + 2 add, τzx and τzy: 6 mul + 4
 * add, the von Mises square: 4 mul + 2 add; 10 of the adds are fused) plus 3 comparisons; 2 more operations
 * and 1 comparison with τmax. Memory: the result arrays (6 or 8 values per point) plus per thread
 * about {@code 17·tile + 4·cases} doubles (vector path: {@code 4·cases} doubles and {@code cases} ints).
 * Measured throughput: docs/performance.md, "Envelope kernel".
 *
 * @since 0.1
 */
public final class EnvelopeKernel {

    /** Force components per case row (N, Vx, Vy, Mx, My, T). */
    public static final int COMPONENTS = 6;
    /** Column of N in a case row. */
    public static final int N = 0;
    /** Column of Vx in a case row. */
    public static final int VX = 1;
    /** Column of Vy in a case row. */
    public static final int VY = 2;
    /** Column of Mx in a case row. */
    public static final int MX = 3;
    /** Column of My in a case row. */
    public static final int MY = 4;
    /** Column of T in a case row. */
    public static final int T = 5;
    /**
     * Cases per chunk, the granularity at which the governing case is recorded before the final pass: a power of
     * two near √(2·cases), 16 to 256, which balances the per-chunk merge (cost ∝ cases / chunk) against the final
     * pass (∝ chunk); 128 for 10 000 cases.
     *
     * @param cases number of cases, ≥ 1
     * @return the chunk size used for that many cases
     */
    public static int chunkSize(int cases) {
        return Math.max(16, Math.min(256, Integer.highestOneBit((int) Math.sqrt(2.0 * cases))));
    }
    /** Cases evaluated first in each tile to seed the skipping thresholds (only with {@link Options#skip()}). */
    public static final int SEEDS = 8;
    /** Relative margin added to the skipping bounds. */
    static final double MARGIN = 1e-12;

    private final int size;
    private final double[] a1;
    private final double[] a2;
    private final double[] a3;
    private final double[] b1;
    private final double[] b2;
    private final double[] b3;
    private final double[] c1;
    private final double[] c2;
    private final double[] c3;
    /** Largest |coefficient| of each of the nine arrays (for the vector path's overflow guard). */
    private final double[] maxAbs = new double[9];

    /**
     * Which implementation computes an envelope. Both give the same values and governing cases bit for bit (see
     * the class comment); they differ in speed and in how many point-cases they skip.
     */
    public enum Implementation {
        /** {@link #VECTOR} when {@link EnvelopeKernel#vectorAvailable()}, otherwise {@link #SCALAR}. */
        AUTOMATIC,
        /** The plain Java kernel described in the class comment, auto-vectorised by C2; runs on every JVM. */
        SCALAR,
        /**
         * The JDK's incubating Vector API ({@code jdk.incubator.vector}), register-blocked: one vector of points
         * keeps its coefficients and running extremes in registers while the cases stream past. Needs the module
         * in the boot layer ({@code --add-modules jdk.incubator.vector}) and the C2 compiler.
         */
        VECTOR
    }

    /**
     * Tuning of one run.
     *
     * @param tile           points per tile, 16 to 65 536 (512–2048 keeps a tile's coefficients in L1/L2); the
     *                       vector path hands whole tiles to its threads too
     * @param threads        worker threads, 1 to 256 (1 = the calling thread only)
     * @param tauMax         also compute the largest τmax per point
     * @param skip           skip cases that cannot govern a tile (never changes the result)
     * @param implementation which implementation runs (never changes the result), not null
     */
    public record Options(int tile, int threads, boolean tauMax, boolean skip, Implementation implementation) {

        /** The default tile: 512 points, i.e. 36 KiB of coefficients. */
        public static final int DEFAULT_TILE = 512;

        /**
         * @throws IllegalArgumentException naming the field when tile or threads is out of range or implementation
         *                                  is null
         */
        public Options {
            if (tile < 16 || tile > 65_536) {
                throw new IllegalArgumentException("tile must be 16..65536 points, got " + tile);
            }
            if (threads < 1 || threads > 256) {
                throw new IllegalArgumentException("threads must be 1..256, got " + threads);
            }
            if (implementation == null) {
                throw new IllegalArgumentException("implementation must not be null");
            }
        }

        /** Options with {@link Implementation#AUTOMATIC}. */
        public Options(int tile, int threads, boolean tauMax, boolean skip) {
            this(tile, threads, tauMax, skip, Implementation.AUTOMATIC);
        }

        /** @return tile 512, one thread, no τmax, skipping on, automatic implementation */
        public static Options defaults() {
            return new Options(DEFAULT_TILE, 1, false, true, Implementation.AUTOMATIC);
        }

        /** @return these options with {@code threads} threads */
        public Options withThreads(int threads) {
            return new Options(tile, threads, tauMax, skip, implementation);
        }

        /** @return these options with tiles of {@code tile} points */
        public Options withTile(int tile) {
            return new Options(tile, threads, tauMax, skip, implementation);
        }

        /** @return these options with τmax on or off */
        public Options withTauMax(boolean tauMax) {
            return new Options(tile, threads, tauMax, skip, implementation);
        }

        /** @return these options with skipping on or off */
        public Options withSkip(boolean skip) {
            return new Options(tile, threads, tauMax, skip, implementation);
        }

        /** @return these options with the given implementation */
        public Options withImplementation(Implementation implementation) {
            return new Options(tile, threads, tauMax, skip, implementation);
        }
    }

    /**
     * A kernel over nine coefficient arrays of equal length. The arrays are <em>not copied</em>: the kernel only
     * reads them, and the caller must not change them while a run is in progress.
     *
     * @param a1 σz per unit N
     * @param a2 σz per unit Mx
     * @param a3 σz per unit My
     * @param b1 τzx per unit T
     * @param b2 τzx per unit Vx
     * @param b3 τzx per unit Vy
     * @param c1 τzy per unit T
     * @param c2 τzy per unit Vx
     * @param c3 τzy per unit Vy
     * @throws IllegalArgumentException when an array is null, the lengths differ or a value is not finite
     */
    public EnvelopeKernel(double[] a1, double[] a2, double[] a3, double[] b1, double[] b2, double[] b3, double[] c1,
            double[] c2, double[] c3) {
        double[][] all = {a1, a2, a3, b1, b2, b3, c1, c2, c3};
        String[] names = {"a1", "a2", "a3", "b1", "b2", "b3", "c1", "c2", "c3"};
        if (a1 == null) {
            throw new IllegalArgumentException("a1 must not be null");
        }
        for (int k = 0; k < all.length; k++) {
            if (all[k] == null) {
                throw new IllegalArgumentException(names[k] + " must not be null");
            }
            if (all[k].length != a1.length) {
                throw new IllegalArgumentException(names[k] + ": length " + all[k].length + " differs from a1's "
                        + a1.length);
            }
            double m = 0;
            for (int i = 0; i < all[k].length; i++) {
                if (!Double.isFinite(all[k][i])) {
                    throw new IllegalArgumentException(names[k] + "[" + i + "] must be finite, got " + all[k][i]);
                }
                m = Math.max(m, Math.abs(all[k][i]));
            }
            maxAbs[k] = m;
        }
        this.size = a1.length;
        this.a1 = a1;
        this.a2 = a2;
        this.a3 = a3;
        this.b1 = b1;
        this.b2 = b2;
        this.b3 = b3;
        this.c1 = c1;
        this.c2 = c2;
        this.c3 = c3;
    }

    /** @return number of points */
    public int size() {
        return size;
    }

    /** @return the nine coefficient arrays a1..a3, b1..b3, c1..c3 themselves (not copies; read only) */
    double[][] coefficients() {
        return new double[][] {a1, a2, a3, b1, b2, b3, c1, c2, c3};
    }

    /**
     * The case table of {@code cases}, rows in list order.
     *
     * @throws IllegalArgumentException when the list or an element is null
     */
    public static double[] caseTable(List<InternalForces> cases) {
        if (cases == null) {
            throw new IllegalArgumentException("cases must not be null");
        }
        double[] t = new double[COMPONENTS * cases.size()];
        for (int k = 0; k < cases.size(); k++) {
            InternalForces f = cases.get(k);
            if (f == null) {
                throw new IllegalArgumentException("cases[" + k + "] must not be null");
            }
            int o = COMPONENTS * k;
            t[o + N] = f.n();
            t[o + VX] = f.vx();
            t[o + VY] = f.vy();
            t[o + MX] = f.mx();
            t[o + MY] = f.my();
            t[o + T] = f.t();
        }
        return t;
    }

    /**
     * @return σz at point p under case row {@code c} of {@code cases}, stress unit, exactly as the kernel computes
     *         it: fma(a3, My, fma(a2, Mx, a1·N))
     */
    public double sigmaZ(int p, double[] cases, int c) {
        int o = COMPONENTS * c;
        return Math.fma(a3[p], cases[o + MY], Math.fma(a2[p], cases[o + MX], a1[p] * cases[o + N]));
    }

    /** @return τzx at point p under case row {@code c}, stress unit, as the kernel computes it: fma(b3, Vy, fma(b2, Vx, b1·T)) */
    public double tauZX(int p, double[] cases, int c) {
        int o = COMPONENTS * c;
        return Math.fma(b3[p], cases[o + VY], Math.fma(b2[p], cases[o + VX], b1[p] * cases[o + T]));
    }

    /** @return τzy at point p under case row {@code c}, stress unit, as the kernel computes it: fma(c3, Vy, fma(c2, Vx, c1·T)) */
    public double tauZY(int p, double[] cases, int c) {
        int o = COMPONENTS * c;
        return Math.fma(c3[p], cases[o + VY], Math.fma(c2[p], cases[o + VX], c1[p] * cases[o + T]));
    }

    /**
     * @return σz² + 3(τzx² + τzy²) at point p under case row {@code c}, stress unit squared, as the kernel computes
     *         it: fma(3, fma(τzx, τzx, τzy·τzy), σz·σz)
     */
    public double vonMisesSquare(int p, double[] cases, int c) {
        double s = sigmaZ(p, cases, c), x = tauZX(p, cases, c), y = tauZY(p, cases, c);
        return Math.fma(3.0, Math.fma(x, x, y * y), s * s);
    }

    /**
     * @return σz²/4 + τzx² + τzy² at point p under case row {@code c}, stress unit squared, as the kernel computes
     *         it: fma(0.25, σz·σz, fma(τzx, τzx, τzy·τzy))
     */
    public double tauMaxSquare(int p, double[] cases, int c) {
        double s = sigmaZ(p, cases, c), x = tauZX(p, cases, c), y = tauZY(p, cases, c);
        return Math.fma(0.25, s * s, Math.fma(x, x, y * y));
    }

    /** @return the envelope with {@link Options#defaults()} */
    public Result envelope(double[] cases) {
        return envelope(cases, Options.defaults());
    }

    /**
     * The envelope of every case of {@code cases} at every point.
     *
     * @param cases   the case table, {@code 6·n} finite values, n ≥ 1 (see the class comment)
     * @param options tile, threads, τmax, skipping
     * @return the envelope
     * @throws IllegalArgumentException when the table is null, empty, not a multiple of 6 long or holds a
     *                                  non-finite value, or options is null
     * @throws ArithmeticException      when a von Mises square overflows (stresses beyond about 1e153)
     */
    public Result envelope(double[] cases, Options options) {
        if (options == null) {
            throw new IllegalArgumentException("options must not be null");
        }
        if (cases == null || cases.length == 0 || cases.length % COMPONENTS != 0) {
            throw new IllegalArgumentException("cases: the table must hold 6 values per case and at least one case, got "
                    + (cases == null ? null : cases.length + " values"));
        }
        for (int i = 0; i < cases.length; i++) {
            if (!Double.isFinite(cases[i])) {
                throw new IllegalArgumentException("cases[" + i / COMPONENTS + "]." + KEYS[i % COMPONENTS]
                        + " must be finite, got " + cases[i]);
            }
        }
        boolean vector = switch (options.implementation()) {
            case SCALAR -> false;
            case AUTOMATIC -> vectorAvailable();
            case VECTOR -> {
                if (!vectorAvailable()) {
                    throw new IllegalStateException("implementation VECTOR: not available in this JVM: "
                            + VectorSupport.STATUS);
                }
                yield true;
            }
        };
        // the vector path does not check each value for overflow: it runs only when none can overflow
        vector = vector && cannotOverflow(cases);
        Result r = new Result(size, cases.length / COMPONENTS, options.tauMax(),
                vector ? Implementation.VECTOR : Implementation.SCALAR);
        int tiles = (size + options.tile() - 1) / options.tile();
        int threads = Math.min(options.threads(), Math.max(1, tiles));
        AtomicInteger next = new AtomicInteger();
        TileWorker[] w = new TileWorker[threads];
        for (int k = 0; k < threads; k++) {
            w[k] = vector ? VectorSupport.PATH.worker(this, cases, options, r, next, tiles)
                    : new Worker(cases, options, r, next, tiles);
        }
        TileWorker.runAll(w, "tensio-envelope-");
        return r;
    }

    /**
     * @return true when the {@link Implementation#VECTOR} path can run in this JVM: the module
     *         {@code jdk.incubator.vector} is in the boot layer, the engine's vector class links against it and
     *         reproduces the scalar kernel on a small self-test, and the JIT is not limited to the client
     *         compiler (which does not compile the Vector API to vector instructions)
     */
    public static boolean vectorAvailable() {
        return VectorSupport.PATH != null;
    }

    /** @return why the vector path is or is not available, one line (for logs and benchmark output) */
    public static String vectorStatus() {
        return VectorSupport.STATUS;
    }

    /**
     * True when no σz, τzx, τzy or square the kernel forms can overflow: the sums of largest |coefficient| ×
     * largest |force| bound every term (with a factor 2 for rounding), and their squares stay finite.
     */
    private boolean cannotOverflow(double[] f) {
        double[] fm = new double[COMPONENTS];
        for (int i = 0; i < f.length; i++) {
            fm[i % COMPONENTS] = Math.max(fm[i % COMPONENTS], Math.abs(f[i]));
        }
        double s = 2 * (maxAbs[0] * fm[N] + maxAbs[1] * fm[MX] + maxAbs[2] * fm[MY]);
        double x = 2 * (maxAbs[3] * fm[T] + maxAbs[4] * fm[VX] + maxAbs[5] * fm[VY]);
        double y = 2 * (maxAbs[6] * fm[T] + maxAbs[7] * fm[VX] + maxAbs[8] * fm[VY]);
        return Double.isFinite(4 * (s * s + 3 * (x * x + y * y)));
    }

    private static final String[] KEYS = {"N", "Vx", "Vy", "Mx", "My", "T"};

    /**
     * The envelope at every point. Values in the stress unit; case indices are rows of the case table.
     */
    public static final class Result {
        private final int size;
        private final int cases;
        private final Implementation implementation;
        // written by the workers of one run, each point by exactly one of them
        final double[] sMax;
        final double[] sMin;
        final double[] vm;
        final double[] tm;
        final int[] sMaxCase;
        final int[] sMinCase;
        final int[] vmCase;
        final int[] tmCase;
        private long evaluated;
        private long skipped;

        Result(int size, int cases, boolean tauMax, Implementation implementation) {
            this.size = size;
            this.cases = cases;
            this.implementation = implementation;
            this.sMax = new double[size];
            this.sMin = new double[size];
            this.vm = new double[size];
            this.sMaxCase = new int[size];
            this.sMinCase = new int[size];
            this.vmCase = new int[size];
            this.tm = tauMax ? new double[size] : null;
            this.tmCase = tauMax ? new int[size] : null;
        }

        /** @return the implementation that computed this result, {@link Implementation#SCALAR} or {@code VECTOR} */
        public Implementation implementation() {
            return implementation;
        }

        synchronized void count(long evaluatedPointCases, long skippedPointCases) {
            evaluated += evaluatedPointCases;
            skipped += skippedPointCases;
        }

        /** @return number of points */
        public int size() {
            return size;
        }

        /** @return number of cases */
        public int cases() {
            return cases;
        }

        /** @return the largest σz at point p */
        public double sigmaZMax(int p) {
            return sMax[p];
        }

        /** @return the first case giving {@link #sigmaZMax(int)} */
        public int sigmaZMaxCase(int p) {
            return sMaxCase[p];
        }

        /** @return the smallest σz at point p */
        public double sigmaZMin(int p) {
            return sMin[p];
        }

        /** @return the first case giving {@link #sigmaZMin(int)} */
        public int sigmaZMinCase(int p) {
            return sMinCase[p];
        }

        /** @return the largest von Mises stress at point p, √ of the largest σz² + 3(τzx² + τzy²) */
        public double vonMises(int p) {
            return vm[p];
        }

        /** @return the first case giving {@link #vonMises(int)} */
        public int vonMisesCase(int p) {
            return vmCase[p];
        }

        /** @return true when τmax was computed ({@link Options#tauMax()}) */
        public boolean hasTauMax() {
            return tm != null;
        }

        /**
         * @return the largest τmax = √(σz²/4 + τzx² + τzy²) at point p
         * @throws IllegalStateException when τmax was not computed
         */
        public double tauMax(int p) {
            if (tm == null) {
                throw new IllegalStateException("tauMax: not computed (Options.tauMax was false)");
            }
            return tm[p];
        }

        /**
         * @return the first case giving {@link #tauMax(int)}
         * @throws IllegalStateException when τmax was not computed
         */
        public int tauMaxCase(int p) {
            if (tmCase == null) {
                throw new IllegalStateException("tauMaxCase: not computed (Options.tauMax was false)");
            }
            return tmCase[p];
        }

        /**
         * @return point-cases evaluated in the main passes (excluding the seeds and the final pass); the vector
         *         path skips fewer than the scalar one (its thresholds come from the seeds only)
         */
        public synchronized long evaluatedPointCases() {
            return evaluated;
        }

        /** @return point-cases skipped by the bounds; evaluated + skipped = points × cases */
        public synchronized long skippedPointCases() {
            return skipped;
        }

        @Override
        public String toString() {
            return String.format(Locale.ROOT, "EnvelopeKernel.Result[points=%d, cases=%d, tauMax=%b, skipped=%d, %s]",
                    size, cases, tm != null, skippedPointCases(), implementation);
        }
    }

    /** One thread's scratch and loop: takes tiles from a shared counter until none is left. */
    private final class Worker extends TileWorker {
        final double[] f;
        final int nc;
        final boolean tau;
        final boolean skip;
        /** The tile's nine coefficient slices (a1..a3, b1..b3, c1..c3), copied once per tile. */
        final double[][] t;
        /** σz² and τzx² + τzy² of the current case, tile-local index. */
        final double[] sq;
        final double[] tt;
        // chunk accumulators, tile-local index
        final double[] cMax;
        final double[] cMin;
        final double[] cVm;
        final double[] cTm;
        // chunk of the running extreme, tile-local index (then resolved to a case)
        final int[] kMax;
        final int[] kMin;
        final int[] kVm;
        final int[] kTm;
        // per-case bounds in the current tile (only with skip)
        final double[] bSU;
        final double[] bSL;
        final double[] bVm;
        final double[] bTm;
        /** Cases per chunk ({@link EnvelopeKernel#chunkSize(int)}). */
        final int chunk;
        final int[] order;

        Worker(double[] f, Options o, Result r, AtomicInteger next, int tiles) {
            super(r, next, tiles, o.tile(), EnvelopeKernel.this.size);
            this.f = f;
            this.nc = f.length / COMPONENTS;
            this.tau = o.tauMax();
            this.skip = o.skip();
            int len = Math.min(tile, Math.max(size, 1));
            t = new double[9][len];
            sq = new double[len];
            tt = new double[len];
            cMax = new double[len];
            cMin = new double[len];
            cVm = new double[len];
            cTm = tau ? new double[len] : null;
            kMax = new int[len];
            kMin = new int[len];
            kVm = new int[len];
            kTm = tau ? new int[len] : null;
            bSU = skip ? new double[nc] : null;
            bSL = skip ? new double[nc] : null;
            bVm = skip ? new double[nc] : null;
            bTm = skip && tau ? new double[nc] : null;
            chunk = chunkSize(nc);
            order = new int[chunk];
        }

        /**
         * Skipping thresholds of the tile: lower bounds of the envelope's maxima (upper bound of its σz minimum)
         * valid at every point of the tile, the better of the seeds' and the running extremes'.
         */
        double thMax;
        double thMin;
        double thVm;
        double thTm;
        /** The seeds' thresholds. */
        double seedMax;
        double seedMin;
        double seedVm;
        double seedTm;

        @Override
        void tile(int p0, int p1) {
            int len = p1 - p0;
            double[][] all = {a1, a2, a3, b1, b2, b3, c1, c2, c3};
            for (int k = 0; k < 9; k++) {
                System.arraycopy(all[k], p0, t[k], 0, len);
            }
            double[] sMax = r.sMax, sMin = r.sMin, vm = r.vm, tm = r.tm;
            Arrays.fill(sMax, p0, p1, Double.NEGATIVE_INFINITY);
            Arrays.fill(sMin, p0, p1, Double.POSITIVE_INFINITY);
            Arrays.fill(vm, p0, p1, Double.NEGATIVE_INFINITY);
            if (tau) {
                Arrays.fill(tm, p0, p1, Double.NEGATIVE_INFINITY);
            }
            Arrays.fill(kMax, 0, len, -1);
            Arrays.fill(kMin, 0, len, -1);
            Arrays.fill(kVm, 0, len, -1);
            if (tau) {
                Arrays.fill(kTm, 0, len, -1);
            }
            seedMax = Double.NEGATIVE_INFINITY;
            seedMin = Double.POSITIVE_INFINITY;
            seedVm = Double.NEGATIVE_INFINITY;
            seedTm = Double.NEGATIVE_INFINITY;
            thMax = seedMax;
            thMin = seedMin;
            thVm = seedVm;
            thTm = seedTm;
            if (skip) {
                bounds(p0, p1, f, tau, bSU, bSL, bVm, bTm);
                seed(p0, len);
            }
            for (int k0 = 0, ck = 0; k0 < nc; k0 += chunk, ck++) {
                int k1 = Math.min(nc, k0 + chunk);
                int m = 0;
                for (int c = k0; c < k1; c++) {
                    if (skip && bSU[c] < thMax && bSL[c] > thMin && bVm[c] < thVm && (!tau || bTm[c] < thTm)) {
                        continue;
                    }
                    order[m++] = c;
                }
                evaluated += (long) m * len;
                skipped += (long) (k1 - k0 - m) * len;
                if (m == 0) {
                    continue;
                }
                Arrays.fill(cMax, 0, len, Double.NEGATIVE_INFINITY);
                Arrays.fill(cMin, 0, len, Double.POSITIVE_INFINITY);
                Arrays.fill(cVm, 0, len, Double.NEGATIVE_INFINITY);
                if (tau) {
                    Arrays.fill(cTm, 0, len, Double.NEGATIVE_INFINITY);
                }
                accumulate(len, m);
                merge(p0, len, ck);
            }
            resolve(p0, len);
        }

        /** Runs the m cases in {@link #order} over the tile (its coefficients in {@link #t}) into the chunk accumulators. */
        void accumulate(int len, int m) {
            for (int j = 0; j < m; j++) {
                int o = COMPONENTS * order[j];
                sigmaPass(len, f[o + N], f[o + MX], f[o + MY]);
                tauPass(len, f[o + T], f[o + VX], f[o + VY]);
                if (tau) {
                    vonMisesTauPass(len);
                } else {
                    vonMisesPass(len);
                }
            }
        }

        /*
         * The hot loops. Each is short enough for C2 to unroll and vectorise it under the default flags (one loop
         * with all 24 operations is not: its body exceeds the unrolling limit and it runs scalar); all arrays are
         * tile-local and indexed alike, so no aliasing or alignment question stops the vectoriser. The
         * expressions are those of sigmaZ, tauZX, tauZY, vonMisesSquare and tauMaxSquare, bit for bit.
         */

        /** σz of one case: running max and min, and σz² into {@link #sq}. */
        void sigmaPass(int len, double n, double mx, double my) {
            final double[] a1 = t[0], a2 = t[1], a3 = t[2], cMax = this.cMax, cMin = this.cMin, sq = this.sq;
            for (int j = 0; j < len; j++) {
                double s = Math.fma(a3[j], my, Math.fma(a2[j], mx, a1[j] * n));
                cMax[j] = Math.max(cMax[j], s);
                cMin[j] = Math.min(cMin[j], s);
                sq[j] = s * s;
            }
        }

        /** τzx² + τzy² of one case into {@link #tt}. */
        void tauPass(int len, double tq, double vx, double vy) {
            final double[] b1 = t[3], b2 = t[4], b3 = t[5], c1 = t[6], c2 = t[7], c3 = t[8], tt = this.tt;
            for (int j = 0; j < len; j++) {
                double tx = Math.fma(b3[j], vy, Math.fma(b2[j], vx, b1[j] * tq));
                double ty = Math.fma(c3[j], vy, Math.fma(c2[j], vx, c1[j] * tq));
                tt[j] = Math.fma(tx, tx, ty * ty);
            }
        }

        /** Running max of σz² + 3(τzx² + τzy²). */
        void vonMisesPass(int len) {
            final double[] sq = this.sq, tt = this.tt, cVm = this.cVm;
            for (int j = 0; j < len; j++) {
                cVm[j] = Math.max(cVm[j], Math.fma(3.0, tt[j], sq[j]));
            }
        }

        /** Running max of σz² + 3(τzx² + τzy²) and of σz²/4 + τzx² + τzy². */
        void vonMisesTauPass(int len) {
            final double[] sq = this.sq, tt = this.tt, cVm = this.cVm, cTm = this.cTm;
            for (int j = 0; j < len; j++) {
                cVm[j] = Math.max(cVm[j], Math.fma(3.0, tt[j], sq[j]));
                cTm[j] = Math.max(cTm[j], Math.fma(0.25, sq[j], tt[j]));
            }
        }

        /**
         * Folds the chunk accumulators into the running extremes, recording chunk {@code ck} where one improves
         * (strictly: an equal value keeps the earlier chunk), and with skipping updates the tile thresholds.
         */
        void merge(int p0, int len, int ck) {
            double[] sMax = r.sMax, sMin = r.sMin, vm = r.vm, tm = r.tm;
            for (int j = 0; j < len; j++) {
                int i = p0 + j;
                double v = cVm[j];
                if (!(v < Double.POSITIVE_INFINITY)) {
                    throw new ArithmeticException("von Mises square at point " + i + " overflows or is NaN (" + v
                            + "): stresses beyond about 1e153 are not supported");
                }
                if (cMax[j] > sMax[i]) {
                    sMax[i] = cMax[j];
                    kMax[j] = ck;
                }
                if (cMin[j] < sMin[i]) {
                    sMin[i] = cMin[j];
                    kMin[j] = ck;
                }
                if (v > vm[i]) {
                    vm[i] = v;
                    kVm[j] = ck;
                }
                if (tau && cTm[j] > tm[i]) {
                    tm[i] = cTm[j];
                    kTm[j] = ck;
                }
            }
            if (!skip) {
                return;
            }
            double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY, lv = Double.POSITIVE_INFINITY;
            double lt = Double.POSITIVE_INFINITY;
            for (int i = p0; i < p0 + len; i++) {
                lo = Math.min(lo, sMax[i]);
                hi = Math.max(hi, sMin[i]);
                lv = Math.min(lv, vm[i]);
            }
            if (tau) {
                for (int i = p0; i < p0 + len; i++) {
                    lt = Math.min(lt, tm[i]);
                }
            }
            thMax = Math.max(seedMax, lo);
            thMin = Math.min(seedMin, hi);
            thVm = Math.max(seedVm, lv);
            thTm = Math.max(seedTm, lt);
        }

        /** Replaces each recorded chunk by the first case in it giving the extreme; takes the square roots. */
        void resolve(int p0, int len) {
            double[] sMax = r.sMax, sMin = r.sMin, vm = r.vm, tm = r.tm;
            for (int j = 0; j < len; j++) {
                int i = p0 + j;
                r.sMaxCase[i] = first(i, kMax[j], sMax[i], 0);
                r.sMinCase[i] = first(i, kMin[j], sMin[i], 1);
                r.vmCase[i] = first(i, kVm[j], vm[i], 2);
                vm[i] = Math.sqrt(vm[i]);
                if (tau) {
                    r.tmCase[i] = first(i, kTm[j], tm[i], 3);
                    tm[i] = Math.sqrt(tm[i]);
                }
            }
        }

        int first(int i, int ck, double value, int q) {
            return firstCase(f, chunk, i, ck, value, q);
        }

        /**
         * Seeds the thresholds with the {@link #SEEDS} cases of largest von Mises bound: each evaluated case's
         * values are lower bounds of the envelope, so any case below them everywhere cannot govern.
         */
        void seed(int p0, int len) {
            int[] best = seeds(bVm, nc);
            int m = best.length;
            Arrays.fill(cMax, 0, len, Double.NEGATIVE_INFINITY);
            Arrays.fill(cMin, 0, len, Double.POSITIVE_INFINITY);
            Arrays.fill(cVm, 0, len, Double.NEGATIVE_INFINITY);
            if (tau) {
                Arrays.fill(cTm, 0, len, Double.NEGATIVE_INFINITY);
            }
            System.arraycopy(best, 0, order, 0, m);
            accumulate(len, m);
            double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY, lv = Double.POSITIVE_INFINITY;
            double lt = Double.POSITIVE_INFINITY;
            for (int j = 0; j < len; j++) {
                lo = Math.min(lo, cMax[j]);
                hi = Math.max(hi, cMin[j]);
                lv = Math.min(lv, cVm[j]);
                if (tau) {
                    lt = Math.min(lt, cTm[j]);
                }
            }
            seedMax = lo;
            seedMin = hi;
            seedVm = lv;
            seedTm = lt;
            thMax = lo;
            thMin = hi;
            thVm = lv;
            thTm = lt;
        }
    }

    /**
     * The first case of chunk {@code ck} (chunks of {@code chunk} cases of table {@code f}) whose quantity q (0, 1
     * σz; 2 von Mises square; 3 τmax square) at point i, as the passes compute it, equals value.
     *
     * @throws IllegalStateException when none does (a defect)
     */
    int firstCase(double[] f, int chunk, int i, int ck, double value, int q) {
        int nc = f.length / COMPONENTS;
        int k1 = Math.min(nc, (ck + 1) * chunk);
        for (int c = ck * chunk; c < k1; c++) {
            double v = switch (q) {
                case 0, 1 -> sigmaZ(i, f, c);
                case 2 -> vonMisesSquare(i, f, c);
                default -> tauMaxSquare(i, f, c);
            };
            if (v == value) {
                return c;
            }
        }
        throw new IllegalStateException("envelope: no case of chunk " + ck + " reproduces the extreme " + value
                + " at point " + i + " (defect)");
    }

    /**
     * Per-case bounds over points p0..p1 from the coefficient extrema: bSU, bSL bound σz from above and below,
     * bVm the von Mises square and bTm (when tau) the τmax square, each with the margin {@link #MARGIN}.
     */
    void bounds(int p0, int p1, double[] f, boolean tau, double[] bSU, double[] bSL, double[] bVm, double[] bTm) {
        int nc = f.length / COMPONENTS;
        double[] lo = new double[9], hi = new double[9];
        double[][] all = {a1, a2, a3, b1, b2, b3, c1, c2, c3};
        for (int k = 0; k < 9; k++) {
            double l = Double.POSITIVE_INFINITY, h = Double.NEGATIVE_INFINITY;
            double[] a = all[k];
            for (int i = p0; i < p1; i++) {
                l = Math.min(l, a[i]);
                h = Math.max(h, a[i]);
            }
            lo[k] = l;
            hi[k] = h;
        }
        for (int c = 0; c < nc; c++) {
            int o = COMPONENTS * c;
            double fn = f[o + N], fmx = f[o + MX], fmy = f[o + MY], ft = f[o + T], fvx = f[o + VX], fvy = f[o + VY];
            double su = up(lo[0], hi[0], fn) + up(lo[1], hi[1], fmx) + up(lo[2], hi[2], fmy);
            double sl = dn(lo[0], hi[0], fn) + dn(lo[1], hi[1], fmx) + dn(lo[2], hi[2], fmy);
            double es = MARGIN * (mag(lo[0], hi[0], fn) + mag(lo[1], hi[1], fmx) + mag(lo[2], hi[2], fmy));
            double xu = up(lo[3], hi[3], ft) + up(lo[4], hi[4], fvx) + up(lo[5], hi[5], fvy);
            double xl = dn(lo[3], hi[3], ft) + dn(lo[4], hi[4], fvx) + dn(lo[5], hi[5], fvy);
            double ex = MARGIN * (mag(lo[3], hi[3], ft) + mag(lo[4], hi[4], fvx) + mag(lo[5], hi[5], fvy));
            double yu = up(lo[6], hi[6], ft) + up(lo[7], hi[7], fvx) + up(lo[8], hi[8], fvy);
            double yl = dn(lo[6], hi[6], ft) + dn(lo[7], hi[7], fvx) + dn(lo[8], hi[8], fvy);
            double ey = MARGIN * (mag(lo[6], hi[6], ft) + mag(lo[7], hi[7], fvx) + mag(lo[8], hi[8], fvy));
            bSU[c] = su + es;
            bSL[c] = sl - es;
            double s = Math.max(Math.abs(su), Math.abs(sl)) + es;
            double x = Math.max(Math.abs(xu), Math.abs(xl)) + ex;
            double y = Math.max(Math.abs(yu), Math.abs(yl)) + ey;
            double ss = s * s, tt = x * x + y * y;
            bVm[c] = (ss + 3 * tt) * (1 + MARGIN);
            if (tau) {
                bTm[c] = (0.25 * ss + tt) * (1 + MARGIN);
            }
        }
    }

    /** @return the min({@link #SEEDS}, nc) cases of largest bound {@code bVm}, largest first */
    static int[] seeds(double[] bVm, int nc) {
        int m = Math.min(SEEDS, nc);
        // insertion into a short sorted list (largest first)
        int[] best = new int[m];
        int have = 0;
        for (int c = 0; c < nc; c++) {
            double b = bVm[c];
            if (have == m && b <= bVm[best[m - 1]]) {
                continue;
            }
            int k = have < m ? have++ : m - 1;
            while (k > 0 && bVm[best[k - 1]] < b) {
                best[k] = best[k - 1];
                k--;
            }
            best[k] = c;
        }
        return best;
    }

    private static double up(double lo, double hi, double f) {
        return Math.max(lo * f, hi * f);
    }

    private static double dn(double lo, double hi, double f) {
        return Math.min(lo * f, hi * f);
    }

    private static double mag(double lo, double hi, double f) {
        return Math.max(Math.abs(lo), Math.abs(hi)) * Math.abs(f);
    }

    @Override
    public String toString() {
        return "EnvelopeKernel[points=" + size + "]";
    }
}
