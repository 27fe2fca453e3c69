package org.tensio.engine.linalg;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;

import org.junit.jupiter.api.Test;
import org.tensio.engine.linalg.SparseMatrixBuilder.Input;

/**
 * {@link SparseCholesky} against manufactured discrete solutions: pick u, form b = A·u exactly as the code under
 * test would see it, solve, and compare with u. Cholesky is backward stable for SPD matrices (Higham,
 * <i>Accuracy and Stability of Numerical Algorithms</i>, 2nd ed. 2002, Thm 10.3 — from memory), so the relative
 * error is bounded by about κ(A)·n·u; for the meshes here κ ≤ 10⁴ and 1e-10 relative holds with a wide margin.
 */
class SparseCholeskyTest {

    private static final double TOL = 1e-10;

    private static List<Ordering> orderings(Meshes.Mesh m) {
        List<Ordering> list = new ArrayList<>();
        list.add(Ordering.natural(m.n()));
        list.add(Ordering.nestedDissection(m.a(), m.x(), m.y()));
        list.add(Ordering.nestedDissection(m.a()));
        list.add(Ordering.reverseCuthillMcKee(m.a()));
        return list;
    }

    private static double[] polynomial(Meshes.Mesh m) {
        double[] u = new double[m.n()];
        for (int i = 0; i < u.length; i++) {
            double x = m.x()[i];
            double y = m.y()[i];
            u[i] = 1 + x * x - 3 * x * y + 0.5 * y * y * y;
        }
        return u;
    }

    @Test
    void dirichletFivePointLaplacianReproducesAPolynomial() {
        Meshes.Mesh m = Meshes.laplace5(60);
        double[] u = polynomial(m);
        double[] b = m.a().multiply(u);
        for (Ordering o : orderings(m)) {
            SparseCholesky f = SparseCholesky.factor(m.a(), new int[0], o);
            assertTrue(Meshes.relativeError(u, f.solve(b)) <= TOL, o + ": " + Meshes.relativeError(u, f.solve(b)));
        }
    }

    @Test
    void quadraticStencilIsExactForAQuadratic() {
        // the 5-point stencil is exact for quadratics: with u = x² + y² (−Δu = −4, h = 1) the right-hand side is
        // −4 inside plus the boundary values moved across (standard finite differences, e.g. LeVeque, Finite
        // Difference Methods for ODEs and PDEs, SIAM 2007, §3.2 — from memory)
        int k = 40;
        Meshes.Mesh m = Meshes.laplace5(k);
        double[] b = new double[m.n()];
        double[] u = new double[m.n()];
        for (int j = 1; j <= k; j++) {
            for (int i = 1; i <= k; i++) {
                int v = (j - 1) * k + i - 1;
                u[v] = i * i + j * j;
                b[v] = -4;
                if (i == 1) {
                    b[v] += j * j; // u(0, j)
                }
                if (i == k) {
                    b[v] += (k + 1) * (k + 1) + j * j;
                }
                if (j == 1) {
                    b[v] += i * i;
                }
                if (j == k) {
                    b[v] += i * i + (k + 1) * (k + 1);
                }
            }
        }
        SparseCholesky f = SparseCholesky.factor(m.a(), new int[0], Ordering.automatic(m.a(), m.x(), m.y()));
        assertTrue(Meshes.relativeError(u, f.solve(b)) <= TOL);
    }

    @Test
    void p1LaplacianOnAnIrregularSquareWithDirichletBoundaryPinned() {
        Meshes.Mesh m = Meshes.p1Square(40, 0.2, 17);
        double[] u = polynomial(m);
        for (int p : m.boundary()) {
            u[p] = 0;
        }
        double[] b = m.a().multiply(u);
        for (Ordering o : orderings(m)) {
            SparseCholesky f = SparseCholesky.factor(m.a(), m.boundary(), o);
            double[] x = f.solve(b);
            assertTrue(Meshes.relativeError(u, x) <= TOL, o + ": " + Meshes.relativeError(u, x));
            for (int p : m.boundary()) {
                assertEquals(0, x[p], 0, "pinned unknowns are exactly zero");
            }
            assertEquals(m.n() - m.boundary().length, m.n() - f.pinned().length);
        }
    }

