package org.tensio.engine.profile;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * Parameter validation shared by the profile records. Every failure is an {@link IllegalArgumentException}
 * whose message starts with the parameter's IFC4 attribute name (lowerCamelCase) and its value, e.g.
 * {@code "filletRadius: 20 does not fit between the web and the flange tip (at most 14.45)"}.
 * <p>
 * "Fits" checks ({@link #atMost}) accept the limit itself (a radius may use a face up completely) with a
 * slack of {@link #SLACK} times the profile's size, so that limits computed by subtraction in floating point
 * (e.g. {@code (0.3 - 0.1) / 2 - 0.05}) do not reject the value a user wrote down as exactly equal.
 * Thickness checks ({@link #lessThan}) are strict, as the IFC4 where-rules are.
 */
final class Check {

    /** Relative slack of the "at most" checks, times the profile's largest dimension. */
    static final double SLACK = 1e-12;

    private Check() {
    }

    /** @return {@code value} when it is finite and &gt; 0 */
    static double positive(String name, double value) {
        finite(name, value);
        if (!(value > 0)) {
            throw new IllegalArgumentException(name + ": " + fmt(value) + " must be positive");
        }
        return value;
    }

    /** @return {@code value} when it is finite and &ge; 0 (optional radii: 0 means a sharp corner) */
    static double nonNegative(String name, double value) {
        finite(name, value);
        if (value < 0) {
            throw new IllegalArgumentException(name + ": " + fmt(value) + " must not be negative");
        }
        return value;
    }

    /** Rejects NaN and infinities. */
    static void finite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + ": " + fmt(value) + " must be a finite number");
        }
    }

    /**
     * Strict upper bound: {@code value < limit}.
     *
     * @param what how the limit reads in the message, e.g. {@code "half the overallDepth"}
     */
    static void lessThan(String name, double value, double limit, String what) {
        if (!(value < limit)) {
            throw new IllegalArgumentException(
                    name + ": " + fmt(value) + " must be less than " + what + " (" + fmt(limit) + ")");
        }
    }

    /**
     * Fit check: {@code value <= max} within {@link #SLACK}{@code  * scale}.
     *
     * @param where how the place reads in the message, e.g. {@code "between the web and the flange tip"}
     * @param scale the profile's largest dimension
     */
    static void atMost(String name, double value, double max, double scale, String where) {
        if (value > max + SLACK * scale) {
            throw new IllegalArgumentException(name + ": " + fmt(value) + " does not fit " + where + " (at most "
                    + fmt(Math.max(max, 0)) + ")");
        }
    }

    /** @return {@code value} with at most 10 significant digits and no trailing zeros ("20", "14.45", "NaN") */
    static String fmt(double value) {
        if (!Double.isFinite(value)) {
            return Double.toString(value);
        }
        if (value == 0) {
            return "0";
        }
        return new BigDecimal(value).round(new MathContext(10)).stripTrailingZeros().toPlainString();
    }
}
