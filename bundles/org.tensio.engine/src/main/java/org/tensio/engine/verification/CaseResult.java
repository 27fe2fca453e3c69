package org.tensio.engine.verification;

/**
 * A verification case as computed.
 *
 * @param definition    the case
 * @param value         the engine's value, unit {@code definition.unit()}; NaN when the computation failed
 * @param absoluteError |value − reference|; NaN when the computation failed
 * @param relativeError |value − reference| / |reference|; NaN when the reference is 0 or the computation failed
 * @param passed        true when the tolerance accepts the value
 * @param computedBy    the public engine call that produced the value, e.g.
 *                      {@code SectionAnalysisService.properties(section).ixx()}
 * @param note          why the computation failed (the exception and its message), or null
 * @since 0.1
 */
public record CaseResult(VerificationCase definition, double value, double absoluteError, double relativeError,
        boolean passed, String computedBy, String note) {

    /** @return the result of comparing {@code value} with the case's reference */
    static CaseResult of(VerificationCase c, double value, String computedBy) {
        double ref = c.reference();
        double abs = Math.abs(value - ref);
        double rel = ref == 0 ? Double.NaN : abs / Math.abs(ref);
        return new CaseResult(c, value, abs, rel, c.tolerance().accepts(value, ref), computedBy, null);
    }

    /** @return a failed result for a computation that threw */
    static CaseResult failed(VerificationCase c, String computedBy, RuntimeException e) {
        String msg = e.getClass().getSimpleName() + (e.getMessage() == null ? "" : ": " + e.getMessage());
        return new CaseResult(c, Double.NaN, Double.NaN, Double.NaN, false, computedBy, msg);
    }
}
