package org.tensio.engine.linalg;

/**
 * Nested dissection and reverse Cuthill–McKee orderings on the graph of a {@link SymmetricCsr}; see
 * {@link Ordering} for the algorithms and sources. Single use, not thread-safe.
 * <p>
 * The permutation is built in place in {@link #nodes}: every subproblem owns a contiguous segment, which it
 * rearranges as [first half][second half][separator] before recursing into the halves; a leaf rearranges its
 * segment into its minimum-degree order.
 */
final class NestedDissection {

    /** Leaves larger than this keep their order (minimum degree on bit sets would cost O(k³/64)). */
    private static final int MAX_MINIMUM_DEGREE_LEAF = 4096;
    /** Recursion guard for degenerate graphs (cliques, stars) that cannot be halved. */
    private static final int MAX_DEPTH = 96;

    private final int n;
    private final int[] rs;
    private final int[] ci;
    private final double[] x;
    private final double[] y;
    private final int leafSize;

    private final int[] nodes;
    private final int[] tag;
    private int tagCounter;
    private final int[] seen;
    private int seenCounter;
    private final int[] scratch;
    private final int[] queue;
    private final int[] levelStart;
    private final int[] local;
    private double[] keys;
    /** Largest |Δx|, |Δy| from each node to a neighbour: nodes farther than that from a cut have no cut edge. */
    private final double[] reachX;
    private final double[] reachY;
    /** Where the last split's cut edges can be: position ranges of candidate nodes, and a key filter. */
    private int scanA0;
    private int scanA1;
    private int scanB0;
    private int scanB1;
    private double[] cutKey;
    private double[] cutReach;
    private double maxKeyA;
    private double minKeyB;

    NestedDissection(SymmetricCsr a, double[] x, double[] y, int leafSize) {
        this.n = a.n();
        this.rs = a.rowStart();
        this.ci = a.columns();
        this.x = x;
        this.y = y;
        this.leafSize = Math.max(4, leafSize);
        this.nodes = new int[n];
        this.tag = new int[n];
        this.seen = new int[n];
        this.scratch = new int[n];
        this.queue = new int[n];
        this.levelStart = new int[n + 2];
        this.local = new int[n];
        for (int i = 0; i < n; i++) {
            nodes[i] = i;
        }
        if (x != null) {
            reachX = new double[n];
            reachY = new double[n];
            for (int v = 0; v < n; v++) {
                double rx = 0;
                double ry = 0;
                for (int p = rs[v]; p < rs[v + 1]; p++) {
                    rx = Math.max(rx, Math.abs(x[ci[p]] - x[v]));
                    ry = Math.max(ry, Math.abs(y[ci[p]] - y[v]));
                }
                reachX[v] = rx;
                reachY[v] = ry;
            }
        } else {
            reachX = null;
            reachY = null;
        }
    }

    int[] order() {
        if (n > 0) {
            recurse(0, n, 0);
        }
        return nodes;
    }

    private void recurse(int lo, int hi, int depth) {
        int size = hi - lo;
        if (size <= leafSize || depth > MAX_DEPTH) {
            orderLeaf(lo, hi);
            return;
        }
        cutKey = null;
        int mid = x != null ? coordinateSplit(lo, hi) : graphSplit(lo, hi);
        if (mid <= lo || mid >= hi) {
            orderLeaf(lo, hi);
            return;
        }
        int tagA = ++tagCounter;
        int tagB = ++tagCounter;
        for (int t = lo; t < mid; t++) {
            tag[nodes[t]] = tagA;
        }
        for (int t = mid; t < hi; t++) {
            tag[nodes[t]] = tagB;
        }
        int sepTag = ++tagCounter;
        int sepSize = minimumCoverSeparator(lo, mid, hi, tagA, tagB, sepTag);
        // rearrange as [A \ S][B \ S][S], keeping the relative order within each part
        int w = lo;
        int s = 0;
        for (int t = lo; t < hi; t++) {
            int v = nodes[t];
            if (tag[v] == sepTag) {
                scratch[s++] = v;
            } else if (tag[v] == tagA) {
                nodes[w++] = v;
            }
        }
        int a1 = w;
        for (int t = mid; t < hi; t++) {
            int v = nodes[t];
            if (tag[v] == tagB) {
                nodes[w++] = v;
            }
        }
        int b1 = w;
        System.arraycopy(scratch, 0, nodes, b1, sepSize);
        recurse(lo, a1, depth + 1);
        recurse(a1, b1, depth + 1);
    }

