package org.tensio.engine.verification;

/**
 * What a verification case accepts, as its fixture states it.
 *
 * @param kind  the rule
 * @param value the rule's number: a relative tolerance (dimensionless) for {@link Kind#relative} and the
 *              bounds, an absolute deviation in the quantity's unit for {@link Kind#absolute}; finite, ≥ 0
 * @since 0.1
 */
public record Tolerance(Kind kind, double value) {

    /** The acceptance rules. */
    public enum Kind {
        /** |value − reference| ≤ tolerance · |reference|. */
        relative,
        /** |value − reference| ≤ tolerance (the quantity's unit). */
        absolute,
        /** The computed value is an upper bound of the reference: value ≥ reference − tolerance · |reference|. */
        upperBound,
        /** The computed value is a lower bound of the reference: value ≤ reference + tolerance · |reference|. */
        lowerBound
    }

    /** Rejects a null kind and a negative or non-finite value. */
    public Tolerance {
        if (kind == null) {
            throw new IllegalArgumentException("tolerance kind must not be null");
        }
        if (!(value >= 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException("tolerance must be finite and ≥ 0, got " + value);
        }
    }

    /**
     * @param computed  the engine's value
     * @param reference the reference value
     * @return true when the rule accepts {@code computed}; false for a non-finite {@code computed}
     */
    public boolean accepts(double computed, double reference) {
        if (!Double.isFinite(computed)) {
            return false;
        }
        double allowed = absolute(reference);
        return switch (kind) {
            case relative, absolute -> Math.abs(computed - reference) <= allowed;
            case upperBound -> computed >= reference - allowed;
            case lowerBound -> computed <= reference + allowed;
        };
    }

    /** @return the allowed deviation from {@code reference} in the quantity's unit (one-sided for the bounds) */
    public double absolute(double reference) {
        return kind == Kind.absolute ? value : value * Math.abs(reference);
    }

    /**
     * @return the allowed deviation relative to {@code reference} (for an absolute rule: value/|reference|), or
     *         NaN when the rule is absolute and the reference 0
     */
    public double relative(double reference) {
        if (kind != Kind.absolute) {
            return value;
        }
        return reference == 0 ? Double.NaN : value / Math.abs(reference);
    }

    /** @return the rule as the fixtures write it, to 4 significant digits: {@code "rel 1e-12"}, {@code "abs 5000"} */
    public String rule() {
        String k = switch (kind) {
            case relative -> "rel";
            case absolute -> "abs";
            case upperBound -> "upper";
            case lowerBound -> "lower";
        };
        return k + " " + Numbers.shortest(value, 4);
    }
}
