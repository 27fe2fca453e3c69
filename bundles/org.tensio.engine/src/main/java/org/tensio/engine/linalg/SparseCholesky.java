package org.tensio.engine.linalg;

/**
 * Sparse Cholesky factorisation PAPᵀ = LLᵀ of a symmetric positive definite matrix, with optional pinned
 * unknowns, and solution of A·x = b for any number of right-hand sides. Immutable once built and safe to share
 * between threads ({@link #solve} allocates its own workspace).
 * <p>
 * <b>Method.</b> A fill-reducing {@link Ordering} (nested dissection by default), a symbolic analysis
 * (elimination tree, postorder, column counts, fundamental supernodes with relaxed amalgamation) and a
 * multifrontal numeric factorisation whose fronts are factored by register-blocked dense kernels, in parallel
 * over independent subtrees and over the rows of large fronts (Davis, <i>Direct Methods for Sparse Linear
 * Systems</i>, SIAM 2006, ch. 4 and 9; George &amp; Liu, <i>Computer Solution of Large Sparse Positive Definite
 * Systems</i>, 1981; Liu, The multifrontal method for sparse matrix solution, SIAM Review 34, 1992 — all from
 * memory). On meshes of 2D quadratic triangles nested dissection gives nnz(L) = O(n log n) and O(n<sup>1.5</sup>)
 * operations.
 * <p>
 * <b>Pinned unknowns.</b> The rows and columns of pinned unknowns are removed before factoring, i.e. the
 * homogeneous Dirichlet condition x<sub>p</sub> = 0 is imposed and the equations of the pinned rows are
 * dropped. {@link #solve} returns x<sub>p</sub> = 0 and ignores b<sub>p</sub>. For a Neumann problem singular by
 * a constant (warping function, shear functions: A·1 = 0) pin one unknown; the result is the solution that
 * vanishes there, and the caller shifts it by a constant afterwards (e.g. to zero mean). The right-hand side must
 * then be consistent (Σ b = 0 to rounding), otherwise the inconsistency is absorbed by the dropped equation.
 * <p>
 * <b>Accuracy.</b> Cholesky without pivoting is backward stable for SPD matrices (Higham, <i>Accuracy and
 * Stability of Numerical Algorithms</i>, 2nd ed., 2002, §10.1 — from memory): the computed x solves
 * (A + ΔA)x = b with |ΔA| ≲ c·n·u·|L||Lᵀ|, u = 1.1e-16; the forward error grows with the condition number
 * (for a mesh Laplacian, roughly (size / element size)²). A pivot d<sub>j</sub> ≤ τ·a<sub>jj</sub> (τ =
 * {@link Options#pivotTolerance()}) stops the factorisation with {@link NotPositiveDefiniteException}; no NaN is
 * ever returned silently.
 *
 * @since 0.1
 */
public final class SparseCholesky {

    /**
     * Options of a factorisation.
     *
     * @param pivotTolerance τ in [0, 1): a pivot d<sub>j</sub> ≤ τ·a<sub>jj</sub> is rejected. The default
     *                       {@value #DEFAULT_PIVOT_TOLERANCE} separates the last pivot of a P1 or P2 Laplacian
     *                       singular by a constant (|d/a| ≤ 1e-13 measured up to 410 000 unknowns: rounding) from
     *                       the pivots of the same problems with one node pinned (d/a ≥ 0.02); raise it to be
     *                       stricter, 0 accepts any positive pivot
     * @param parallelism    number of threads, ≥ 1 (1 = the calling thread only)
     * @param monitor        progress and cancellation, not null ({@link ProgressMonitor#NONE})
     * @since 0.1
     */
    public record Options(double pivotTolerance, int parallelism, ProgressMonitor monitor) {

        /** Default pivot tolerance τ, relative to the diagonal entry. */
        public static final double DEFAULT_PIVOT_TOLERANCE = 1e-10;

        /** Validates the options. */
        public Options {
            if (!(pivotTolerance >= 0) || pivotTolerance >= 1) {
                throw new IllegalArgumentException("pivotTolerance = " + pivotTolerance + " must be in [0, 1)");
            }
            if (parallelism < 1) {
                throw new IllegalArgumentException("parallelism = " + parallelism + " must be ≥ 1");
            }
            if (monitor == null) {
                throw new IllegalArgumentException("monitor must not be null (use ProgressMonitor.NONE)");
            }
        }

        /** @return default tolerance, one thread per available processor, no monitor */
        public static Options defaults() {
            return new Options(DEFAULT_PIVOT_TOLERANCE, Runtime.getRuntime().availableProcessors(), ProgressMonitor.NONE);
        }

        /**
         * @param tolerance new pivot tolerance
         * @return a copy with that tolerance
         */
        public Options withPivotTolerance(double tolerance) {
            return new Options(tolerance, parallelism, monitor);
        }

        /**
         * @param threads new parallelism
         * @return a copy with that parallelism
         */
        public Options withParallelism(int threads) {
            return new Options(pivotTolerance, threads, monitor);
        }