    /**
     * Tags with sepTag a minimum vertex cover of the bipartite graph of cut edges between A (tagA, nodes lo …
     * mid−1) and B (tagB, nodes mid … hi−1): König's theorem via a maximum matching (greedy start, then
     * augmenting paths). Every cut edge then has an end in the separator, and no separator made of cut-edge
     * ends is smaller; in particular it is never larger than the boundary layer of either side. Returns its
     * size.
     */
    private int minimumCoverSeparator(int lo, int mid, int hi, int tagA, int tagB, int sepTag) {
        int na = 0;
        int nb = 0;
        int[] sa = new int[Math.max(1, mid - lo)];
        int[] sb = new int[Math.max(1, hi - mid)];
        for (int t = scanA0; t < scanA1; t++) {
            int v = nodes[t];
            if ((cutKey == null || cutKey[v] + cutReach[v] >= minKeyB) && adjacentTo(v, tagB)) {
                local[v] = na;
                sa[na++] = v;
            }
        }
        for (int t = scanB0; t < scanB1; t++) {
            int v = nodes[t];
            if ((cutKey == null || cutKey[v] - cutReach[v] <= maxKeyA) && adjacentTo(v, tagA)) {
                local[v] = nb;
                sb[nb++] = v;
            }
        }
        if (na == 0 || nb == 0) {
            return 0;
        }
        int[] ptr = new int[na + 1];
        for (int a = 0; a < na; a++) {
            int v = sa[a];
            int c = 0;
            for (int p = rs[v], e = rs[v + 1]; p < e; p++) {
                if (tag[ci[p]] == tagB) {
                    c++;
                }
            }
            ptr[a + 1] = ptr[a] + c;
        }
        int[] adj = new int[ptr[na]];
        for (int a = 0; a < na; a++) {
            int v = sa[a];
            int w = ptr[a];
            for (int p = rs[v], e = rs[v + 1]; p < e; p++) {
                if (tag[ci[p]] == tagB) {
                    adj[w++] = local[ci[p]];
                }
            }
        }
        int[] mateA = new int[na];
        int[] mateB = new int[nb];
        java.util.Arrays.fill(mateA, -1);
        java.util.Arrays.fill(mateB, -1);
        for (int a = 0; a < na; a++) {
            for (int q = ptr[a]; q < ptr[a + 1]; q++) {
                if (mateB[adj[q]] < 0) {
                    mateA[a] = adj[q];
                    mateB[adj[q]] = a;
                    break;
                }
            }
        }
        int[] seenB = new int[nb];
        int[] stackA = new int[na];
        int[] stackPos = new int[na];
        int[] via = new int[na];
        int stamp = 0;
        for (int a0 = 0; a0 < na; a0++) {
            if (mateA[a0] >= 0) {
                continue;
            }
            stamp++;
            int top = 0;
            stackA[0] = a0;
            stackPos[0] = ptr[a0];
            while (top >= 0) {
                int a = stackA[top];
                if (stackPos[top] == ptr[a + 1]) {
                    top--;
                    continue;
                }
                int b = adj[stackPos[top]++];
                if (seenB[b] == stamp) {
                    continue;
                }
                seenB[b] = stamp;
                if (mateB[b] < 0) {
                    // augment along the stack
                    for (int l = top; l >= 0; l--) {
                        int bl = l == top ? b : via[l];
                        mateA[stackA[l]] = bl;
                        mateB[bl] = stackA[l];
                    }
                    break;
                }
                via[top] = b;
                top++;
                stackA[top] = mateB[b];
                stackPos[top] = ptr[mateB[b]];
            }
        }
        // König: Z = vertices reachable from free A vertices by alternating paths; cover = (A \ Z) ∪ (B ∩ Z)
        boolean[] zA = new boolean[na];
        boolean[] zB = new boolean[nb];
        int[] q = stackA;
        int head = 0;
        int tail = 0;
        for (int a = 0; a < na; a++) {
            if (mateA[a] < 0) {
                zA[a] = true;
                q[tail++] = a;
            }
        }
        while (head < tail) {
            int a = q[head++];
            for (int p = ptr[a]; p < ptr[a + 1]; p++) {
                int b = adj[p];
                if (!zB[b]) {
                    zB[b] = true;
                    int a2 = mateB[b];
                    if (a2 >= 0 && !zA[a2]) {
                        zA[a2] = true;
                        q[tail++] = a2;
                    }
                }
            }
        }
        int size = 0;
        for (int a = 0; a < na; a++) {
            if (!zA[a]) {
                tag[sa[a]] = sepTag;
                size++;
            }
        }
        for (int b = 0; b < nb; b++) {
            if (zB[b]) {
                tag[sb[b]] = sepTag;
                size++;
            }
        }
        return size;
    }

