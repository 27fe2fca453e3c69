package org.tensio.benchmarks;

import java.util.List;

import org.tensio.engine.linalg.SparseMatrixBuilder;
import org.tensio.engine.linalg.SymmetricCsr;
import org.tensio.engine.mesh.Mesh;
import org.tensio.engine.mesh.MeshGenerator;
import org.tensio.engine.mesh.MeshOptions;
import org.tensio.engine.profile.IShapeProfile;
import org.tensio.engine.section.Material;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;

/**
 * The St. Venant warping problem of a rolled I-section (150 × 300, web 7.1, flanges 10.7, root radius 15)
 * on a mesh of 6-node triangles, assembled here from the public {@link Mesh} so that every solver gets the
 * same matrix without touching engine internals.
 * <p>
 * Assembly: each element is taken as <em>straight-sided</em> (affine map from its three corners; the
 * mid-side nodes only supply the connectivity), so the P2 shape-function gradients are linear and the
 * 3-point rule at barycentric (2/3, 1/6, 1/6) and permutations, weights A/3, integrates the stiffness
 * ∫∇N_i·∇N_j dA and the load ∫(y ∂N_i/∂x − x ∂N_i/∂y) dA exactly (both are quadratic). Elements on the
 * fillets are therefore slightly off the engine's isoparametric ones; the sparsity pattern, the order and
 * the conditioning are the same. Node 0 is pinned (ω = 0) as in the engine, which makes the matrix
 * symmetric positive definite of order {@code nodeCount − 1}; unknown k is node k + 1.
 * <p>
 * The matrix is held as a full symmetric CSR (both triangles, sorted columns, duplicates summed): as CSR
 * for the conjugate-gradient operator and, being symmetric, unchanged as CSC for EJML.
 */
final class WarpingProblem {

    /**
     * Nodes per requested element of the engine's P2 meshes of this section: nodeCount / targetElements measured
     * 2.08, 2.00, 2.01 at 5 000, 50 000, 200 000 elements.
     */
    static final double NODES_PER_ELEMENT = 2.0;

    /** The benchmarked section. */
    static Section section() {
        Material steel = new Material("S355", 210000, 0.3, 355.0);
        return new Section("IPE-like 300",
                List.of(SectionPart.of(new IShapeProfile(150, 300, 7.1, 10.7, 15, 0), 0, 0, steel)));
    }

    /** @return mesh options giving about {@code unknowns} nodes */
    static MeshOptions optionsFor(int unknowns) {
        return MeshOptions.elements((int) Math.round(unknowns / NODES_PER_ELEMENT));
    }

    final Mesh mesh;
    /** order (nodes − 1) */
    final int n;
    final int[] rowPtr;
    final int[] cols;
    final double[] vals;
    final double[] diag;
    /** right-hand side: the warping load vector */
    final double[] b;
    /** coordinates of unknown k (node k + 1), for the engine's geometric ordering */
    final double[] x;
    final double[] y;

    private WarpingProblem(Mesh mesh) {
        this.mesh = mesh;
        int nn = mesh.nodeCount();
        int ne = mesh.elementCount();
        n = nn - 1;
        x = new double[n];
        y = new double[n];
        double minX = Double.POSITIVE_INFINITY, maxX = Double.NEGATIVE_INFINITY;
        double minY = Double.POSITIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < nn; i++) {
            minX = Math.min(minX, mesh.x(i));
            maxX = Math.max(maxX, mesh.x(i));
            minY = Math.min(minY, mesh.y(i));
            maxY = Math.max(maxY, mesh.y(i));
            if (i > 0) {
                x[i - 1] = mesh.x(i);
                y[i - 1] = mesh.y(i);
            }
        }
        double ox = 0.5 * (minX + maxX), oy = 0.5 * (minY + maxY);

