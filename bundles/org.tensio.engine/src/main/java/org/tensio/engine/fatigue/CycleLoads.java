package org.tensio.engine.fatigue;

import org.tensio.engine.loads.InternalForces;

/**
 * The internal forces of one load cycle, F(θ) = mean + cosine · cos θ + sine · sin θ for θ over a full turn:
 * a steady mean and an alternating part in two phases. A load history with an in-phase alternating part has a
 * zero sine phase; a rotating shaft under loads fixed in space has the bending moments and shear forces of the
 * section frame turning with θ (cosine phase the forces at θ = 0, sine phase those turned by 90°). Components,
 * units and sign convention as {@link InternalForces}.
 *
 * @param mean   the steady part
 * @param cosine the alternating part in the cosine phase
 * @param sine   the alternating part in the sine phase
 * @since 0.1
 */
public record CycleLoads(InternalForces mean, InternalForces cosine, InternalForces sine) {

    /** Rejects nulls. */
    public CycleLoads {
        if (mean == null || cosine == null || sine == null) {
            throw new IllegalArgumentException("cycle loads: mean, cosine and sine parts are required");
        }
    }

    /** @return true when the alternating part has a sine phase (a rotating shaft) */
    public boolean rotating() {
        return !isZero(sine);
    }

    /** @return the amplitude of the alternating bending moment, max over θ of |M(θ)|, force·length */
    public double bendingAmplitude() {
        return amplitude(cosine.mx(), cosine.my(), sine.mx(), sine.my());
    }

    /** @return the amplitude of the alternating torque, max over θ of |T(θ)| */
    public double torqueAmplitude() {
        return Math.hypot(cosine.t(), sine.t());
    }

    /** @return the amplitude of the alternating axial force */
    public double axialAmplitude() {
        return Math.hypot(cosine.n(), sine.n());
    }

    /** @return |M| of the mean */
    public double meanBending() {
        return Math.hypot(mean.mx(), mean.my());
    }

    /** max over θ of |c cos θ + s sin θ| for the vectors c = (cx, cy), s = (sx, sy). */
    static double amplitude(double cx, double cy, double sx, double sy) {
        double a = cx * cx + cy * cy, c = sx * sx + sy * sy, b = cx * sx + cy * sy;
        return Math.sqrt(0.5 * (a + c) + Math.hypot(0.5 * (a - c), b));
    }

    private static boolean isZero(InternalForces f) {
        return f.n() == 0 && f.vx() == 0 && f.vy() == 0 && f.mx() == 0 && f.my() == 0 && f.t() == 0;
    }

    /**
     * The cycle of a rotating shaft under the loads {@code f} fixed in space: the bending moments and shear
     * forces become fully reversed at every fibre (cosine phase f's, sine phase f's turned by 90° about z:
     * (Mx, My) → (−My, Mx), (Vx, Vy) → (−Vy, Vx)); the axial force and the torque stay steady.
     */
    public static CycleLoads rotating(InternalForces f) {
        return new CycleLoads(new InternalForces(f.n(), 0, 0, 0, 0, f.t()),
                new InternalForces(0, f.vx(), f.vy(), f.mx(), f.my(), 0),
                new InternalForces(0, -f.vy(), f.vx(), -f.my(), f.mx(), 0));
    }

    /** The cycle between two load states: mean (max + min)/2, alternating (max − min)/2 in phase. */
    public static CycleLoads between(InternalForces max, InternalForces min) {
        return new CycleLoads(InternalForces.ZERO.plusScaled(0.5, max.plusScaled(1, min)),
                InternalForces.ZERO.plusScaled(0.5, max.plusScaled(-1, min)), InternalForces.ZERO);
    }

    /** A cycle given by its mean and in-phase alternating parts. */
    public static CycleLoads of(InternalForces mean, InternalForces alternating) {
        return new CycleLoads(mean, alternating, InternalForces.ZERO);
    }

    /** @return this cycle plus another, phase by phase */
    public CycleLoads plus(CycleLoads o) {
        return new CycleLoads(mean.plusScaled(1, o.mean), cosine.plusScaled(1, o.cosine), sine.plusScaled(1, o.sine));
    }
}
