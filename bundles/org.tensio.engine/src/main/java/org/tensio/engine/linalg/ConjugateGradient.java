package org.tensio.engine.linalg;

import java.util.concurrent.CancellationException;

/**
 * Preconditioned conjugate gradients for A·x = b with A symmetric positive definite (Hestenes &amp; Stiefel
 * 1952; Saad, <i>Iterative Methods for Sparse Linear Systems</i>, 2nd ed., SIAM 2003, Alg. 9.1 — from memory).
 * A fallback for systems too large to factor and a cross-check of {@link SparseCholesky}.
 * <p>
 * Stopping test: the recursively updated residual satisfies ‖r‖₂ ≤ tol·‖b‖₂. The reported
 * {@link Result#relativeResidual()} is recomputed from the true residual b − A·x at the end, so it can differ
 * from the recursive one by rounding (about n·u·‖A‖‖x‖/‖b‖). Convergence takes O(√κ) iterations, κ the
 * condition number of M⁻¹A; for a mesh Laplacian κ grows as (size / element size)².
 * <p>
 * Pinned unknowns: use {@link SymmetricCsr#pinned(int[])} and set b<sub>p</sub> = 0. A Neumann problem singular
 * by a constant with a consistent b (Σ b = 0) also converges in exact arithmetic; the constant is then that of
 * the initial guess.
 * <p>
 * A single-use object for the configurable path, {@link #solve(SymmetricCsr, double[], Preconditioner, double, int)}
 * for the common one.
 *
 * @since 0.1
 */
public final class ConjugateGradient {

    /**
     * Outcome of a CG run.
     *
     * @param x                the last iterate, length n
     * @param iterations       iterations performed (matrix-vector products, not counting the final residual)
     * @param relativeResidual true ‖b − A·x‖₂ / ‖b‖₂ of the returned x (0 when b = 0)
     * @param converged        whether the recursive residual met the tolerance within the iteration cap
     * @since 0.1
     */
    public record Result(double[] x, int iterations, double relativeResidual, boolean converged) {
    }

    private final SymmetricCsr a;
    private final Preconditioner m;
    private final double tolerance;
    private final int maxIterations;
    private ProgressMonitor monitor = ProgressMonitor.NONE;
    private double[] initialGuess;

    /**
     * @param a             symmetric positive (semi-)definite matrix, not null
     * @param m             preconditioner, not null ({@link Preconditioner#identity()} for none)
     * @param tolerance     relative residual tolerance, in (0, 1)
     * @param maxIterations iteration cap, ≥ 1
     * @throws IllegalArgumentException on a bad argument, naming it
     */
    public ConjugateGradient(SymmetricCsr a, Preconditioner m, double tolerance, int maxIterations) {
        if (a == null) {
            throw new IllegalArgumentException("a must not be null");
        }
        if (m == null) {
            throw new IllegalArgumentException("preconditioner must not be null (use Preconditioner.identity())");
        }
        if (!(tolerance > 0 && tolerance < 1)) {
            throw new IllegalArgumentException("tolerance = " + tolerance + " must be in (0, 1)");
        }
        if (maxIterations < 1) {
            throw new IllegalArgumentException("maxIterations = " + maxIterations + " must be ≥ 1");
        }
        this.a = a;
        this.m = m;
        this.tolerance = tolerance;
        this.maxIterations = maxIterations;
    }

    /**
     * @param mon progress (fraction = iterations / cap) and cancellation, polled every 32 iterations; not null
     * @return this
     */
    public ConjugateGradient monitor(ProgressMonitor mon) {
        if (mon == null) {
            throw new IllegalArgumentException("monitor must not be null (use ProgressMonitor.NONE)");
        }
        this.monitor = mon;
        return this;
    }

    /**
     * @param x0 initial guess, length n, copied; null for zero
     * @return this
     */
    public ConjugateGradient initialGuess(double[] x0) {
        if (x0 != null) {
            a.requireLength("x0", x0);
        }
        this.initialGuess = x0 == null ? null : x0.clone();
        return this;
    }

    /**
     * Runs CG with a zero initial guess.
     *
     * @param a             symmetric positive definite matrix
     * @param b             right-hand side, length n, finite
     * @param m             preconditioner
     * @param tolerance     relative residual tolerance in (0, 1)
     * @param maxIterations iteration cap ≥ 1
     * @return the result; check {@link Result#converged()}
     */
    public static Result solve(SymmetricCsr a, double[] b, Preconditioner m, double tolerance, int maxIterations) {
        return new ConjugateGradient(a, m, tolerance, maxIterations).solve(b);
    }

    /**
     * @param b right-hand side, length n, finite, not modified
     * @return the result; not converged is reported, not thrown
     * @throws ArithmeticException   when p·A·p ≤ 0 occurs (A not positive definite on the Krylov space)
     * @throws CancellationException when the monitor cancels
     */
    public Result solve(double[] b) {
        a.requireLength("b", b);
        int n = a.n();
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(b[i])) {
                throw new IllegalArgumentException("b[" + i + "] = " + b[i] + " must be finite");
            }
        }
        double[] x = initialGuess == null ? new double[n] : initialGuess.clone();
        double bnorm = norm(b);
        if (bnorm == 0) {
            return new Result(new double[n], 0, 0, true);
        }
        double[] r = new double[n];
        double[] z = new double[n];
        double[] p = new double[n];
        double[] q = new double[n];
        a.multiply(x, q);
        for (int i = 0; i < n; i++) {
            r[i] = b[i] - q[i];
        }
        double target = tolerance * bnorm;
        int it = 0;
        boolean converged = norm(r) <= target;
        if (!converged) {
            m.apply(r, z);
            System.arraycopy(z, 0, p, 0, n);
            double rz = dot(r, z);
            while (it < maxIterations) {
                a.multiply(p, q);
                double pq = dot(p, q);
                if (!(pq > 0)) {
                    throw new ArithmeticException("conjugate gradients: p·A·p = " + pq + " at iteration " + it
                            + ": the matrix is not positive definite (or the preconditioner not SPD)");
                }
                double alpha = rz / pq;
                for (int i = 0; i < n; i++) {
                    x[i] += alpha * p[i];
                    r[i] -= alpha * q[i];
                }
                it++;
                if (norm(r) <= target) {
                    converged = true;
                    break;
                }
                m.apply(r, z);
                double rzNew = dot(r, z);
                double beta = rzNew / rz;
                rz = rzNew;
                for (int i = 0; i < n; i++) {
                    p[i] = z[i] + beta * p[i];
                }
                if ((it & 31) == 0) {
                    monitor.worked((double) it / maxIterations);
                    if (monitor.isCancelled()) {
                        throw new CancellationException("conjugate gradients cancelled at iteration " + it);
                    }
                }
            }
        }
        a.multiply(x, q);
        for (int i = 0; i < n; i++) {
            r[i] = b[i] - q[i];
        }
        monitor.worked(1.0);
        return new Result(x, it, norm(r) / bnorm, converged);
    }

    private static double dot(double[] u, double[] v) {
        double s = 0;
        for (int i = 0; i < u.length; i++) {
            s += u[i] * v[i];
        }
        return s;
    }

    private static double norm(double[] u) {
        return Math.sqrt(dot(u, u));
    }
}
