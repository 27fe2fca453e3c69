package org.tensio.engine.linalg;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.ForkJoinTask;
import java.util.concurrent.RecursiveAction;
import java.util.concurrent.RecursiveTask;
import java.util.concurrent.atomic.AtomicReference;

/**
 * Numeric multifrontal Cholesky factorisation (Duff &amp; Reid 1983; Liu, SIAM Review 34, 1992 — from memory)
 * over the supernodes of a {@link CholeskySymbolic}. Each supernode's frontal matrix is assembled from the
 * columns of PAPᵀ and the update matrices of its children (extend-add), partially factored by the dense
 * kernels, and its own update matrix is passed to its parent. Independent subtrees run in parallel on a
 * fork-join pool, and large fronts split their panel and update rows between threads; the arithmetic of each
 * entry is independent of the split, so the factor is bit-identical for every parallelism.
 */
final class CholeskyNumeric {

    /** Subtrees with less work than this (Σ colCount²) are factored sequentially in one task. */
    private static final double SEQUENTIAL_SUBTREE_WORK = 4e6;
    /** Fronts whose update work exceeds this split their rows between threads. */
    private static final double PARALLEL_FRONT_WORK = 2e6;
    private static final int MAX_FORK_DEPTH = 48;
    /** Diagonal blocks with at least this many columns are factored in parallel panels of PANEL rows. */
    private static final int PARALLEL_DIAGONAL_COLUMNS = 192;
    private static final int PANEL = 64;
    private static final int POLL_COLUMNS = 2048;
    private static final double POLL_WORK = 2e8;

    private final CholeskySymbolic sym;
    private final double[] av;
    private final double[] diag;
    private final double tol;
    private final ProgressMonitor monitor;
    private final int threads;
    final double[][] blocks;

    private ForkJoinPool pool;
    private volatile boolean abort;
    private final AtomicReference<RuntimeException> failure = new AtomicReference<>();
    private final ThreadLocal<int[]> relMap;
    private final Object progressLock = new Object();
    private double workDone;
    private double lastReported;
    private long columnsSincePoll;
    private double workSincePoll;
    private double minPivotRatio = Double.POSITIVE_INFINITY;

    CholeskyNumeric(CholeskySymbolic sym, SymmetricCsr a, double tol, ProgressMonitor monitor, int threads) {
        this.sym = sym;
        this.av = a.values();
        this.tol = tol;
        this.monitor = monitor;
        this.threads = threads;
        this.blocks = new double[sym.nsuper][];
        this.diag = new double[sym.nf];
        for (int j = 0; j < sym.nf; j++) {
            int q = sym.colPtr[j];
            diag[j] = q < sym.colPtr[j + 1] && sym.rowIdx[q] == j ? av[sym.srcPos[q]] : 0;
        }
        int nf = sym.nf;
        this.relMap = ThreadLocal.withInitial(() -> new int[nf]);
    }

    double minPivotRatio() {
        return minPivotRatio;
    }

    void run() {
        try {
            if (threads <= 1 || sym.nsuper < 2) {
                sequentialRange(0, sym.nsuper - 1);
            } else {
                pool = new ForkJoinPool(threads);
                try {
                    pool.invoke(new RecursiveAction() {
                        private static final long serialVersionUID = 1L;

                        @Override
                        protected void compute() {
                            List<ForkJoinTask<double[]>> tasks = new ArrayList<>();
                            for (int s = 0; s < sym.nsuper; s++) {
                                if (sym.superParent[s] < 0) {
                                    tasks.add(subtreeTask(s, 0));
                                }
                            }
                            invokeAll(tasks);
                        }
                    });
                } finally {
                    pool.shutdown();
                }
            }
        } catch (RuntimeException e) {
            RuntimeException first = failure.get();
            throw first != null ? first : e;
        }
        RuntimeException first = failure.get();
        if (first != null) {
            throw first;
        }
        synchronized (progressLock) {
            monitor.worked(1.0);
        }
    }

    private ForkJoinTask<double[]> subtreeTask(int s, int depth) {
        return new RecursiveTask<>() {
            private static final long serialVersionUID = 1L;

            @Override
            protected double[] compute() {
                return subtree(s, depth);
            }
        };
    }

