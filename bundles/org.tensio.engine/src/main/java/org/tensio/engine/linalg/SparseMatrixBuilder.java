package org.tensio.engine.linalg;

import java.util.Arrays;

/**
 * Assembles a sparse symmetric matrix from (i, j, value) contributions, as in finite-element assembly, and
 * builds an immutable {@link SymmetricCsr}. Contributions to the same entry are summed. Not thread-safe.
 * <p>
 * <b>Which triangle.</b> The builder is told once, at construction, how contributions arrive:
 * <ul>
 * <li>{@link Input#ONE_TRIANGLE}: each off-diagonal call {@code add(i, j, v)} stands for the symmetric pair,
 * adding v to both a<sub>ij</sub> and a<sub>ji</sub>. The caller may use the lower triangle, the upper one or
 * mix them freely ({@code add(3, 1, v)} and {@code add(1, 3, v)} are the same contribution); it must not add
 * both a<sub>ij</sub> and a<sub>ji</sub> for one pair, or the pair is counted twice.</li>
 * <li>{@link Input#BOTH_TRIANGLES}: the caller adds the full matrix, a<sub>ij</sub> and a<sub>ji</sub>
 * separately (e.g. a complete element matrix). The built entry is the symmetric part
 * (a<sub>ij</sub> + a<sub>ji</sub>)/2; for exactly symmetric input this is exact (halving is exact in binary
 * floating point), and an unsymmetric input is silently symmetrised.</li>
 * </ul>
 * Diagonal contributions are added once in both modes. {@link #addElement} reads a full element matrix and is
 * correct in either mode.
 * <p>
 * <b>Cost.</b> Each call appends to flat primitive arrays (16 bytes per contribution; about 100 MB for 6
 * million contributions, no boxing); {@link #build()} sorts by a counting sort on rows and an insertion or
 * primitive sort within rows, O(contributions + n) plus the in-row sorts. Order of summation of duplicates
 * follows the order of the calls, so a build is reproducible.
 *
 * @since 0.1
 */
public final class SparseMatrixBuilder {

    /** How off-diagonal contributions are interpreted; see the class comment. */
    public enum Input {
        /** Each off-diagonal contribution counts for both a<sub>ij</sub> and a<sub>ji</sub>. */
        ONE_TRIANGLE,
        /** Both triangles are added; the symmetric part (a<sub>ij</sub> + a<sub>ji</sub>)/2 is kept. */
        BOTH_TRIANGLES
    }

    private final int n;
    private final Input input;
    private final double offDiagonalWeight;
    private int[] rows;
    private int[] cols;
    private double[] vals;
    private int size;

    /**
     * @param n     order of the matrix, ≥ 0
     * @param input how off-diagonal contributions are interpreted, not null
     * @throws IllegalArgumentException when n &lt; 0 or input is null
     */
    public SparseMatrixBuilder(int n, Input input) {
        this(n, input, 16);
    }

    /**
     * @param n                     order of the matrix, ≥ 0
     * @param input                 how off-diagonal contributions are interpreted, not null
     * @param expectedContributions capacity hint: expected number of {@code add} calls, ≥ 0
     * @throws IllegalArgumentException when n &lt; 0, input is null or the hint is negative
     */
    public SparseMatrixBuilder(int n, Input input, int expectedContributions) {
        if (n < 0) {
            throw new IllegalArgumentException("n = " + n + " must be ≥ 0");
        }
        if (input == null) {
            throw new IllegalArgumentException("input must not be null");
        }
        if (expectedContributions < 0) {
            throw new IllegalArgumentException("expectedContributions = " + expectedContributions + " must be ≥ 0");
        }
        this.n = n;
        this.input = input;
        this.offDiagonalWeight = input == Input.BOTH_TRIANGLES ? 0.5 : 1.0;
        int cap = Math.max(16, expectedContributions);
        rows = new int[cap];
        cols = new int[cap];
        vals = new double[cap];
    }

    /** @return the order n */
    public int n() {
        return n;
    }

    /** @return the input mode given at construction */
    public Input input() {
        return input;
    }

    /** @return the number of contributions added so far */
    public int contributions() {
        return size;
    }

