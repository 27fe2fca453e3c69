package org.tensio.engine.stress;

/**
 * The three non-zero stress components on the cross-section face (beam theory: σx = σy = τxy = 0),
 * stress unit.
 *
 * @param sigmaZ normal stress, tension positive
 * @param tauZX  shear stress on the +z face in the x direction
 * @param tauZY  shear stress on the +z face in the y direction
 * @since 0.1
 */
public record StressComponents(double sigmaZ, double tauZX, double tauZY) {

    /** No stress. */
    public static final StressComponents ZERO = new StressComponents(0, 0, 0);

    /** @return the componentwise sum */
    public StressComponents plus(StressComponents o) {
        return new StressComponents(sigmaZ + o.sigmaZ, tauZX + o.tauZX, tauZY + o.tauZY);
    }

    /** @return resultant shear stress √(τzx² + τzy²) */
    public double tauResultant() {
        return Math.hypot(tauZX, tauZY);
    }
}
