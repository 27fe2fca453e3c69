package org.tensio.engine.fem;

import java.util.List;

import org.tensio.engine.geometry.Point2;
import org.tensio.engine.linalg.ProgressMonitor;
import org.tensio.engine.mesh.Mesh;
import org.tensio.engine.section.Material;
import org.tensio.engine.section.Section;

/**
 * Finite-element solution of the cross-section problems on a mesh of 6-node triangles:
 * <ul>
 * <li>St. Venant torsion by the warping function ω (Herrmann 1965; Pilkey, Analysis and Design of Elastic
 * Beams, 2002, ch. 5 — from memory): ∇·(g∇ω) = 0, g∂ω/∂n = g(y nx − x ny) on the boundary, g = G/G_ref,
 * coordinates about the E-weighted centroid; J = ∫g(x² + y² + x ω,y − y ω,x) dA (an upper bound: the
 * displacement formulation is too stiff);</li>
 * <li>the same by the Prandtl stress function φ: ∇·(∇φ/g) = −2, φ = 0 on outer boundaries and an unknown
 * constant on each hole boundary, found from the circulation condition by tying the hole's nodes to one
 * unknown loaded with 2·A_hole; J = 2∫φ dA + 2Σ φ_k A_k (a lower bound);</li>
 * <li>transverse shear by the shear functions Ψ (Vx) and Φ (Vy) with Poisson's ratio (Pilkey 2002 ch. 6;
 * Gruttmann, Sauer &amp; Wagner 1999 — from memory; derived again in {@link FiniteElementSolution}): homogeneous
 * sections only;</li>
 * <li>the shear centre by Trefftz's definition from ω and the warping constant Cw = ∫n ω_s² dA about it.</li>
 * </ul>
 * One factorisation serves the warping problem and both shear functions (same matrix when homogeneous).
 *
 * @since 0.1
 */
public final class SectionSolver {

    private SectionSolver() {
    }

    /** @return the solution with the default sparse solver; {@code monitor} may be null */
    public static FiniteElementSolution solve(Section section, Mesh mesh, ProgressMonitor monitor) {
        return solve(section, mesh, monitor, LinalgSolver.INSTANCE);
    }

