package org.tensio.engine.linalg;

import java.util.Random;

/**
 * Test matrices: grid Laplacians and finite-element Laplacians (stiffness ∫∇φa·∇φb dA) of linear (P1) and
 * quadratic (P2, 6-node) triangles on a triangulated unit square, nodes numbered row by row (a banded natural
 * order). Interior vertices may be displaced at random so that the mesh is "random-ish" but valid.
 */
final class Meshes {

    /** A matrix with the node coordinates and the boundary nodes. */
    record Mesh(SymmetricCsr a, double[] x, double[] y, int[] boundary) {
        int n() {
            return a.n();
        }
    }

    private Meshes() {
    }

    /**
     * 5-point Laplacian 4u<sub>ij</sub> − u<sub>i±1,j</sub> − u<sub>i,j±1</sub> on the k × k interior nodes of a
     * grid with Dirichlet boundary (boundary values eliminated); no boundary unknowns.
     */
    static Mesh laplace5(int k) {
        int n = k * k;
        SparseMatrixBuilder b = new SparseMatrixBuilder(n, SparseMatrixBuilder.Input.ONE_TRIANGLE, 3 * n);
        double[] x = new double[n];
        double[] y = new double[n];
        for (int j = 0; j < k; j++) {
            for (int i = 0; i < k; i++) {
                int v = j * k + i;
                x[v] = i + 1;
                y[v] = j + 1;
                b.add(v, v, 4);
                if (i > 0) {
                    b.add(v, v - 1, -1);
                }
                if (j > 0) {
                    b.add(v, v - k, -1);
                }
            }
        }
        return new Mesh(b.build(), x, y, new int[0]);
    }

    /**
     * Linear (3-node) triangles on a k × k cell grid of the unit square, (k+1)² nodes, all
     * nodes unknown (pure Neumann: A·1 = 0). Each cell is cut along a diagonal whose direction alternates in a
     * checkerboard; interior vertices are moved by up to {@code jitter} × cell size.
     */
    static Mesh p1Square(int k, double jitter, long seed) {
        int nv = (k + 1) * (k + 1);
        double[] x = new double[nv];
        double[] y = new double[nv];
        Random rnd = new Random(seed);
        double h = 1.0 / k;
        for (int j = 0; j <= k; j++) {
            for (int i = 0; i <= k; i++) {
                int v = j * (k + 1) + i;
                x[v] = i * h;
                y[v] = j * h;
                if (i > 0 && i < k && j > 0 && j < k) {
                    x[v] += jitter * h * (2 * rnd.nextDouble() - 1);
                    y[v] += jitter * h * (2 * rnd.nextDouble() - 1);
                }
            }
        }
        SparseMatrixBuilder b = new SparseMatrixBuilder(nv, SparseMatrixBuilder.Input.BOTH_TRIANGLES, 18 * k * k);
        for (int j = 0; j < k; j++) {
            for (int i = 0; i < k; i++) {
                int v00 = j * (k + 1) + i;
                int v10 = v00 + 1;
                int v01 = v00 + k + 1;
                int v11 = v01 + 1;
                if (((i + j) & 1) == 0) {
                    p1Element(b, x, y, v00, v10, v11);
                    p1Element(b, x, y, v00, v11, v01);
                } else {
                    p1Element(b, x, y, v00, v10, v01);
                    p1Element(b, x, y, v10, v11, v01);
                }
            }
        }
        return new Mesh(b.build(), x, y, boundaryOfLattice(k + 1));
    }

    private static void p1Element(SparseMatrixBuilder b, double[] x, double[] y, int a, int c, int d) {
        int[] v = {a, c, d};
        double twiceArea = (x[c] - x[a]) * (y[d] - y[a]) - (x[d] - x[a]) * (y[c] - y[a]);
        double[] gx = new double[3];
        double[] gy = new double[3];
        for (int t = 0; t < 3; t++) {
            int p = v[(t + 1) % 3];
            int q = v[(t + 2) % 3];
            gx[t] = (y[p] - y[q]) / twiceArea;
            gy[t] = (x[q] - x[p]) / twiceArea;
        }
        if (!(twiceArea > 0)) {
            throw new IllegalStateException("inverted P1 element " + a + ", " + c + ", " + d + ": jitter too large");
        }
        double area = twiceArea / 2;
        double[] ke = new double[9];
        for (int s = 0; s < 3; s++) {
            for (int t = 0; t < 3; t++) {
                ke[s * 3 + t] = area * (gx[s] * gx[t] + gy[s] * gy[t]);
            }
        }
        b.addElement(v, ke);
    }