    /**
     * Adds v to entry (i, j) — and, for an off-diagonal entry in {@link Input#ONE_TRIANGLE} mode, to (j, i).
     * A zero v still creates a structural entry.
     *
     * @param i row index in [0, n)
     * @param j column index in [0, n)
     * @param v finite value
     * @throws IllegalArgumentException when an index is out of range or v is not finite
     */
    public void add(int i, int j, double v) {
        if (i < 0 || i >= n) {
            throw new IllegalArgumentException("i = " + i + " is outside [0, " + n + ")");
        }
        if (j < 0 || j >= n) {
            throw new IllegalArgumentException("j = " + j + " is outside [0, " + n + ")");
        }
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("value at (" + i + ", " + j + ") = " + v + " must be finite");
        }
        if (i == j) {
            append(i, i, v);
        } else if (i > j) {
            append(i, j, offDiagonalWeight * v);
        } else {
            append(j, i, offDiagonalWeight * v);
        }
    }

    /**
     * Adds a symmetric element matrix. Only its lower triangle (local row ≥ local column) is read, and each
     * local off-diagonal entry is added as the symmetric pair, whatever the {@link Input} mode; so a full
     * element matrix is added exactly once in both modes.
     *
     * @param dofs global indices of the element's unknowns, each in [0, n); a repeated index accumulates
     * @param k    element matrix, row-major m × m with m = dofs.length
     * @throws IllegalArgumentException on a size mismatch, an index out of range or a non-finite entry
     */
    public void addElement(int[] dofs, double[] k) {
        if (dofs == null || k == null) {
            throw new IllegalArgumentException("dofs and k must not be null");
        }
        int m = dofs.length;
        if (k.length != m * m) {
            throw new IllegalArgumentException("k.length = " + k.length + " but dofs.length² = " + m * m);
        }
        for (int a = 0; a < m; a++) {
            int ga = dofs[a];
            if (ga < 0 || ga >= n) {
                throw new IllegalArgumentException("dofs[" + a + "] = " + ga + " is outside [0, " + n + ")");
            }
        }
        ensureCapacity(size + m * (m + 1) / 2);
        for (int a = 0; a < m; a++) {
            int ga = dofs[a];
            for (int b = 0; b <= a; b++) {
                int gb = dofs[b];
                double v = k[a * m + b];
                if (!Double.isFinite(v)) {
                    throw new IllegalArgumentException("k[" + (a * m + b) + "] = " + v + " must be finite");
                }
                if (ga == gb && a != b) {
                    v *= 2; // two local entries (a, b) and (b, a) land on one global diagonal entry
                }
                if (ga >= gb) {
                    append(ga, gb, v);
                } else {
                    append(gb, ga, v);
                }
            }
        }
    }

    private void append(int r, int c, double v) {
        if (size == rows.length) {
            ensureCapacity(size + 1);
        }
        rows[size] = r;
        cols[size] = c;
        vals[size] = v;
        size++;
    }

    private void ensureCapacity(int needed) {
        if (needed <= rows.length) {
            return;
        }
        if (needed < 0) {
            throw new IllegalStateException("more than " + Integer.MAX_VALUE + " contributions");
        }
        long grown = Math.max(needed, rows.length + (rows.length >> 1) + 16L);
        int cap = (int) Math.min(Integer.MAX_VALUE - 8, grown);
        rows = Arrays.copyOf(rows, cap);
        cols = Arrays.copyOf(cols, cap);
        vals = Arrays.copyOf(vals, cap);
    }

    /**
     * Builds the matrix from the contributions so far. The builder stays usable: later contributions add to
     * the same entries and a later build includes them.
     *
     * @return a new immutable matrix with the full symmetric pattern
     */
    public SymmetricCsr build() {
        // counting sort of the lower-triangle contributions by row
        int[] start = new int[n + 1];
        for (int t = 0; t < size; t++) {
            start[rows[t] + 1]++;
        }
        for (int i = 0; i < n; i++) {
            start[i + 1] += start[i];
        }
        int[] next = Arrays.copyOf(start, n);
        int[] c = new int[size];
        double[] v = new double[size];
        for (int t = 0; t < size; t++) {
            int p = next[rows[t]]++;
            c[p] = cols[t];
            v[p] = vals[t];
        }
        // sort each row by column (stable, so duplicates sum in call order) and merge duplicates
        int[] lowStart = new int[n + 1];
        int w = 0;
        long[] keys = new long[0];
        double[] tmpV = new double[0];
        for (int i = 0; i < n; i++) {
            int b = start[i];
            int e = start[i + 1];
            int len = e - b;
            if (len <= 48) {
                insertionSort(c, v, b, e);
            } else {
                if (keys.length < len) {
                    keys = new long[len];
                    tmpV = new double[len];
                }
                for (int p = 0; p < len; p++) {
                    keys[p] = ((long) c[b + p] << 32) | p;
                    tmpV[p] = v[b + p];
                }
                Arrays.sort(keys, 0, len);
                for (int p = 0; p < len; p++) {
                    c[b + p] = (int) (keys[p] >>> 32);
                    v[b + p] = tmpV[(int) keys[p]];
                }
            }
            lowStart[i] = w;
            for (int p = b; p < e; p++) {
                if (w > lowStart[i] && c[w - 1] == c[p]) {
                    v[w - 1] += v[p];
                } else {
                    c[w] = c[p];
                    v[w] = v[p];
                    w++;
                }
            }
        }
        lowStart[n] = w;
        // full pattern: row i = lower part (cols ≤ i) followed by the transposed strictly-lower part (cols > i)
        int[] fullStart = new int[n + 1];
        for (int i = 0; i < n; i++) {
            fullStart[i + 1] += lowStart[i + 1] - lowStart[i];
            for (int p = lowStart[i]; p < lowStart[i + 1]; p++) {
                if (c[p] != i) {
                    fullStart[c[p] + 1]++;
                }
            }
        }
        for (int i = 0; i < n; i++) {
            fullStart[i + 1] += fullStart[i];
        }
        int[] fc = new int[fullStart[n]];
        double[] fv = new double[fullStart[n]];
        int[] fill = new int[n];
        for (int i = 0; i < n; i++) {
            int q = fullStart[i];
            int len = lowStart[i + 1] - lowStart[i];
            System.arraycopy(c, lowStart[i], fc, q, len);
            System.arraycopy(v, lowStart[i], fv, q, len);
            fill[i] = q + len;
        }
        for (int i = 0; i < n; i++) {
            for (int p = lowStart[i]; p < lowStart[i + 1]; p++) {
                int j = c[p];
                if (j != i) {
                    int q = fill[j]++;
                    fc[q] = i;
                    fv[q] = v[p];
                }
            }
        }
        return new SymmetricCsr(n, fullStart, fc, fv);
    }

    private static void insertionSort(int[] c, double[] v, int b, int e) {
        for (int p = b + 1; p < e; p++) {
            int key = c[p];
            double kv = v[p];
            int q = p - 1;
            while (q >= b && c[q] > key) {
                c[q + 1] = c[q];
                v[q + 1] = v[q];
                q--;
            }
            c[q + 1] = key;
            v[q + 1] = kv;
        }
    }
}
