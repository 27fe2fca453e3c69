package org.tensio.ui.editor.overlay;

import org.tensio.engine.geometry.Point2;

/**
 * A computed overlay, in the section frame (length unit of the file): the mesh, a value per element corner
 * and mid-side node (or none), and the section's centroid, principal angle and shear centre. Arrays are owned
 * by this result and not changed after construction.
 *
 * @param request           what was asked
 * @param x                 node x
 * @param y                 node y
 * @param elements          6 node indices per element (corners counter-clockwise, then mid-sides)
 * @param values            6 values per element (same order), or null when no case was asked
 * @param min               smallest value (NaN when none)
 * @param max               largest value (NaN when none)
 * @param centroid          elastic centroid
 * @param principalAngleDeg angle of the major principal axis from +x, counter-clockwise, degrees
 * @param shearCentre       shear centre, or null when not computed
 * @param stressUnit        the stress unit of the file (e.g. MPa)
 */
public record ContourResult(ContourRequest request, double[] x, double[] y, int[] elements, double[] values,
        double min, double max, Point2 centroid, double principalAngleDeg, Point2 shearCentre, String stressUnit) {

    /** @return number of elements */
    public int elementCount() {
        return elements.length / 6;
    }
}