    /**
     * Quadratic (6-node) triangles on a k × k cell grid of the unit square: (2k+1)² nodes on the half-step
     * lattice, numbered row by row, vertices jittered, mid-side nodes at the midpoints of the straight edges.
     * All nodes are unknowns (Neumann); {@link Mesh#boundary()} lists the boundary nodes for Dirichlet use.
     */
    static Mesh p2Square(int k, double jitter, long seed) {
        int w = 2 * k + 1;
        int nn = w * w;
        double[] x = new double[nn];
        double[] y = new double[nn];
        Random rnd = new Random(seed);
        double h = 1.0 / k;
        for (int j = 0; j <= k; j++) {
            for (int i = 0; i <= k; i++) {
                int v = (2 * j) * w + 2 * i;
                x[v] = i * h;
                y[v] = j * h;
                if (i > 0 && i < k && j > 0 && j < k) {
                    x[v] += jitter * h * (2 * rnd.nextDouble() - 1);
                    y[v] += jitter * h * (2 * rnd.nextDouble() - 1);
                }
            }
        }
        SparseMatrixBuilder b = new SparseMatrixBuilder(nn, SparseMatrixBuilder.Input.BOTH_TRIANGLES, 36 * 2 * k * k);
        double[] ke = new double[36];
        int[] dofs = new int[6];
        for (int j = 0; j < k; j++) {
            for (int i = 0; i < k; i++) {
                int l00 = (2 * j) * w + 2 * i;
                int l20 = l00 + 2;
                int l02 = l00 + 2 * w;
                int l22 = l02 + 2;
                int l11 = l00 + w + 1;
                int l10 = l00 + 1;
                int l01 = l00 + w;
                int l21 = l01 + 2;
                int l12 = l02 + 1;
                // diagonal l00-l22 (midpoint l11)
                p2Element(b, x, y, dofs, ke, l00, l20, l22, l10, l21, l11);
                p2Element(b, x, y, dofs, ke, l00, l22, l02, l11, l12, l01);
            }
        }
        return new Mesh(b.build(), x, y, boundaryOfLattice(w));
    }

    /** Vertices v0 v1 v2 counter-clockwise, mid-side nodes m01 m12 m20; sets the mid-side coordinates. */
    private static void p2Element(SparseMatrixBuilder b, double[] x, double[] y, int[] dofs, double[] ke, int v0,
            int v1, int v2, int m01, int m12, int m20) {
        int[] v = {v0, v1, v2};
        x[m01] = (x[v0] + x[v1]) / 2;
        y[m01] = (y[v0] + y[v1]) / 2;
        x[m12] = (x[v1] + x[v2]) / 2;
        y[m12] = (y[v1] + y[v2]) / 2;
        x[m20] = (x[v2] + x[v0]) / 2;
        y[m20] = (y[v2] + y[v0]) / 2;
        double twiceArea = (x[v1] - x[v0]) * (y[v2] - y[v0]) - (x[v2] - x[v0]) * (y[v1] - y[v0]);
        double[] gx = new double[3];
        double[] gy = new double[3];
        for (int t = 0; t < 3; t++) {
            int p = v[(t + 1) % 3];
            int q = v[(t + 2) % 3];
            gx[t] = (y[p] - y[q]) / twiceArea;
            gy[t] = (x[q] - x[p]) / twiceArea;
        }
        if (!(twiceArea > 0)) {
            throw new IllegalStateException("inverted P2 element at " + v0 + ": jitter too large");
        }
        double area = twiceArea / 2;
        java.util.Arrays.fill(ke, 0);
        // edge-midpoint quadrature, exact for the quadratic integrand ∇φa·∇φb
        double[][] lambdas = {{0.5, 0.5, 0}, {0, 0.5, 0.5}, {0.5, 0, 0.5}};
        double[] dx = new double[6];
        double[] dy = new double[6];
        for (double[] l : lambdas) {
            for (int t = 0; t < 3; t++) {
                dx[t] = (4 * l[t] - 1) * gx[t];
                dy[t] = (4 * l[t] - 1) * gy[t];
            }
            int[][] edges = {{0, 1}, {1, 2}, {2, 0}};
            for (int e = 0; e < 3; e++) {
                int p = edges[e][0];
                int q = edges[e][1];
                dx[3 + e] = 4 * (l[p] * gx[q] + l[q] * gx[p]);
                dy[3 + e] = 4 * (l[p] * gy[q] + l[q] * gy[p]);
            }
            for (int s = 0; s < 6; s++) {
                for (int t = 0; t < 6; t++) {
                    ke[s * 6 + t] += area / 3 * (dx[s] * dx[t] + dy[s] * dy[t]);
                }
            }
        }
        dofs[0] = v0;
        dofs[1] = v1;
        dofs[2] = v2;
        dofs[3] = m01;
        dofs[4] = m12;
        dofs[5] = m20;
        b.addElement(dofs, ke);
    }

    private static int[] boundaryOfLattice(int w) {
        int[] out = new int[4 * (w - 1)];
        int c = 0;
        for (int j = 0; j < w; j++) {
            for (int i = 0; i < w; i++) {
                if (i == 0 || j == 0 || i == w - 1 || j == w - 1) {
                    out[c++] = j * w + i;
                }
            }
        }
        return out;
    }

    /** ‖u − v‖∞ / ‖u‖∞. */
    static double relativeError(double[] expected, double[] actual) {
        double num = 0;
        double den = 0;
        for (int i = 0; i < expected.length; i++) {
            num = Math.max(num, Math.abs(expected[i] - actual[i]));
            den = Math.max(den, Math.abs(expected[i]));
        }
        return num / den;
    }
}
