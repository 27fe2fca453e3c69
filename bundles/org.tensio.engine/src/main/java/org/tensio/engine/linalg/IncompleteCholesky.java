package org.tensio.engine.linalg;

/** IC(0) preconditioner; see {@link Preconditioner#incompleteCholesky(SymmetricCsr)}. Immutable. */
final class IncompleteCholesky implements Preconditioner {

    private final int n;
    private final int[] rowStart;
    private final int[] col;
    /** Strictly lower entries of L̃ by rows. */
    private final double[] val;
    private final double[] diag;
    private final double shift;

    private IncompleteCholesky(int n, int[] rowStart, int[] col, double[] val, double[] diag, double shift) {
        this.n = n;
        this.rowStart = rowStart;
        this.col = col;
        this.val = val;
        this.diag = diag;
        this.shift = shift;
    }

    static IncompleteCholesky of(SymmetricCsr a) {
        int n = a.n();
        int[] rs = a.rowStart();
        int[] ci = a.columns();
        double[] av = a.values();
        double[] ad = a.diagonal();
        for (int i = 0; i < n; i++) {
            if (!(ad[i] > 0)) {
                throw new IllegalArgumentException("diagonal a[" + i + "][" + i + "] = " + ad[i]
                        + " must be positive for incomplete Cholesky");
            }
        }
        int[] lrs = new int[n + 1];
        for (int i = 0; i < n; i++) {
            int c = 0;
            for (int p = rs[i]; p < rs[i + 1] && ci[p] < i; p++) {
                c++;
            }
            lrs[i + 1] = lrs[i] + c;
        }
        int[] lc = new int[lrs[n]];
        for (int i = 0; i < n; i++) {
            int w = lrs[i];
            for (int p = rs[i]; p < rs[i + 1] && ci[p] < i; p++) {
                lc[w++] = ci[p];
            }
        }
        double shift = 0;
        for (int attempt = 0; attempt < 12; attempt++) {
            double[] lv = new double[lrs[n]];
            double[] d = new double[n];
            if (factor(n, rs, ci, av, ad, lrs, lc, lv, d, shift)) {
                return new IncompleteCholesky(n, lrs, lc, lv, d, shift);
            }
            shift = shift == 0 ? 1e-3 : 4 * shift;
        }
        // a shift of 4^11·1e-3 makes A + α·diag(A) strongly diagonally dominant; unreachable for valid input
        throw new IllegalArgumentException("incomplete Cholesky failed even with diagonal shift " + shift);
    }

    /** Row-oriented IC(0): l_ik = (a_ik − Σ_j l_ij l_kj) / l_kk over the common pattern j &lt; k. */
    private static boolean factor(int n, int[] rs, int[] ci, double[] av, double[] ad, int[] lrs, int[] lc,
            double[] lv, double[] d, double shift) {
        for (int i = 0; i < n; i++) {
            int w = lrs[i];
            for (int p = rs[i]; p < rs[i + 1] && ci[p] < i; p++) {
                lv[w++] = av[p];
            }
            for (int q = lrs[i]; q < lrs[i + 1]; q++) {
                int k = lc[q];
                double s = lv[q];
                // sparse dot of row i (entries before q) with row k, both sorted by column
                int pi = lrs[i];
                int pk = lrs[k];
                int ek = lrs[k + 1];
                while (pi < q && pk < ek) {
                    int ciq = lc[pi];
                    int ckq = lc[pk];
                    if (ciq == ckq) {
                        s -= lv[pi++] * lv[pk++];
                    } else if (ciq < ckq) {
                        pi++;
                    } else {
                        pk++;
                    }
                }
                lv[q] = s / d[k];
            }
            double s = ad[i] * (1 + shift);
            for (int q = lrs[i]; q < lrs[i + 1]; q++) {
                s -= lv[q] * lv[q];
            }
            if (!(s > 1e-12 * ad[i])) {
                return false;
            }
            d[i] = Math.sqrt(s);
        }
        return true;
    }

    /** @return the relative diagonal shift α that was needed (0 when IC(0) of A itself succeeded) */
    double shift() {
        return shift;
    }

    @Override
    public void apply(double[] r, double[] z) {
        for (int i = 0; i < n; i++) {
            double s = r[i];
            for (int q = rowStart[i]; q < rowStart[i + 1]; q++) {
                s -= val[q] * z[col[q]];
            }
            z[i] = s / diag[i];
        }
        for (int i = n - 1; i >= 0; i--) {
            double v = z[i] / diag[i];
            z[i] = v;
            for (int q = rowStart[i]; q < rowStart[i + 1]; q++) {
                z[col[q]] -= val[q] * v;
            }
        }
    }
}
