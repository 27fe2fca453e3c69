package org.tensio.engine.linalg;

/**
 * Dense kernels of the multifrontal factorisation, on row-major blocks. A front of m rows and k pivot columns is
 * held as {@code L} (m × k, row-major, leading dimension k: the k × k diagonal block on top of the m − k rows
 * below) and {@code U} (p × p, row-major, p = m − k, lower triangle used) for the update (Schur complement)
 * matrix.
 * <p>
 * Every entry is computed as a dot product of two contiguous rows (the Cholesky–Banachiewicz, or "row
 * Cholesky", arrangement), register-blocked as 4 rows × 2 columns: eight independent accumulators hide the
 * floating-point add latency, and each loaded value is used two or four times. On the JIT this runs at several
 * GFlop/s without any vector API. The summation order of each entry depends only on its position in the front,
 * never on how rows are split between threads, so results are bit-identical for any parallelism.
 */
final class DenseKernels {

    private DenseKernels() {
    }

    /**
     * Cholesky factor of the k × k diagonal block (rows 0 … k−1 of L) in place; writes 1/L<sub>cc</sub> into
     * inv[c]. Returns −1 on success or the local column of the first pivot d with !(d &gt; tol·diag[c]) (d and
     * diag are then in pivotOut[0], pivotOut[1]). Row groups of four are processed in order: first their columns
     * left of the group ({@link #solveRange}), then the small triangle with the pivots ({@link #factorTriangle}).
     */
    static int factorDiagonal(double[] l, int k, double[] inv, double[] diag, double tol, double[] pivotOut,
            double[] minRatio) {
        for (int g0 = 0; g0 < k; g0 += 4) {
            int g1 = Math.min(g0 + 4, k);
            solveRange(l, k, inv, g0, g1, 0, g0);
            int bad = factorTriangle(l, k, inv, g0, g1, diag, tol, pivotOut, minRatio);
            if (bad >= 0) {
                return bad;
            }
        }
        return -1;
    }

    /**
     * Rows r0 … r1−1 of the diagonal block, columns cStart … cEnd−1 (cEnd ≤ r0), against the already factored rows
     * above: row groups of four start at multiples of 4 and cStart is a multiple of 4, so every entry is computed by
     * the same column pair with the same arithmetic however the columns are split into ranges — the parallel panel
     * schedule of the factorisation is therefore bit-identical to {@link #factorDiagonal}.
     */
    static void solveRange(double[] l, int k, double[] inv, int r0, int r1, int cStart, int cEnd) {
        for (int g = r0; g < r1; g += 4) {
            int g1 = Math.min(g + 4, r1);
            if (g1 - g == 4) {
                solveRows4(l, k, inv, g, cStart, cEnd);
            } else {
                for (int r = g; r < g1; r++) {
                    solveRow(l, k, inv, r, cStart, cEnd);
                }
            }
        }
    }

    /**
     * Rows g0 … g1−1 (one group of at most four) of the diagonal block: the entries left of the diagonal inside
     * the group, then the pivots, each checked against tol·diag. Returns −1 or the failing local column.
     */
    static int factorTriangle(double[] l, int k, double[] inv, int g0, int g1, double[] diag, double tol,
            double[] pivotOut, double[] minRatio) {
        for (int r = g0; r < g1; r++) {
            int rr = r * k;
            for (int c = g0; c < r; c++) {
                int rc = c * k;
                double s = l[rr + c];
                for (int j = 0; j < c; j++) {
                    s -= l[rr + j] * l[rc + j];
                }
                l[rr + c] = s * inv[c];
            }
            double d = l[rr + r];
            double d0 = 0;
            double d1 = 0;
            int j = 0;
            for (; j + 1 < r; j += 2) {
                d0 += l[rr + j] * l[rr + j];
                d1 += l[rr + j + 1] * l[rr + j + 1];
            }
            for (; j < r; j++) {
                d0 += l[rr + j] * l[rr + j];
            }
            d -= d0 + d1;
            double a = diag[r];
            if (!(d > tol * Math.abs(a)) || !(a > 0)) {
                pivotOut[0] = d;
                pivotOut[1] = a;
                return r;
            }
            double ratio = d / a;
            if (ratio < minRatio[0]) {
                minRatio[0] = ratio;
            }
            double sq = Math.sqrt(d);
            l[rr + r] = sq;
            inv[r] = 1 / sq;
        }
        return -1;
    }

