package org.tensio.engine.stress;

/**
 * The two straight cuts through a point used by the elementary shear-flow method: the cut parallel to x
 * (the part beyond it is y ≥ y0) gives τzy, the cut parallel to y (the part beyond it is x ≥ x0) gives τzx.
 * First moments are E-weighted, about the centroidal axes, length³; widths are the total material length
 * of the cut, length.
 *
 * @param qxHorizontal ∫(y − yc) dA of the part above the horizontal cut
 * @param qyHorizontal ∫(x − xc) dA of the part above the horizontal cut
 * @param widthHorizontal total width of the horizontal cut
 * @param qxVertical   ∫(y − yc) dA of the part right of the vertical cut
 * @param qyVertical   ∫(x − xc) dA of the part right of the vertical cut
 * @param widthVertical total width of the vertical cut
 * @since 0.1
 */
public record ShearCuts(double qxHorizontal, double qyHorizontal, double widthHorizontal, double qxVertical,
        double qyVertical, double widthVertical) {
}