    private boolean adjacentTo(int v, int otherTag) {
        for (int p = rs[v], e = rs[v + 1]; p < e; p++) {
            if (tag[ci[p]] == otherTag) {
                return true;
            }
        }
        return false;
    }

    // ---------------------------------------------------------------- coordinate bisection

    /** Splits at the median of the longer bounding-box axis; returns the index where the second half starts. */
    private int coordinateSplit(int lo, int hi) {
        double minX = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY;
        double minY = Double.POSITIVE_INFINITY;
        double maxY = Double.NEGATIVE_INFINITY;
        for (int t = lo; t < hi; t++) {
            int v = nodes[t];
            minX = Math.min(minX, x[v]);
            maxX = Math.max(maxX, x[v]);
            minY = Math.min(minY, y[v]);
            maxY = Math.max(maxY, y[v]);
        }
        if (!(maxX > minX) && !(maxY > minY)) {
            return graphSplit(lo, hi); // coincident nodes: fall back on the graph
        }
        double[] c = maxX - minX >= maxY - minY ? x : y;
        int size = hi - lo;
        if (keys == null || keys.length < size) {
            keys = new double[Math.max(size, 16)];
        }
        for (int t = 0; t < size; t++) {
            keys[t] = c[nodes[lo + t]];
        }
        int half = size / 2;
        double v = select(keys, 0, size - 1, half);
        int less = 0;
        int equal = 0;
        for (int t = lo; t < hi; t++) {
            double k = c[nodes[t]];
            if (k < v) {
                less++;
            } else if (k == v) {
                equal++;
            }
        }
        // cut between distinct coordinate values, at whichever side of the median run is closer to half
        boolean equalToA = Math.abs(less + equal - half) < Math.abs(less - half) || less == 0;
        if (less + equal == size) {
            equalToA = false;
        }
        int a = 0;
        int b = 0;
        int nA = equalToA ? less + equal : less;
        for (int t = lo; t < hi; t++) {
            int u = nodes[t];
            double k = c[u];
            if (k < v || (k == v && equalToA)) {
                scratch[a++] = u;
            } else {
                scratch[nA + b++] = u;
            }
        }
        System.arraycopy(scratch, 0, nodes, lo, size);
        double mA = Double.NEGATIVE_INFINITY;
        double mB = Double.POSITIVE_INFINITY;
        for (int t = 0; t < size; t++) {
            double k = c[scratch[t]];
            if (t < nA) {
                mA = Math.max(mA, k);
            } else {
                mB = Math.min(mB, k);
            }
        }
        cutKey = c;
        cutReach = c == x ? reachX : reachY;
        maxKeyA = mA;
        minKeyB = mB;
        scanA0 = lo;
        scanA1 = lo + nA;
        scanB0 = lo + nA;
        scanB1 = hi;
        return lo + nA;
    }

