package org.tensio.engine.fem;

/**
 * Shear stress components on the +z face per unit load (stress unit per force, or per force·length for a
 * torque).
 *
 * @param tauZX shear stress in the x direction
 * @param tauZY shear stress in the y direction
 * @since 0.1
 */
public record UnitShear(double tauZX, double tauZY) {
}
