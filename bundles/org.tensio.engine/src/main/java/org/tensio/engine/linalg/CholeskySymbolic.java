package org.tensio.engine.linalg;

import java.util.Arrays;

/**
 * Symbolic analysis for {@link SparseCholesky}: permutation with pinned unknowns removed, elimination tree,
 * postorder, column counts, fundamental supernodes, relaxed amalgamation and the row structure of every
 * supernode. Depends only on the pattern of A, the ordering and the pinned set.
 * <p>
 * Algorithms (Davis, <i>Direct Methods for Sparse Linear Systems</i>, SIAM 2006, ch. 4 — from memory): the
 * elimination tree by Liu's algorithm with path compression, a depth-first postorder, column counts by
 * traversing the row subtrees (O(nnz(L)) instead of the Gilbert–Ng–Peyton O(nnz(A)·α) method, simpler and
 * cheap next to the numeric phase), fundamental supernodes (Liu, Ng &amp; Peyton 1993), and relaxed
 * amalgamation with the thresholds of CHOLMOD (Chen, Davis, Hager &amp; Rajamanickam, ACM TOMS 35, 2008 —
 * from memory): merge a child into its parent when the merged supernode has at most 4 columns, or at most
 * 16 columns and under 80 % explicit zeros, or at most 48 and under 10 %, or any size and under 5 %.
 */
final class CholeskySymbolic {
    static final class T { static long last = System.nanoTime(); static StringBuilder sb = new StringBuilder(); static void t(String l) { long now = System.nanoTime(); sb.append(l).append(String.format("%.3f ", (now - last) * 1e-9)); last = now; if (l.equals("I")) { if (Boolean.getBoolean("sym.debug")) System.err.println(sb); sb.setLength(0);} } }

    /** Order of A. */
    final int n;
    /** Number of unknowns left after removing pinned ones (order of the factor). */
    final int nf;
    /** perm[k] = index in A of factor unknown k, k &lt; nf (fill-reducing order composed with the postorder). */
    final int[] perm;
    /** inv[i] = factor index of unknown i of A, −1 when pinned. */
    final int[] inv;

    /** Lower triangle of PAPᵀ by columns: column j holds rows ≥ j at colPtr[j] … colPtr[j+1]−1. */
    final int[] colPtr;
    final int[] rowIdx;
    /** Position in A's value array of each entry of the permuted lower triangle. */
    final int[] srcPos;

    /** Elimination tree of the factor, −1 for roots. */
    final int[] parent;
    /** Number of non-zeros of each column of L, diagonal included. */
    final int[] colCount;
    final long nnzL;
    final double flops;

    /** Supernodes: columns superStart[s] … superStart[s+1]−1. */
    final int nsuper;
    final int[] superStart;
    final int[] superParent;
    /** Row structure of each supernode: its own columns in order, then the rows below, increasing. */
    final int[][] superRows;
    /** Children of each supernode, increasing. */
    final int[][] children;
    /** Smallest supernode index in the subtree of each supernode (subtrees are contiguous ranges). */
    final int[] firstDescendant;
    /** Work of each supernode (Σ colCount² over its columns, as stored with amalgamation zeros). */
    final double[] work;
    /** Work of each supernode's subtree. */
    final double[] subtreeWork;
    final long storedEntries;
    final int maxFront;

