package org.tensio.engine.linalg;

/**
 * Thrown by {@link SparseCholesky} when a pivot is not safely positive: the matrix (with the pinned unknowns
 * removed) is indefinite, or singular to working precision — typically a Neumann problem such as the
 * St. Venant warping function with no unknown pinned, or a part of the mesh not connected to any pinned node.
 * <p>
 * The test is d ≤ τ·a<sub>jj</sub>, where d is the pivot (the diagonal of the Schur complement when unknown j is
 * eliminated), a<sub>jj</sub> the original diagonal entry and τ the pivot tolerance; a NaN pivot and a
 * non-positive diagonal also fail. No factor with a NaN is ever returned.
 *
 * @since 0.1
 */
public final class NotPositiveDefiniteException extends ArithmeticException {

    private static final long serialVersionUID = 1L;

    private final int unknown;
    private final int position;
    private final double pivot;
    private final double diagonal;

    NotPositiveDefiniteException(int unknown, int position, double pivot, double diagonal, double tolerance) {
        super(message(unknown, position, pivot, diagonal, tolerance));
        this.unknown = unknown;
        this.position = position;
        this.pivot = pivot;
        this.diagonal = diagonal;
    }

    private static String message(int unknown, int position, double pivot, double diagonal, double tolerance) {
        String head = "matrix is not positive definite at unknown " + unknown + " (elimination step " + position + "): ";
        if (!(diagonal > 0)) {
            return head + "diagonal entry a[" + unknown + "][" + unknown + "] = " + diagonal + " is not positive";
        }
        String s = head + "pivot = " + pivot + ", diagonal entry a[" + unknown + "][" + unknown + "] = " + diagonal
                + ", pivot/diagonal = " + (pivot / diagonal) + " is not above the tolerance " + tolerance;
        if (Math.abs(pivot) <= 1e-6 * diagonal) {
            s += " (singular to working precision: for a Neumann problem pin one unknown of each connected part)";
        }
        return s;
    }

    /** @return index, in the caller's numbering, of the unknown whose pivot failed */
    public int unknown() {
        return unknown;
    }

    /** @return elimination step (position in the factor's order) at which it failed */
    public int position() {
        return position;
    }

    /** @return the failed pivot d (may be negative, zero or NaN) */
    public double pivot() {
        return pivot;
    }

    /** @return the original diagonal entry a<sub>jj</sub> of that unknown */
    public double diagonal() {
        return diagonal;
    }
}
