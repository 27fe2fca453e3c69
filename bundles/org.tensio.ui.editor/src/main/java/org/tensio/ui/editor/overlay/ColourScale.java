package org.tensio.ui.editor.overlay;

/**
 * Tensio's own banded colour scales (no product's colours): a diverging scale for signed quantities (cool
 * slate-teal for compression, warm ochre to brick for tension, a pale sand at zero) and a sequential one for
 * non-negative quantities (pale sand to deep plum); a grey ramp as an alternative. Utilisation above 1 gets
 * its own band colour (black-violet), so an overstressed zone never looks like a high but acceptable one.
 * Immutable; colours are plain RGB triples (no SWT).
 */
public enum ColourScale {
    /** Coloured bands. */
    BANDS,
    /** Grey ramp, light to dark. */
    GREY;

    /** Number of bands of the scale. */
    public static final int BANDS_COUNT = 10;

    private static final int[][] DIVERGING = { { 38, 70, 83 }, { 42, 107, 120 }, { 62, 142, 145 },
            { 120, 180, 170 }, { 214, 222, 196 }, { 238, 218, 170 }, { 226, 178, 102 }, { 206, 126, 64 },
            { 170, 72, 46 }, { 120, 34, 36 } };
    private static final int[][] SEQUENTIAL = { { 246, 238, 214 }, { 236, 214, 168 }, { 226, 186, 122 },
            { 214, 152, 88 }, { 196, 114, 70 }, { 172, 80, 68 }, { 142, 54, 76 }, { 110, 38, 84 },
            { 80, 28, 82 }, { 52, 20, 66 } };
    /** Band colour of utilisation above 1. */
    public static final int[] OVER_LIMIT = { 20, 0, 30 };

    /** @return RGB of band {@code i} (0 = lowest) for a quantity, signed or not */
    public int[] band(int i, boolean signed) {
        if (this == GREY) {
            int v = 235 - i * 190 / (BANDS_COUNT - 1);
            return new int[] { v, v, v };
        }
        return (signed ? DIVERGING : SEQUENTIAL)[i].clone();
    }

    /**
     * The band edges of a contour: for a signed quantity symmetric about zero (±max|value|), else 0 .. max
     * (utilisation: 0 .. max(1, max) with the last band starting at 1 only when max exceeds 1).
     *
     * @return BANDS_COUNT + 1 increasing edges
     */
    public static double[] edges(Quantity q, double min, double max) {
        double[] e = new double[BANDS_COUNT + 1];
        double lo;
        double hi;
        if (q.signed()) {
            double a = Math.max(Math.abs(min), Math.abs(max));
            if (!(a > 0)) {
                a = 1;
            }
            lo = -a;
            hi = a;
        } else {
            lo = 0;
            hi = max > 0 ? max : 1;
            if (q.isUtilisation()) {
                hi = Math.min(hi, 1);
            }
        }
        for (int i = 0; i <= BANDS_COUNT; i++) {
            e[i] = lo + (hi - lo) * i / BANDS_COUNT;
        }
        return e;
    }

    /**
     * @return the band of {@code value} between {@code edges}, clamped to 0 .. BANDS_COUNT − 1, or
     *         BANDS_COUNT for utilisation above 1
     */
    public static int bandOf(Quantity q, double value, double[] edges) {
        if (q.isUtilisation() && value > 1) {
            return BANDS_COUNT;
        }
        double t = (value - edges[0]) / (edges[BANDS_COUNT] - edges[0]);
        int b = (int) Math.floor(t * BANDS_COUNT);
        return Math.max(0, Math.min(BANDS_COUNT - 1, b));
    }
}
