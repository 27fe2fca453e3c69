package org.tensio.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

import org.tensio.engine.project.Project;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code tensio properties FILE [--section ID] [--format text|json]}. */
@Command(name = "properties", mixinStandardHelpOptions = true,
        description = "Exact section properties (area, centroid, second moments, principal axes, moduli).")
final class PropertiesCommand implements Callable<Integer> {

    @Mixin
    ProjectInput input; // made by Main's factory

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Option(names = "--section", paramLabel = "ID", description = "only this section")
    String sectionId;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE})")
    Format format;

    @Option(names = "--convergence", description = "also solve on a refined mesh (about 4x the elements) and report"
            + " J and the peak torsion stress on both meshes")
    boolean convergence;

    @Override
    public Integer call() throws Exception {
        SectionAnalysisService engine = input.engine();
        Project project = input.read();
        List<Section> sections = sectionId != null ? List.of(project.section(sectionId))
                : new ArrayList<>(project.sections().values());
        List<SectionProperties> list = new ArrayList<>();
        List<TorsionReport> torsion = new ArrayList<>();
        for (Section s : sections) {
            SectionProperties p = engine.properties(s);
            list.add(p);
            torsion.add(TorsionReport.of(engine, s, p, convergence));
        }
        var out = spec.commandLine().getOut();
        if (format == Format.json) {
            if (list.size() == 1) {
                out.println(Json.GSON.toJson(Json.properties(list.get(0), torsion.get(0), project.units())));
            } else {
                JsonObject o = new JsonObject();
                JsonArray arr = new JsonArray();
                for (int i = 0; i < list.size(); i++) {
                    arr.add(Json.properties(list.get(i), torsion.get(i), project.units()));
                }
                o.add("sections", arr);
                out.println(Json.GSON.toJson(o));
            }
        } else {
            for (int i = 0; i < list.size(); i++) {
                out.print(Text.properties(list.get(i), torsion.get(i), project.units()));
                out.println();
            }
            out.println(Caution.TEXT);
        }
        return Main.OK;
    }
}
