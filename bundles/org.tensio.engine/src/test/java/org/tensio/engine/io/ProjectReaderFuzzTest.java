package org.tensio.engine.io;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * The reader's contract that nothing but {@link ProjectFormatException} escapes {@code parse}, for any
 * text: every prefix of a small file, and random mutations of the demo (fixed seed, reproducible).
 */
class ProjectReaderFuzzTest {

    private static final String SMALL = "{\"tensio\": 1, \"units\": {\"length\": \"mm\", \"force\": \"N\"},\n"
            + " \"materials\": {\"S355\": {\"E\": 210000, \"nu\": 0.3, \"fy\": 355}},\n"
            + " \"sections\": {\"plate\": {\"material\": \"S355\", \"profile\": {\"type\": \"ArbitraryProfileWithVoids\",\n"
            + "   \"outer\": [[0,0],[100,0],{\"through\":[110,10]},[100,20],[0,20]], \"voids\": [[[50,10],{\"centre\":[45,10],"
            + "\"turn\":\"cw\"}]]}}},\n"
            + " \"stations\": {\"A\": {\"section\": \"plate\", \"forces\": {\"LC1\": {\"N\": 5e4, \"Mx\": 1.5e6}}}},\n"
            + " \"combinations\": {\"ULS1\": {\"LC1\": 1.35}}}\n";

    private static final String[] TOKENS = {"{", "}", "[", "]", ",", ":", "\"", "\\", "0", "-", "e", "1e999", "NaN",
        "null", "true", "[]", "{}", "\"x\"", "-0", "1e-320", "1.7976931348623157E308", "\"type\"", "\"outer\"",
        "{\"through\":[0,0]}", "{\"centre\":[1e300,0],\"turn\":\"ccw\"}", "[1e300,1e300]", "\u0000", "\uFEFF",
        "\ud800", "\"parts\":[]", "\"tensio\":1,"};

    @Test
    void everyProperPrefixIsRejected() throws ProjectFormatException {
        ProjectReader.parse(SMALL, "small");
        String body = SMALL.strip();
        for (int n = 0; n < body.length(); n++) {
            String prefix = body.substring(0, n);
            assertThrows(ProjectFormatException.class, () -> ProjectReader.parse(prefix, "prefix"), prefix);
        }
    }

    @Test
    void randomMutationsOnlyEverGiveProjectFormatExceptions() throws IOException {
        String demo = Files.readString(Path.of("../../docs/examples/demo.tensio.json"));
        Random random = new Random(20240611L);
        for (int i = 0; i < 3000; i++) {
            String text = mutate(i % 2 == 0 ? demo : SMALL, random, 1 + random.nextInt(4));
            try {
                ProjectReader.parse(text, "fuzz");
            } catch (ProjectFormatException expected) {
                // the contract
            } catch (RuntimeException | Error e) {
                fail("mutation " + i + " escaped with " + e + " for input:\n" + text, e);
            }
        }
    }

    private static String mutate(String s, Random r, int times) {
        StringBuilder sb = new StringBuilder(s);
        for (int k = 0; k < times && sb.length() > 0; k++) {
            int at = r.nextInt(sb.length());
            switch (r.nextInt(4)) {
                case 0 -> sb.delete(at, Math.min(sb.length(), at + 1 + r.nextInt(8)));
                case 1 -> sb.insert(at, TOKENS[r.nextInt(TOKENS.length)]);
                case 2 -> {
                    int end = Math.min(sb.length(), at + 1 + r.nextInt(40));
                    sb.insert(r.nextInt(sb.length()), sb.substring(at, end));
                }
                default -> sb.replace(at, Math.min(sb.length(), at + 1 + r.nextInt(6)), TOKENS[r.nextInt(TOKENS.length)]);
            }
        }
        return sb.toString();
    }
}
