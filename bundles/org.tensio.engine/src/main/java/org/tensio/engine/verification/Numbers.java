package org.tensio.engine.verification;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;

/** Number formatting for the record's human-readable views (the JSON and CSV views keep every digit). */
final class Numbers {

    private Numbers() {
    }

    /**
     * @return {@code v} rounded to {@code digits} significant digits without trailing zeros: plain notation for
     *         1e-4 ≤ |v| &lt; 1e7 ({@code 0.005}, {@code 5000}, {@code 28.48}), otherwise {@code 1e-12},
     *         {@code 2.313e+10}; "—" for NaN
     */
    static String shortest(double v, int digits) {
        if (Double.isNaN(v)) {
            return "—";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "∞" : "−∞";
        }
        if (v == 0) {
            return "0";
        }
        double a = Math.abs(v);
        if (a >= 1e-4 && a < 1e7) {
            return new BigDecimal(v).round(new MathContext(digits)).stripTrailingZeros().toPlainString();
        }
        String s = String.format(Locale.ROOT, "%." + (digits - 1) + "e", v);
        // 1.000e-12 → 1e-12, 2.310e+10 → 2.31e+10
        int e = s.indexOf('e');
        String mantissa = s.substring(0, e), exponent = s.substring(e);
        if (mantissa.contains(".")) {
            mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return mantissa + exponent;
    }
}
