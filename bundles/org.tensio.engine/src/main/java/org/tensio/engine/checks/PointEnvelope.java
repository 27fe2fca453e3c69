package org.tensio.engine.checks;

import org.tensio.engine.geometry.Point2;

/**
 * The envelope of the stress state at one sample point ({@link UnitStressField}) over all load cases and
 * combinations of a station. Stresses in the stress unit; τmax = √((σz/2)² + τzx² + τzy²), von Mises
 * √(σz² + 3(τzx² + τzy²)) ({@link org.tensio.engine.stress.PrincipalStresses}).
 *
 * @param point    the sample point, section frame
 * @param part     index of the section part it belongs to
 * @param material that part's material id
 * @param singular true when within 2 % of the section diagonal of a sharp re-entrant corner
 * @param sigmaZ   range of σz
 * @param tauZX    range of τzx
 * @param tauZY    range of τzy
 * @param vonMises largest von Mises stress
 * @param tauMax   largest maximum shear stress
 * @since 0.1
 */
public record PointEnvelope(Point2 point, int part, String material, boolean singular, Range sigmaZ, Range tauZX,
        Range tauZY, Peak vonMises, Peak tauMax) {
}
