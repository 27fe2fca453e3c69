package org.tensio.engine.loads;

/**
 * Internal forces at a station, acting on the face whose outward normal is +z.
 * <p>
 * Sign convention: right-handed x, y, z with z along the member axis. N positive in tension, acting at the
 * centroid. Vx, Vy positive along +x, +y, acting through the shear centre. Mx, My, T are right-hand moment
 * vectors about x, y, z: positive Mx stretches the fibres at +y, positive My stretches the fibres at −x,
 * positive T turns counter-clockwise seen from +z. Units: force and force·length of the project.
 *
 * @param n  axial force
 * @param vx shear force along x
 * @param vy shear force along y
 * @param mx bending moment about x
 * @param my bending moment about y
 * @param t  torque about z
 * @since 0.1
 */
public record InternalForces(double n, double vx, double vy, double mx, double my, double t) {

    /** All zero. */
    public static final InternalForces ZERO = new InternalForces(0, 0, 0, 0, 0, 0);

    /** Rejects non-finite components. */
    public InternalForces {
        double[] v = {n, vx, vy, mx, my, t};
        String[] k = {"N", "Vx", "Vy", "Mx", "My", "T"};
        for (int i = 0; i < v.length; i++) {
            if (!Double.isFinite(v[i])) {
                throw new IllegalArgumentException("internal force " + k[i] + " must be finite, got " + v[i]);
            }
        }
    }

    /** @return this + f·other */
    public InternalForces plusScaled(double f, InternalForces o) {
        return new InternalForces(n + f * o.n, vx + f * o.vx, vy + f * o.vy, mx + f * o.mx, my + f * o.my, t + f * o.t);
    }

    /** @return the component by name (N, Vx, Vy, Mx, My, T) */
    public double get(ForceComponent c) {
        return switch (c) {
            case N -> n;
            case VX -> vx;
            case VY -> vy;
            case MX -> mx;
            case MY -> my;
            case T -> t;
        };
    }
}
