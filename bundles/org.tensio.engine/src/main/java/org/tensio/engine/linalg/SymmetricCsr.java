package org.tensio.engine.linalg;

import java.util.Arrays;

/**
 * An immutable sparse symmetric matrix of order {@code n} in compressed sparse row form, storing the
 * <em>full</em> symmetric pattern: every off-diagonal entry a<sub>ij</sub> is stored twice, in row i and in
 * row j, with bit-identical values. Column indices are strictly increasing within each row, so there are no
 * duplicates. The full pattern costs twice the memory of a triangle but makes {@link #multiply} a plain row
 * loop and gives the adjacency graph the orderings walk directly.
 * <p>
 * Entries are those added to a {@link SparseMatrixBuilder}; an entry whose summed value is exactly zero is
 * kept as a structural non-zero (finite-element assembly patterns are preserved). Values are finite. No unit
 * is implied: entries carry whatever unit the assembled operator has (e.g. a stiffness, length⁰ for the
 * Laplacian of a 2D mesh).
 * <p>
 * Instances are created by {@link SparseMatrixBuilder#build()} or {@link #pinned(int[])} and are safe to share
 * between threads.
 *
 * @since 0.1
 */
public final class SymmetricCsr {

    private final int n;
    private final int[] rowStart;
    private final int[] col;
    private final double[] val;
    private final int[] diagPos;

    /** Takes ownership of the arrays; rows must be sorted, duplicate-free and symmetric (not re-checked). */
    SymmetricCsr(int n, int[] rowStart, int[] col, double[] val) {
        this.n = n;
        this.rowStart = rowStart;
        this.col = col;
        this.val = val;
        this.diagPos = new int[n];
        for (int i = 0; i < n; i++) {
            int p = Arrays.binarySearch(col, rowStart[i], rowStart[i + 1], i);
            diagPos[i] = p >= 0 ? p : -1;
        }
    }

    /** @return the order n of the matrix (number of rows = number of columns) */
    public int n() {
        return n;
    }

    /**
     * @return the number of stored entries of the full symmetric pattern: diagonal entries once, each
     *         off-diagonal pair a<sub>ij</sub> = a<sub>ji</sub> twice
     */
    public long nonZeros() {
        return rowStart[n];
    }

    /**
     * Computes y = A·x. Each y<sub>i</sub> is a sum over row i in increasing column order, so the result is
     * deterministic and bit-reproducible.
     *
     * @param x vector of length n, not modified
     * @param y result, length n, overwritten; must not be the same array as x
     * @throws IllegalArgumentException on a length mismatch or when x and y are the same array
     */
    public void multiply(double[] x, double[] y) {
        requireLength("x", x);
        requireLength("y", y);
        if (x == y) {
            throw new IllegalArgumentException("y must not be the same array as x");
        }
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int p = rowStart[i], e = rowStart[i + 1]; p < e; p++) {
                s += val[p] * x[col[p]];
            }
            y[i] = s;
        }
    }

    /**
     * @param x vector of length n, not modified
     * @return a new vector A·x
     */
    public double[] multiply(double[] x) {
        double[] y = new double[n];
        multiply(x, y);
        return y;
    }

    /** @return a new array with the diagonal a<sub>ii</sub>; 0 where no diagonal entry is stored */
    public double[] diagonal() {
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            d[i] = diagPos[i] >= 0 ? val[diagPos[i]] : 0;
        }
        return d;
    }

    /**
     * @param i row index, 0 ≤ i &lt; n
     * @param j column index, 0 ≤ j &lt; n
     * @return a<sub>ij</sub>, 0 where no entry is stored (binary search, O(log row length))
     */
    public double get(int i, int j) {
        checkIndex("i", i);
        checkIndex("j", j);
        int p = Arrays.binarySearch(col, rowStart[i], rowStart[i + 1], j);
        return p >= 0 ? val[p] : 0;
    }

    /**
     * @param i row index
     * @return number of entries stored in row i, including the diagonal when present
     */
    public int rowLength(int i) {
        checkIndex("i", i);
        return rowStart[i + 1] - rowStart[i];
    }

    /**
     * Returns the matrix with homogeneous Dirichlet conditions imposed on the given unknowns by the identity-row
     * technique: row and column p of each pinned unknown are cleared and a<sub>pp</sub> = 1. Solving the result
     * with b<sub>p</sub> = 0 yields x<sub>p</sub> = 0 and, for the other unknowns, the solution of the system
     * with row and column p removed. Useful for {@link ConjugateGradient}; {@link SparseCholesky} removes
     * pinned unknowns itself.
     *
     * @param pinned indices to pin, each in [0, n); duplicates allowed; may be empty
     * @return a new matrix of the same order and pattern minus the cleared off-diagonal entries
     * @throws IllegalArgumentException when an index is out of range
     */
    public SymmetricCsr pinned(int[] pinned) {
        boolean[] pin = pinMask(pinned);
        int[] rs = new int[n + 1];
        int count = 0;
        for (int i = 0; i < n; i++) {
            if (pin[i]) {
                count++;
            } else {
                for (int p = rowStart[i]; p < rowStart[i + 1]; p++) {
                    if (!pin[col[p]]) {
                        count++;
                    }
                }
            }
            rs[i + 1] = count;
        }
        int[] c = new int[count];
        double[] v = new double[count];
        int q = 0;
        for (int i = 0; i < n; i++) {
            if (pin[i]) {
                c[q] = i;
                v[q++] = 1;
                continue;
            }
            for (int p = rowStart[i]; p < rowStart[i + 1]; p++) {
                if (!pin[col[p]]) {
                    c[q] = col[p];
                    v[q++] = val[p];
                }
            }
        }
        return new SymmetricCsr(n, rs, c, v);
    }

    boolean[] pinMask(int[] pinned) {
        if (pinned == null) {
            throw new IllegalArgumentException("pinned must not be null (pass an empty array)");
        }
        boolean[] pin = new boolean[n];
        for (int k = 0; k < pinned.length; k++) {
            if (pinned[k] < 0 || pinned[k] >= n) {
                throw new IllegalArgumentException("pinned[" + k + "] = " + pinned[k] + " is outside [0, " + n + ")");
            }
            pin[pinned[k]] = true;
        }
        return pin;
    }

    /** @return internal row pointers (length n + 1); callers in this package must not modify them */
    int[] rowStart() {
        return rowStart;
    }

    /** @return internal column indices; not to be modified */
    int[] columns() {
        return col;
    }

    /** @return internal values; not to be modified */
    double[] values() {
        return val;
    }

    /** @return position of the diagonal entry of each row in {@link #columns()}, −1 when absent */
    int[] diagonalPositions() {
        return diagPos;
    }

    void requireLength(String name, double[] v) {
        if (v == null) {
            throw new IllegalArgumentException(name + " must not be null");
        }
        if (v.length != n) {
            throw new IllegalArgumentException(name + ".length = " + v.length + " but n = " + n);
        }
    }

    private void checkIndex(String name, int i) {
        if (i < 0 || i >= n) {
            throw new IllegalArgumentException(name + " = " + i + " is outside [0, " + n + ")");
        }
    }

    @Override
    public String toString() {
        return "SymmetricCsr[n=" + n + ", nonZeros=" + nonZeros() + "]";
    }
}