        /**
         * @param m new monitor
         * @return a copy with that monitor
         */
        public Options withMonitor(ProgressMonitor m) {
            return new Options(pivotTolerance, parallelism, m);
        }
    }

    private final int n;
    private final int[] pinned;
    private final Ordering ordering;
    private final CholeskySymbolic sym;
    private final double[][] blocks;
    private final double minPivotRatio;

    private SparseCholesky(int n, int[] pinned, Ordering ordering, CholeskySymbolic sym, double[][] blocks,
            double minPivotRatio) {
        this.n = n;
        this.pinned = pinned;
        this.ordering = ordering;
        this.sym = sym;
        this.blocks = blocks;
        this.minPivotRatio = minPivotRatio;
    }

    /**
     * Factors a with graph nested dissection ({@link Ordering#nestedDissection(SymmetricCsr)}), nothing pinned,
     * default options. Prefer {@link #factor(SymmetricCsr, int[], Ordering)} with a coordinate ordering for
     * meshes.
     *
     * @param a symmetric positive definite matrix
     * @return the factorisation
     * @throws NotPositiveDefiniteException when a pivot fails the test
     */
    public static SparseCholesky factor(SymmetricCsr a) {
        if (a == null) {
            throw new IllegalArgumentException("a must not be null");
        }
        return factor(a, new int[0], Ordering.nestedDissection(a), Options.defaults());
    }

    /**
     * Factors a with the given unknowns pinned and default options.
     *
     * @param a        symmetric matrix, positive definite once the pinned rows and columns are removed
     * @param pinned   unknowns with x = 0 (each in [0, n), duplicates ignored), may be empty, not null
     * @param ordering fill-reducing order of all n unknowns (pinned ones are skipped), not null
     * @return the factorisation
     * @throws NotPositiveDefiniteException when a pivot fails the test
     * @throws IllegalArgumentException     on a null argument, a size mismatch or a pinned index out of range
     */
    public static SparseCholesky factor(SymmetricCsr a, int[] pinned, Ordering ordering) {
        return factor(a, pinned, ordering, Options.defaults());
    }

    /**
     * Factors a with the given unknowns pinned.
     *
     * @param a        symmetric matrix, positive definite once the pinned rows and columns are removed
     * @param pinned   unknowns with x = 0, may be empty, not null
     * @param ordering fill-reducing order of all n unknowns, not null
     * @param options  tolerance, parallelism and monitor, not null
     * @return the factorisation
     * @throws NotPositiveDefiniteException                 when a pivot fails the test
     * @throws java.util.concurrent.CancellationException when the monitor cancels
     * @throws IllegalArgumentException                     on a bad argument
     */
    public static SparseCholesky factor(SymmetricCsr a, int[] pinned, Ordering ordering, Options options) {
        if (a == null) {
            throw new IllegalArgumentException("a must not be null");
        }
        if (ordering == null) {
            throw new IllegalArgumentException("ordering must not be null");
        }
        if (options == null) {
            throw new IllegalArgumentException("options must not be null");
        }
        if (ordering.size() != a.n()) {
            throw new IllegalArgumentException("ordering.size() = " + ordering.size() + " but a.n() = " + a.n());
        }
        boolean[] mask = a.pinMask(pinned);
        int np = 0;
        for (boolean b : mask) {
            if (b) {
                np++;
            }
        }
        int[] pins = new int[np];
        for (int i = 0, w = 0; i < mask.length; i++) {
            if (mask[i]) {
                pins[w++] = i;
            }
        }
        if (options.monitor().isCancelled()) {
            throw new java.util.concurrent.CancellationException("Cholesky factorisation cancelled before it started");
        }
        CholeskySymbolic sym = new CholeskySymbolic(a, mask, ordering);
        CholeskyNumeric num = new CholeskyNumeric(sym, a, options.pivotTolerance(), options.monitor(), options.parallelism());
        num.run();
        return new SparseCholesky(a.n(), pins, ordering, sym, num.blocks, num.minPivotRatio());
    }

    /** @return order n of A (pinned unknowns included) */
    public int n() {
        return n;
    }

    /** @return the pinned unknowns, increasing, without duplicates (a copy) */
    public int[] pinned() {
        return pinned.clone();
    }

    /** @return the fill-reducing ordering used (the factor's own order is it composed with a postorder) */
    public Ordering ordering() {
        return ordering;
    }

    /** @return structural non-zeros of L (diagonal included), excluding explicit zeros from amalgamation: the fill */
    public long factorNonZeros() {
        return sym.nnzL;
    }

    /** @return entries actually stored: dense supernode blocks including amalgamation zeros and upper triangles */
    public long storedEntries() {
        return sym.storedEntries;
    }

    /**
     * @return floating-point operations of the factorisation estimated as Σ<sub>j</sub> c<sub>j</sub>², c<sub>j</sub>
     *         = non-zeros of column j of L (a multiply-add counted as two; Davis 2006, §4.6 — from memory)
     */
    public double flops() {
        return sym.flops;
    }