    /**
     * Rows r0 … r1−1 (all ≥ k) of L: L[r][c] = (A[r][c] − L[r][0:c]·L[c][0:c]) / L[c][c] for c &lt; k, against the
     * factored diagonal block. Rows are independent; r0 should be aligned to 4 from k for reproducible
     * blocking (callers split at k + 4·t).
     */
    static void solvePanel(double[] l, int k, double[] inv, int r0, int r1) {
        int r = r0;
        for (; r + 3 < r1; r += 4) {
            solveRows4(l, k, inv, r, 0, k);
        }
        for (; r < r1; r++) {
            solveRow(l, k, inv, r, 0, k);
        }
    }

    /**
     * Four consecutive rows r … r+3, columns cStart … cEnd−1 (cStart even; cEnd even or not), each against the row
     * of its column: L[r][c] = (A[r][c] − L[r][0:c]·L[c][0:c]) / L[c][c], in column pairs.
     */
    private static void solveRows4(double[] l, int k, double[] inv, int r, int cStart, int cEnd) {
        int ra0 = r * k;
        int ra1 = ra0 + k;
        int ra2 = ra1 + k;
        int ra3 = ra2 + k;
        int c = cStart;
        for (; c + 1 < cEnd; c += 2) {
            int rc0 = c * k;
            int rc1 = rc0 + k;
            double s00 = 0, s01 = 0, s10 = 0, s11 = 0, s20 = 0, s21 = 0, s30 = 0, s31 = 0;
            for (int j = 0; j < c; j++) {
                double x0 = l[rc0 + j];
                double x1 = l[rc1 + j];
                double y0 = l[ra0 + j];
                double y1 = l[ra1 + j];
                double y2 = l[ra2 + j];
                double y3 = l[ra3 + j];
                s00 += y0 * x0;
                s01 += y0 * x1;
                s10 += y1 * x0;
                s11 += y1 * x1;
                s20 += y2 * x0;
                s21 += y2 * x1;
                s30 += y3 * x0;
                s31 += y3 * x1;
            }
            double ic0 = inv[c];
            double ic1 = inv[c + 1];
            double lcc = l[rc1 + c];
            double v0 = (l[ra0 + c] - s00) * ic0;
            double v1 = (l[ra1 + c] - s10) * ic0;
            double v2 = (l[ra2 + c] - s20) * ic0;
            double v3 = (l[ra3 + c] - s30) * ic0;
            l[ra0 + c] = v0;
            l[ra1 + c] = v1;
            l[ra2 + c] = v2;
            l[ra3 + c] = v3;
            l[ra0 + c + 1] = (l[ra0 + c + 1] - s01 - v0 * lcc) * ic1;
            l[ra1 + c + 1] = (l[ra1 + c + 1] - s11 - v1 * lcc) * ic1;
            l[ra2 + c + 1] = (l[ra2 + c + 1] - s21 - v2 * lcc) * ic1;
            l[ra3 + c + 1] = (l[ra3 + c + 1] - s31 - v3 * lcc) * ic1;
        }
        if (c < cEnd) {
            int rc0 = c * k;
            double s0 = 0, s1 = 0, s2 = 0, s3 = 0;
            for (int j = 0; j < c; j++) {
                double x0 = l[rc0 + j];
                s0 += l[ra0 + j] * x0;
                s1 += l[ra1 + j] * x0;
                s2 += l[ra2 + j] * x0;
                s3 += l[ra3 + j] * x0;
            }
            double ic0 = inv[c];
            l[ra0 + c] = (l[ra0 + c] - s0) * ic0;
            l[ra1 + c] = (l[ra1 + c] - s1) * ic0;
            l[ra2 + c] = (l[ra2 + c] - s2) * ic0;
            l[ra3 + c] = (l[ra3 + c] - s3) * ic0;
        }
    }

