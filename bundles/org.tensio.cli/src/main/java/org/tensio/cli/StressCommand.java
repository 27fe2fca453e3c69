package org.tensio.cli;

import java.util.concurrent.Callable;

import org.tensio.engine.checks.FatiguePointOp;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.project.Project;
import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.ShearMethod;

import com.google.gson.JsonObject;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code tensio stress FILE --station ID --case ID --at X,Y [--format text|json] [--surface-tolerance D]}. At a
 * station with a fatigue check the output adds the fatigue results at the point for every load history and
 * fatigue criterion of the station ({@link FatiguePointOp}; JSON key {@code fatigue}); they do not depend on
 * {@code --case}.
 */
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

    @Option(names = "--surface-tolerance", paramLabel = "D",
            description = "fatigue: distance from the section's boundary within which the point counts as on the surface,"
                    + " where surface notches act (file length unit; default 0.5 % of the section's bounding-box diagonal)")
    Double surfaceTolerance;

    @Override
    public Integer call() throws Exception {
        Point2 p = parsePoint(at);
        SectionAnalysisService engine = input.engine();
        Project project = input.read();
        PointStress s = engine.stressAt(project, station, caseId, p, shearMethod);
        String sectionId = project.station(station).sectionId();
        FatiguePointOp fatigue = null;
        if (project.fatigue().station(station) != null) {
            Section section = project.section(sectionId);
            fatigue = new FatiguePointOp(project, section, engine.properties(section), engine.solution(section));
        }
        if (surfaceTolerance != null && (!(surfaceTolerance >= 0) || surfaceTolerance.isInfinite())) {
            throw new IllegalArgumentException("--surface-tolerance: must be a finite distance ≥ 0, got "
                    + surfaceTolerance);
        }
        double tolerance = surfaceTolerance != null ? surfaceTolerance
                : fatigue != null ? fatigue.defaultSurfaceTolerance() : 0;
        FatiguePointOp.Result f = fatigue == null ? null : fatigue.evaluate(station, p, tolerance);
        var out = spec.commandLine().getOut();
        if (format == Format.json) {
            JsonObject o = Json.stress(s, sectionId, project.units());
            if (f != null) {
                o.add("fatigue", FatiguePointViews.json(f, tolerance));
            }
            out.println(Json.GSON.toJson(o));
        } else {
            out.print(Text.stress(s, sectionId, project.units()));
            if (f != null) {
                out.print(FatiguePointViews.text(f, tolerance, project.units()));
            }
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
