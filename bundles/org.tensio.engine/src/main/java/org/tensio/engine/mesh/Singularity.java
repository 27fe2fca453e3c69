package org.tensio.engine.mesh;

/**
 * A sharp re-entrant corner of a section boundary: the elastic shear stress there is singular (it grows
 * without bound as the mesh is refined), so a peak value at such a corner is not a number to trust; model
 * the fillet instead.
 *
 * @param part            index of the section part
 * @param x               corner x, length unit
 * @param y               corner y, length unit
 * @param interiorAngleDeg interior angle of the material at the corner, degrees (&gt; 180)
 * @since 0.1
 */
public record Singularity(int part, double x, double y, double interiorAngleDeg) {
}
