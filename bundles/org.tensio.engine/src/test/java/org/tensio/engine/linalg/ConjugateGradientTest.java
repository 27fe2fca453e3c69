package org.tensio.engine.linalg;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.CancellationException;

import org.junit.jupiter.api.Test;
import org.tensio.engine.linalg.SparseMatrixBuilder.Input;

/**
 * {@link ConjugateGradient} as a cross-check of {@link SparseCholesky}, with the standard facts (Saad, <i>Iterative
 * Methods for Sparse Linear Systems</i>, 2nd ed. 2003, §6.11 and §10.3 — from memory): CG terminates in at most n
 * steps in exact arithmetic, and IC(0) needs markedly fewer iterations than Jacobi on a Laplacian (Meijerink &amp;
 * van der Vorst 1977 — from memory).
 */
class ConjugateGradientTest {

    @Test
    void agreesWithCholeskyOnAPinnedP1Problem() {
        Meshes.Mesh m = Meshes.p1Square(30, 0.2, 3);
        double[] b = new double[m.n()];
        for (int i = 0; i < b.length; i++) {
            b[i] = Math.sin(3 * m.x()[i]) * m.y()[i];
        }
        for (int p : m.boundary()) {
            b[p] = 0;
        }
        double[] direct = SparseCholesky.factor(m.a(), m.boundary(), Ordering.automatic(m.a(), m.x(), m.y())).solve(b);
        SymmetricCsr pinned = m.a().pinned(m.boundary());
        for (Preconditioner pc : new Preconditioner[] {Preconditioner.identity(), Preconditioner.jacobi(pinned),
                Preconditioner.incompleteCholesky(pinned)}) {
            ConjugateGradient.Result r = ConjugateGradient.solve(pinned, b, pc, 1e-12, 5000);
            assertTrue(r.converged(), "iterations " + r.iterations());
            assertTrue(r.relativeResidual() <= 1e-11, "true residual " + r.relativeResidual());
            // forward error ≤ κ · residual, κ ≈ 10³ here
            assertTrue(Meshes.relativeError(direct, r.x()) <= 1e-8, "difference " + Meshes.relativeError(direct, r.x()));
        }
    }

    @Test
    void incompleteCholeskyBeatsJacobiOnALaplacian() {
        Meshes.Mesh m = Meshes.laplace5(80);
        double[] b = new double[m.n()];
        java.util.Arrays.fill(b, 1);
        int jacobi = ConjugateGradient.solve(m.a(), b, Preconditioner.jacobi(m.a()), 1e-10, 5000).iterations();
        int ic = ConjugateGradient.solve(m.a(), b, Preconditioner.incompleteCholesky(m.a()), 1e-10, 5000).iterations();
        assertTrue(ic < 0.7 * jacobi, "IC(0) " + ic + " vs Jacobi " + jacobi + " iterations");
    }

    @Test
    void incompleteCholeskyOfQuadraticElementsStillConverges() {
        // P2 stiffness matrices are not M-matrices; IC(0) may need the diagonal shift but must stay SPD
        Meshes.Mesh m = Meshes.p2Square(20, 0.2, 5);
        SymmetricCsr a = m.a().pinned(m.boundary());
        double[] u = new double[m.n()];
        for (int i = 0; i < u.length; i++) {
            u[i] = m.x()[i] * (1 - m.x()[i]) * m.y()[i] * (1 - m.y()[i]);
        }
        for (int p : m.boundary()) {
            u[p] = 0;
        }
        ConjugateGradient.Result r = ConjugateGradient.solve(a, a.multiply(u), Preconditioner.incompleteCholesky(a), 1e-13, 2000);
        assertTrue(r.converged());
        assertTrue(Meshes.relativeError(u, r.x()) <= 1e-9, "error " + Meshes.relativeError(u, r.x()));
    }

    @Test
    void terminatesWithinNStepsOnASmallSystem() {
        SymmetricCsr a = Meshes.laplace5(3).a(); // n = 9, 3 distinct eigenvalue clusters at most 9 steps
        double[] b = {1, 2, 3, 4, 5, 6, 7, 8, 9};
        ConjugateGradient.Result r = ConjugateGradient.solve(a, b, Preconditioner.identity(), 1e-13, 9);
        assertTrue(r.converged());
        assertTrue(r.iterations() <= 9);
        assertArrayEquals(SparseCholesky.factor(a).solve(b), r.x(), 1e-12);
    }

    @Test
    void reportsTheIterationCapInsteadOfThrowing() {
        Meshes.Mesh m = Meshes.laplace5(40);
        double[] b = new double[m.n()];
        java.util.Arrays.fill(b, 1);
        ConjugateGradient.Result r = ConjugateGradient.solve(m.a(), b, Preconditioner.jacobi(m.a()), 1e-12, 3);
        assertFalse(r.converged());
        assertEquals(3, r.iterations());
        assertTrue(r.relativeResidual() > 1e-6, "far from converged: " + r.relativeResidual());
    }

    @Test
    void zeroRightHandSideAndInitialGuess() {
        SymmetricCsr a = Meshes.laplace5(5).a();
        ConjugateGradient.Result r = ConjugateGradient.solve(a, new double[25], Preconditioner.identity(), 1e-10, 10);
        assertEquals(0, r.iterations());
        assertArrayEquals(new double[25], r.x(), 0);
        double[] x = SparseCholesky.factor(a).solve(filled(25, 1));
        ConjugateGradient.Result warm = new ConjugateGradient(a, Preconditioner.identity(), 1e-10, 10).initialGuess(x)
                .solve(filled(25, 1));
        assertEquals(0, warm.iterations(), "an exact initial guess needs no iteration");
    }

    @Test
    void indefiniteMatrixAndCancellationAreReported() {
        SparseMatrixBuilder sb = new SparseMatrixBuilder(2, Input.ONE_TRIANGLE);
        sb.add(0, 0, 1);
        sb.add(1, 1, -1);
        assertThrows(ArithmeticException.class,
                () -> ConjugateGradient.solve(sb.build(), new double[] {0, 1}, Preconditioner.identity(), 1e-10, 10));
        Meshes.Mesh m = Meshes.laplace5(60);
        ProgressMonitor cancel = new ProgressMonitor() {
            @Override
            public void worked(double fraction) {
                // ignored
            }

            @Override
            public boolean isCancelled() {
                return true;
            }
        };
        ConjugateGradient cg = new ConjugateGradient(m.a(), Preconditioner.jacobi(m.a()), 1e-12, 1000).monitor(cancel);
        assertThrows(CancellationException.class, () -> cg.solve(filled(m.n(), 1)));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new ConjugateGradient(m.a(), Preconditioner.identity(), 0, 10));
        assertTrue(e.getMessage().contains("tolerance = 0.0"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Preconditioner.jacobi(sb.build()));
        assertTrue(e.getMessage().contains("a[1][1] = -1.0"), e.getMessage());
    }

    private static double[] filled(int n, double v) {
        double[] a = new double[n];
        java.util.Arrays.fill(a, v);
        return a;
    }
}
