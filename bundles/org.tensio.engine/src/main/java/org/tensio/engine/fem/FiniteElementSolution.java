package org.tensio.engine.fem;

import org.tensio.engine.geometry.Point2;
import org.tensio.engine.mesh.Mesh;
import org.tensio.engine.section.Section;

/**
 * The finite-element fields of a section and what follows from them: torsion constant from the warping
 * (upper bound) and stress-function (lower bound) formulations, shear centre (Trefftz), warping constant,
 * shear areas (energy method), and the shear stresses per unit torque and per unit shear force at any point.
 * <p>
 * Shear functions (homogeneous sections): with centroidal coordinates, D = Ixx·Iyy − Ixy² and Δ = 2(1+ν)D,
 * the field for unit Vy is τ = (∇Φ − h)/Δ with ∇²Φ = 2(Ixy·x − Iyy·y), ∂Φ/∂n = h·n and the harmonic
 * h = ν(Iyy·xy − Ixy(x² − y²)/2, −Iyy(x² − y²)/2 − Ixy·xy); for unit Vx, τ = (∇Ψ − d)/Δ with
 * ∇²Ψ = 2(Ixy·y − Ixx·x), ∂Ψ/∂n = d·n, d = ν(Ixx(x² − y²)/2 − Ixy·xy, Ixx·xy + Ixy(x² − y²)/2). These satisfy
 * equilibrium (div τ = −∂σz/∂z), the traction-free boundary and the Beltrami–Michell compatibility
 * equations ∇²τzx = −(1/(1+ν))∂²σz/∂x∂z, ∇²τzy = −(1/(1+ν))∂²σz/∂y∂z.
 * <p>
 * Stresses are recovered from nodal gradients averaged over the elements of the same part around each node
 * (area-weighted), interpolated with the element's shape functions; {@code raw} evaluation uses the
 * element's own gradient instead.
 *
 * @since 0.1
 */
public final class FiniteElementSolution {

    private final Section section;
    private final Mesh mesh;
    private final Point2 centroid;
    private final double area;
    private final double geometricArea;
    private final double ixx;
    private final double iyy;
    private final double ixy;
    private final double nu;
    private final double[] nW;
    private final double[] gW;
    private final double[] omega;
    private final double[] psi;
    private final double[] phi;
    private final double[] prandtl;
    private final double jWarping;
    private final double jPrandtl;
    private final Point2 shearCentre;
    private final double cw;
    private final double[] shearAreas;
    private final double[] equilibriumErrors;
    private final int parts;
    // smoothed nodal gradients per part: [field][part * nodes + node], fields ω,x ω,y Ψ,x Ψ,y Φ,x Φ,y
    private final double[][] grad;
    private final PointLocator locator;
    private final double peakUnitTorsion;
    private final Point2 peakUnitTorsionAt;

