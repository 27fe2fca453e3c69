package org.tensio.engine.geometry;

/** Angle helpers for arc parameters, radians. */
final class Angles {

    private Angles() {
    }

    /**
     * @return the offset u in [0, |sweep|) of parameter t from start in the sweep's direction, modulo a full
     *         turn
     */
    static double offset(double t, double start, double sweep) {
        double u = sweep >= 0 ? t - start : start - t;
        u = u % (2 * Math.PI);
        if (u < 0) {
            u += 2 * Math.PI;
        }
        return u;
    }

    /** @return true when parameter t (mod 2π) lies strictly inside the open sweep from start */
    static boolean inSweep(double t, double start, double sweep) {
        double u = offset(t, start, sweep);
        return u > 0 && u < Math.abs(sweep);
    }

    /** @return the parameter value that corresponds to t, expressed as start + signed offset within the sweep */
    static double unwrap(double t, double start, double sweep) {
        double u = offset(t, start, sweep);
        return sweep >= 0 ? start + u : start - u;
    }
}
