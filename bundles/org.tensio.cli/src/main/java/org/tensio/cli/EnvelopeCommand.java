package org.tensio.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;

import org.tensio.engine.checks.EnvelopeOp;
import org.tensio.engine.checks.StationEnvelope;
import org.tensio.engine.project.Project;
import org.tensio.engine.service.SectionAnalysisService;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code tensio envelope FILE --station ID [--format text|json] [--limit N]}. */
@Command(name = "envelope", mixinStandardHelpOptions = true,
        description = "Per-point envelope of a station's stresses over all its load cases and combinations, and the"
                + " envelope of its internal forces.")
final class EnvelopeCommand implements Callable<Integer> {

    @Mixin
    ProjectInput input; // made by Main's factory

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Option(names = "--station", required = true, paramLabel = "ID", description = "station id")
    String station;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE})")
    Format format;

    @Option(names = "--limit", paramLabel = "N", defaultValue = "20",
            description = "text only: list the N points with the largest von Mises stress, 0 for all (default: ${DEFAULT-VALUE})")
    int limit;

    @Override
    public Integer call() throws Exception {
        if (limit < 0) {
            throw new IllegalArgumentException("--limit: must be 0 (all) or positive, got " + limit);
        }
        SectionAnalysisService engine = input.engine();
        Project project = input.read();
        StationEnvelope e = EnvelopeOp.envelope(project, station, engine);
        PrintWriter out = spec.commandLine().getOut();
        if (format == Format.json) {
            out.println(Json.GSON.toJson(EnvelopeViews.json(e, project.units())));
        } else {
            out.print(EnvelopeViews.text(e, project.units(), limit));
        }
        return Main.OK;
    }
}