    CholeskySymbolic(SymmetricCsr a, boolean[] pinnedMask, Ordering ordering) {
        n = a.n();
        int[] rs = a.rowStart();
        int[] ci = a.columns();
        int[] order = ordering.newToOldArray();
        int count = 0;
        for (int i = 0; i < n; i++) {
            if (!pinnedMask[i]) {
                count++;
            }
        }
        nf = count;
        int[] p0 = new int[nf];
        int w = 0;
        for (int k = 0; k < n; k++) {
            if (!pinnedMask[order[k]]) {
                p0[w++] = order[k];
            }
        }
        // elimination tree of the ordering, then postorder it and relabel
        T.t("A");
        int[][] upper0 = upperPattern(rs, ci, p0);
        T.t("B");
        int[] parent0 = etree(upper0[0], upper0[1], nf);
        T.t("C");
        int[] post = postorder(parent0, nf);
        perm = new int[nf];
        for (int k = 0; k < nf; k++) {
            perm[k] = p0[post[k]];
        }
        inv = fullInverse(perm);
        int[] postInv = new int[nf];
        for (int k = 0; k < nf; k++) {
            postInv[post[k]] = k;
        }
        parent = new int[nf];
        for (int k = 0; k < nf; k++) {
            int pk = parent0[post[k]];
            parent[k] = pk < 0 ? -1 : postInv[pk];
        }
        T.t("D");
        int[][] upper = upperPattern(rs, ci, perm);
        T.t("E");
        int[][] lower = lowerPattern(rs, ci, perm);
        colPtr = lower[0];
        rowIdx = lower[1];
        srcPos = lower[2];
        T.t("F");
        colCount = columnCounts(upper[0], upper[1], parent, nf);
        long nz = 0;
        double fl = 0;
        for (int j = 0; j < nf; j++) {
            nz += colCount[j];
            fl += (double) colCount[j] * colCount[j];
        }
        nnzL = nz;
        flops = fl;

        T.t("G");
        // ---- fundamental supernodes
        int[] nchild = new int[nf];
        for (int j = 0; j < nf; j++) {
            if (parent[j] >= 0) {
                nchild[parent[j]]++;
            }
        }
        int[] fStart = new int[nf + 1];
        int nfs = 0;
        for (int j = 0; j < nf; j++) {
            boolean extend = j > 0 && parent[j - 1] == j && colCount[j - 1] == colCount[j] + 1 && nchild[j] == 1;
            if (!extend) {
                fStart[nfs++] = j;
            }
        }
        fStart[nfs] = nf;
        int[] superOf = new int[nf];
        for (int s = 0; s < nfs; s++) {
            for (int j = fStart[s]; j < fStart[s + 1]; j++) {
                superOf[j] = s;
            }
        }
        int[] fParent = new int[nfs];
        for (int s = 0; s < nfs; s++) {
            int pj = parent[fStart[s + 1] - 1];
            fParent[s] = pj < 0 ? -1 : superOf[pj];
        }

        // ---- relaxed amalgamation (representative = lowest fundamental supernode of a merged run)
        int[] nscol = new int[nfs];
        int[] snz = new int[nfs];
        double[] zeros = new double[nfs];
        int[] repEnd = new int[nfs];
        boolean[] absorbed = new boolean[nfs];
        for (int s = 0; s < nfs; s++) {
            nscol[s] = fStart[s + 1] - fStart[s];
            snz[s] = colCount[fStart[s]];
            repEnd[s] = s;
        }
        for (int s = nfs - 2; s >= 0; s--) {
            int ps = fParent[s];
            int r = s + 1;
            if (ps < r || ps > repEnd[r]) {
                continue;
            }
            int ns = nscol[s] + nscol[r];
            double newZeros = (double) nscol[s] * (nscol[s] + snz[r] - snz[s]);
            double totZeros = zeros[s] + zeros[r] + newZeros;
            double below = snz[r] - nscol[r];
            double totSize = ns * (ns + 1.0) / 2 + ns * below;
            double z = totZeros / totSize;
            boolean merge = ns <= 4 || newZeros == 0 || (ns <= 16 && z < 0.8) || (ns <= 48 && z < 0.1) || z < 0.05;
            if (merge) {
                snz[s] = nscol[s] + snz[r];
                nscol[s] = ns;
                zeros[s] = totZeros;
                repEnd[s] = repEnd[r];
                absorbed[r] = true;
            }
        }
        int ns = 0;
        for (int s = 0; s < nfs; s++) {
            if (!absorbed[s]) {
                ns++;
            }
        }
        nsuper = ns;
        superStart = new int[ns + 1];
        int t = 0;
        for (int s = 0; s < nfs; s++) {
            if (!absorbed[s]) {
                superStart[t++] = fStart[s];
            }
        }
        superStart[ns] = nf;
        for (int s = 0; s < ns; s++) {
            for (int j = superStart[s]; j < superStart[s + 1]; j++) {
                superOf[j] = s;
            }
        }
        superParent = new int[ns];
        int[] nch = new int[ns];
        for (int s = 0; s < ns; s++) {
            int pj = parent[superStart[s + 1] - 1];
            superParent[s] = pj < 0 ? -1 : superOf[pj];
            if (superParent[s] >= 0) {
                nch[superParent[s]]++;
            }
        }
        children = new int[ns][];
        for (int s = 0; s < ns; s++) {
            children[s] = new int[nch[s]];
            nch[s] = 0;
        }
        for (int s = 0; s < ns; s++) {
            int q = superParent[s];
            if (q >= 0) {
                children[q][nch[q]++] = s;
            }
        }
        firstDescendant = new int[ns];
        for (int s = 0; s < ns; s++) {
            firstDescendant[s] = s;
        }
        for (int s = 0; s < ns; s++) {
            int q = superParent[s];
            if (q >= 0) {
                firstDescendant[q] = Math.min(firstDescendant[q], firstDescendant[s]);
            }
        }

        T.t("H");
        // ---- row structure of each supernode
        superRows = new int[ns][];
        int[] mark = new int[nf];
        Arrays.fill(mark, -1);
        int[] buf = new int[Math.max(1, nf)];
        long stored = 0;
        int maxM = 0;
        work = new double[ns];
        subtreeWork = new double[ns];
        for (int s = 0; s < ns; s++) {
            int f = superStart[s];
            int l = superStart[s + 1] - 1;
            int k = l - f + 1;
            int m = 0;
            for (int j = f; j <= l; j++) {
                mark[j] = s;
                buf[m++] = j;
            }
            for (int j = f; j <= l; j++) {
                for (int q = colPtr[j]; q < colPtr[j + 1]; q++) {
                    int i = rowIdx[q];
                    if (i > l && mark[i] != s) {
                        mark[i] = s;
                        buf[m++] = i;
                    }
                }
            }
            for (int c : children[s]) {
                int[] cr = superRows[c];
                for (int q = superStart[c + 1] - superStart[c]; q < cr.length; q++) {
                    int i = cr[q];
                    if (mark[i] != s) {
                        mark[i] = s;
                        buf[m++] = i;
                    }
                }
            }
            Arrays.sort(buf, k, m);
            superRows[s] = Arrays.copyOf(buf, m);
            stored += (long) m * k;
            maxM = Math.max(maxM, m);
            double wk = 0;
            for (int c = 0; c < k; c++) {
                double len = m - c;
                wk += len * len;
            }
            work[s] = wk;
        }
        for (int s = 0; s < ns; s++) {
            subtreeWork[s] += work[s];
            if (superParent[s] >= 0) {
                subtreeWork[superParent[s]] += subtreeWork[s];
            }
        }
        T.t("I");
        storedEntries = stored;
        maxFront = maxM;
    }

