package org.tensio.ui.editor.model;

/**
 * An arc between a vertex and the next one of its loop, as the file writes it (docs/file-format.md §7):
 * through a point, or about a centre turning counter-clockwise or clockwise. Immutable; length unit of the file.
 *
 * @param kind how the arc is given
 * @param x    x of the through point or the centre
 * @param y    y of the through point or the centre
 */
public record ArcMarker(Kind kind, double x, double y) {

    /** How an arc is given in the file. */
    public enum Kind {
        /** {@code {"through": [x, y]}} */
        THROUGH,
        /** {@code {"centre": [x, y], "turn": "ccw"}} */
        CENTRE_CCW,
        /** {@code {"centre": [x, y], "turn": "cw"}} */
        CENTRE_CW
    }

    /** Rejects a null kind and non-finite coordinates. */
    public ArcMarker {
        if (kind == null) {
            throw new IllegalArgumentException("arc kind must not be null");
        }
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("arc point must be finite, got (" + x + ", " + y + ")");
        }
    }
}
