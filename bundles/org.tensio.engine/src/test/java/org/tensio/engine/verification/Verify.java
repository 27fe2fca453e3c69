package org.tensio.engine.verification;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Assertions with an explicit tolerance, expected value first. With {@code -Dtensio.verification.log=true}
 * every comparison is also printed (what, expected, actual, deviation, tolerance) so that a report can quote
 * the measured deviation against the allowed one.
 */
public final class Verify {

    private static final boolean LOG = Boolean.getBoolean("tensio.verification.log");

    private Verify() {
    }

    /** |actual − expected| ≤ relTol · |expected|. */
    public static void close(double expected, double actual, double relTol, String what) {
        closeAbs(expected, actual, relTol * Math.abs(expected), what);
    }

    /** |actual − expected| ≤ absTol. */
    public static void closeAbs(double expected, double actual, double absTol, String what) {
        if (LOG) {
            double dev = Math.abs(actual - expected);
            System.out.printf("VERIFY\t%s\t%.10g\t%.10g\tdev=%.3g\ttol=%.3g\tratio=%.3g%n", what, expected, actual, dev,
                    absTol, absTol > 0 ? dev / absTol : Double.NaN);
        }
        assertEquals(expected, actual, absTol, what);
    }
}
