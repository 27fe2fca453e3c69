package org.tensio.engine.mesh;

/**
 * How finely to mesh a section.
 *
 * @param maxEdge        target edge length, length unit; 0 to derive it from {@code targetElements}
 * @param targetElements approximate number of triangles when {@code maxEdge} is 0
 * @param minAngleDeg    minimum interior angle the refinement aims for, degrees (20 ≤ value ≤ 33)
 * @param maxArcStepDeg  largest angle an arc may subtend per boundary edge, degrees
 * @param cornerLevels   number of geometric grading steps (halving) towards each re-entrant corner
 * @since 0.1
 */
public record MeshOptions(double maxEdge, int targetElements, double minAngleDeg, double maxArcStepDeg,
        int cornerLevels) {

    /** Default number of triangles: chosen so that the default mesh meets the documented accuracy. */
    public static final int DEFAULT_ELEMENTS = 2500;

    /** Validates the values; messages name the field. */
    public MeshOptions {
        if (!(maxEdge >= 0) || !Double.isFinite(maxEdge)) {
            throw new IllegalArgumentException("mesh.maxEdge must be ≥ 0 and finite, got " + maxEdge);
        }
        if (maxEdge == 0 && (targetElements < 10 || targetElements > 5_000_000)) {
            throw new IllegalArgumentException("mesh.targetElements must lie in [10, 5000000], got " + targetElements);
        }
        if (!(minAngleDeg >= 20 && minAngleDeg <= 33)) {
            throw new IllegalArgumentException("mesh.minAngleDeg must lie in [20, 33], got " + minAngleDeg);
        }
        if (!(maxArcStepDeg >= 1 && maxArcStepDeg <= 45)) {
            throw new IllegalArgumentException("mesh.maxArcStepDeg must lie in [1, 45], got " + maxArcStepDeg);
        }
        if (cornerLevels < 0 || cornerLevels > 12) {
            throw new IllegalArgumentException("mesh.cornerLevels must lie in [0, 12], got " + cornerLevels);
        }
    }

    /** @return the defaults: {@value #DEFAULT_ELEMENTS} triangles, 25°, 10° per arc edge, 4 corner levels */
    public static MeshOptions defaults() {
        return new MeshOptions(0, DEFAULT_ELEMENTS, 25, 10, 4);
    }

    /** @return options for about {@code n} triangles, other settings as the defaults */
    public static MeshOptions elements(int n) {
        return new MeshOptions(0, n, 25, 10, 4);
    }

    /** @return the same options with about four times as many triangles (edge length halved) */
    public MeshOptions refined() {
        return maxEdge > 0 ? new MeshOptions(maxEdge / 2, targetElements, minAngleDeg, maxArcStepDeg / 2, cornerLevels + 1)
                : new MeshOptions(0, targetElements * 4, minAngleDeg, maxArcStepDeg / 2, cornerLevels + 1);
    }
}