    @Test
    void neumannP2LaplacianWithOneNodePinned() {
        // A·1 = 0, so b = A·u is consistent and the solution vanishing at the pinned node is u − u_p
        Meshes.Mesh m = Meshes.p2Square(25, 0.2, 23);
        double[] u = polynomial(m);
        double[] b = m.a().multiply(u);
        int pin = 137;
        double[] expected = new double[u.length];
        for (int i = 0; i < u.length; i++) {
            expected[i] = u[i] - u[pin];
        }
        for (Ordering o : orderings(m)) {
            SparseCholesky f = SparseCholesky.factor(m.a(), new int[] {pin}, o);
            double[] x = f.solve(b);
            assertTrue(Meshes.relativeError(expected, x) <= TOL, o + ": " + Meshes.relativeError(expected, x));
            assertEquals(0, x[pin], 0);
        }
    }

    @Test
    void neumannProblemWithoutAPinIsRejectedNotSolved() {
        Meshes.Mesh m = Meshes.p2Square(20, 0.2, 29);
        NotPositiveDefiniteException e = assertThrows(NotPositiveDefiniteException.class,
                () -> SparseCholesky.factor(m.a(), new int[0], Ordering.automatic(m.a(), m.x(), m.y())));
        assertTrue(Math.abs(e.pivot()) <= 1e-10 * e.diagonal(), e.getMessage());
        assertTrue(e.getMessage().contains("singular"), e.getMessage());
        assertEquals(e.position(), m.n() - 1, "only the very last pivot vanishes");
    }

    @Test
    void indefiniteMatrixIsRejectedNamingThePivot() {
        // [[1, 2], [2, 1]] has eigenvalues 3 and −1; the second pivot is 1 − 2·2/1 = −3 exactly
        SparseMatrixBuilder b = new SparseMatrixBuilder(2, Input.ONE_TRIANGLE);
        b.add(0, 0, 1);
        b.add(1, 1, 1);
        b.add(1, 0, 2);
        NotPositiveDefiniteException e = assertThrows(NotPositiveDefiniteException.class,
                () -> SparseCholesky.factor(b.build(), new int[0], Ordering.natural(2)));
        assertEquals(1, e.unknown());
        assertEquals(-3, e.pivot(), 0);
        assertEquals(1, e.diagonal(), 0);
        assertTrue(e.getMessage().contains("unknown 1") && e.getMessage().contains("-3.0"), e.getMessage());

        // a shifted Laplacian: eigenvalues of the 5-point operator lie in (0, 8), so A − 5·I is indefinite
        Meshes.Mesh m = Meshes.laplace5(30);
        SparseMatrixBuilder s = new SparseMatrixBuilder(m.n(), Input.ONE_TRIANGLE);
        for (int i = 0; i < m.n(); i++) {
            s.add(i, i, -5);
            for (int p = m.a().rowStart()[i]; p < m.a().rowStart()[i + 1]; p++) {
                if (m.a().columns()[p] <= i) {
                    s.add(i, m.a().columns()[p], m.a().values()[p]);
                }
            }
        }
        SymmetricCsr shifted = s.build();
        NotPositiveDefiniteException e2 = assertThrows(NotPositiveDefiniteException.class,
                () -> SparseCholesky.factor(shifted, new int[0], Ordering.automatic(shifted, m.x(), m.y())));
        assertTrue(e2.unknown() >= 0 && e2.unknown() < m.n());
        assertTrue(!(e2.pivot() > 0), e2.getMessage());
    }

