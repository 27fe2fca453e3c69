package org.tensio.engine.properties;

import org.tensio.engine.geometry.Point2;

/**
 * Exact cross-section properties. Lengths in the project's length unit; for a composite section every
 * property is E-weighted and transformed to the reference material (the first part's), so that
 * {@code E_ref · Ixx} is the true bending stiffness.
 * <p>
 * Axes: Ixx = ∫(y − yc)² dA, Iyy = ∫(x − xc)² dA, Ixy = ∫(x − xc)(y − yc) dA about centroidal axes parallel to
 * x and y. I1 ≥ I2 are the principal values; {@code principalAngleDeg} is the angle of the I1 axis measured
 * counter-clockwise from +x, in (−90°, 90°]. Elastic moduli divide Ixx or Iyy by the distance to each extreme
 * fibre. Plastic moduli Zx, Zy are geometric (unweighted) first moments of the two halves about the
 * equal-area axis parallel to x (at {@code plasticAxisY}) and to y (at {@code plasticAxisX}).
 * <p>
 * {@code j}, {@code shearCentre} and {@code cw} are {@code null} where not computed: they come from closed
 * forms for circles and tubes only ({@code torsionSource} says which); never a guess.
 *
 * @param section           section id
 * @param referenceMaterial id of the material properties are transformed to
 * @param composite         true when parts have different Young's moduli
 * @param area              area A, length²
 * @param centroid          elastic centroid (E-weighted), length
 * @param ixx               second moment about the centroidal x axis, length⁴
 * @param iyy               second moment about the centroidal y axis, length⁴
 * @param ixy               product moment about the centroidal axes, length⁴
 * @param i1                major principal moment, length⁴
 * @param i2                minor principal moment, length⁴
 * @param principalAngleDeg angle of the I1 axis from +x, counter-clockwise, degrees
 * @param rx                radius of gyration √(Ixx/A), length
 * @param ry                radius of gyration √(Iyy/A), length
 * @param sxTop             Ixx / (ymax − yc), length³
 * @param sxBottom          Ixx / (yc − ymin), length³
 * @param syRight           Iyy / (xmax − xc), length³
 * @param syLeft            Iyy / (xc − xmin), length³
 * @param zx                plastic modulus for bending about x, length³
 * @param zy                plastic modulus for bending about y, length³
 * @param plasticAxisY      y of the plastic neutral axis for bending about x, length
 * @param plasticAxisX      x of the plastic neutral axis for bending about y, length
 * @param j                 St. Venant torsion constant, length⁴, or null
 * @param shearCentre       shear centre, length, or null
 * @param cw                warping constant about the shear centre, length⁶, or null
 * @param torsionSource     how J was obtained, or null when not computed
 * @param minX              bounding box, length
 * @param minY              bounding box, length
 * @param maxX              bounding box, length
 * @param maxY              bounding box, length
 * @since 0.1
 */
public record SectionProperties(String section, String referenceMaterial, boolean composite, double area,
        Point2 centroid, double ixx, double iyy, double ixy, double i1, double i2, double principalAngleDeg,
        double rx, double ry, double sxTop, double sxBottom, double syRight, double syLeft, double zx, double zy,
        double plasticAxisY, double plasticAxisX, Double j, Point2 shearCentre, Double cw, String torsionSource,
        double minX, double minY, double maxX, double maxY) {

    /** {@link #torsionSource()} of the closed form for a solid circle. */
    public static final String CLOSED_FORM_CIRCLE = "closedFormCircle";
    /** {@link #torsionSource()} of the closed form for a circular tube. */
    public static final String CLOSED_FORM_TUBE = "closedFormTube";
    /** {@link #torsionSource()} of the finite-element solution. */
    public static final String FINITE_ELEMENT = "finiteElement";

    /** @return true when J and the shear centre come from a closed form (circle or tube) */
    public boolean torsionClosedForm() {
        return CLOSED_FORM_CIRCLE.equals(torsionSource) || CLOSED_FORM_TUBE.equals(torsionSource);
    }

    /** @return a copy with the torsion constant, shear centre, warping constant and their source replaced */
    public SectionProperties withTorsion(Double newJ, Point2 newShearCentre, Double newCw, String source) {
        return new SectionProperties(section, referenceMaterial, composite, area, centroid, ixx, iyy, ixy, i1, i2,
                principalAngleDeg, rx, ry, sxTop, sxBottom, syRight, syLeft, zx, zy, plasticAxisY, plasticAxisX, newJ,
                newShearCentre, newCw, source, minX, minY, maxX, maxY);
    }
}