    /**
     * Strict upper triangle of PAPᵀ by columns (equivalently the strict lower triangle by rows): column k lists
     * the rows i &lt; k. Pinned unknowns (inv = −1 in the full-size map) are dropped.
     */
    private int[][] upperPattern(int[] rs, int[] ci, int[] p) {
        int m = p.length;
        int[] full = fullInverse(p);
        int[] ptr = new int[m + 1];
        for (int k = 0; k < m; k++) {
            int r = p[k];
            int c = 0;
            for (int q = rs[r]; q < rs[r + 1]; q++) {
                int i = full[ci[q]];
                if (i >= 0 && i < k) {
                    c++;
                }
            }
            ptr[k + 1] = ptr[k] + c;
        }
        int[] idx = new int[ptr[m]];
        for (int k = 0; k < m; k++) {
            int r = p[k];
            int w = ptr[k];
            for (int q = rs[r]; q < rs[r + 1]; q++) {
                int i = full[ci[q]];
                if (i >= 0 && i < k) {
                    idx[w++] = i;
                }
            }
        }
        return new int[][] {ptr, idx};
    }

    /** Lower triangle (diagonal included) of PAPᵀ by columns, rows increasing, with source positions. */
    private int[][] lowerPattern(int[] rs, int[] ci, int[] p) {
        int m = p.length;
        int[] full = fullInverse(p);
        int[] ptr = new int[m + 1];
        for (int j = 0; j < m; j++) {
            int r = p[j];
            int c = 0;
            for (int q = rs[r]; q < rs[r + 1]; q++) {
                int i = full[ci[q]];
                if (i >= j) {
                    c++;
                }
            }
            ptr[j + 1] = ptr[j] + c;
        }
        int[] idx = new int[ptr[m]];
        int[] src = new int[ptr[m]];
        long[] keys = new long[16];
        for (int j = 0; j < m; j++) {
            int r = p[j];
            int w = 0;
            int len = ptr[j + 1] - ptr[j];
            if (keys.length < len) {
                keys = new long[len];
            }
            for (int q = rs[r]; q < rs[r + 1]; q++) {
                int i = full[ci[q]];
                if (i >= j) {
                    keys[w++] = ((long) i << 32) | q;
                }
            }
            Arrays.sort(keys, 0, w);
            for (int t = 0; t < w; t++) {
                idx[ptr[j] + t] = (int) (keys[t] >>> 32);
                src[ptr[j] + t] = (int) keys[t];
            }
        }
        return new int[][] {ptr, idx, src};
    }

