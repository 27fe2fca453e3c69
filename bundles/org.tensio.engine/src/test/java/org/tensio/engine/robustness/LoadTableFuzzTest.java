package org.tensio.engine.robustness;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.ShrinkingMode;
import net.jqwik.api.lifecycle.AfterContainer;

import org.tensio.engine.robustness.Harness.PathRule;

/**
 * Bad CSV load tables: a valid table of two stations and their cases, mutated byte by byte (deleted and inserted
 * delimiters, quotes, line breaks, invalid UTF-8, NaN, thousands separators, numbers beyond a double, empty cells,
 * unknown stations, repeated rows, extra fields) and with the table's entry mutated (units, delimiter, decimal
 * separator, column names, header row, scale). Any rejection must be at the table's entry ({@code $.loadTables[0]}
 * and below) or at a combination naming a case the table no longer gives.
 */
class LoadTableFuzzTest {

    static final String FAMILY = "load-tables";

    private static final String CSV = "Member,LoadCase,Fx,Fy,Fz,Mx,My,Mz\n"
            + "A,G,0,0,0.12,0,26.98,0\n"
            + "A,Q,0,0,0.4,0,105.95,0\n"
            + "B,G,0,0.9,35.7,0,0,0\n"
            + "B,Q,1.5,-0.2,12,0.3,-4.5,0\n";

    private static final String[] INSERTS = {",", ";", "\t", "\"", "\"\"", "\n", "\r\n", "\r", "NaN", "Infinity",
        "1,000", "1e400", "-1e305", "0x10", " ", "", "A,G,1,2,3,4,5,6\n", "C,G,0,0,0,0,0,0\n", ",,,,,,,\n", "\uFEFF",
        "é", "1.2.3", "--1", "+", "1e", "E5"};

    private static final String[] ENTRIES = {
        "{\"file\": \"loads.csv\", \"units\": {\"length\": \"m\", \"force\": \"kN\"}, \"columns\": {\"station\": "
            + "\"Member\", \"case\": \"LoadCase\", \"N\": \"Fx\", \"Vx\": \"Fy\", \"Vy\": \"Fz\", \"Mx\": \"My\", "
            + "\"My\": \"Mz\", \"T\": \"Mx\"}, \"scale\": {\"Mx\": -1}}",
        "{\"file\": \"loads.csv\", \"columns\": {\"station\": \"Member\", \"case\": \"LoadCase\", \"N\": \"Fx\"}}",
        "{\"file\": \"loads.csv\", \"columns\": {\"station\": \"Member\", \"case\": \"LoadCase\", \"N\": \"Fq\"}}",
        "{\"file\": \"loads.csv\", \"delimiter\": \";\", \"columns\": {\"station\": \"Member\", \"case\": \"LoadCase\"}}",
        "{\"file\": \"loads.csv\", \"decimalSeparator\": \",\", \"columns\": {\"station\": \"Member\", \"case\": "
            + "\"LoadCase\", \"N\": \"Fx\"}}",
        "{\"file\": \"loads.csv\", \"headerRow\": 2, \"columns\": {\"station\": \"Member\", \"case\": \"LoadCase\"}}",
        "{\"file\": \"loads.csv\", \"units\": {\"length\": \"in\", \"force\": \"kip\"}, \"scale\": {\"N\": 1e300}, "
            + "\"columns\": {\"station\": \"Member\", \"case\": \"LoadCase\", \"N\": \"Fx\", \"Mx\": \"My\"}}",
        "{\"file\": \"missing.csv\", \"columns\": {\"station\": \"Member\", \"case\": \"LoadCase\", \"N\": \"Fx\"}}",
        "{\"file\": \"../loads.csv\", \"columns\": {\"station\": \"Member\", \"case\": \"LoadCase\", \"N\": \"Fx\"}}",
        "{\"file\": \"loads.csv\", \"unknownStations\": \"skip\", \"columns\": {\"station\": \"Member\", \"case\": "
            + "\"LoadCase\", \"N\": \"Fx\", \"Vy\": \"Fz\"}}"};

    private static Path dir;

    private static synchronized Path dir() throws IOException {
        if (dir == null) {
            dir = Files.createDirectories(Path.of("target", "robustness", "tables"));
        }
        return dir;
    }

    @Property(tries = 1200, seed = "99", shrinking = ShrinkingMode.OFF)
    void badTablesAreRejectedAtTheirEntry(@ForAll long seed) throws IOException {
        Random r = new Random(seed);
        byte[] csv = mutate(CSV, r);
        Path folder = Files.createDirectories(dir().resolve("t" + Math.floorMod(seed, 64)));
        Files.write(folder.resolve("loads.csv"), csv);
        String entry = ENTRIES[r.nextInt(ENTRIES.length)];
        String json = "{\"tensio\": 1, \"materials\": {\"S355\": {\"E\": 210000, \"nu\": 0.3, \"fy\": 355}},"
                + " \"sections\": {\"s\": {\"material\": \"S355\", \"profile\": {\"type\": \"RectangleProfile\","
                + " \"xDim\": 100, \"yDim\": 200}}},"
                + " \"stations\": {\"A\": {\"section\": \"s\"}, \"B\": {\"section\": \"s\", \"forces\": {\"W\": {\"N\": 1}}}},"
                + " \"loadTables\": [" + entry + "],"
                + " \"combinations\": {\"ULS\": {\"G\": 1.35, \"Q\": 1.5}}}";
        PathRule rule = p -> p.startsWith("$.loadTables[0]") || p.startsWith("$.combinations.ULS")
                || p.startsWith("$.stations.A");
        Harness.run(FAMILY, json, folder, rule, false, false, "seed " + seed + ", entry " + entry);
    }

    private static byte[] mutate(String csv, Random r) {
        StringBuilder sb = new StringBuilder(csv);
        int times = r.nextInt(4);
        for (int k = 0; k < times; k++) {
            int at = r.nextInt(sb.length());
            switch (r.nextInt(3)) {
                case 0 -> sb.delete(at, Math.min(sb.length(), at + 1 + r.nextInt(5)));
                case 1 -> sb.insert(at, INSERTS[r.nextInt(INSERTS.length)]);
                default -> sb.replace(at, Math.min(sb.length(), at + 1 + r.nextInt(4)), INSERTS[r.nextInt(INSERTS.length)]);
            }
        }
        byte[] bytes = sb.toString().getBytes(StandardCharsets.UTF_8);
        if (r.nextInt(10) == 0 && bytes.length > 0) {
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            int at = r.nextInt(bytes.length);
            out.write(bytes, 0, at);
            out.write(new byte[] {(byte) 0xC3, (byte) 0x28}, 0, 2); // invalid UTF-8
            out.write(bytes, at, bytes.length - at);
            bytes = out.toByteArray();
        }
        return bytes;
    }

    @AfterContainer
    static void writeCounts() {
        Counts.write();
    }
}