    @Test
    void failureInAParallelSubtreeIsReportedAsItself() {
        Meshes.Mesh m = Meshes.p2Square(60, 0.2, 41);
        int bad = 4321;
        SparseMatrixBuilder b = new SparseMatrixBuilder(m.n(), Input.ONE_TRIANGLE);
        SymmetricCsr a = m.a();
        for (int i = 0; i < m.n(); i++) {
            for (int p = a.rowStart()[i]; p < a.rowStart()[i + 1]; p++) {
                if (a.columns()[p] <= i) {
                    b.add(i, a.columns()[p], a.values()[p]);
                }
            }
        }
        b.add(bad, bad, -2 * a.get(bad, bad)); // flip the sign of one diagonal entry
        SymmetricCsr flipped = b.build();
        SparseCholesky.Options opt = SparseCholesky.Options.defaults().withParallelism(2);
        NotPositiveDefiniteException e = assertThrows(NotPositiveDefiniteException.class,
                () -> SparseCholesky.factor(flipped, new int[] {0}, Ordering.automatic(flipped, m.x(), m.y()), opt));
        assertEquals(bad, e.unknown());
        assertEquals(-a.get(bad, bad), e.diagonal(), 0);
    }

    @Test
    void missingOrNegativeDiagonalIsRejected() {
        SparseMatrixBuilder b = new SparseMatrixBuilder(3, Input.ONE_TRIANGLE);
        b.add(0, 0, 2);
        b.add(2, 2, 2);
        b.add(1, 0, 0.5);
        NotPositiveDefiniteException e = assertThrows(NotPositiveDefiniteException.class,
                () -> SparseCholesky.factor(b.build(), new int[0], Ordering.natural(3)));
        assertEquals(1, e.unknown());
        assertTrue(e.getMessage().contains("not positive"), e.getMessage());
    }

    @Test
    void tridiagonalMatrixHasNoFill() {
        // the 1D Laplacian in natural order: L is bidiagonal, nnz(L) = 2n − 1, and Σ c_j² = 4(n − 1) + 1
        // (George & Liu 1981, ch. 2: no fill for a tridiagonal matrix — from memory)
        int n = 1000;
        SparseMatrixBuilder b = new SparseMatrixBuilder(n, Input.ONE_TRIANGLE);
        for (int i = 0; i < n; i++) {
            b.add(i, i, 2);
            if (i > 0) {
                b.add(i, i - 1, -1);
            }
        }
        SymmetricCsr a = b.build();
        SparseCholesky f = SparseCholesky.factor(a, new int[0], Ordering.natural(n));
        assertEquals(2L * n - 1, f.factorNonZeros());
        assertEquals(4.0 * (n - 1) + 1, f.flops(), 0);
        double[] u = new double[n];
        for (int i = 0; i < n; i++) {
            u[i] = Math.sin(0.01 * i);
        }
        assertTrue(Meshes.relativeError(u, f.solve(a.multiply(u))) <= TOL);
    }

    @Test
    void severalRightHandSidesAndAnyParallelismGiveIdenticalBits() {
        Meshes.Mesh m = Meshes.p2Square(80, 0.2, 31); // 25 921 unknowns: a 241-column supernode, parallel panels
        int[] pin = {0};
        Ordering o = Ordering.automatic(m.a(), m.x(), m.y());
        SparseCholesky f1 = SparseCholesky.factor(m.a(), pin, o, SparseCholesky.Options.defaults().withParallelism(1));
        SparseCholesky f4 = SparseCholesky.factor(m.a(), pin, o, SparseCholesky.Options.defaults().withParallelism(4));
        double[][] bs = new double[3][m.n()];
        for (int r = 0; r < 3; r++) {
            for (int i = 0; i < m.n(); i++) {
                bs[r][i] = Math.cos(r + m.x()[i] * (r + 1)) - m.y()[i];
            }
        }
        double[][] xs = f1.solve(bs);
        for (int r = 0; r < 3; r++) {
            assertArrayEquals(f1.solve(bs[r]), xs[r], 0);
            assertArrayEquals(xs[r], f4.solve(bs[r]), 0, "parallel factor must be bit-identical");
        }
        double[] inPlace = bs[1].clone();
        f1.solve(inPlace, inPlace);
        assertArrayEquals(xs[1], inPlace, 0);
        assertEquals(f1.factorNonZeros(), f4.factorNonZeros());
        assertTrue(f1.storedEntries() >= f1.factorNonZeros());
        assertTrue(f1.minimumPivotRatio() > 0 && f1.minimumPivotRatio() <= 1);
    }