    static FiniteElementSolution solve(Section section, Mesh mesh, ProgressMonitor monitor, SpdSolver solver) {
        ProgressMonitor mon = monitor == null ? ProgressMonitor.NONE : monitor;
        int ne = mesh.elementCount(), nn = mesh.nodeCount();
        Material ref = section.referenceMaterial();
        double[] nW = new double[ne], gW = new double[ne];
        boolean homogeneous = true;
        for (int e = 0; e < ne; e++) {
            Material m = section.parts().get(mesh.part(e)).material();
            nW[e] = m.e() / ref.e();
            gW[e] = m.shearModulus() / ref.shearModulus();
            homogeneous &= m.e() == ref.e() && m.nu() == ref.nu();
        }
        double nu = ref.nu();
        P2Element el = new P2Element();

        // E-weighted moments, first about the bounding-box centre, then about the centroid
        var b = section.bounds();
        double ox = 0.5 * (b.minX() + b.maxX()), oy = 0.5 * (b.minY() + b.maxY());
        double a = 0, sx = 0, sy = 0;
        for (int e = 0; e < ne; e++) {
            el.load(mesh, e, ox, oy);
            for (double[] q : Quadrature.TRI7) {
                el.at(q[0], q[1]);
                double w = q[2] * el.detJ * nW[e];
                a += w;
                sx += w * el.x;
                sy += w * el.y;
            }
        }
        double xc = ox + sx / a, yc = oy + sy / a;
        double ixx = 0, iyy = 0, ixy = 0, geoArea = 0;
        for (int e = 0; e < ne; e++) {
            el.load(mesh, e, xc, yc);
            for (double[] q : Quadrature.TRI7) {
                el.at(q[0], q[1]);
                double w0 = q[2] * el.detJ;
                double w = w0 * nW[e];
                geoArea += w0;
                ixx += w * el.y * el.y;
                iyy += w * el.x * el.x;
                ixy += w * el.x * el.y;
            }
        }
        mon.worked(0.05);

        // warping (pinned at node 0) and, for homogeneous sections, the shear functions on the same matrix
        int pin = 0;
        int[] dofW = new int[nn];
        for (int i = 0; i < nn; i++) {
            dofW[i] = i < pin ? i : (i == pin ? -1 : i - 1);
        }
        Triplets kw = new Triplets();
        double[] fw = new double[nn - 1];
        double[] fPsi = new double[nn - 1];
        double[] fPhi = new double[nn - 1];
        double[] ke = new double[36];
        for (int e = 0; e < ne; e++) {
            el.load(mesh, e, xc, yc);
            java.util.Arrays.fill(ke, 0);
            double[] fe = new double[6], fpe = new double[6], ffe = new double[6];
            for (double[] q : Quadrature.TRI7) {
                el.at(q[0], q[1]);
                double w = q[2] * el.detJ;
                double x = el.x, y = el.y;
                double x2y2 = 0.5 * (x * x - y * y);
                double dX = nu * (ixx * x2y2 - ixy * x * y), dY = nu * (ixx * x * y + ixy * x2y2);
                double hX = nu * (iyy * x * y - ixy * x2y2), hY = nu * (-iyy * x2y2 - ixy * x * y);
                for (int i = 0; i < 6; i++) {
                    for (int j = 0; j < 6; j++) {
                        ke[6 * i + j] += w * (el.dx[i] * el.dx[j] + el.dy[i] * el.dy[j]);
                    }
                    fe[i] += w * (y * el.dx[i] - x * el.dy[i]);
                    fpe[i] += w * (dX * el.dx[i] + dY * el.dy[i] + 2 * (1 + nu) * (ixx * x - ixy * y) * el.n[i]);
                    ffe[i] += w * (hX * el.dx[i] + hY * el.dy[i] + 2 * (1 + nu) * (iyy * y - ixy * x) * el.n[i]);
                }
            }
            for (int i = 0; i < 6; i++) {
                int di = dofW[mesh.node(e, i)];
                if (di < 0) {
                    continue;
                }
                fw[di] += gW[e] * fe[i];
                fPsi[di] += fpe[i];
                fPhi[di] += ffe[i];
                for (int j = 0; j <= 5; j++) {
                    int dj = dofW[mesh.node(e, j)];
                    if (dj >= 0 && dj <= di) {
                        kw.add(di, dj, gW[e] * ke[6 * i + j]);
                    }
                }
            }
        }
        double[] xyW = coordinates(mesh, dofW, nn - 1);
        SpdSolver.Factor fw0 = solver.factor(nn - 1, kw, xyW, sub(mon, 0.05, 0.45));
        double[] omega = expand(fw0.solve(fw), dofW);
        double[] psi = null, phi = null;
        if (homogeneous) {
            psi = expand(fw0.solve(fPsi), dofW);
            phi = expand(fw0.solve(fPhi), dofW);
        }
        mon.worked(0.5);

        // Prandtl stress function with hole circulation conditions
        List<BoundaryLoops.Loop> loops = BoundaryLoops.of(mesh);
        int[] dofP = new int[nn];
        java.util.Arrays.fill(dofP, 0);
        for (BoundaryLoops.Loop l : loops) {
            if (l.signedArea() > 0) {
                for (int node : l.nodes()) {
                    dofP[node] = -1;
                }
            }
        }
        int nd = 0;
        for (int i = 0; i < nn; i++) {
            if (dofP[i] == 0) {
                dofP[i] = -2; // placeholder for free
            }
        }
        int holeCount = 0;
        double[] holeArea = new double[loops.size()];
        int[] holeDof = new int[loops.size()];
        for (int i = 0; i < nn; i++) {
            if (dofP[i] == -2) {
                dofP[i] = nd++;
            }
        }
        for (int li = 0; li < loops.size(); li++) {
            BoundaryLoops.Loop l = loops.get(li);
            if (l.signedArea() < 0) {
                // tie the hole's nodes (some may share a node with an outer loop: those stay fixed)
                int tied = nd++;
                holeDof[holeCount] = tied;
                holeArea[holeCount++] = -l.signedArea();
                for (int node : l.nodes()) {
                    if (dofP[node] >= 0) {
                        dofP[node] = tied;
                    }
                }
            }
        }
        // compact the numbering (tied nodes left gaps)
        int[] remap = new int[nd];
        java.util.Arrays.fill(remap, -1);
        int np = 0;
        for (int i = 0; i < nn; i++) {
            if (dofP[i] >= 0 && remap[dofP[i]] < 0) {
                remap[dofP[i]] = np++;
            }
        }
        for (int i = 0; i < nn; i++) {
            if (dofP[i] >= 0) {
                dofP[i] = remap[dofP[i]];
            }
        }
        double[] holeAreaC = java.util.Arrays.copyOf(holeArea, holeCount);
        int[] holeDofC = new int[holeCount];
        for (int k = 0; k < holeCount; k++) {
            holeDofC[k] = remap[holeDof[k]];
        }
        double[] phiP = new double[nn];
        double jPrandtl = Double.NaN;
        if (np > 0) {
            Triplets kp = new Triplets();
            double[] fp = new double[np];
            for (int e = 0; e < ne; e++) {
                el.load(mesh, e, xc, yc);
                java.util.Arrays.fill(ke, 0);
                double[] fe = new double[6];
                for (double[] q : Quadrature.TRI7) {
                    el.at(q[0], q[1]);
                    double w = q[2] * el.detJ;
                    for (int i = 0; i < 6; i++) {
                        for (int j = 0; j < 6; j++) {
                            ke[6 * i + j] += w * (el.dx[i] * el.dx[j] + el.dy[i] * el.dy[j]);
                        }
                        fe[i] += w * 2 * el.n[i];
                    }
                }
                for (int i = 0; i < 6; i++) {
                    int di = dofP[mesh.node(e, i)];
                    if (di < 0) {
                        continue;
                    }
                    fp[di] += fe[i];
                    for (int j = 0; j < 6; j++) {
                        int dj = dofP[mesh.node(e, j)];
                        if (dj >= 0 && dj <= di) {
                            // two nodes tied to one hole unknown: both (i, j) and (j, i) land on its diagonal, as they must
                            kp.add(di, dj, ke[6 * i + j] / gW[e]);
                        }
                    }
                }
            }
            for (int k = 0; k < holeCount; k++) {
                fp[holeDofC[k]] += 2 * holeAreaC[k];
            }
            SpdSolver.Factor fpf = solver.factor(np, kp, coordinates(mesh, dofP, np), sub(mon, 0.5, 0.85));
            double[] sol = fpf.solve(fp);
            for (int i = 0; i < nn; i++) {
                phiP[i] = dofP[i] >= 0 ? sol[dofP[i]] : 0;
            }
            double integral = 0;
            for (int e = 0; e < ne; e++) {
                el.load(mesh, e, xc, yc);
                for (double[] q : Quadrature.TRI7) {
                    el.at(q[0], q[1]);
                    double v = 0;
                    for (int i = 0; i < 6; i++) {
                        v += el.n[i] * phiP[mesh.node(e, i)];
                    }
                    integral += q[2] * el.detJ * v;
                }
            }
            jPrandtl = 2 * integral;
            for (int k = 0; k < holeCount; k++) {
                jPrandtl += 2 * sol[holeDofC[k]] * holeAreaC[k];
            }
        }
        mon.worked(0.9);
        FiniteElementSolution s = new FiniteElementSolution(section, mesh, new Point2(xc, yc), a, geoArea, ixx, iyy,
                ixy, nu, nW, gW, omega, psi, phi, phiP, jPrandtl);
        mon.worked(1.0);
        return s;
    }

    private static double[] expand(double[] sol, int[] dof) {
        double[] out = new double[dof.length];
        for (int i = 0; i < dof.length; i++) {
            out[i] = dof[i] >= 0 ? sol[dof[i]] : 0;
        }
        return out;
    }

    private static double[] coordinates(Mesh mesh, int[] dof, int n) {
        double[] xy = new double[2 * n];
        for (int i = 0; i < dof.length; i++) {
            if (dof[i] >= 0) {
                xy[2 * dof[i]] = mesh.x(i);
                xy[2 * dof[i] + 1] = mesh.y(i);
            }
        }
        return xy;
    }

    private static ProgressMonitor sub(ProgressMonitor m, double from, double to) {
        return new ProgressMonitor() {
            @Override
            public void worked(double fraction) {
                m.worked(from + (to - from) * fraction);
            }

            @Override
            public boolean isCancelled() {
                return m.isCancelled();
            }
        };
    }
}
