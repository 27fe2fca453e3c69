package org.tensio.cli.report.spi;

import java.nio.file.Path;
import java.time.Instant;

import org.tensio.engine.checks.CheckReport;
import org.tensio.engine.project.Project;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * What a contributed {@link ReportSection} may read. Immutable.
 *
 * @param projectFile  the project file the report is made from
 * @param inputSha256  SHA-256 of that file's bytes, lower-case hex (as printed in the report)
 * @param made         when the report is made (UTC, seconds)
 * @param project      the project as the engine read it
 * @param checks       the project's check results
 * @param engine       the engine (properties, finite-element solutions, point stresses)
 * @since 0.1
 */
public record ReportContext(Path projectFile, String inputSha256, Instant made, Project project, CheckReport checks,
        SectionAnalysisService engine) {
}