    /** One row r, columns cStart … cEnd−1; per entry the same arithmetic as {@link #solveRows4}. */
    private static void solveRow(double[] l, int k, double[] inv, int r, int cStart, int cEnd) {
        int ra = r * k;
        int c = cStart;
        for (; c + 1 < cEnd; c += 2) {
            int rc0 = c * k;
            int rc1 = rc0 + k;
            double s0 = 0, s1 = 0;
            for (int j = 0; j < c; j++) {
                double y = l[ra + j];
                s0 += y * l[rc0 + j];
                s1 += y * l[rc1 + j];
            }
            double v0 = (l[ra + c] - s0) * inv[c];
            l[ra + c] = v0;
            l[ra + c + 1] = (l[ra + c + 1] - s1 - v0 * l[rc1 + c]) * inv[c + 1];
        }
        if (c < cEnd) {
            int rc0 = c * k;
            double s0 = 0;
            for (int j = 0; j < c; j++) {
                s0 += l[ra + j] * l[rc0 + j];
            }
            l[ra + c] = (l[ra + c] - s0) * inv[c];
        }
    }

    /**
     * Update matrix rows a0 … a1−1: U[a][b] −= L[k+a][0:k]·L[k+b][0:k] for b ≤ a (tiles of 4 × 2 may also
     * write a few entries just above the diagonal of U; they are never read). a0 must be a multiple of 4.
     */
    static void schur(double[] l, int k, double[] u, int p, int a0, int a1) {
        int a = a0;
        for (; a + 3 < a1; a += 4) {
            int ra0 = (k + a) * k;
            int ra1 = ra0 + k;
            int ra2 = ra1 + k;
            int ra3 = ra2 + k;
            int bEnd = a + 4;
            int b = 0;
            for (; b + 1 < bEnd; b += 2) {
                int rb0 = (k + b) * k;
                int rb1 = rb0 + k;
                double s00 = 0, s01 = 0, s10 = 0, s11 = 0, s20 = 0, s21 = 0, s30 = 0, s31 = 0;
                for (int j = 0; j < k; j++) {
                    double x0 = l[rb0 + j];
                    double x1 = l[rb1 + j];
                    double y0 = l[ra0 + j];
                    double y1 = l[ra1 + j];
                    double y2 = l[ra2 + j];
                    double y3 = l[ra3 + j];
                    s00 += y0 * x0;
                    s01 += y0 * x1;
                    s10 += y1 * x0;
                    s11 += y1 * x1;
                    s20 += y2 * x0;
                    s21 += y2 * x1;
                    s30 += y3 * x0;
                    s31 += y3 * x1;
                }
                int q = a * p + b;
                u[q] -= s00;
                u[q + 1] -= s01;
                q += p;
                u[q] -= s10;
                u[q + 1] -= s11;
                q += p;
                u[q] -= s20;
                u[q + 1] -= s21;
                q += p;
                u[q] -= s30;
                u[q + 1] -= s31;
            }
        }
        for (; a < a1; a++) {
            int ra = (k + a) * k;
            int b = 0;
            for (; b + 1 <= a; b += 2) {
                int rb0 = (k + b) * k;
                int rb1 = rb0 + k;
                double s0 = 0, s1 = 0;
                for (int j = 0; j < k; j++) {
                    double y = l[ra + j];
                    s0 += y * l[rb0 + j];
                    s1 += y * l[rb1 + j];
                }
                u[a * p + b] -= s0;
                u[a * p + b + 1] -= s1;
            }
            if (b == a) {
                int rb0 = (k + b) * k;
                double s0 = 0;
                for (int j = 0; j < k; j++) {
                    s0 += l[ra + j] * l[rb0 + j];
                }
                u[a * p + b] -= s0;
            }
        }
    }
}