    private int[] fullInverse(int[] p) {
        int[] full = new int[n];
        Arrays.fill(full, -1);
        for (int k = 0; k < p.length; k++) {
            full[p[k]] = k;
        }
        return full;
    }

    /** Liu's elimination-tree algorithm with path compression (Davis 2006, §4.1). */
    static int[] etree(int[] ptr, int[] idx, int m) {
        int[] par = new int[m];
        int[] anc = new int[m];
        for (int k = 0; k < m; k++) {
            par[k] = -1;
            anc[k] = -1;
            for (int q = ptr[k]; q < ptr[k + 1]; q++) {
                int i = idx[q];
                while (i != -1 && i < k) {
                    int next = anc[i];
                    anc[i] = k;
                    if (next == -1) {
                        par[i] = k;
                    }
                    i = next;
                }
            }
        }
        return par;
    }

    /** Depth-first postorder of a forest, children visited in increasing order (Davis 2006, §4.3). */
    static int[] postorder(int[] par, int m) {
        int[] head = new int[m];
        int[] next = new int[m];
        Arrays.fill(head, -1);
        for (int j = m - 1; j >= 0; j--) {
            if (par[j] >= 0) {
                next[j] = head[par[j]];
                head[par[j]] = j;
            }
        }
        int[] post = new int[m];
        int[] stack = new int[m];
        int k = 0;
        for (int root = 0; root < m; root++) {
            if (par[root] != -1) {
                continue;
            }
            int top = 0;
            stack[0] = root;
            while (top >= 0) {
                int p = stack[top];
                int c = head[p];
                if (c == -1) {
                    top--;
                    post[k++] = p;
                } else {
                    head[p] = next[c];
                    stack[++top] = c;
                }
            }
        }
        return post;
    }

    /** Column counts of L by walking each row subtree of the elimination tree (Davis 2006, §4.4). */
    static int[] columnCounts(int[] ptr, int[] idx, int[] par, int m) {
        int[] cc = new int[m];
        int[] mark = new int[m];
        Arrays.fill(mark, -1);
        for (int k = 0; k < m; k++) {
            cc[k]++;
            mark[k] = k;
            for (int q = ptr[k]; q < ptr[k + 1]; q++) {
                int i = idx[q];
                while (mark[i] != k) {
                    cc[i]++;
                    mark[i] = k;
                    i = par[i];
                }
            }
        }
        return cc;
    }
}