    FiniteElementSolution(Section section, Mesh mesh, Point2 centroid, double area, double geometricArea, double ixx,
            double iyy, double ixy, double nu, double[] nW, double[] gW, double[] omega, double[] psi, double[] phi,
            double[] prandtl, double jPrandtl) {
        this.section = section;
        this.mesh = mesh;
        this.centroid = centroid;
        this.area = area;
        this.geometricArea = geometricArea;
        this.ixx = ixx;
        this.iyy = iyy;
        this.ixy = ixy;
        this.nu = nu;
        this.nW = nW;
        this.gW = gW;
        this.prandtl = prandtl;
        this.jPrandtl = jPrandtl;
        this.parts = section.parts().size();
        P2Element el = new P2Element();
        int ne = mesh.elementCount();
        // J from the warping function; ∫nω, ∫nωx, ∫nωy for the shear centre
        double j = 0, iwx = 0, iwy = 0;
        for (int e = 0; e < ne; e++) {
            el.load(mesh, e, centroid.x(), centroid.y());
            for (double[] q : Quadrature.TRI7) {
                el.at(q[0], q[1]);
                double w = q[2] * el.detJ;
                double wx = 0, wy = 0, wv = 0;
                for (int i = 0; i < 6; i++) {
                    double o = omega[mesh.node(e, i)];
                    wv += el.n[i] * o;
                    wx += el.dx[i] * o;
                    wy += el.dy[i] * o;
                }
                j += w * gW[e] * (el.x * el.x + el.y * el.y + el.x * wy - el.y * wx);
                iwx += w * nW[e] * wv * el.x;
                iwy += w * nW[e] * wv * el.y;
            }
        }
        this.jWarping = j;
        // centroidal coordinates (∫n x = ∫n y = 0): the constant in ω does not enter iwx, iwy
        double d = ixx * iyy - ixy * ixy;
        double xs = (ixy * iwx - iyy * iwy) / d;
        double ys = (ixx * iwx - ixy * iwy) / d;
        this.shearCentre = new Point2(centroid.x() + xs, centroid.y() + ys);
        // ω about the shear centre, zero E-weighted mean
        double[] os = new double[omega.length];
        for (int i = 0; i < omega.length; i++) {
            double x = mesh.x(i) - centroid.x(), y = mesh.y(i) - centroid.y();
            os[i] = omega[i] + xs * y - ys * x;
        }
        double shift = integrate(mesh, nW, os, 1) / area;
        for (int i = 0; i < os.length; i++) {
            os[i] -= shift;
        }
        this.omega = os;
        this.cw = integrate(mesh, nW, os, 2);
        this.psi = psi;
        this.phi = phi;
        this.grad = smooth();
        this.locator = new PointLocator(mesh);
        // shear areas and equilibrium checks
        double[] checks = new double[5];
        double[] sa = null;
        double tx = 0, txy = 0, ty = 0;
        double[] sumX = new double[2], sumY = new double[2];
        double torque = 0;
        for (int e = 0; e < ne; e++) {
            el.load(mesh, e, centroid.x(), centroid.y());
            for (double[] q : Quadrature.TRI7) {
                el.at(q[0], q[1]);
                double w = q[2] * el.detJ;
                double[] t = rawAt(el, e, 0);
                torque += w * (el.x * t[1] - el.y * t[0]);
                if (psi != null) {
                    double[] vx = rawAt(el, e, 1), vy = rawAt(el, e, 2);
                    sumX[0] += w * vx[0];
                    sumX[1] += w * vx[1];
                    sumY[0] += w * vy[0];
                    sumY[1] += w * vy[1];
                    tx += w * (vx[0] * vx[0] + vx[1] * vx[1]);
                    ty += w * (vy[0] * vy[0] + vy[1] * vy[1]);
                    txy += w * (vx[0] * vy[0] + vx[1] * vy[1]);
                }
            }
        }
        checks[0] = torque - 1;
        if (psi != null) {
            checks[1] = sumX[0] - 1;
            checks[2] = sumX[1];
            checks[3] = sumY[0];
            checks[4] = sumY[1] - 1;
            sa = new double[] {1 / tx, 1 / ty, txy / Math.sqrt(tx * ty)};
        }
        this.shearAreas = sa;
        this.equilibriumErrors = checks;
        // peak smoothed torsion stress per unit torque, over all nodes
        double peak = 0;
        Point2 at = centroid;
        for (int e = 0; e < ne; e++) {
            for (int k = 0; k < 6; k++) {
                int node = mesh.node(e, k);
                double[] t = torsionAtNode(e, node);
                double v = Math.hypot(t[0], t[1]);
                if (v > peak) {
                    peak = v;
                    at = new Point2(mesh.x(node), mesh.y(node));
                }
            }
        }
        this.peakUnitTorsion = peak;
        this.peakUnitTorsionAt = at;
    }

    /** @return Σ_e w_e ∫ u^power dA of the nodal field u over the mesh (power 1 or 2) */
    private static double integrate(Mesh mesh, double[] weight, double[] u, int power) {
        P2Element el = new P2Element();
        double sum = 0;
        for (int e = 0; e < mesh.elementCount(); e++) {
            el.load(mesh, e, 0, 0);
            for (double[] q : Quadrature.TRI7) {
                el.at(q[0], q[1]);
                double v = 0;
                for (int i = 0; i < 6; i++) {
                    v += el.n[i] * u[mesh.node(e, i)];
                }
                sum += q[2] * el.detJ * weight[e] * (power == 1 ? v : v * v);
            }
        }
        return sum;
    }

