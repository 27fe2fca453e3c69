package org.tensio.engine.checks;

import java.util.List;

/**
 * All check results of a project: one governing result per station × case (or combination) × criterion.
 *
 * @param passed         true when every utilisation ≤ 1
 * @param maxUtilisation the largest utilisation (0 when nothing was checked)
 * @param results        per station, case and criterion, in project order
 * @param warnings       notes (materials without limits, singular corners, elementary fall-backs)
 * @since 0.1
 */
public record CheckReport(boolean passed, double maxUtilisation, List<CheckResult> results, List<String> warnings) {

    /** Copies the lists. */
    public CheckReport {
        results = List.copyOf(results);
        warnings = List.copyOf(warnings);
    }
}
