package org.tensio.engine.fatigue;

/**
 * One correction factor (or one derived strength) of a fatigue calculation, with where its value comes from, so
 * that a report can show every number and its source.
 *
 * @param symbol the usual symbol ({@code ka}, {@code kb}, ..., {@code Se'})
 * @param name   what it corrects for ("surface finish", "size", ...)
 * @param value  the value: dimensionless for factors, stress unit of the project for strengths
 * @param source how it was obtained: the formula with its inputs and the published source, or "given"
 * @since 0.1
 */
public record Factor(String symbol, String name, double value, String source) {

    /** Rejects a non-finite or non-positive value and missing texts. */
    public Factor {
        if (symbol == null || name == null || source == null) {
            throw new IllegalArgumentException("factor: symbol, name and source are required, got " + symbol + ", "
                    + name + ", " + source);
        }
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException("factor " + symbol + " (" + name + "): must be positive and finite, got "
                    + value);
        }
    }
}
