package org.tensio.cli;

import java.util.concurrent.Callable;

import org.tensio.engine.geometry.Point2;
import org.tensio.engine.project.Project;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.ShearMethod;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code tensio stress FILE --station ID --case ID --at X,Y [--format text|json]}. */
@Command(name = "stress", mixinStandardHelpOptions = true,
        description = "The full stress state at one point of a station's section for a load case or combination.")
final class StressCommand implements Callable<Integer> {

    @Mixin
    ProjectInput input; // made by Main's factory

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Option(names = "--station", required = true, paramLabel = "ID", description = "station id")
    String station;

    @Option(names = "--case", required = true, paramLabel = "ID", description = "load case or combination id")
    String caseId;

    @Option(names = "--at", required = true, paramLabel = "X,Y", description = "point in the section frame, file units")
    String at;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE})")
    Format format;

    @Option(names = "--shear-method", paramLabel = "METHOD", defaultValue = "finiteElement",
            description = "finiteElement (shear functions, default) or elementary (VQ/(It) on straight cuts, for comparison)")
    ShearMethod shearMethod;

    @Override
    public Integer call() throws Exception {
        Point2 p = parsePoint(at);
        SectionAnalysisService engine = input.engine();
        Project project = input.read();
        PointStress s = engine.stressAt(project, station, caseId, p, shearMethod);
        String sectionId = project.station(station).sectionId();
        var out = spec.commandLine().getOut();
        if (format == Format.json) {
            out.println(Json.GSON.toJson(Json.stress(s, sectionId, project.units())));
        } else {
            out.print(Text.stress(s, sectionId, project.units()));
            out.println(Caution.TEXT);
        }
        return Main.OK;
    }

    /** Parses "X,Y" (also "X Y" or "X;Y"); the message names the option and the value. */
    static Point2 parsePoint(String text) {
        String[] parts = text.trim().split("\\s*[,; ]\\s*");
        if (parts.length != 2) {
            throw new IllegalArgumentException("--at: expected X,Y, got '" + text + "'");
        }
        try {
            double x = Double.parseDouble(parts[0]);
            double y = Double.parseDouble(parts[1]);
            if (!Double.isFinite(x) || !Double.isFinite(y)) {
                throw new NumberFormatException();
            }
            return new Point2(x, y);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("--at: coordinates must be finite numbers, got '" + text + "'");
        }
    }
}
