package org.tensio.engine.fem;

import org.tensio.engine.mesh.Mesh;

/**
 * Evaluation of a 6-node isoparametric triangle at a reference point (ξ, η): shape functions, their
 * Cartesian gradients, the Jacobian determinant and the mapped point. Node order as {@link Mesh}: corners
 * c0, c1, c2, then mid-sides c0–c1, c1–c2, c2–c0. Reusable scratch object: not thread-safe.
 */
final class P2Element {

    final double[] n = new double[6];
    final double[] dx = new double[6];
    final double[] dy = new double[6];
    final double[] ex = new double[6];
    final double[] ey = new double[6];
    private final double[] dxi = new double[6];
    private final double[] deta = new double[6];
    double detJ;
    double x;
    double y;

    /** Loads the coordinates of element e, shifted by (ox, oy). */
    void load(Mesh mesh, int e, double ox, double oy) {
        for (int k = 0; k < 6; k++) {
            int node = mesh.node(e, k);
            ex[k] = mesh.x(node) - ox;
            ey[k] = mesh.y(node) - oy;
        }
    }

    /** Evaluates at (ξ, η); throws when the element is inverted there. */
    void at(double xi, double eta) {
        double l1 = 1 - xi - eta, l2 = xi, l3 = eta;
        n[0] = l1 * (2 * l1 - 1);
        n[1] = l2 * (2 * l2 - 1);
        n[2] = l3 * (2 * l3 - 1);
        n[3] = 4 * l1 * l2;
        n[4] = 4 * l2 * l3;
        n[5] = 4 * l3 * l1;
        // d/dξ (dl1 = -1, dl2 = 1, dl3 = 0); d/dη (dl1 = -1, dl2 = 0, dl3 = 1)
        dxi[0] = -(4 * l1 - 1);
        dxi[1] = 4 * l2 - 1;
        dxi[2] = 0;
        dxi[3] = 4 * (l1 - l2);
        dxi[4] = 4 * l3;
        dxi[5] = -4 * l3;
        deta[0] = -(4 * l1 - 1);
        deta[1] = 0;
        deta[2] = 4 * l3 - 1;
        deta[3] = -4 * l2;
        deta[4] = 4 * l2;
        deta[5] = 4 * (l1 - l3);
        double j11 = 0, j12 = 0, j21 = 0, j22 = 0, px = 0, py = 0;
        for (int k = 0; k < 6; k++) {
            j11 += dxi[k] * ex[k];
            j12 += dxi[k] * ey[k];
            j21 += deta[k] * ex[k];
            j22 += deta[k] * ey[k];
            px += n[k] * ex[k];
            py += n[k] * ey[k];
        }
        detJ = j11 * j22 - j12 * j21;
        if (!(detJ > 0)) {
            throw new IllegalStateException("inverted or degenerate element (det J = " + detJ + ")");
        }
        double inv = 1 / detJ;
        for (int k = 0; k < 6; k++) {
            dx[k] = inv * (j22 * dxi[k] - j12 * deta[k]);
            dy[k] = inv * (-j21 * dxi[k] + j11 * deta[k]);
        }
        x = px;
        y = py;
    }

    /** Reference coordinates of node k. */
    static final double[][] NODE_REF = {{0, 0}, {1, 0}, {0, 1}, {0.5, 0}, {0.5, 0.5}, {0, 0.5}};
}
