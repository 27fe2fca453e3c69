package org.tensio.engine.verification;

import java.time.Instant;
import java.util.List;

/**
 * The verification record: every published check case of the engine, computed through its public API, with
 * the environment it ran in. This is what a quality system files before it trusts the tool; write it with
 * {@link RecordFormat}.
 *
 * @param engineVersion the engine bundle's {@code Bundle-Version}, or "unknown"
 * @param date          when the record was computed, to the second (UTC; the views print ISO 8601)
 * @param javaVersion   the Java runtime: version, vendor and VM
 * @param os            the operating system: name, version and architecture
 * @param processors    processors available to the Java runtime
 * @param units         the unit system of every case ("mm, N, MPa; angles in degrees")
 * @param caution       the caution every report carries
 * @param cases         the results in fixture order
 * @since 0.1
 */
public record VerificationRecord(String engineVersion, Instant date, String javaVersion, String os, int processors,
        String units, String caution, List<CaseResult> cases) {

    /** The caution every report carries. */
    public static final String CAUTION = "Results support, not replace, a competent engineer's review;"
            + " local codes and licensed practice govern.";

    /** Copies the case list; rejects nulls. */
    public VerificationRecord {
        if (engineVersion == null || date == null || javaVersion == null || os == null || units == null
                || caution == null || cases == null) {
            throw new IllegalArgumentException("verification record: no field may be null");
        }
        cases = List.copyOf(cases);
    }

    /** @return true when every case passed (and there is at least one) */
    public boolean passed() {
        return !cases.isEmpty() && cases.stream().allMatch(CaseResult::passed);
    }

    /** @return number of cases that passed */
    public int passedCount() {
        return (int) cases.stream().filter(CaseResult::passed).count();
    }

    /** @return number of cases that failed */
    public int failedCount() {
        return cases.size() - passedCount();
    }
}