        // rows with duplicates: bucket the element entries by row, then sort and merge each row
        int[] count = new int[n + 1];
        for (int e = 0; e < ne; e++) {
            for (int a = 0; a < 6; a++) {
                int r = mesh.node(e, a) - 1;
                if (r >= 0) {
                    for (int c = 0; c < 6; c++) {
                        if (mesh.node(e, c) > 0) {
                            count[r + 1]++;
                        }
                    }
                }
            }
        }
        for (int i = 0; i < n; i++) {
            count[i + 1] += count[i];
        }
        int[] fill = count.clone();
        int[] tc = new int[count[n]];
        double[] tv = new double[count[n]];
        b = new double[n];
        double[] ke = new double[36];
        double[] fe = new double[6];
        double[] gx = new double[6], gy = new double[6];
        int[] nd = new int[6];
        for (int e = 0; e < ne; e++) {
            for (int k = 0; k < 6; k++) {
                nd[k] = mesh.node(e, k);
            }
            double x1 = mesh.x(nd[0]) - ox, y1 = mesh.y(nd[0]) - oy;
            double x2 = mesh.x(nd[1]) - ox, y2 = mesh.y(nd[1]) - oy;
            double x3 = mesh.x(nd[2]) - ox, y3 = mesh.y(nd[2]) - oy;
            double twoA = (x2 - x1) * (y3 - y1) - (x3 - x1) * (y2 - y1);
            double g1x = (y2 - y3) / twoA, g1y = (x3 - x2) / twoA;
            double g2x = (y3 - y1) / twoA, g2y = (x1 - x3) / twoA;
            double g3x = (y1 - y2) / twoA, g3y = (x2 - x1) / twoA;
            double w = Math.abs(twoA) / 6; // area / 3
            java.util.Arrays.fill(ke, 0);
            java.util.Arrays.fill(fe, 0);
            for (int q = 0; q < 3; q++) {
                double l1 = q == 0 ? 2.0 / 3 : 1.0 / 6;
                double l2 = q == 1 ? 2.0 / 3 : 1.0 / 6;
                double l3 = q == 2 ? 2.0 / 3 : 1.0 / 6;
                double px = l1 * x1 + l2 * x2 + l3 * x3, py = l1 * y1 + l2 * y2 + l3 * y3;
                gx[0] = (4 * l1 - 1) * g1x;
                gy[0] = (4 * l1 - 1) * g1y;
                gx[1] = (4 * l2 - 1) * g2x;
                gy[1] = (4 * l2 - 1) * g2y;
                gx[2] = (4 * l3 - 1) * g3x;
                gy[2] = (4 * l3 - 1) * g3y;
                gx[3] = 4 * (l2 * g1x + l1 * g2x);
                gy[3] = 4 * (l2 * g1y + l1 * g2y);
                gx[4] = 4 * (l3 * g2x + l2 * g3x);
                gy[4] = 4 * (l3 * g2y + l2 * g3y);
                gx[5] = 4 * (l1 * g3x + l3 * g1x);
                gy[5] = 4 * (l1 * g3y + l3 * g1y);
                for (int i = 0; i < 6; i++) {
                    for (int j = 0; j < 6; j++) {
                        ke[6 * i + j] += w * (gx[i] * gx[j] + gy[i] * gy[j]);
                    }
                    fe[i] += w * (py * gx[i] - px * gy[i]);
                }
            }
            for (int i = 0; i < 6; i++) {
                int r = nd[i] - 1;
                if (r < 0) {
                    continue;
                }
                b[r] += fe[i];
                for (int j = 0; j < 6; j++) {
                    int c = nd[j] - 1;
                    if (c >= 0) {
                        tc[fill[r]] = c;
                        tv[fill[r]++] = ke[6 * i + j];
                    }
                }
            }
        }
        // sort each row by column (insertion sort: rows hold a few dozen entries) and sum duplicates in place
        int[] ptr = new int[n + 1];
        int out = 0;
        for (int r = 0; r < n; r++) {
            int from = count[r], to = count[r + 1];
            for (int p = from + 1; p < to; p++) {
                int c = tc[p];
                double v = tv[p];
                int q = p - 1;
                while (q >= from && tc[q] > c) {
                    tc[q + 1] = tc[q];
                    tv[q + 1] = tv[q];
                    q--;
                }
                tc[q + 1] = c;
                tv[q + 1] = v;
            }
            ptr[r] = out;
            for (int p = from; p < to; p++) {
                if (out > ptr[r] && tc[out - 1] == tc[p]) {
                    tv[out - 1] += tv[p];
                } else {
                    tc[out] = tc[p];
                    tv[out++] = tv[p];
                }
            }
        }
        ptr[n] = out;
        rowPtr = ptr;
        cols = java.util.Arrays.copyOf(tc, out);
        vals = java.util.Arrays.copyOf(tv, out);
        diag = new double[n];
        for (int r = 0; r < n; r++) {
            for (int p = rowPtr[r]; p < rowPtr[r + 1]; p++) {
                if (cols[p] == r) {
                    diag[r] = vals[p];
                }
            }
        }
    }

    /** Meshes {@link #section()} for about {@code unknowns} nodes and assembles the warping problem. */
    static WarpingProblem create(int unknowns) {
        Mesh mesh = MeshGenerator.generate(section(), optionsFor(unknowns), null);
        WarpingProblem p = new WarpingProblem(mesh);
        System.out.printf("%n# mesh: %d elements, %d nodes -> %d unknowns, nnz(A) = %d (both triangles)%n",
                mesh.elementCount(), mesh.nodeCount(), p.n, p.nonZeros());
        return p;
    }

    /** @return stored entries of the full symmetric matrix */
    long nonZeros() {
        return rowPtr[n];
    }

    /** @return the same matrix in the engine's format (lower triangle given) */
    SymmetricCsr tensioMatrix() {
        SparseMatrixBuilder builder = new SparseMatrixBuilder(n, SparseMatrixBuilder.Input.ONE_TRIANGLE,
                (int) ((nonZeros() + n) / 2));
        for (int r = 0; r < n; r++) {
            for (int p = rowPtr[r]; p < rowPtr[r + 1] && cols[p] <= r; p++) {
                builder.add(r, cols[p], vals[p]);
            }
        }
        return builder.build();
    }

    /** out = A v */
    void multiply(double[] v, double[] out) {
        for (int r = 0; r < n; r++) {
            double s = 0;
            for (int p = rowPtr[r]; p < rowPtr[r + 1]; p++) {
                s += vals[p] * v[cols[p]];
            }
            out[r] = s;
        }
    }

    /** @return ‖b − A x‖₂ / ‖b‖₂ */
    double relativeResidual(double[] sol) {
        double[] ax = new double[n];
        multiply(sol, ax);
        double rr = 0, bb = 0;
        for (int i = 0; i < n; i++) {
            double d = b[i] - ax[i];
            rr += d * d;
            bb += b[i] * b[i];
        }
        return Math.sqrt(rr / bb);
    }
}
