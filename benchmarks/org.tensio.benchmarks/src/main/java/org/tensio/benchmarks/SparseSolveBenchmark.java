package org.tensio.benchmarks;

import java.util.concurrent.TimeUnit;

import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.ConjugateGradient;
import org.apache.commons.math3.linear.JacobiPreconditioner;
import org.apache.commons.math3.linear.RealLinearOperator;
import org.apache.commons.math3.linear.RealVector;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.IGrowArray;
import org.ejml.interfaces.linsol.LinearSolverSparse;
import org.ejml.sparse.FillReducing;
import org.ejml.sparse.csc.factory.LinearSolverFactory_DSCC;
import org.ejml.sparse.csc.misc.ColumnCounts_DSCC;
import org.ejml.sparse.csc.misc.TriangularSolver_DSCC;
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
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.tensio.engine.linalg.Ordering;
import org.tensio.engine.linalg.SparseCholesky;
import org.tensio.engine.linalg.SymmetricCsr;

/**
 * One solve of the assembled warping system of {@link WarpingProblem} (same matrix, same right-hand side) by
 * <ul>
 * <li>the engine's sparse Cholesky: ordering ({@link Ordering#automatic}) + numeric factorisation + one solve;</li>
 * <li>EJML 0.46.1 sparse Cholesky ({@code LinearSolverFactory_DSCC.cholesky(FillReducing.NONE)}: EJML has no
 * fill-reducing ordering), symbolic + numeric factorisation + one solve, in the mesh's node order and, for
 * comparison of the kernels, in the engine's nested-dissection order;</li>
 * <li>commons-math3 3.6.1 {@link ConjugateGradient} with its {@link JacobiPreconditioner} over a CSR-backed
 * {@link RealLinearOperator}, stopping at ‖r‖ ≤ 1e-10 ‖b‖.</li>
 * </ul>
 * Each trial's tear-down prints the true relative residual ‖b − A x‖/‖b‖ of the last solution and the memory
 * measure of the method (entries of the factor; CG: iterations).
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgsAppend = {"-Xmx8g"})
public class SparseSolveBenchmark {

    /** Relative residual the iterative solver must reach. */
    static final double CG_TOLERANCE = 1e-10;

    /** The engine's matrix. */
    @State(Scope.Benchmark)
    public static class TensioState {
        /** Approximate number of unknowns (P2 nodes). */
        @Param({"10000", "100000", "400000"})
        public int unknowns;
        WarpingProblem p;
        SymmetricCsr a;
        SparseCholesky lastFactor;
        double[] last;

        /** Meshes and assembles. */
        @Setup(Level.Trial)
        public void setUp() {
            p = WarpingProblem.create(unknowns);
            a = p.tensioMatrix();
        }

        /** Prints residual and factor size. */
        @TearDown(Level.Trial)
        public void report() {
            if (lastFactor == null) {
                return;
            }
            System.out.printf("%n# tensio: n = %d, %s: nnz(L) = %d, stored entries %d (%.0f MB), %.3g flops, "
                    + "%d supernodes, largest front %d; relative residual %.2e%n", p.n, lastFactor.ordering().method(),
                    lastFactor.factorNonZeros(), lastFactor.storedEntries(), 8e-6 * lastFactor.storedEntries(),
                    lastFactor.flops(), lastFactor.supernodes(), lastFactor.maxFrontSize(), p.relativeResidual(last));
        }
    }

    /**
     * The same matrix for EJML, in one of two orders, with a check that its factor fits in memory and time.
     * {@code NATURAL} is the comparison asked for (EJML has no fill-reducing ordering; the mesh's own node order);
     * {@code TENSIO_ND} hands EJML the engine's nested-dissection permutation (computed and applied inside the
     * timed call) so that both factor the same fill: it compares the numeric kernels.
     */
    @State(Scope.Benchmark)
    public static class EjmlState {
        /** Approximate number of unknowns (P2 nodes). */
        @Param({"10000", "100000", "400000"})
        public int unknowns;
        /** Order in which EJML sees the matrix. */
        @Param({"NATURAL", "TENSIO_ND"})
        public String order;
        WarpingProblem p;
        SymmetricCsr tensio;
        DMatrixSparseCSC a;
        DMatrixRMaj b;
        double[] last;

        /**
         * Meshes, assembles and predicts nnz(L) and the flop count Σ c_j² from EJML's own elimination tree and
         * column counts; refuses (fails this trial with the reason) when L would not fit in
         * {@code tensio.bench.ejmlMemoryShare} (default 0.6) of the heap or would need more than
         * {@code tensio.bench.ejmlMaxFlops} (default 1e11) floating-point operations.
         */
        @Setup(Level.Trial)
        public void setUp() {
            p = WarpingProblem.create(unknowns);
            int n = p.n;
            b = new DMatrixRMaj(n, 1);
            System.arraycopy(p.b, 0, b.data, 0, n);
            DMatrixSparseCSC probe;
            if (order.equals("NATURAL")) {
                a = symmetricCsc(p, null);
                probe = a;
            } else {
                tensio = p.tensioMatrix();
                probe = symmetricCsc(p, Ordering.automatic(tensio, p.x, p.y));
            }
            int[] parent = new int[n], post = new int[n], counts = new int[n];
            IGrowArray gw = new IGrowArray();
            TriangularSolver_DSCC.eliminationTree(probe, false, parent, gw);
            TriangularSolver_DSCC.postorder(parent, n, post, gw);
            new ColumnCounts_DSCC(false).process(probe, parent, post, counts);
            long nnzL = 0;
            double flops = 0;
            for (int c : counts) {
                nnzL += c;
                flops += (double) c * c;
            }
            double share = Double.parseDouble(System.getProperty("tensio.bench.ejmlMemoryShare", "0.6"));
            double maxFlops = Double.parseDouble(System.getProperty("tensio.bench.ejmlMaxFlops", "1e11"));
            double bytes = 12.0 * nnzL;
            System.out.printf("%n# ejml: n = %d, %s order: nnz(L) = %d (%.0f MB), %.3g flops%n", n, order, nnzL,
                    bytes / 1e6, flops);
            if (nnzL > Integer.MAX_VALUE - 8 || bytes > share * Runtime.getRuntime().maxMemory()) {
                throw new IllegalStateException(String.format("EJML skipped at n = %d, %s order: the factor needs "
                        + "nnz(L) = %d (%.1f GB), more than %.0f %% of the %.1f GB heap", n, order, nnzL, bytes / 1e9,
                        share * 100, Runtime.getRuntime().maxMemory() / 1e9));
            }
            if (flops > maxFlops) {
                throw new IllegalStateException(String.format("EJML skipped at n = %d, %s order: the factor needs "
                        + "%.3g flops, more than the limit %.3g (-Dtensio.bench.ejmlMaxFlops)", n, order, flops,
                        maxFlops));
            }
        }

        /** Prints the residual. */
        @TearDown(Level.Trial)
        public void report() {
            if (last != null) {
                System.out.printf("%n# ejml (%s): relative residual %.2e%n", order, p.relativeResidual(last));
            }
        }
    }

    /**
     * @param ordering null for the matrix as assembled, else the symmetric permutation P A Pᵀ
     * @return both triangles in column-compressed form, rows sorted (symmetric: the CSR rows are the columns)
     */
    static DMatrixSparseCSC symmetricCsc(WarpingProblem p, Ordering ordering) {
        int n = p.n, nnz = (int) p.nonZeros();
        DMatrixSparseCSC m = new DMatrixSparseCSC(n, n, nnz);
        if (ordering == null) {
            System.arraycopy(p.rowPtr, 0, m.col_idx, 0, n + 1);
            System.arraycopy(p.cols, 0, m.nz_rows, 0, nnz);
            System.arraycopy(p.vals, 0, m.nz_values, 0, nnz);
        } else {
            int w = 0;
            for (int k = 0; k < n; k++) {
                int old = ordering.newToOld(k);
                int from = w;
                for (int q = p.rowPtr[old]; q < p.rowPtr[old + 1]; q++) {
                    int r = ordering.oldToNew(p.cols[q]);
                    double v = p.vals[q];
                    int t = w++;
                    while (t > from && m.nz_rows[t - 1] > r) {
                        m.nz_rows[t] = m.nz_rows[t - 1];
                        m.nz_values[t] = m.nz_values[t - 1];
                        t--;
                    }
                    m.nz_rows[t] = r;
                    m.nz_values[t] = v;
                }
                m.col_idx[k + 1] = w;
            }
        }
        m.nz_length = nnz;
        m.indicesSorted = true;
        return m;
    }

    /** The same matrix as a commons-math operator. */
    @State(Scope.Benchmark)
    public static class CgState {
        /** Approximate number of unknowns (P2 nodes). */
        @Param({"10000", "100000", "400000"})
        public int unknowns;
        WarpingProblem p;
        RealLinearOperator a;
        JacobiPreconditioner m;
        ArrayRealVector b;
        int maxIterations;
        RealVector last;
        int lastIterations;

        /** Meshes and assembles. */
        @Setup(Level.Trial)
        public void setUp() {
            p = WarpingProblem.create(unknowns);
            a = new CsrOperator(p);
            m = new JacobiPreconditioner(p.diag, true);
            b = new ArrayRealVector(p.b, true);
            maxIterations = Math.max(10_000, p.n);
        }

        /** Prints residual and iterations. */
        @TearDown(Level.Trial)
        public void report() {
            System.out.printf("%n# commons-math CG (Jacobi): %d iterations, relative residual %.2e%n", lastIterations,
                    p.relativeResidual(last.toArray()));
        }
    }

    /** y = A x on the full symmetric CSR. */
    static final class CsrOperator extends RealLinearOperator {
        private final WarpingProblem p;

        CsrOperator(WarpingProblem p) {
            this.p = p;
        }

        @Override
        public int getRowDimension() {
            return p.n;
        }

        @Override
        public int getColumnDimension() {
            return p.n;
        }

        @Override
        public RealVector operate(RealVector x) {
            double[] in = x instanceof ArrayRealVector v ? v.getDataRef() : x.toArray();
            double[] out = new double[p.n];
            p.multiply(in, out);
            return new ArrayRealVector(out, false);
        }
    }

    /** Engine, default options (one thread per processor): ordering + factorisation + solve. */
    @Benchmark
    public double[] tensioCholesky(TensioState s) {
        return tensio(s, SparseCholesky.Options.defaults());
    }

    /** Engine on the calling thread only, like the two libraries. */
    @Benchmark
    public double[] tensioCholesky1Thread(TensioState s) {
        return tensio(s, SparseCholesky.Options.defaults().withParallelism(1));
    }

    /** Engine: the ordering alone (part of both calls above). */
    @Benchmark
    public Ordering tensioOrdering(TensioState s) {
        return Ordering.automatic(s.a, s.p.x, s.p.y);
    }

    private static double[] tensio(TensioState s, SparseCholesky.Options options) {
        Ordering ordering = Ordering.automatic(s.a, s.p.x, s.p.y);
        SparseCholesky factor = SparseCholesky.factor(s.a, new int[0], ordering, options);
        s.lastFactor = factor;
        return s.last = factor.solve(s.p.b);
    }

    /** EJML: (permutation +) symbolic + numeric factorisation + solve. */
    @Benchmark
    public double[] ejmlCholesky(EjmlState s) {
        int n = s.p.n;
        Ordering ordering = null;
        DMatrixSparseCSC a = s.a;
        DMatrixRMaj b = s.b.copy();
        if (a == null) { // TENSIO_ND: order and permute inside the timed call
            ordering = Ordering.automatic(s.tensio, s.p.x, s.p.y);
            a = symmetricCsc(s.p, ordering);
            for (int k = 0; k < n; k++) {
                b.data[k] = s.p.b[ordering.newToOld(k)];
            }
        }
        LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> solver = LinearSolverFactory_DSCC.cholesky(FillReducing.NONE);
        if (!solver.setA(solver.modifiesA() ? a.copy() : a)) {
            throw new IllegalStateException("EJML: matrix not positive definite");
        }
        DMatrixRMaj x = new DMatrixRMaj(n, 1);
        solver.solve(b, x);
        double[] out = x.data;
        if (ordering != null) {
            out = new double[n];
            for (int k = 0; k < n; k++) {
                out[ordering.newToOld(k)] = x.data[k];
            }
        }
        return s.last = out;
    }

    /** commons-math: Jacobi-preconditioned CG to ‖r‖ ≤ 1e-10 ‖b‖ from x = 0. */
    @Benchmark
    public RealVector commonsMathCg(CgState s) {
        ConjugateGradient cg = new ConjugateGradient(s.maxIterations, CG_TOLERANCE, false);
        RealVector x = cg.solve(s.a, s.m, s.b);
        s.lastIterations = cg.getIterationManager().getIterations();
        return s.last = x;
    }
}