    /** Update matrix of supernode s after factoring its whole subtree, forking big independent subtrees. */
    private double[] subtree(int s, int depth) {
        if (sym.subtreeWork[s] < SEQUENTIAL_SUBTREE_WORK || depth > MAX_FORK_DEPTH) {
            return sequentialRange(sym.firstDescendant[s], s);
        }
        // walk down a chain of single big children iteratively (no recursion per chain link)
        List<Integer> chain = new ArrayList<>();
        int t = s;
        chain.add(t);
        while (sym.children[t].length == 1 && sym.subtreeWork[sym.children[t][0]] >= SEQUENTIAL_SUBTREE_WORK) {
            t = sym.children[t][0];
            chain.add(t);
        }
        int[] ch = sym.children[t];
        double[][] upd = new double[ch.length][];
        List<ForkJoinTask<double[]>> forks = new ArrayList<>();
        List<Integer> forkIndex = new ArrayList<>();
        for (int i = 0; i < ch.length; i++) {
            if (sym.subtreeWork[ch[i]] >= SEQUENTIAL_SUBTREE_WORK) {
                forks.add(subtreeTask(ch[i], depth + 1));
                forkIndex.add(i);
            }
        }
        if (!forks.isEmpty()) {
            for (int i = 1; i < forks.size(); i++) {
                forks.get(i).fork();
            }
        }
        for (int i = 0; i < ch.length; i++) {
            if (sym.subtreeWork[ch[i]] < SEQUENTIAL_SUBTREE_WORK) {
                upd[i] = sequentialRange(sym.firstDescendant[ch[i]], ch[i]);
            }
        }
        if (!forks.isEmpty()) {
            upd[forkIndex.get(0)] = forks.get(0).invoke();
            for (int i = 1; i < forks.size(); i++) {
                upd[forkIndex.get(i)] = forks.get(i).join();
            }
        }
        double[] u = front(t, upd);
        for (int c = chain.size() - 2; c >= 0; c--) {
            u = front(chain.get(c), new double[][] {u});
        }
        return u;
    }

    /** Factors supernodes from … to in order with an explicit stack; returns the update matrix of {@code to}. */
    private double[] sequentialRange(int from, int to) {
        if (to < from) {
            return null;
        }
        double[][] stack = new double[16][];
        int top = 0;
        for (int s = from; s <= to; s++) {
            int nc = sym.children[s].length;
            double[][] upd = new double[nc][];
            for (int i = nc - 1; i >= 0; i--) {
                upd[i] = stack[--top];
                stack[top] = null;
            }
            double[] u = front(s, upd);
            if (top == stack.length) {
                stack = java.util.Arrays.copyOf(stack, 2 * top);
            }
            stack[top++] = u;
        }
        return stack[--top];
    }

    /** Assembles, factors and stores supernode s; returns its update matrix (null for a root). */
    private double[] front(int s, double[][] childUpdates) {
        if (abort) {
            throw new CancellationException("factorisation abandoned");
        }
        try {
            return frontUnchecked(s, childUpdates);
        } catch (RuntimeException e) {
            if (failure.compareAndSet(null, e)) {
                abort = true;
            }
            throw e;
        }
    }

    private double[] frontUnchecked(int s, double[][] childUpdates) {
        int f = sym.superStart[s];
        int k = sym.superStart[s + 1] - f;
        int[] rows = sym.superRows[s];
        int m = rows.length;
        int p = m - k;
        int[] map = relMap.get();
        for (int t = 0; t < m; t++) {
            map[rows[t]] = t;
        }
        double[] l = new double[m * k];
        double[] u = p > 0 ? new double[p * p] : null;
        int[] cp = sym.colPtr;
        int[] ri = sym.rowIdx;
        int[] src = sym.srcPos;
        for (int c = 0; c < k; c++) {
            int j = f + c;
            for (int q = cp[j]; q < cp[j + 1]; q++) {
                l[map[ri[q]] * k + c] += av[src[q]];
            }
        }
        int[] ch = sym.children[s];
        for (int i = 0; i < ch.length; i++) {
            extendAdd(ch[i], childUpdates[i], map, l, k, u, p);
            childUpdates[i] = null;
        }
        double[] inv = new double[k];
        double[] piv = new double[2];
        double[] ratio = {Double.POSITIVE_INFINITY};
        double[] dg = new double[k];
        System.arraycopy(diag, f, dg, 0, k);
        int bad = pool != null && k >= PARALLEL_DIAGONAL_COLUMNS
                ? parallelDiagonal(l, k, inv, dg, piv, ratio)
                : DenseKernels.factorDiagonal(l, k, inv, dg, tol, piv, ratio);
        if (bad >= 0) {
            int col = f + bad;
            throw new NotPositiveDefiniteException(sym.perm[col], col, piv[0], piv[1], tol);
        }
        if (p > 0) {
            double panelWork = (double) p * k * k;
            double schurWork = (double) p * p * k / 2;
            if (pool != null && panelWork + schurWork > PARALLEL_FRONT_WORK) {
                parallelRows(l, k, inv, u, p, true);
                parallelRows(l, k, inv, u, p, false);
            } else {
                DenseKernels.solvePanel(l, k, inv, k, m);
                DenseKernels.schur(l, k, u, p, 0, p);
            }
        }
        blocks[s] = l;
        progress(k, sym.work[s], ratio[0]);
        return u;
    }

