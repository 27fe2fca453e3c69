package org.tensio.engine.linalg;

/**
 * A symmetric positive definite approximation M ≈ A applied as z = M⁻¹·r inside {@link ConjugateGradient}.
 * Implementations must be linear, symmetric and positive definite for CG to converge, and must not keep
 * references to r or z. The factories' results are immutable and thread-safe.
 *
 * @since 0.1
 */
@FunctionalInterface
public interface Preconditioner {

    /**
     * Computes z = M⁻¹·r.
     *
     * @param r residual, length n, not modified
     * @param z result, length n, overwritten; never the same array as r
     */
    void apply(double[] r, double[] z);

    /** @return M = I (plain conjugate gradients) */
    static Preconditioner identity() {
        return (r, z) -> System.arraycopy(r, 0, z, 0, r.length);
    }

    /**
     * Jacobi (diagonal) scaling M = diag(A).
     *
     * @param a matrix with a positive diagonal
     * @return the preconditioner
     * @throws IllegalArgumentException when a diagonal entry is not positive, naming it
     */
    static Preconditioner jacobi(SymmetricCsr a) {
        if (a == null) {
            throw new IllegalArgumentException("a must not be null");
        }
        double[] d = a.diagonal();
        double[] inv = new double[d.length];
        for (int i = 0; i < d.length; i++) {
            if (!(d[i] > 0)) {
                throw new IllegalArgumentException("diagonal a[" + i + "][" + i + "] = " + d[i] + " must be positive for Jacobi");
            }
            inv[i] = 1 / d[i];
        }
        return (r, z) -> {
            for (int i = 0; i < inv.length; i++) {
                z[i] = r[i] * inv[i];
            }
        };
    }

    /**
     * Incomplete Cholesky without fill, IC(0): M = L̃L̃ᵀ with L̃ on the lower pattern of A (Meijerink &amp; van der
     * Vorst, Math. Comp. 31, 1977 — from memory). For matrices that are not M-matrices (quadratic elements) IC(0)
     * can break down with a non-positive pivot; it is then recomputed for A + α·diag(A) with α = 10⁻³, 4·10⁻³, …
     * (Manteuffel, Math. Comp. 34, 1980 — from memory), which is still a valid SPD preconditioner.
     *
     * @param a symmetric positive definite matrix with a positive diagonal
     * @return the preconditioner
     * @throws IllegalArgumentException when a diagonal entry is not positive, naming it
     */
    static Preconditioner incompleteCholesky(SymmetricCsr a) {
        if (a == null) {
            throw new IllegalArgumentException("a must not be null");
        }
        return IncompleteCholesky.of(a);
    }
}
