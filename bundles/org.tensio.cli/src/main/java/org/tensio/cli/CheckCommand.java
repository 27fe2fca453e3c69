package org.tensio.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.tensio.engine.checks.CheckOp;
import org.tensio.engine.checks.CheckReport;
import org.tensio.engine.project.Project;
import org.tensio.engine.service.SectionAnalysisService;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code tensio check FILE [--format text|json|csv] [--report DIR]}: the static strength checks of every
 * station, load case, combination, material and criterion. Exit codes: 0 every utilisation ≤ 1, 1 some
 * utilisation &gt; 1, 2 bad input.
 */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Utilisation checks of every station, load case and combination against the materials' limits"
                + " (exit 0: all pass, 1: some utilisation > 1, 2: bad input).")
final class CheckCommand implements Callable<Integer> {

    @Mixin
    ProjectInput input; // made by Main's factory

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "text, json or csv (default: ${DEFAULT-VALUE})")
    CheckFormat format;

    @Option(names = "--report", paramLabel = "DIR", description = "also write a report into this folder")
    Path reportDir;

    @Override
    public Integer call() throws Exception {
        SectionAnalysisService engine = input.engine();
        Project project = input.read();
        CheckReport report = CheckOp.check(project, engine);
        PrintWriter out = spec.commandLine().getOut();
        switch (format) {
            case json -> out.println(Json.GSON.toJson(CheckViews.json(report, project.units())));
            case csv -> out.print(CheckViews.csv(report));
            case text -> out.print(CheckViews.text(report, project.units()));
        }
        out.flush();
        if (reportDir != null) {
            writeReport(project, report, engine);
        }
        return report.passed() ? Main.OK : Main.FAILED_CHECK;
    }

    /** Writes the HTML report (and its PDF) into {@code reportDir}; the exit code stays the check's. */
    private void writeReport(Project project, CheckReport report, SectionAnalysisService engine) throws java.io.IOException {
        java.nio.file.Path html = org.tensio.cli.report.ReportWriter.write(reportDir, input.file(), project, report, engine,
                input.reportSections());
        spec.commandLine().getErr().println("report: " + html);
    }
}
