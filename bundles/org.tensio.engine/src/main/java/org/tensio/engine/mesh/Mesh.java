package org.tensio.engine.mesh;

import java.util.List;

/**
 * An immutable mesh of 6-node (quadratic) triangles over a section. Corner nodes come first
 * ({@code 0 .. cornerCount-1}), mid-side nodes after; mid-side nodes of edges on circular or elliptic
 * boundaries lie on the true curve, so such elements are curved (isoparametric).
 * <p>
 * Element {@code e} has nodes {@code element(e, 0..5)}: corners c0, c1, c2 counter-clockwise, then the
 * mid-side nodes of edges c0–c1, c1–c2, c2–c0. {@code part(e)} is the index of the section part (material)
 * the element belongs to.
 *
 * @since 0.1
 */
public final class Mesh {

    private final double[] x;
    private final double[] y;
    private final int[] elements;
    private final int[] parts;
    private final int cornerCount;
    private final double minAngleDeg;
    private final List<Singularity> singularities;

    Mesh(double[] x, double[] y, int[] elements, int[] parts, int cornerCount, double minAngleDeg,
            List<Singularity> singularities) {
        this.x = x;
        this.y = y;
        this.elements = elements;
        this.parts = parts;
        this.cornerCount = cornerCount;
        this.minAngleDeg = minAngleDeg;
        this.singularities = List.copyOf(singularities);
    }

    /** @return number of nodes (corner and mid-side) */
    public int nodeCount() {
        return x.length;
    }

    /** @return number of corner nodes */
    public int cornerCount() {
        return cornerCount;
    }

    /** @return number of triangles */
    public int elementCount() {
        return parts.length;
    }

    /** @return x of node i, length unit */
    public double x(int i) {
        return x[i];
    }

    /** @return y of node i, length unit */
    public double y(int i) {
        return y[i];
    }

    /** @return node k (0..5) of element e */
    public int node(int e, int k) {
        return elements[6 * e + k];
    }

    /** @return section part index of element e */
    public int part(int e) {
        return parts[e];
    }

    /** @return smallest interior angle of the corner triangles, degrees */
    public double minAngleDeg() {
        return minAngleDeg;
    }

    /**
     * The boundary of the mesh (outer and inner): the element edges used by one element only, as node triples
     * (corner, mid-side node, corner) in element order.
     *
     * @return {a0, m0, b0, a1, m1, b1, ...}, three node indices per boundary edge (a new array)
     * @since 0.1
     */
    public int[] boundaryEdges() {
        int[] uses = new int[nodeCount()];
        for (int e = 0; e < elementCount(); e++) {
            for (int k = 3; k < 6; k++) {
                uses[node(e, k)]++;
            }
        }
        int[] out = new int[3 * elementCount()];
        int n = 0;
        for (int e = 0; e < elementCount(); e++) {
            for (int k = 3; k < 6; k++) {
                int mid = node(e, k);
                if (uses[mid] == 1) {
                    if (n + 3 > out.length) {
                        out = java.util.Arrays.copyOf(out, 2 * out.length);
                    }
                    out[n++] = node(e, k - 3);
                    out[n++] = mid;
                    out[n++] = node(e, (k - 2) % 3);
                }
            }
        }
        return java.util.Arrays.copyOf(out, n);
    }

    /** @return re-entrant corners found on the boundary (where elastic stresses are singular) */
    public List<Singularity> singularities() {
        return singularities;
    }
}
