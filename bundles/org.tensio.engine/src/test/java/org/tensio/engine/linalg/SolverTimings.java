package org.tensio.engine.linalg;

import java.util.Locale;

/**
 * Informal timing of ordering + factorisation + one solve on P2 Laplacians of the unit square (the Neumann problem
 * with one node pinned), for about 10⁴, 10⁵ and 4·10⁵ unknowns, with the exponent fitted between the sizes. Not a
 * test (no assertion on time; surefire does not pick it up): run it by hand, on a quiet machine, e.g.
 * {@code java -Xmx8g -cp <test-classes>:<classes> org.tensio.engine.linalg.SolverTimings [threads]}. Each size is
 * repeated and the best time kept, after a warm-up, to take the JIT and the garbage collector out of the figure.
 */
public final class SolverTimings {

    private SolverTimings() {
    }

    /**
     * @param args optional number of threads (default: available processors)
     */
    public static void main(String[] args) {
        int threads = args.length > 0 ? Integer.parseInt(args[0]) : Runtime.getRuntime().availableProcessors();
        int[] cells = {50, 158, 316}; // (2k + 1)² nodes: 10 201, 100 489, 400 689
        double[] n = new double[cells.length];
        double[] t = new double[cells.length];
        time(Meshes.p2Square(40, 0.2, 1), threads, 5); // warm-up
        for (int c = 0; c < cells.length; c++) {
            Meshes.Mesh m = Meshes.p2Square(cells[c], 0.2, 1);
            n[c] = m.n();
            t[c] = time(m, threads, cells[c] > 200 ? 5 : 9);
        }
        for (int c = 1; c < cells.length; c++) {
            System.out.printf(Locale.ROOT, "exponent %.0f → %.0f unknowns: %.2f%n", n[c - 1], n[c],
                    Math.log(t[c] / t[c - 1]) / Math.log(n[c] / n[c - 1]));
        }
        // least-squares slope of log t against log n
        double mx = 0;
        double my = 0;
        for (int c = 0; c < cells.length; c++) {
            mx += Math.log(n[c]) / cells.length;
            my += Math.log(t[c]) / cells.length;
        }
        double sxy = 0;
        double sxx = 0;
        for (int c = 0; c < cells.length; c++) {
            sxy += (Math.log(n[c]) - mx) * (Math.log(t[c]) - my);
            sxx += (Math.log(n[c]) - mx) * (Math.log(n[c]) - mx);
        }
        System.out.printf(Locale.ROOT, "fitted exponent (least squares, all sizes): %.2f%n", sxy / sxx);
    }

    private static double time(Meshes.Mesh m, int threads, int repeats) {
        SymmetricCsr a = m.a();
        double[] b = new double[a.n()];
        double mean = 0;
        for (int i = 0; i < b.length; i++) {
            b[i] = Math.sin(3 * m.x()[i]) + m.y()[i];
            mean += b[i] / b.length;
        }
        for (int i = 0; i < b.length; i++) {
            b[i] -= mean;
        }
        double best = Double.POSITIVE_INFINITY;
        SparseCholesky f = null;
        for (int r = 0; r < repeats; r++) {
            long t0 = System.nanoTime();
            Ordering o = Ordering.nestedDissection(a, m.x(), m.y());
            f = SparseCholesky.factor(a, new int[] {0}, o, SparseCholesky.Options.defaults().withParallelism(threads));
            f.solve(b);
            best = Math.min(best, (System.nanoTime() - t0) * 1e-9);
        }
        System.out.printf(Locale.ROOT, "n = %d: order + factor + solve %.3f s (best of %d), nnz(L) = %d, flops = %.3g%n",
                a.n(), best, repeats, f.factorNonZeros(), f.flops());
        return best;
    }
}