    /** k-th smallest of keys[lo..hi] (inclusive), rearranging keys; iterative quickselect, median-of-3 pivot. */
    private static double select(double[] keys, int lo, int hi, int k) {
        while (hi > lo) {
            int m = (lo + hi) >>> 1;
            double a = keys[lo];
            double b = keys[m];
            double c = keys[hi];
            double pivot = a < b ? (b < c ? b : Math.max(a, c)) : (a < c ? a : Math.max(b, c));
            int i = lo;
            int j = hi;
            while (i <= j) {
                while (keys[i] < pivot) {
                    i++;
                }
                while (keys[j] > pivot) {
                    j--;
                }
                if (i <= j) {
                    double t = keys[i];
                    keys[i] = keys[j];
                    keys[j] = t;
                    i++;
                    j--;
                }
            }
            if (k <= j) {
                hi = j;
            } else if (k >= i) {
                lo = i;
            } else {
                return keys[k];
            }
        }
        return keys[k];
    }

    // ---------------------------------------------------------------- level-structure bisection

    /** Splits by components or by the middle of a level structure; returns where the second half starts. */
    private int graphSplit(int lo, int hi) {
        int seg = ++tagCounter;
        for (int t = lo; t < hi; t++) {
            tag[nodes[t]] = seg;
        }
        int size = hi - lo;
        int start = minDegreeNode(lo, hi);
        int levels = bfs(start, seg);
        int reached = levelStart[levels];
        if (reached < size) {
            return componentSplit(lo, hi, seg);
        }
        // pseudo-peripheral node (George & Liu 1981, §4.3): move to a minimum-degree node of the last level
        // while the eccentricity grows
        for (int iter = 0; iter < 8; iter++) {
            int cand = -1;
            int best = Integer.MAX_VALUE;
            for (int q = levelStart[levels - 1]; q < levelStart[levels]; q++) {
                int v = queue[q];
                int d = rs[v + 1] - rs[v];
                if (d < best) {
                    best = d;
                    cand = v;
                }
            }
            int l2 = bfs(cand, seg);
            if (l2 <= levels) {
                levels = bfs(start, seg);
                break;
            }
            start = cand;
            levels = l2;
        }
        if (levels < 2) {
            return lo;
        }
        int half = size / 2;
        int bestLevel = 0;
        int bestGap = Integer.MAX_VALUE;
        for (int l = 0; l <= levels - 2; l++) {
            int gap = Math.abs(levelStart[l + 1] - half);
            if (gap < bestGap) {
                bestGap = gap;
                bestLevel = l;
            }
        }
        System.arraycopy(queue, 0, nodes, lo, size);
        // cut edges join only the last level of the first half and the first level of the second
        scanA0 = lo + levelStart[bestLevel];
        scanA1 = lo + levelStart[bestLevel + 1];
        scanB0 = scanA1;
        scanB1 = lo + levelStart[bestLevel + 2];
        return lo + levelStart[bestLevel + 1];
    }

    private int componentSplit(int lo, int hi, int seg) {
        int size = hi - lo;
        int stamp = ++seenCounter;
        int w = 0;
        int half = size / 2;
        int mid = -1;
        for (int t = lo; t < hi; t++) {
            int r = nodes[t];
            if (seen[r] == stamp) {
                continue;
            }
            // breadth-first search of one component into scratch
            int head = w;
            seen[r] = stamp;
            scratch[w++] = r;
            while (head < w) {
                int v = scratch[head++];
                for (int p = rs[v], e = rs[v + 1]; p < e; p++) {
                    int u = ci[p];
                    if (tag[u] == seg && seen[u] != stamp) {
                        seen[u] = stamp;
                        scratch[w++] = u;
                    }
                }
            }
            if (mid < 0 && w >= half) {
                mid = w;
            }
        }
        System.arraycopy(scratch, 0, nodes, lo, size);
        if (mid >= size) {
            // the first components fill more than half: cut after the first component instead
            mid = firstComponentEnd(lo, hi, seg);
        }
        scanA0 = lo; // no edge between components: nothing to scan
        scanA1 = lo;
        scanB0 = lo;
        scanB1 = lo;
        return lo + mid;
    }