    /**
     * The diagonal block in panels of {@value #PANEL} rows: the columns left of a panel are independent between its
     * row groups and are computed in parallel, the triangle of the panel sequentially; the same arithmetic per
     * entry as {@link DenseKernels#factorDiagonal}.
     */
    private int parallelDiagonal(double[] l, int k, double[] inv, double[] dg, double[] piv, double[] ratio) {
        for (int p0 = 0; p0 < k; p0 += PANEL) {
            int p1 = Math.min(p0 + PANEL, k);
            if (p0 > 0) {
                int groups = (p1 - p0 + 3) / 4;
                int tasks = Math.min(groups, 2 * threads);
                List<RecursiveAction> list = new ArrayList<>();
                for (int t = 0; t < tasks; t++) {
                    int r0 = p0 + 4 * (groups * t / tasks);
                    int r1 = Math.min(p1, p0 + 4 * (groups * (t + 1) / tasks));
                    int cEnd = p0;
                    list.add(new RecursiveAction() {
                        private static final long serialVersionUID = 1L;

                        @Override
                        protected void compute() {
                            DenseKernels.solveRange(l, k, inv, r0, r1, 0, cEnd);
                        }
                    });
                }
                ForkJoinTask.invokeAll(list);
            }
            for (int g0 = p0; g0 < p1; g0 += 4) {
                int g1 = Math.min(g0 + 4, k);
                DenseKernels.solveRange(l, k, inv, g0, g1, p0, g0);
                int bad = DenseKernels.factorTriangle(l, k, inv, g0, g1, dg, tol, piv, ratio);
                if (bad >= 0) {
                    return bad;
                }
            }
        }
        return -1;
    }

    private void parallelRows(double[] l, int k, double[] inv, double[] u, int p, boolean panel) {
        int chunks = Math.min(4 * threads, Math.max(1, p / 16));
        int[] bounds = new int[chunks + 1];
        for (int c = 1; c < chunks; c++) {
            // panel rows cost the same; update rows grow linearly: equal-area split of the triangle
            double frac = (double) c / chunks;
            int a = panel ? (int) (frac * p) : (int) (Math.sqrt(frac) * p);
            bounds[c] = Math.max(bounds[c - 1], Math.min(p, a & ~3));
        }
        bounds[chunks] = p;
        List<RecursiveAction> tasks = new ArrayList<>();
        for (int c = 0; c < chunks; c++) {
            int a0 = bounds[c];
            int a1 = bounds[c + 1];
            if (a1 <= a0) {
                continue;
            }
            tasks.add(new RecursiveAction() {
                private static final long serialVersionUID = 1L;

                @Override
                protected void compute() {
                    if (panel) {
                        DenseKernels.solvePanel(l, k, inv, k + a0, k + a1);
                    } else {
                        DenseKernels.schur(l, k, u, p, a0, a1);
                    }
                }
            });
        }
        ForkJoinTask.invokeAll(tasks);
    }

    private void extendAdd(int c, double[] uc, int[] map, double[] l, int k, double[] u, int p) {
        int[] cr = sym.superRows[c];
        int kc = sym.superStart[c + 1] - sym.superStart[c];
        int pc = cr.length - kc;
        int[] loc = new int[pc];
        int nInL = 0;
        for (int a = 0; a < pc; a++) {
            loc[a] = map[cr[kc + a]];
            if (loc[a] < k) {
                nInL++;
            }
        }
        for (int a = 0; a < pc; a++) {
            int la = loc[a];
            int base = a * pc;
            int bl = Math.min(nInL, a + 1);
            int lrow = la * k;
            for (int b = 0; b < bl; b++) {
                l[lrow + loc[b]] += uc[base + b];
            }
            if (la >= k) {
                int urow = (la - k) * p - k;
                for (int b = bl; b <= a; b++) {
                    u[urow + loc[b]] += uc[base + b];
                }
            }
        }
    }

    private void progress(int columns, double work, double ratio) {
        synchronized (progressLock) {
            if (ratio < minPivotRatio) {
                minPivotRatio = ratio;
            }
            workDone += work;
            columnsSincePoll += columns;
            workSincePoll += work;
            if (columnsSincePoll < POLL_COLUMNS && workSincePoll < POLL_WORK) {
                return;
            }
            columnsSincePoll = 0;
            workSincePoll = 0;
            double frac = Math.min(1.0, workDone / Math.max(1.0, totalWork()));
            if (frac > lastReported) {
                lastReported = frac;
                monitor.worked(frac);
            }
            if (monitor.isCancelled()) {
                CancellationException e = new CancellationException("Cholesky factorisation cancelled after "
                        + Math.round(100 * frac) + " % of the work");
                failure.compareAndSet(null, e);
                abort = true;
                throw e;
            }
        }
    }

    private double total = -1;

    private double totalWork() {
        if (total < 0) {
            double t = 0;
            for (double w : sym.work) {
                t += w;
            }
            total = t;
        }
        return total;
    }
}