    @Test
    void progressIsMonotoneAndCancellationStopsTheFactorisation() {
        Meshes.Mesh m = Meshes.p2Square(60, 0.2, 37); // 14 641 unknowns: several polls
        Ordering o = Ordering.automatic(m.a(), m.x(), m.y());
        List<Double> fractions = new ArrayList<>();
        ProgressMonitor recording = new ProgressMonitor() {
            @Override
            public void worked(double fraction) {
                fractions.add(fraction);
            }

            @Override
            public boolean isCancelled() {
                return false;
            }
        };
        SparseCholesky.factor(m.a(), new int[] {0}, o, SparseCholesky.Options.defaults().withMonitor(recording));
        assertTrue(fractions.size() >= 3, "polled " + fractions);
        for (int i = 1; i < fractions.size(); i++) {
            assertTrue(fractions.get(i) >= fractions.get(i - 1), "non-decreasing: " + fractions);
        }
        assertEquals(1.0, fractions.get(fractions.size() - 1), 0);

        int[] polls = {0};
        ProgressMonitor cancelling = new ProgressMonitor() {
            @Override
            public void worked(double fraction) {
                assertTrue(fraction < 1, "cancelled before the end");
            }

            @Override
            public boolean isCancelled() {
                return ++polls[0] >= 2;
            }
        };
        for (int threads : new int[] {1, 2}) {
            polls[0] = 0;
            SparseCholesky.Options opt = SparseCholesky.Options.defaults().withMonitor(cancelling).withParallelism(threads);
            assertThrows(CancellationException.class, () -> SparseCholesky.factor(m.a(), new int[] {0}, o, opt));
        }
    }

    @Test
    void disconnectedGraphWithIsolatedNodes() {
        Meshes.Mesh m = OrderingTest.disconnected(); // three Dirichlet grids and 40 isolated unit diagonals
        double[] u = polynomial(m);
        double[] b = m.a().multiply(u);
        SparseCholesky f = SparseCholesky.factor(m.a(), new int[0], Ordering.automatic(m.a(), m.x(), m.y()));
        assertTrue(Meshes.relativeError(u, f.solve(b)) <= TOL);
    }

    @Test
    void trivialSizes() {
        SymmetricCsr empty = new SparseMatrixBuilder(0, Input.ONE_TRIANGLE).build();
        assertEquals(0, SparseCholesky.factor(empty).solve(new double[0]).length);
        SparseMatrixBuilder b = new SparseMatrixBuilder(2, Input.ONE_TRIANGLE);
        b.add(0, 0, 4);
        b.add(1, 1, 1);
        SparseCholesky all = SparseCholesky.factor(b.build(), new int[] {0, 1}, Ordering.natural(2));
        assertArrayEquals(new double[] {0, 0}, all.solve(new double[] {1, 1}), 0);
        assertArrayEquals(new double[] {0.25, 3}, SparseCholesky.factor(b.build()).solve(new double[] {1, 3}), 0);
    }

    @Test
    void badArgumentsAreRejectedNamingFieldAndValue() {
        SymmetricCsr a = Meshes.laplace5(4).a();
        SparseCholesky f = SparseCholesky.factor(a);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> f.solve(new double[3]));
        assertTrue(e.getMessage().contains("b.length = 3"), e.getMessage());
        double[] b = new double[16];
        b[5] = Double.POSITIVE_INFINITY;
        e = assertThrows(IllegalArgumentException.class, () -> f.solve(b));
        assertTrue(e.getMessage().contains("b[5] = Infinity"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> SparseCholesky.factor(a, new int[] {16}, Ordering.natural(16)));
        assertTrue(e.getMessage().contains("pinned[0] = 16"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> SparseCholesky.factor(a, new int[0], Ordering.natural(15)));
        assertTrue(e.getMessage().contains("ordering.size() = 15"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> SparseCholesky.Options.defaults().withParallelism(0));
        assertTrue(e.getMessage().contains("parallelism = 0"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> SparseCholesky.Options.defaults().withPivotTolerance(-1));
        assertTrue(e.getMessage().contains("pivotTolerance = -1.0"), e.getMessage());
    }
}
