package org.tensio.cli.report;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Filled contour bands of a field that is linear on each triangle: every triangle is cut exactly along the band
 * boundaries (iso-lines of the linear interpolant), so the picture is the piecewise-linear field itself, not a flat
 * average per triangle. Each 6-node element is split into its four linear sub-triangles (corner, two mid-sides),
 * which uses all six nodal values.
 */
final class Bands {

    /** The four sub-triangles of a 6-node triangle (corners 0-2; mid-sides 3: 0-1, 4: 1-2, 5: 2-0). */
    static final int[][] SUB = {{0, 3, 5}, {3, 1, 4}, {5, 4, 2}, {3, 4, 5}};

    private Bands() {
    }

    /**
     * "Nice" band boundaries covering [lo, hi]: a step of 1, 2, 2.5 or 5 × 10ⁿ giving at least {@code target}/2
     * and about {@code target} bands. A constant field gets a single band around its value.
     */
    static double[] levels(double lo, double hi, int target) {
        if (!(hi > lo) || (hi - lo) <= 1e-9 * Math.max(Math.abs(lo), Math.abs(hi))) {
            double d = Math.abs(hi) > 0 ? Math.abs(hi) * 0.05 : 1;
            return new double[] {lo - d, hi + d};
        }
        double raw = (hi - lo) / target;
        double mag = Math.pow(10, Math.floor(Math.log10(raw)));
        double step = mag * 10;
        for (double m : new double[] {1, 2, 2.5, 5, 10}) {
            if (m * mag >= raw * (1 - 1e-12)) {
                step = m * mag;
                break;
            }
        }
        BigDecimal st = new BigDecimal(Double.toString(step));
        BigDecimal x = new BigDecimal(Double.toString(Math.floor(lo / step))).multiply(st);
        List<Double> out = new ArrayList<>();
        out.add(x.doubleValue());
        while (out.get(out.size() - 1) < hi) {
            x = x.add(st);
            out.add(x.doubleValue());
        }
        if (out.size() < 2) {
            out.add(out.get(0) + step);
        }
        return out.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /**
     * Adds the parts of one triangle (vertices x, y with values f) lying in each band to {@code out.get(band)}.
     *
     * @param levels ascending band boundaries; band i is [levels[i], levels[i+1]]
     */
    static void clip(double[] x, double[] y, double[] f, double[] levels, List<List<double[]>> out) {
        double fmin = Math.min(f[0], Math.min(f[1], f[2])), fmax = Math.max(f[0], Math.max(f[1], f[2]));
        int b0 = band(levels, fmin), b1 = band(levels, fmax);
        if (b0 == b1) {
            out.get(b0).add(new double[] {x[0], y[0], x[1], y[1], x[2], y[2]});
            return;
        }
        double[][] poly = {x.clone(), y.clone(), f.clone()};
        for (int b = b0; b <= b1; b++) {
            double[][] p = poly;
            if (b > b0) {
                p = half(p, levels[b], true);
            }
            if (b < b1) {
                p = half(p, levels[b + 1], false);
            }
            if (p[0].length >= 3) {
                double[] ring = new double[2 * p[0].length];
                for (int i = 0; i < p[0].length; i++) {
                    ring[2 * i] = p[0][i];
                    ring[2 * i + 1] = p[1][i];
                }
                out.get(b).add(ring);
            }
        }
    }

    /** @return the band holding value v (values outside the range go to the first or last band) */
    static int band(double[] levels, double v) {
        int nb = levels.length - 1;
        for (int i = 0; i < nb - 1; i++) {
            if (v < levels[i + 1]) {
                return i;
            }
        }
        return nb - 1;
    }

    /** Sutherland–Hodgman clip of a convex polygon carrying linear values f by f ≥ c (above) or f ≤ c. */
    static double[][] half(double[][] p, double c, boolean above) {
        int n = p[0].length;
        double[] ox = new double[2 * n], oy = new double[2 * n], of = new double[2 * n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            double fi = p[2][i], fj = p[2][j];
            boolean in = above ? fi >= c : fi <= c;
            boolean jn = above ? fj >= c : fj <= c;
            if (in) {
                ox[m] = p[0][i];
                oy[m] = p[1][i];
                of[m++] = fi;
            }
            if (in != jn) {
                double t = (c - fi) / (fj - fi);
                ox[m] = p[0][i] + t * (p[0][j] - p[0][i]);
                oy[m] = p[1][i] + t * (p[1][j] - p[1][i]);
                of[m++] = c;
            }
        }
        return new double[][] {Arrays.copyOf(ox, m), Arrays.copyOf(oy, m), Arrays.copyOf(of, m)};
    }
}
