package org.tensio.engine.fatigue;

/**
 * The distortion-energy (von Mises) stresses of one point over a load cycle. The beam stress state at the point
 * is (σ, τzx, τzy) with von Mises value √(σ² + 3 (τzx² + τzy²)); over the cycle it is
 * s(θ) = m + c cos θ + s sin θ (mean, cosine and sine phases, {@link CycleLoads}), each component already
 * multiplied by its fatigue stress-concentration factor.
 * <ul>
 * <li>σa' = max over θ of the von Mises value of c cos θ + s sin θ: the largest eigenvalue of a 2 × 2 matrix,
 * exact. With s = 0 it is √(σa² + 3 τa²), Shigley's Eq. 7-5 (Mechanical Engineering Design, 9th/10th ed.,
 * from memory) for an in-phase cycle; for a rotating shaft it is the amplitude at the fibre.</li>
 * <li>σm' = the von Mises value of m (Shigley Eq. 7-6).</li>
 * <li>σmax' = max over θ of the von Mises value of s(θ): exact (max of |m ± c|) when s = 0, otherwise a scan
 * of 720 steps refined by golden-section search to 1e−12 of a turn (the function is smooth with at most two
 * maxima per turn).</li>
 * </ul>
 * Static only; the arrays are {σ, τzx, τzy}, stress unit.
 *
 * @since 0.1
 */
public final class CycleStress {


    private CycleStress() {
    }

    /** @return σa' for the phases c and s */
    public static double alternating(double[] c, double[] s) {
        double a = c[0] * c[0] + 3 * (c[1] * c[1] + c[2] * c[2]);
        double d = s[0] * s[0] + 3 * (s[1] * s[1] + s[2] * s[2]);
        double b = c[0] * s[0] + 3 * (c[1] * s[1] + c[2] * s[2]);
        return Math.sqrt(Math.max(0, 0.5 * (a + d) + Math.hypot(0.5 * (a - d), b)));
    }

    /** @return σm' of the mean state m */
    public static double mean(double[] m) {
        return Math.sqrt(m[0] * m[0] + 3 * (m[1] * m[1] + m[2] * m[2]));
    }

    /** @return {σmax', θ at the peak (radians)} */
    public static double[] peak(double[] m, double[] c, double[] s) {
        if (s[0] == 0 && s[1] == 0 && s[2] == 0) {
            double plus = at(m, c, s, 0), minus = at(m, c, s, Math.PI);
            return plus >= minus ? new double[] {plus, 0} : new double[] {minus, Math.PI};
        }
        int n = 720;
        double best = -1, bt = 0, h = 2 * Math.PI / n;
        for (int i = 0; i < n; i++) {
            double v = at(m, c, s, i * h);
            if (v > best) {
                best = v;
                bt = i * h;
            }
        }
        double lo = bt - h, hi = bt + h, g = (Math.sqrt(5) - 1) / 2;
        double x1 = hi - g * (hi - lo), x2 = lo + g * (hi - lo), f1 = at(m, c, s, x1), f2 = at(m, c, s, x2);
        while (hi - lo > 1e-12 * 2 * Math.PI) {
            if (f1 < f2) {
                lo = x1;
                x1 = x2;
                f1 = f2;
                x2 = lo + g * (hi - lo);
                f2 = at(m, c, s, x2);
            } else {
                hi = x2;
                x2 = x1;
                f2 = f1;
                x1 = hi - g * (hi - lo);
                f1 = at(m, c, s, x1);
            }
        }
        double t = 0.5 * (lo + hi), v = at(m, c, s, t);
        return v >= best ? new double[] {v, t} : new double[] {best, bt};
    }

    /** @return the stress state {σ, τzx, τzy} at phase θ */
    public static double[] state(double[] m, double[] c, double[] s, double theta) {
        double co = Math.cos(theta), si = Math.sin(theta);
        return new double[] {m[0] + c[0] * co + s[0] * si, m[1] + c[1] * co + s[1] * si, m[2] + c[2] * co + s[2] * si};
    }

    private static double at(double[] m, double[] c, double[] s, double theta) {
        double co = Math.cos(theta), si = Math.sin(theta);
        double x = m[0] + c[0] * co + s[0] * si, y = m[1] + c[1] * co + s[1] * si, z = m[2] + c[2] * co + s[2] * si;
        return Math.sqrt(x * x + 3 * (y * y + z * z));
    }
}
