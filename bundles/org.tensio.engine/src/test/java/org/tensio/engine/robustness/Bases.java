package org.tensio.engine.robustness;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The valid projects that generated inputs start from: the shipped examples (docs/examples) and one project per
 * line of {@code robustness/profiles.txt} (every profile type), each with material limits, two stations, three
 * load cases and two combinations; and a composite of two parts.
 */
final class Bases {

    private static List<String> all;

    private Bases() {
    }

    static synchronized List<String> all() {
        if (all == null) {
            List<String> out = new ArrayList<>();
            for (String example : List.of("demo.tensio.json", "units-m-kN.tensio.json")) {
                try {
                    out.add(Files.readString(Path.of("../../docs/examples", example)));
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            }
            for (String profile : resourceLines("/robustness/profiles.txt")) {
                out.add(project("{\"material\": \"S355\", \"profile\": " + profile + "}"));
            }
            out.add(project("{\"parts\": [{\"material\": \"S355\", \"profile\": {\"type\": \"RectangleProfile\", "
                    + "\"xDim\": 100, \"yDim\": 12}, \"offset\": [0, 6]}, {\"material\": \"AL\", \"profile\": "
                    + "{\"type\": \"RectangleProfile\", \"xDim\": 60, \"yDim\": 40}, \"offset\": [0, 32]}]}"));
            all = List.copyOf(out);
        }
        return all;
    }

    /** @return a project with one section {@code s} given by {@code sectionJson} */
    static String project(String sectionJson) {
        return "{\"tensio\": 1, \"name\": \"fuzz base\", \"units\": {\"length\": \"mm\", \"force\": \"N\"},\n"
                + " \"materials\": {\"S355\": {\"E\": 210000, \"nu\": 0.3, \"fy\": 355, \"fu\": 510, \"partialFactor\": 1.1,"
                + " \"criteria\": [\"vonMises\", \"tresca\", \"maxShear\"]},\n"
                + "  \"AL\": {\"E\": 70000, \"nu\": 0.33, \"criteria\": [\"normal\", \"shear\"],"
                + " \"allowable\": {\"normal\": 140, \"shear\": 80}}},\n"
                + " \"sections\": {\"s\": " + sectionJson + "},\n"
                + " \"stations\": {\"A\": {\"section\": \"s\", \"forces\": {\"G\": {\"N\": 5e4, \"Mx\": 1.5e6, \"T\": 2e5},"
                + " \"Q\": {\"Vx\": 2e3, \"Vy\": -4e3, \"My\": -8e5}}},\n"
                + "  \"B\": {\"section\": \"s\", \"forces\": {\"G\": {\"N\": -2e4}, \"W\": {\"Mx\": -3e5, \"T\": 1e5}}}},\n"
                + " \"combinations\": {\"ULS1\": {\"G\": 1.35, \"Q\": 1.5}, \"ULS2\": {\"G\": 1.0, \"W\": 1.5}}}\n";
    }

    static List<String> resourceLines(String resource) {
        try (InputStream in = Bases.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("test resource " + resource + " not found");
            }
            List<String> out = new ArrayList<>();
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                if (!line.isBlank() && !line.startsWith("#")) {
                    out.add(line);
                }
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