    /** τ per unit load of field f (0 torsion, 1 Vx, 2 Vy) from the element's own gradient at the loaded point. */
    private double[] rawAt(P2Element el, int e, int f) {
        double gx = 0, gy = 0;
        double[] u = f == 0 ? omega : f == 1 ? psi : phi;
        for (int i = 0; i < 6; i++) {
            double v = u[mesh.node(e, i)];
            gx += el.dx[i] * v;
            gy += el.dy[i] * v;
        }
        return stressFromGradient(f, e, el.x, el.y, gx, gy);
    }

    /**
     * τ from a field's gradient at centroidal (x, y). The torsion field uses ω about any pole: the pole's
     * linear term cancels against its own gradient, so the shifted ω gives the same stress.
     */
    private double[] stressFromGradient(int f, int e, double x, double y, double gx, double gy) {
        if (f == 0) {
            // ω here is about the shear centre: ω_s = ω_c + xs·y − ys·x, so ∇ω_c = ∇ω_s − (−ys, xs)
            double xs = shearCentre.x() - centroid.x(), ys = shearCentre.y() - centroid.y();
            double wx = gx + ys, wy = gy - xs;
            double g = gW[e] / jWarping;
            return new double[] {g * (wx - y), g * (wy + x)};
        }
        double delta = 2 * (1 + nu) * (ixx * iyy - ixy * ixy);
        double x2y2 = 0.5 * (x * x - y * y);
        if (f == 1) {
            double dX = nu * (ixx * x2y2 - ixy * x * y), dY = nu * (ixx * x * y + ixy * x2y2);
            return new double[] {(gx - dX) / delta, (gy - dY) / delta};
        }
        double hX = nu * (iyy * x * y - ixy * x2y2), hY = nu * (-iyy * x2y2 - ixy * x * y);
        return new double[] {(gx - hX) / delta, (gy - hY) / delta};
    }

    private double[][] smooth() {
        int nn = mesh.nodeCount();
        double[][] g = new double[6][parts * nn];
        double[] weight = new double[parts * nn];
        P2Element el = new P2Element();
        for (int e = 0; e < mesh.elementCount(); e++) {
            el.load(mesh, e, centroid.x(), centroid.y());
            el.at(1.0 / 3, 1.0 / 3);
            double w = el.detJ;
            for (int k = 0; k < 6; k++) {
                el.at(P2Element.NODE_REF[k][0], P2Element.NODE_REF[k][1]);
                int idx = mesh.part(e) * nn + mesh.node(e, k);
                weight[idx] += w;
                double[][] fields = {omega, psi, phi};
                for (int f = 0; f < 3; f++) {
                    if (fields[f] == null) {
                        continue;
                    }
                    double gx = 0, gy = 0;
                    for (int i = 0; i < 6; i++) {
                        double v = fields[f][mesh.node(e, i)];
                        gx += el.dx[i] * v;
                        gy += el.dy[i] * v;
                    }
                    g[2 * f][idx] += w * gx;
                    g[2 * f + 1][idx] += w * gy;
                }
            }
        }
        for (double[] row : g) {
            for (int i = 0; i < row.length; i++) {
                if (weight[i] > 0) {
                    row[i] /= weight[i];
                }
            }
        }
        return g;
    }

    private double[] torsionAtNode(int e, int node) {
        int idx = mesh.part(e) * mesh.nodeCount() + node;
        return stressFromGradient(0, e, mesh.x(node) - centroid.x(), mesh.y(node) - centroid.y(), grad[0][idx],
                grad[1][idx]);
    }

