package org.tensio.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

import org.tensio.engine.project.Project;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.service.SectionAnalysisService;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code tensio properties FILE [--section ID] [--format text|json]}. */
@Command(name = "properties", mixinStandardHelpOptions = true,
        description = "Exact section properties (area, centroid, second moments, principal axes, moduli).")
final class PropertiesCommand implements Callable<Integer> {

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "project file (JSON)")
    Path file;

    @Option(names = "--section", paramLabel = "ID", description = "only this section")
    String sectionId;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE})")
    Format format;

    @Override
    public Integer call() throws Exception {
        SectionAnalysisService engine = SectionAnalysisService.create();
        Project project = engine.readProject(file);
        List<SectionProperties> list = new ArrayList<>();
        if (sectionId != null) {
            list.add(engine.properties(project.section(sectionId)));
        } else {
            for (var s : project.sections().values()) {
                list.add(engine.properties(s));
            }
        }
        var out = spec.commandLine().getOut();
        if (format == Format.json) {
            if (list.size() == 1) {
                out.println(Json.GSON.toJson(Json.properties(list.get(0), project.units())));
            } else {
                JsonObject o = new JsonObject();
                JsonArray arr = new JsonArray();
                list.forEach(p -> arr.add(Json.properties(p, project.units())));
                o.add("sections", arr);
                out.println(Json.GSON.toJson(o));
            }
        } else {
            for (SectionProperties p : list) {
                out.print(Text.properties(p, project.units()));
                out.println();
            }
            out.println(Caution.TEXT);
        }
        return Main.OK;
    }
}