    private int firstComponentEnd(int lo, int hi, int seg) {
        int levels = bfs(nodes[lo], seg);
        return levelStart[levels];
    }

    /** Breadth-first search inside the segment tagged seg; fills queue and levelStart; returns the level count. */
    private int bfs(int root, int seg) {
        int stamp = ++seenCounter;
        int w = 0;
        int head = 0;
        int levels = 0;
        seen[root] = stamp;
        queue[w++] = root;
        levelStart[0] = 0;
        while (head < w) {
            int end = w;
            levelStart[levels++] = head;
            for (; head < end; head++) {
                int v = queue[head];
                for (int p = rs[v], e = rs[v + 1]; p < e; p++) {
                    int u = ci[p];
                    if (tag[u] == seg && seen[u] != stamp) {
                        seen[u] = stamp;
                        queue[w++] = u;
                    }
                }
            }
        }
        levelStart[levels] = w;
        return levels;
    }

    private int minDegreeNode(int lo, int hi) {
        int best = nodes[lo];
        int bd = Integer.MAX_VALUE;
        for (int t = lo; t < hi; t++) {
            int v = nodes[t];
            int d = rs[v + 1] - rs[v];
            if (d < bd) {
                bd = d;
                best = v;
            }
        }
        return best;
    }

    // ---------------------------------------------------------------- leaves

    /**
     * Minimum degree on the leaf's elimination graph held as bit sets, where the degree also counts the leaf's
     * neighbours outside it (ancestor separator nodes, eliminated later): nodes touching a separator are thus
     * eliminated late, which keeps fill inside the leaf. Degrees live in bucket lists, so a leaf of k nodes costs
     * O(k·(k + h)/64 · degree) for h halo nodes; ties go to the node most recently moved into the bucket.
     */
    private void orderLeaf(int lo, int hi) {
        int k = hi - lo;
        if (k <= 2 || k > MAX_MINIMUM_DEGREE_LEAF) {
            return;
        }
        int leafTag = ++tagCounter;
        for (int t = 0; t < k; t++) {
            int v = nodes[lo + t];
            tag[v] = leafTag;
            local[v] = t;
        }
        int haloTag = ++tagCounter;
        int h = 0;
        for (int t = lo; t < hi; t++) {
            int v = nodes[t];
            for (int p = rs[v], e = rs[v + 1]; p < e; p++) {
                int u = ci[p];
                if (tag[u] != leafTag && tag[u] != haloTag) {
                    tag[u] = haloTag;
                    local[u] = k + h++;
                }
            }
        }
        int words = (k + h + 63) >>> 6;
        long[] bits = new long[k * words];
        int[] deg = new int[k];
        for (int t = 0; t < k; t++) {
            int v = nodes[lo + t];
            int base = t * words;
            for (int p = rs[v], e = rs[v + 1]; p < e; p++) {
                int u = ci[p];
                if (u != v) {
                    int l = local[u];
                    bits[base + (l >>> 6)] |= 1L << l;
                }
            }
            deg[t] = popcount(bits, base, words);
        }
        // degree buckets: doubly linked lists, most recently inserted first
        int maxDeg = k + h;
        int[] head = new int[maxDeg + 1];
        java.util.Arrays.fill(head, -1);
        int[] next = new int[k];
        int[] prev = new int[k];
        for (int t = k - 1; t >= 0; t--) {
            link(t, deg[t], head, next, prev);
        }
        boolean[] done = new boolean[k];
        int[] order = new int[k];
        int leafWords = (k + 63) >>> 6;
        int minDeg = 0;
        for (int step = 0; step < k; step++) {
            while (head[minDeg] < 0) {
                minDeg++;
            }
            int a = head[minDeg];
            unlink(a, deg[a], head, next, prev);
            done[a] = true;
            order[step] = nodes[lo + a];
            int baseA = a * words;
            for (int wd = 0; wd < leafWords; wd++) {
                long m = bits[baseA + wd];
                while (m != 0) {
                    int b = (wd << 6) + Long.numberOfTrailingZeros(m);
                    m &= m - 1;
                    if (b >= k || done[b]) {
                        continue;
                    }
                    int baseB = b * words;
                    for (int q = 0; q < words; q++) {
                        bits[baseB + q] |= bits[baseA + q];
                    }
                    bits[baseB + (b >>> 6)] &= ~(1L << b);
                    bits[baseB + (a >>> 6)] &= ~(1L << a);
                    int d = popcount(bits, baseB, words);
                    if (d != deg[b]) {
                        unlink(b, deg[b], head, next, prev);
                        deg[b] = d;
                        link(b, d, head, next, prev);
                    }
                }
            }
            // eliminating a removes one neighbour from each of its neighbours: the minimum drops by at most one
            minDeg = Math.max(0, minDeg - 1);
        }
        System.arraycopy(order, 0, nodes, lo, k);
    }

