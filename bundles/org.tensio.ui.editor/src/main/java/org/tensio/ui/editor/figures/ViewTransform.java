package org.tensio.ui.editor.figures;

/**
 * Maps the section frame (length unit of the file, y up) to figure coordinates (y down) by a fixed scale:
 * figure x = x · scale, figure y = −y · scale. The viewer's zoom comes on top. Immutable.
 *
 * @param scale figure units per length unit, > 0
 */
public record ViewTransform(double scale) {

    /** Figure extent a section is scaled to at zoom 1. */
    public static final double TARGET_EXTENT = 600;

    /** Rejects a non-positive scale. */
    public ViewTransform {
        if (!(scale > 0) || !Double.isFinite(scale)) {
            throw new IllegalArgumentException("scale must be positive and finite, got " + scale);
        }
    }

    /**
     * @param extent the section's larger bounding-box side, length unit
     * @return the transform whose scale is the 1-2-5 number nearest below TARGET_EXTENT / extent
     */
    public static ViewTransform forExtent(double extent) {
        if (!(extent > 0) || !Double.isFinite(extent)) {
            return new ViewTransform(1);
        }
        double raw = TARGET_EXTENT / extent;
        double decade = Math.pow(10, Math.floor(Math.log10(raw)));
        double m = raw / decade;
        double nice = m >= 5 ? 5 : m >= 2 ? 2 : 1;
        return new ViewTransform(nice * decade);
    }

    /** @return figure x of section x */
    public int fx(double x) {
        return (int) Math.round(x * scale);
    }

    /** @return figure y of section y */
    public int fy(double y) {
        return (int) Math.round(-y * scale);
    }

    /** @return section x of figure x */
    public double x(double fx) {
        return fx / scale;
    }

    /** @return section y of figure y */
    public double y(double fy) {
        return -fy / scale;
    }
}
