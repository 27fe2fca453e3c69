package org.tensio.ui.results.model;

/**
 * Tensio's colour scale for utilisation (demand / capacity), as 0xRRGGBB cell backgrounds light enough for black
 * text. Continuous, piecewise linear in RGB between these stops (this project's own choice of colours):
 * <ul>
 * <li>0.0 mist blue {@code #E4ECF5} — 0.5 sage {@code #D5EBD3} — at the warning threshold w (default 0.9) straw
 * {@code #F3E6A6}: comfortably passing to close;</li>
 * <li>w … 1.0 straw to apricot {@code #F6C28B}: passing, above the warning threshold;</li>
 * <li>&gt; 1.0 coral {@code #F09A8E} at 1.0 deepening to rosewood {@code #D9707F} at 1.5 and beyond: failing.</li>
 * </ul>
 * The jump at 1.0 (apricot to coral) is deliberate: failing cells must not look like nearly-failing ones.
 */
public final class UtilisationScale {

    private static final int MIST = 0xE4ECF5;
    private static final int SAGE = 0xD5EBD3;
    private static final int STRAW = 0xF3E6A6;
    private static final int APRICOT = 0xF6C28B;
    private static final int CORAL = 0xF09A8E;
    private static final int ROSEWOOD = 0xD9707F;
    private static final double DEEPEST = 1.5;

    private UtilisationScale() {
    }

    /**
     * @param utilisation demand / capacity, ≥ 0 (NaN and negative values are shown as 0)
     * @param warning     the warning threshold, in (0, 1]
     * @return the colour, 0xRRGGBB
     */
    public static int rgb(double utilisation, double warning) {
        double u = Double.isNaN(utilisation) || utilisation < 0 ? 0 : utilisation;
        double w = Math.min(1, Math.max(1e-3, warning));
        if (u > 1) {
            return blend(CORAL, ROSEWOOD, (u - 1) / (DEEPEST - 1));
        }
        if (u > w) {
            return blend(STRAW, APRICOT, (u - w) / (1 - w));
        }
        double half = w / 2;
        return u <= half ? blend(MIST, SAGE, u / half) : blend(SAGE, STRAW, (u - half) / (w - half));
    }

    static int blend(int a, int b, double t) {
        double s = Math.min(1, Math.max(0, t));
        int r = channel(a >> 16, b >> 16, s);
        int g = channel(a >> 8, b >> 8, s);
        int bl = channel(a, b, s);
        return (r << 16) | (g << 8) | bl;
    }

    private static int channel(int a, int b, double t) {
        int x = a & 0xFF, y = b & 0xFF;
        return (int) Math.round(x + (y - x) * t);
    }
}
