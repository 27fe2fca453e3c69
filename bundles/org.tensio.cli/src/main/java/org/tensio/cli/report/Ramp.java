package org.tensio.cli.report;

import java.util.Locale;

/**
 * Tensio's colour scale for stress magnitudes: deep navy → teal → sage → sand → brick, interpolated in the OKLab
 * colour space (Björn Ottosson, "A perceptual color space for image processing", 2020, whose sRGB↔OKLab matrices
 * are used here) so that equal steps of the parameter look like roughly equal steps of colour. Low values are cool
 * and dark, high values warm; the hue order carries the ordering, and the band labels carry the numbers.
 */
final class Ramp {

    /** Anchor parameters and colours (sRGB). */
    private static final double[] AT = {0.0, 0.3, 0.55, 0.75, 1.0};
    private static final int[] RGB = {0x172B4D, 0x1F6E78, 0x8DB8A2, 0xE6D3A3, 0x9A2F22};

    private static final double[][] LAB = new double[RGB.length][];

    static {
        for (int i = 0; i < RGB.length; i++) {
            LAB[i] = toLab(RGB[i]);
        }
    }

    private Ramp() {
    }

    /** @return the colour at {@code t} in [0, 1] (clamped), as #rrggbb */
    static String at(double t) {
        return hex(rgb(t));
    }

    /** @return the colour at {@code t} as packed 0xRRGGBB */
    static int rgb(double t) {
        t = Math.max(0, Math.min(1, Double.isNaN(t) ? 0 : t));
        int k = 0;
        while (k < AT.length - 2 && t > AT[k + 1]) {
            k++;
        }
        double u = (t - AT[k]) / (AT[k + 1] - AT[k]);
        double[] a = LAB[k], b = LAB[k + 1];
        return fromLab(a[0] + u * (b[0] - a[0]), a[1] + u * (b[1] - a[1]), a[2] + u * (b[2] - a[2]));
    }

    /** @return OKLab (L, a, b) of a packed sRGB colour */
    static double[] toLab(int rgb) {
        double r = lin(((rgb >> 16) & 255) / 255.0), g = lin(((rgb >> 8) & 255) / 255.0), bl = lin((rgb & 255) / 255.0);
        double l = Math.cbrt(0.4122214708 * r + 0.5363325363 * g + 0.0514459929 * bl);
        double m = Math.cbrt(0.2119034982 * r + 0.6806995451 * g + 0.1073969566 * bl);
        double s = Math.cbrt(0.0883024619 * r + 0.2817188376 * g + 0.6299787005 * bl);
        return new double[] {0.2104542553 * l + 0.7936177850 * m - 0.0040720468 * s,
            1.9779984951 * l - 2.4285922050 * m + 0.4505937099 * s,
            0.0259040371 * l + 0.7827717662 * m - 0.8086757660 * s};
    }

    private static int fromLab(double lightness, double a, double b) {
        double l = lightness + 0.3963377774 * a + 0.2158037573 * b;
        double m = lightness - 0.1055613458 * a - 0.0638541728 * b;
        double s = lightness - 0.0894841775 * a - 1.2914855480 * b;
        l = l * l * l;
        m = m * m * m;
        s = s * s * s;
        double r = 4.0767416621 * l - 3.3077115913 * m + 0.2309699292 * s;
        double g = -1.2684380046 * l + 2.6097574011 * m - 0.3413193965 * s;
        double bl = -0.0041960863 * l - 0.7034186147 * m + 1.7076147010 * s;
        return (enc(r) << 16) | (enc(g) << 8) | enc(bl);
    }

    private static double lin(double c) {
        return c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
    }

    private static int enc(double c) {
        c = Math.max(0, Math.min(1, c));
        double v = c <= 0.0031308 ? 12.92 * c : 1.055 * Math.pow(c, 1 / 2.4) - 0.055;
        return (int) Math.round(v * 255);
    }

    /** @return #rrggbb */
    static String hex(int rgb) {
        return String.format(Locale.ROOT, "#%06x", rgb & 0xFFFFFF);
    }
}
