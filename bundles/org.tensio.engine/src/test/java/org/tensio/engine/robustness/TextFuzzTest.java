package org.tensio.engine.robustness;

import java.util.List;
import java.util.Random;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.ShrinkingMode;
import net.jqwik.api.lifecycle.AfterContainer;

import org.tensio.engine.robustness.Harness.PathRule;

/**
 * Generated text that is mostly not a valid project: every base project truncated at a random place, random
 * deletions, insertions of JSON tokens and odd characters, swapped brackets, deep nesting, NaN/Infinity
 * literals, numbers beyond a double, duplicated keys, control characters. The contract is the same
 * ({@link Harness}): a {@code ProjectFormatException} naming where, or a project with finite results.
 */
class TextFuzzTest {

    static final String TRUNCATED = "text-truncated";
    static final String MUTATED = "text-mutated";

    private static final String[] TOKENS = {"{", "}", "[", "]", ",", ":", "\"", "\\", "0", "-", "e", "1e999", "-1e400",
        "NaN", "Infinity", "-Infinity", "null", "true", "[]", "{}", "\"x\"", "-0", "1e-320", "012", "0x1F", "+1",
        ".5", "1.", "\u0000", "\uFEFF", "\ud800", "\u2028", "/* c */", "// c\n", "'s'", "\"tensio\":1,",
        "\"parts\":[]", "\"E\":1,", "[[0,0],[0,0],[0,0]]", "{\"through\":[0,0]}", "{\"centre\":[1e300,0],\"turn\":\"ccw\"}",
        "[1e300,1e300]", "\"materials\":{},", "\"sections\":{\"q\":{}}", "\"x\":" + "[".repeat(70) + "1" + "]".repeat(70)};

    @Property(tries = 2000, seed = "1234", shrinking = ShrinkingMode.OFF)
    void truncatedFilesAreRejectedAsSuch(@ForAll long seed) {
        Random r = new Random(seed);
        List<String> bases = Bases.all();
        String base = bases.get(r.nextInt(bases.size())).strip();
        String text = base.substring(0, r.nextInt(base.length()));
        Harness.run(TRUNCATED, text, null, PathRule.ANY, false, true, "seed " + seed + ": prefix of "
                + text.length() + " characters");
    }

    @Property(tries = 2500, seed = "5678", shrinking = ShrinkingMode.OFF)
    void mutatedTextIsRejectedOrReadWithFiniteResults(@ForAll long seed) {
        Random r = new Random(seed);
        List<String> bases = Bases.all();
        StringBuilder sb = new StringBuilder(bases.get(r.nextInt(bases.size())));
        int times = 1 + r.nextInt(4);
        for (int k = 0; k < times && sb.length() > 0; k++) {
            int at = r.nextInt(sb.length());
            switch (r.nextInt(6)) {
                case 0 -> sb.delete(at, Math.min(sb.length(), at + 1 + r.nextInt(8)));
                case 1 -> sb.insert(at, TOKENS[r.nextInt(TOKENS.length)]);
                case 2 -> {
                    int end = Math.min(sb.length(), at + 1 + r.nextInt(40));
                    sb.insert(r.nextInt(sb.length()), sb.substring(at, end));
                }
                case 3 -> sb.setCharAt(at, (char) r.nextInt(0x80));
                case 4 -> { // nest a value deeply
                    int depth = 1 + r.nextInt(120);
                    sb.insert(at, "[".repeat(depth) + "]".repeat(depth));
                }
                default -> sb.replace(at, Math.min(sb.length(), at + 1 + r.nextInt(6)), TOKENS[r.nextInt(TOKENS.length)]);
            }
        }
        Harness.run(MUTATED, sb.toString(), null, PathRule.ANY, false, false, "seed " + seed);
    }

    @AfterContainer
    static void writeCounts() {
        Counts.write();
    }
}
