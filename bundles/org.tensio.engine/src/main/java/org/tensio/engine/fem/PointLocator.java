package org.tensio.engine.fem;

import java.util.ArrayList;
import java.util.List;

import org.tensio.engine.geometry.Point2;
import org.tensio.engine.mesh.Mesh;

/**
 * Finds the element holding a point and its reference coordinates (ξ, η), by a uniform bucket grid over the
 * element bounding boxes and Newton iteration on the isoparametric map. Points slightly outside every element
 * (within 1e-6 of the section size; curved boundaries are approximated by quadratic edges) are clamped onto
 * the nearest element.
 */
final class PointLocator {

    /** An element and reference coordinates in it. */
    record Hit(int element, double xi, double eta) {
    }

    private final Mesh mesh;
    private final double minX;
    private final double minY;
    private final double cell;
    private final int nx;
    private final int ny;
    private final List<List<Integer>> buckets;
    private final double size;

    PointLocator(Mesh mesh) {
        this.mesh = mesh;
        double x0 = Double.POSITIVE_INFINITY, y0 = Double.POSITIVE_INFINITY, x1 = Double.NEGATIVE_INFINITY, y1 = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < mesh.nodeCount(); i++) {
            x0 = Math.min(x0, mesh.x(i));
            y0 = Math.min(y0, mesh.y(i));
            x1 = Math.max(x1, mesh.x(i));
            y1 = Math.max(y1, mesh.y(i));
        }
        this.size = Math.hypot(x1 - x0, y1 - y0);
        int target = Math.max(1, mesh.elementCount());
        double c = Math.sqrt((x1 - x0) * (y1 - y0) / target) * 1.5;
        if (!(c > 0)) {
            c = Math.max(x1 - x0, y1 - y0) / 16 + 1e-300;
        }
        this.cell = c;
        this.minX = x0 - 1e-9 * size;
        this.minY = y0 - 1e-9 * size;
        this.nx = Math.max(1, (int) Math.ceil((x1 - minX) / c) + 1);
        this.ny = Math.max(1, (int) Math.ceil((y1 - minY) / c) + 1);
        this.buckets = new ArrayList<>(nx * ny);
        for (int i = 0; i < nx * ny; i++) {
            buckets.add(new ArrayList<>(4));
        }
        for (int e = 0; e < mesh.elementCount(); e++) {
            double ex0 = Double.POSITIVE_INFINITY, ey0 = Double.POSITIVE_INFINITY, ex1 = Double.NEGATIVE_INFINITY, ey1 = Double.NEGATIVE_INFINITY;
            for (int k = 0; k < 6; k++) {
                int n = mesh.node(e, k);
                ex0 = Math.min(ex0, mesh.x(n));
                ey0 = Math.min(ey0, mesh.y(n));
                ex1 = Math.max(ex1, mesh.x(n));
                ey1 = Math.max(ey1, mesh.y(n));
            }
            int i0 = clampX(ex0), i1 = clampX(ex1), j0 = clampY(ey0), j1 = clampY(ey1);
            for (int i = i0; i <= i1; i++) {
                for (int j = j0; j <= j1; j++) {
                    buckets.get(j * nx + i).add(e);
                }
            }
        }
    }

    private int clampX(double x) {
        return Math.max(0, Math.min(nx - 1, (int) Math.floor((x - minX) / cell)));
    }

    private int clampY(double y) {
        return Math.max(0, Math.min(ny - 1, (int) Math.floor((y - minY) / cell)));
    }

    /** @return the element holding p, or the nearest one when p lies just outside; null when far outside */
    Hit locate(Point2 p) {
        P2Element el = new P2Element();
        Hit best = null;
        double bestOut = Double.POSITIVE_INFINITY;
        int ci = clampX(p.x()), cj = clampY(p.y());
        for (int ring = 0; ring <= 1; ring++) {
            for (int i = ci - ring; i <= ci + ring; i++) {
                for (int j = cj - ring; j <= cj + ring; j++) {
                    if (i < 0 || j < 0 || i >= nx || j >= ny) {
                        continue;
                    }
                    for (int e : buckets.get(j * nx + i)) {
                        el.load(mesh, e, 0, 0);
                        double[] r = inverse(el, p.x(), p.y());
                        if (r == null) {
                            continue;
                        }
                        double out = Math.max(0, Math.max(-r[0], Math.max(-r[1], r[0] + r[1] - 1)));
                        if (out == 0) {
                            return new Hit(e, r[0], r[1]);
                        }
                        if (out < bestOut) {
                            bestOut = out;
                            double xi = Math.max(0, r[0]), eta = Math.max(0, r[1]);
                            double s = xi + eta;
                            if (s > 1) {
                                xi /= s;
                                eta /= s;
                            }
                            best = new Hit(e, xi, eta);
                        }
                    }
                }
            }
            if (best != null) {
                break;
            }
        }
        if (best == null) {
            return null;
        }
        el.load(mesh, best.element(), 0, 0);
        el.at(best.xi(), best.eta());
        return Math.hypot(el.x - p.x(), el.y - p.y()) <= 2e-5 * size ? best : null;
    }

    /** Newton on the isoparametric map from the linear guess; null when it does not converge. */
    private static double[] inverse(P2Element el, double px, double py) {
        double x0 = el.ex[0], y0 = el.ey[0];
        double ax = el.ex[1] - x0, ay = el.ey[1] - y0, bx = el.ex[2] - x0, by = el.ey[2] - y0;
        double det = ax * by - ay * bx;
        if (det == 0) {
            return null;
        }
        double xi = ((px - x0) * by - (py - y0) * bx) / det;
        double eta = (ax * (py - y0) - ay * (px - x0)) / det;
        if (xi < -0.5 || eta < -0.5 || xi + eta > 1.5) {
            return null;
        }
        try {
            return newton(el, px, py, xi, eta);
        } catch (IllegalStateException e) {
            return null;
        }
    }

    private static double[] newton(P2Element el, double px, double py, double xi, double eta) {
        for (int it = 0; it < 20; it++) {
            double cx = Math.min(1.2, Math.max(-0.2, xi)), cy = Math.min(1.2, Math.max(-0.2, eta));
            double fx, fy, j11, j12, j21, j22;
            el.at(cx, cy);
            fx = el.x - px;
            fy = el.y - py;
            // Jacobian from the shape-function gradients: J^-1 gives dξ/dx; invert back via finite pieces
            double h = 1e-7;
            double xA = el.x, yA = el.y;
            el.at(cx + h, cy);
            j11 = (el.x - xA) / h;
            j21 = (el.y - yA) / h;
            el.at(cx, cy + h);
            j12 = (el.x - xA) / h;
            j22 = (el.y - yA) / h;
            double d = j11 * j22 - j12 * j21;
            if (d == 0) {
                return null;
            }
            double dxi = (j22 * fx - j12 * fy) / d, deta = (-j21 * fx + j11 * fy) / d;
            xi = cx - dxi;
            eta = cy - deta;
            if (Math.abs(dxi) + Math.abs(deta) < 1e-13) {
                break;
            }
        }
        return new double[] {xi, eta};
    }
}