    /**
     * Shear stress components at a point per unit load: {@code [0]} per unit torque T, {@code [1]} per unit
     * Vx, {@code [2]} per unit Vy ({@code null} entries for the shear fields of composite sections), from the
     * smoothed fields (or the element's own gradient when {@code raw}). Stress unit per force (or per
     * force·length for T).
     *
     * @throws IllegalArgumentException when the point is not in any element (allowing a small tolerance)
     */
    public UnitShear[] unitStresses(Point2 p, boolean raw) {
        PointLocator.Hit hit = locator.locate(p);
        if (hit == null) {
            throw new IllegalArgumentException("point (" + p.x() + ", " + p.y() + ") is not inside the mesh of section '"
                    + section.name() + "'");
        }
        int e = hit.element();
        P2Element el = new P2Element();
        el.load(mesh, e, centroid.x(), centroid.y());
        el.at(hit.xi(), hit.eta());
        UnitShear[] out = new UnitShear[3];
        int nn = mesh.nodeCount();
        for (int f = 0; f < 3; f++) {
            double[] u = f == 0 ? omega : f == 1 ? psi : phi;
            if (u == null) {
                continue;
            }
            double gx = 0, gy = 0;
            for (int i = 0; i < 6; i++) {
                int node = mesh.node(e, i);
                if (raw) {
                    gx += el.dx[i] * u[node];
                    gy += el.dy[i] * u[node];
                } else {
                    int idx = mesh.part(e) * nn + node;
                    gx += el.n[i] * grad[2 * f][idx];
                    gy += el.n[i] * grad[2 * f + 1][idx];
                }
            }
            double x = p.x() - centroid.x(), y = p.y() - centroid.y();
            double[] t = stressFromGradient(f, e, x, y, gx, gy);
            out[f] = new UnitShear(t[0], t[1]);
        }
        return out;
    }

    /** @return the mesh */
    public Mesh mesh() {
        return mesh;
    }

    /** @return J from the warping function (upper bound), length⁴, reference material */
    public double jWarping() {
        return jWarping;
    }

    /** @return J from the Prandtl stress function (lower bound), length⁴, reference material */
    public double jPrandtl() {
        return jPrandtl;
    }

    /** @return (J_warping − J_Prandtl) / J_warping: the bracket width, an accuracy indicator */
    public double jBracket() {
        return (jWarping - jPrandtl) / jWarping;
    }

    /** @return shear centre (Trefftz, from the warping function), section frame */
    public Point2 shearCentre() {
        return shearCentre;
    }

    /** @return warping constant about the shear centre, length⁶, E-weighted to the reference material */
    public double cw() {
        return cw;
    }

    /** @return centroid as integrated on the mesh */
    public Point2 centroid() {
        return centroid;
    }

    /** @return E-weighted area as integrated on the mesh */
    public double area() {
        return area;
    }

    /** @return geometric area as integrated on the mesh */
    public double geometricArea() {
        return geometricArea;
    }

    /**
     * @return shear areas by the energy method {Asx, Asy, c} (A_s = 1/∫τ² dA for a unit shear force, length²;
     *         c = ∫τx·τy dA / √(∫τx² dA ∫τy² dA), the dimensionless coupling of the two, 0 for a symmetric
     *         section), or null for composite sections
     */
    public double[] shearAreas() {
        return shearAreas == null ? null : shearAreas.clone();
    }

    /**
     * @return runtime equilibrium residuals for unit loads: {∫(xτzy − yτzx) − 1 for T; ∫τzx − 1, ∫τzy for Vx;
     *         ∫τzx, ∫τzy − 1 for Vy}; all should vanish to solver precision
     */
    public double[] equilibriumErrors() {
        return equilibriumErrors.clone();
    }

    /** @return largest smoothed nodal shear stress per unit torque, stress unit per force·length */
    public double peakUnitTorsionStress() {
        return peakUnitTorsion;
    }

    /** @return where {@link #peakUnitTorsionStress()} occurs */
    public Point2 peakUnitTorsionAt() {
        return peakUnitTorsionAt;
    }

    /** @return true when the shear fields were computed (homogeneous sections) */
    public boolean hasShearFields() {
        return psi != null;
    }

    /** @return Poisson's ratio used for the shear functions */
    public double nu() {
        return nu;
    }

    /** @return the nodal warping function about the shear centre (copy) */
    public double[] warping() {
        return omega.clone();
    }

    /** @return the nodal Prandtl stress function (copy) */
    public double[] stressFunction() {
        return prandtl.clone();
    }
}
