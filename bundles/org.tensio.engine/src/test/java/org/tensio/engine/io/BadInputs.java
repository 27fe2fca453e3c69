package org.tensio.engine.io;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.params.provider.Arguments;

/**
 * Loads {@code /io/bad-inputs.txt}: one rejection case per line, {@code path<TAB>fragment<TAB>json}, with
 * the abbreviations described at the top of that file.
 */
final class BadInputs {

    /** Abbreviations, expanded in this order (longer ones use shorter ones). */
    static final Map<String, String> ABBREVIATIONS = new LinkedHashMap<>();

    static {
        ABBREVIATIONS.put("%ST%", "%S%\"stations\":{\"A\":{\"section\":\"s\",\"forces\":{\"LC1\":{\"N\":5e4,\"Mx\":1.5e6}}}},");
        ABBREVIATIONS.put("%S%", "%P%\"sections\":{\"s\":{\"material\":\"m\",\"profile\":{\"type\":\"CircleProfile\",\"radius\":25}}},");
        ABBREVIATIONS.put("%OUTER%",
                "%P%\"sections\":{\"s\":{\"material\":\"m\",\"profile\":{\"type\":\"ArbitraryClosedProfile\",\"outer\":");
        ABBREVIATIONS.put("%VOIDS%", "%P%\"sections\":{\"s\":{\"material\":\"m\",\"profile\":{\"type\":"
                + "\"ArbitraryProfileWithVoids\",\"outer\":[[0,0],[100,0],[100,20],[0,20]],\"voids\":");
        ABBREVIATIONS.put("%P%", "{\"tensio\":1,\"materials\":{\"m\":{\"E\":210000,\"nu\":0.3},\"al\":{\"E\":70000,\"nu\":0.33}},");
    }

    private BadInputs() {
    }

    /** @return (line number, expected path, expected message fragment, json) per case */
    static List<Arguments> cases() {
        List<Arguments> out = new ArrayList<>();
        try (InputStream in = BadInputs.class.getResourceAsStream("/io/bad-inputs.txt")) {
            if (in == null) {
                throw new IllegalStateException("test resource /io/bad-inputs.txt not found");
            }
            String[] lines = new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n", -1);
            for (int i = 0; i < lines.length; i++) {
                String line = lines[i];
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] cols = line.split("\t", 3);
                if (cols.length != 3) {
                    throw new IllegalStateException("bad-inputs.txt line " + (i + 1) + ": expected 3 tab-separated columns");
                }
                out.add(Arguments.of(i + 1, cols[0], cols[1], expand(cols[2])));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out;
    }

    static String expand(String json) {
        String s = json;
        for (Map.Entry<String, String> e : ABBREVIATIONS.entrySet()) {
            s = s.replace(e.getKey(), e.getValue());
        }
        return s;
    }
}
