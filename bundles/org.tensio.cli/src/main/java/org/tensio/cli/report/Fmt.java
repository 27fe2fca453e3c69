package org.tensio.cli.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Number formatting for reports: a fixed number of significant digits, plain notation between 1e-3 and 1e6,
 * otherwise a mantissa times a power of ten with superscript digits (8.3562×10⁷); a true minus sign; '.' as the
 * decimal mark whatever the locale. The exact double is kept beside each table value as {@code data-value} in the
 * HTML.
 */
final class Fmt {

    private static final String SUP = "⁰¹²³⁴⁵⁶⁷⁸⁹";

    private Fmt() {
    }

    /** @return {@code v} to {@code sig} significant digits; "—" for null or non-finite */
    static String sig(Double v, int sig) {
        if (v == null || !Double.isFinite(v)) {
            return "—";
        }
        double x = v;
        if (x == 0) {
            return "0";
        }
        BigDecimal d = new BigDecimal(x).round(new MathContext(sig, RoundingMode.HALF_EVEN));
        double a = Math.abs(d.doubleValue());
        if (a >= 1e-3 && a < 1e6) {
            return minus(strip(d.toPlainString()));
        }
        int exp = d.precision() - d.scale() - 1;
        BigDecimal m = d.movePointLeft(exp);
        return minus(strip(m.toPlainString())) + "×10" + sup(exp);
    }

    /** @return {@code v} with {@code decimals} digits after the point; "—" for null or non-finite */
    static String fixed(Double v, int decimals) {
        if (v == null || !Double.isFinite(v)) {
            return "—";
        }
        String s = new BigDecimal(v).setScale(decimals, RoundingMode.HALF_EVEN).toPlainString();
        if (s.matches("-0(\\.0*)?")) {
            s = s.substring(1);
        }
        return minus(s);
    }

    /** @return a point as "(x, y)" */
    static String point(double x, double y) {
        return "(" + sig(x, 5) + ", " + sig(y, 5) + ")";
    }

    /** @return superscript form of an integer exponent */
    static String sup(int e) {
        StringBuilder b = new StringBuilder();
        if (e < 0) {
            b.append('⁻');
        }
        for (char c : Integer.toString(Math.abs(e)).toCharArray()) {
            b.append(SUP.charAt(c - '0'));
        }
        return b.toString();
    }

    private static String strip(String s) {
        if (s.indexOf('.') >= 0) {
            s = s.replaceAll("0+$", "");
            if (s.endsWith(".")) {
                s = s.substring(0, s.length() - 1);
            }
        }
        return s;
    }

    /** A true minus sign (U+2212) reads better than a hyphen in tables. */
    private static String minus(String s) {
        return s.startsWith("-") ? "−" + s.substring(1) : s;
    }
}
