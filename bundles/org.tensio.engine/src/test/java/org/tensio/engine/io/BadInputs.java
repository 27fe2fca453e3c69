package org.tensio.engine.io;

import java.io.ByteArrayOutputStream;
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
 * the abbreviations described at the top of that file; and {@code /io/load-table-bad-inputs.txt}:
 * {@code path<TAB>fragment<TAB>csv<TAB>json}, the CSV content escaped as described at the top of that file.
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

    /** Abbreviations of the load-table cases, expanded in this order. */
    static final Map<String, String> TABLE_ABBREVIATIONS = new LinkedHashMap<>();

    static {
        TABLE_ABBREVIATIONS.put("%LT%", "%PRJ%{\"file\":\"loads.csv\"");
        TABLE_ABBREVIATIONS.put("%PRJ%", "{\"tensio\":1,\"materials\":{\"m\":{\"E\":210000,\"nu\":0.3}},\"sections\":"
                + "{\"s\":{\"material\":\"m\",\"profile\":{\"type\":\"CircleProfile\",\"radius\":25}}},\"stations\":"
                + "{\"A\":{\"section\":\"s\"},\"B\":{\"section\":\"s\",\"forces\":{\"G\":{\"N\":1}}}},\"loadTables\":[");
    }

    private BadInputs() {
    }

    /** @return (line number, expected path, expected message fragment, json) per case */
    static List<Arguments> cases() {
        List<Arguments> out = new ArrayList<>();
        String[] lines = lines("/io/bad-inputs.txt");
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
        return out;
    }

    /** @return (line number, expected path, expected message fragment, CSV bytes, project json) per case */
    static List<Arguments> tableCases() {
        List<Arguments> out = new ArrayList<>();
        String[] lines = lines("/io/load-table-bad-inputs.txt");
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i];
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            String[] cols = line.split("\t", 4);
            if (cols.length != 4) {
                throw new IllegalStateException("load-table-bad-inputs.txt line " + (i + 1)
                        + ": expected 4 tab-separated columns");
            }
            String json = cols[3];
            for (Map.Entry<String, String> e : TABLE_ABBREVIATIONS.entrySet()) {
                json = json.replace(e.getKey(), e.getValue());
            }
            out.add(Arguments.of(i + 1, cols[0], cols[1], csvBytes(cols[2]), json));
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

    /**
     * @return the bytes of an escaped CSV text: a backslash followed by n, r, t, a backslash, u and four hex digits
     *         (a character, written as UTF-8) or x and two hex digits (one raw byte); the macro {@code %ROWSn%}
     *         stands for n rows "A,Lk,0" (k = 1..n) of station A
     */
    static byte[] csvBytes(String escaped) {
        String s = escaped;
        int m = s.indexOf("%ROWS");
        if (m >= 0) {
            int end = s.indexOf('%', m + 5);
            int n = Integer.parseInt(s.substring(m + 5, end));
            StringBuilder rows = new StringBuilder();
            for (int k = 1; k <= n; k++) {
                rows.append("A,L").append(k).append(",0\\n");
            }
            s = s.substring(0, m) + rows + s.substring(end + 1);
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        StringBuilder text = new StringBuilder();
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c != '\\') {
                text.append(c);
                continue;
            }
            char e = s.charAt(++i);
            switch (e) {
                case 'n' -> text.append('\n');
                case 'r' -> text.append('\r');
                case 't' -> text.append('\t');
                case '\\' -> text.append('\\');
                case 'u' -> {
                    text.append((char) Integer.parseInt(s.substring(i + 1, i + 5), 16));
                    i += 4;
                }
                case 'x' -> {
                    out.writeBytes(text.toString().getBytes(StandardCharsets.UTF_8));
                    text.setLength(0);
                    out.write(Integer.parseInt(s.substring(i + 1, i + 3), 16));
                    i += 2;
                }
                default -> throw new IllegalStateException("unknown escape \\" + e + " in " + escaped);
            }
        }
        out.writeBytes(text.toString().getBytes(StandardCharsets.UTF_8));
        return out.toByteArray();
    }

    private static String[] lines(String resource) {
        try (InputStream in = BadInputs.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("test resource " + resource + " not found");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n", -1);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
