package org.tensio.engine.checks;

import java.util.List;

/**
 * All check results of a project: one governing result per station × case (or combination) × material of the
 * station's section × criterion of that material ({@link CheckOp}).
 *
 * @param passed         true when every utilisation ≤ 1 (also when nothing was checked: see {@code warnings})
 * @param maxUtilisation the largest utilisation (0 when nothing was checked)
 * @param results        per station, case, material and criterion, in project order
 * @param warnings       notes (materials without limits, skipped combinations, singular corners, elementary
 *                       fall-backs), in the order they arose, without repeats
 * @since 0.1
 */
public record CheckReport(boolean passed, double maxUtilisation, List<CheckResult> results, List<String> warnings) {

    /** Copies the lists. */
    public CheckReport {
        results = List.copyOf(results);
        warnings = List.copyOf(warnings);
    }

    /** @return the index in {@link #results()} of the first result with the largest utilisation, or −1 when none */
    public int governingIndex() {
        int best = -1;
        for (int i = 0; i < results.size(); i++) {
            if (best < 0 || results.get(i).utilisation() > results.get(best).utilisation()) {
                best = i;
            }
        }
        return best;
    }

    /** @return the number of results with utilisation &gt; 1 */
    public int failedCount() {
        return (int) results.stream().filter(r -> !r.passed()).count();
    }
}