    /** @return number of supernodes after amalgamation */
    public int supernodes() {
        return sym.nsuper;
    }

    /** @return order of the largest frontal matrix */
    public int maxFrontSize() {
        return sym.maxFront;
    }

    /**
     * @return smallest pivot ratio d<sub>j</sub> / a<sub>jj</sub> met (1 for a diagonal matrix, near 0 for a
     *         nearly singular one): a cheap conditioning warning; +∞ when nothing was factored
     */
    public double minimumPivotRatio() {
        return minPivotRatio;
    }

    /**
     * Solves A·x = b (pinned unknowns: x<sub>p</sub> = 0, b<sub>p</sub> ignored).
     *
     * @param b right-hand side, length n, finite, not modified
     * @return a new solution vector
     * @throws IllegalArgumentException on a length mismatch or a non-finite entry of b
     */
    public double[] solve(double[] b) {
        double[] x = new double[n];
        solve(b, x);
        return x;
    }

    /**
     * Solves A·x = b into a given array.
     *
     * @param b right-hand side, length n, finite, not modified
     * @param x solution, length n, overwritten (may be the same array as b)
     */
    public void solve(double[] b, double[] x) {
        check("b", b);
        if (x == null || x.length != n) {
            throw new IllegalArgumentException("x.length = " + (x == null ? "null" : x.length) + " but n = " + n);
        }
        int nf = sym.nf;
        double[] y = new double[nf];
        int[] perm = sym.perm;
        for (int k = 0; k < nf; k++) {
            y[k] = b[perm[k]];
        }
        forward(y);
        backward(y, new double[Math.max(1, sym.maxFront)]);
        java.util.Arrays.fill(x, 0);
        for (int k = 0; k < nf; k++) {
            x[perm[k]] = y[k];
        }
    }

    /**
     * Solves for several right-hand sides with one factorisation.
     *
     * @param bs right-hand sides, each of length n; not modified
     * @return new solutions, one per right-hand side
     */
    public double[][] solve(double[][] bs) {
        if (bs == null) {
            throw new IllegalArgumentException("bs must not be null");
        }
        double[][] xs = new double[bs.length][];
        for (int r = 0; r < bs.length; r++) {
            check("bs[" + r + "]", bs[r]);
        }
        for (int r = 0; r < bs.length; r++) {
            xs[r] = solve(bs[r]);
        }
        return xs;
    }

    private void check(String name, double[] b) {
        if (b == null || b.length != n) {
            throw new IllegalArgumentException(name + ".length = " + (b == null ? "null" : b.length) + " but n = " + n);
        }
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(b[i])) {
                throw new IllegalArgumentException(name + "[" + i + "] = " + b[i] + " must be finite");
            }
        }
    }

    /** L·y = b in place, supernode by supernode. */
    private void forward(double[] y) {
        for (int s = 0; s < sym.nsuper; s++) {
            int f = sym.superStart[s];
            int k = sym.superStart[s + 1] - f;
            int[] rows = sym.superRows[s];
            int m = rows.length;
            double[] l = blocks[s];
            for (int c = 0; c < k; c++) {
                int rc = c * k;
                double t = y[f + c];
                for (int j = 0; j < c; j++) {
                    t -= l[rc + j] * y[f + j];
                }
                y[f + c] = t / l[rc + c];
            }
            for (int r = k; r < m; r++) {
                int rr = r * k;
                double t0 = 0;
                double t1 = 0;
                int j = 0;
                for (; j + 1 < k; j += 2) {
                    t0 += l[rr + j] * y[f + j];
                    t1 += l[rr + j + 1] * y[f + j + 1];
                }
                if (j < k) {
                    t0 += l[rr + j] * y[f + j];
                }
                y[rows[r]] -= t0 + t1;
            }
        }
    }

    /** Lᵀ·x = y in place, supernodes in reverse order. */
    private void backward(double[] y, double[] t) {
        for (int s = sym.nsuper - 1; s >= 0; s--) {
            int f = sym.superStart[s];
            int k = sym.superStart[s + 1] - f;
            int[] rows = sym.superRows[s];
            int m = rows.length;
            double[] l = blocks[s];
            java.util.Arrays.fill(t, 0, k, 0);
            for (int r = k; r < m; r++) {
                int rr = r * k;
                double xr = y[rows[r]];
                for (int j = 0; j < k; j++) {
                    t[j] += l[rr + j] * xr;
                }
            }
            for (int c = k - 1; c >= 0; c--) {
                int rc = c * k;
                double v = (y[f + c] - t[c]) / l[rc + c];
                y[f + c] = v;
                for (int j = 0; j < c; j++) {
                    t[j] += l[rc + j] * v;
                }
            }
        }
    }

    @Override
    public String toString() {
        return "SparseCholesky[n=" + n + ", pinned=" + pinned.length + ", nnz(L)=" + sym.nnzL + ", supernodes="
                + sym.nsuper + ", flops=" + String.format("%.3g", sym.flops) + "]";
    }
}
