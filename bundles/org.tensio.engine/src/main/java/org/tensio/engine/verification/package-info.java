/**
 * The engine's verification record: its published check cases, computed through the public API exactly as a
 * user gets them, compared with references named by their source, each with an explicit, justified
 * tolerance — the record a quality system files before it trusts the tool.
 * <ul>
 * <li>{@link org.tensio.engine.verification.VerificationRunner} loads the case fixtures shipped in the bundle
 * ({@code verification/*.txt}) and computes them;</li>
 * <li>{@link org.tensio.engine.verification.VerificationRecord}, {@link org.tensio.engine.verification.CaseResult},
 * {@link org.tensio.engine.verification.VerificationCase}, {@link org.tensio.engine.verification.Tolerance}: the
 * results (immutable records);</li>
 * <li>{@link org.tensio.engine.verification.RecordFormat}: text, JSON (stable keys), CSV and HTML views.</li>
 * </ul>
 * Fixture format: one directive per line ({@code family}, {@code let}, {@code text}, {@code material},
 * {@code section}, {@code case}); a case is
 * {@code case ID | SECTION | QUANTITY | REFERENCE | TOLERANCE | WHY THIS TOLERANCE | SOURCE}. The quantities
 * are section properties, finite-element results on the default mesh and stresses at a point; references are
 * arithmetic expressions of the fixture's own constants (closed forms, hand calculations written out line by
 * line, printed table values). Units: mm, N, MPa, degrees.
 * <p>
 * Null policy: no method accepts or returns null unless its documentation says so
 * ({@link org.tensio.engine.verification.CaseResult#note()} is null when the computation succeeded).
 *
 * @since 0.1
 */
package org.tensio.engine.verification;