    private static void link(int t, int d, int[] head, int[] next, int[] prev) {
        next[t] = head[d];
        prev[t] = -1;
        if (head[d] >= 0) {
            prev[head[d]] = t;
        }
        head[d] = t;
    }

    private static void unlink(int t, int d, int[] head, int[] next, int[] prev) {
        if (prev[t] >= 0) {
            next[prev[t]] = next[t];
        } else {
            head[d] = next[t];
        }
        if (next[t] >= 0) {
            prev[next[t]] = prev[t];
        }
    }

    private static int popcount(long[] bits, int base, int words) {
        int c = 0;
        for (int q = 0; q < words; q++) {
            c += Long.bitCount(bits[base + q]);
        }
        return c;
    }

    // ---------------------------------------------------------------- reverse Cuthill-McKee

    static int[] reverseCuthillMcKee(SymmetricCsr a) {
        NestedDissection nd = new NestedDissection(a, null, null, 4);
        return nd.rcm();
    }

    private int[] rcm() {
        int seg = ++tagCounter;
        java.util.Arrays.fill(tag, seg);
        boolean[] placed = new boolean[n];
        int[] out = new int[n];
        int w = 0;
        int[] nb = new int[16];
        for (int r0 = 0; r0 < n; r0++) {
            if (placed[r0]) {
                continue;
            }
            // pseudo-peripheral root of this component
            int root = r0;
            int levels = bfs(root, seg);
            for (int iter = 0; iter < 8; iter++) {
                int cand = -1;
                int best = Integer.MAX_VALUE;
                for (int q = levelStart[levels - 1]; q < levelStart[levels]; q++) {
                    int v = queue[q];
                    int d = rs[v + 1] - rs[v];
                    if (d < best) {
                        best = d;
                        cand = v;
                    }
                }
                int l2 = bfs(cand, seg);
                if (l2 <= levels) {
                    break;
                }
                root = cand;
                levels = l2;
            }
            // Cuthill-McKee from root, neighbours by increasing degree
            int head = w;
            placed[root] = true;
            out[w++] = root;
            while (head < w) {
                int v = out[head++];
                int c = 0;
                for (int p = rs[v], e = rs[v + 1]; p < e; p++) {
                    int u = ci[p];
                    if (!placed[u]) {
                        placed[u] = true;
                        if (c == nb.length) {
                            nb = java.util.Arrays.copyOf(nb, 2 * c);
                        }
                        nb[c++] = u;
                    }
                }
                for (int i = 1; i < c; i++) {
                    int u = nb[i];
                    int du = rs[u + 1] - rs[u];
                    int j = i - 1;
                    while (j >= 0 && rs[nb[j] + 1] - rs[nb[j]] > du) {
                        nb[j + 1] = nb[j];
                        j--;
                    }
                    nb[j + 1] = u;
                }
                System.arraycopy(nb, 0, out, w, c);
                w += c;
            }
        }
        for (int i = 0, j = n - 1; i < j; i++, j--) {
            int t = out[i];
            out[i] = out[j];
            out[j] = t;
        }
        return out;
    }
}
