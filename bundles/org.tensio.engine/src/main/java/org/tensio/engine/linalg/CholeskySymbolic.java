package org.tensio.engine.linalg;

import java.util.Arrays;

/**
 * Symbolic analysis for {@link SparseCholesky}: permutation with pinned unknowns removed, elimination tree,
 * postorder, column counts, fundamental supernodes, relaxed amalgamation and the row structure of every
 * supernode. Depends only on the pattern of A, the ordering and the pinned set.
 * <p>
 * Algorithms (Davis, <i>Direct Methods for Sparse Linear Systems</i>, SIAM 2006, ch. 4 — from memory): the
 * elimination tree by Liu's algorithm with path compression, a depth-first postorder, column counts by the
 * Gilbert–Ng–Peyton skeleton method in O(nnz(A)·α), fundamental supernodes (Liu, Ng &amp; Peyton, SIAM J. Matrix
 * Anal. Appl. 14, 1993), and relaxed amalgamation with the thresholds of CHOLMOD (Chen, Davis, Hager &amp;
 * Rajamanickam, ACM TOMS 35, 2008 — from memory): merge a child into its parent when the merged supernode has at
 * most 4 columns, or at most 16 columns and under 80 % explicit zeros, or at most 48 and under 10 %, or any size
 * and under 5 %. A child is merged only when its columns immediately precede the parent's, so supernodes stay
 * contiguous column ranges in postorder and the multifrontal stack discipline holds.
 */
final class CholeskySymbolic {

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
        int[] parent0 = etree(rs, ci, p0, fullInverse(p0));
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
        int[][] lower = lowerPattern(rs, ci, perm, inv);
        colPtr = lower[0];
        rowIdx = lower[1];
        srcPos = lower[2];
        colCount = columnCounts(colPtr, rowIdx, parent, nf);
        long nz = 0;
        double fl = 0;
        for (int j = 0; j < nf; j++) {
            nz += colCount[j];
            fl += (double) colCount[j] * colCount[j];
        }
        nnzL = nz;
        flops = fl;

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
        storedEntries = stored;
        maxFront = maxM;
    }

    /** Lower triangle (diagonal included) of PAPᵀ by columns, rows increasing, with source positions in A. */
    private static int[][] lowerPattern(int[] rs, int[] ci, int[] p, int[] full) {
        int m = p.length;
        int[] ptr = new int[m + 1];
        for (int j = 0; j < m; j++) {
            int r = p[j];
            int c = 0;
            for (int q = rs[r]; q < rs[r + 1]; q++) {
                if (full[ci[q]] >= j) {
                    c++;
                }
            }
            ptr[j + 1] = ptr[j] + c;
        }
        int[] idx = new int[ptr[m]];
        int[] src = new int[ptr[m]];
        for (int j = 0; j < m; j++) {
            int r = p[j];
            int b = ptr[j];
            int w = b;
            for (int q = rs[r]; q < rs[r + 1]; q++) {
                int i = full[ci[q]];
                if (i >= j) {
                    // insertion into the sorted run idx[b … w)
                    int t = w++;
                    while (t > b && idx[t - 1] > i) {
                        idx[t] = idx[t - 1];
                        src[t] = src[t - 1];
                        t--;
                    }
                    idx[t] = i;
                    src[t] = q;
                }
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

    /**
     * Liu's elimination-tree algorithm with path compression (Davis 2006, §4.1), reading row p[k] of the full
     * pattern of A for the entries i &lt; k of row k of PAPᵀ; full maps A's indices to the order (−1 = pinned).
     */
    static int[] etree(int[] rs, int[] ci, int[] p, int[] full) {
        int m = p.length;
        int[] par = new int[m];
        int[] anc = new int[m];
        for (int k = 0; k < m; k++) {
            par[k] = -1;
            anc[k] = -1;
            int r = p[k];
            for (int q = rs[r]; q < rs[r + 1]; q++) {
                int i = full[ci[q]];
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

    /**
     * Column counts of L in O(nnz(A)·α) by the skeleton-matrix / least-common-ancestor method of Gilbert, Ng
     * &amp; Peyton (SIAM J. Matrix Anal. Appl. 15, 1994), as in CSparse's cs_counts (Davis 2006, §4.5 — from
     * memory). The tree must be postordered (children before parents, subtrees contiguous); ptr/idx is the
     * lower triangle by columns.
     */
    static int[] columnCounts(int[] ptr, int[] idx, int[] par, int m) {
        int[] delta = new int[m];
        int[] first = new int[m];
        int[] maxFirst = new int[m];
        int[] prevLeaf = new int[m];
        int[] ancestor = new int[m];
        Arrays.fill(first, -1);
        Arrays.fill(maxFirst, -1);
        Arrays.fill(prevLeaf, -1);
        for (int k = 0; k < m; k++) {
            int j = k;
            delta[j] = first[j] == -1 ? 1 : 0;
            for (; j != -1 && first[j] == -1; j = par[j]) {
                first[j] = k;
            }
            ancestor[k] = k;
        }
        for (int j = 0; j < m; j++) {
            if (par[j] != -1) {
                delta[par[j]]--;
            }
            for (int q = ptr[j]; q < ptr[j + 1]; q++) {
                int i = idx[q];
                if (i <= j || first[j] <= maxFirst[i]) {
                    continue; // j is not a leaf of the i-th row subtree
                }
                maxFirst[i] = first[j];
                int jprev = prevLeaf[i];
                prevLeaf[i] = j;
                delta[j]++; // A(i, j) is in the skeleton matrix
                if (jprev != -1) {
                    // subsequent leaf: subtract at the least common ancestor of jprev and j
                    int lca = jprev;
                    while (lca != ancestor[lca]) {
                        lca = ancestor[lca];
                    }
                    for (int s = jprev; s != lca;) {
                        int next = ancestor[s];
                        ancestor[s] = lca;
                        s = next;
                    }
                    delta[lca]--;
                }
            }
            if (par[j] != -1) {
                ancestor[j] = par[j];
            }
        }
        for (int j = 0; j < m; j++) {
            if (par[j] != -1) {
                delta[par[j]] += delta[j];
            }
        }
        return delta;
    }

    /** Column counts by walking each row subtree, O(nnz(L)); a slow reference for the tests. */
    static int[] columnCountsByRowSubtrees(SymmetricCsr a, CholeskySymbolic s) {
        int m = s.nf;
        int[] cc = new int[m];
        int[] mark = new int[m];
        Arrays.fill(mark, -1);
        for (int k = 0; k < m; k++) {
            cc[k]++;
            mark[k] = k;
            int r = s.perm[k];
            for (int q = a.rowStart()[r]; q < a.rowStart()[r + 1]; q++) {
                int i = s.inv[a.columns()[q]];
                while (i >= 0 && i < k && mark[i] != k) {
                    cc[i]++;
                    mark[i] = k;
                    i = s.parent[i];
                }
            }
        }
        return cc;
    }
}
