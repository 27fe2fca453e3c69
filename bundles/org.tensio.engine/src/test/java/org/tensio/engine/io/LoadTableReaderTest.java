package org.tensio.engine.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.project.Project;
import org.tensio.engine.units.UnitSystem;

/**
 * Load tables: CSV files of internal forces named in a project's {@code loadTables} (docs/file-format.md).
 * Rejections are data in {@code load-table-bad-inputs.txt} (run by {@link ProjectReaderRejectionTest}); here
 * is what valid tables give. Expected values are written out from the CSV cells and the unit definitions of
 * NIST SP 811 (2008 edition), Appendix B: 1 in = 25.4 mm, 1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N,
 * 1 kip = 1000 lbf, all exact.
 */
class LoadTableReaderTest {

    private static final String HEAD = "{\"tensio\":1,\"materials\":{\"m\":{\"E\":210000,\"nu\":0.3}},"
            + "\"sections\":{\"s\":{\"material\":\"m\",\"profile\":{\"type\":\"CircleProfile\",\"radius\":25}}},";

    @TempDir
    Path dir;

    private Project project(String csv, String stations, String table) throws IOException, ProjectFormatException {
        Files.writeString(dir.resolve("loads.csv"), csv, StandardCharsets.UTF_8);
        return ProjectReader.parse(HEAD + "\"stations\":" + stations + ",\"loadTables\":[{\"file\":\"loads.csv\""
                + table + "}]}", "test", dir);
    }

    private Project project(String csv, String table) throws IOException, ProjectFormatException {
        // A has no "forces" (the table must give its cases), B an empty one (the table may add to it)
        return project(csv, "{\"A\":{\"section\":\"s\"},\"B\":{\"section\":\"s\",\"forces\":{}}}", table);
    }

    @Test
    void quotedFieldsEscapedQuotesBomCrlfAndBlankTrailingLines() throws IOException, ProjectFormatException {
        String csv = "\uFEFFstation,\"Load, case\",N,Comment\r\n"
                + "A,\"G, dead\",\"1.5\",\"a comment, with a comma\"\r\n"
                + "\"A\" , \"say \"\"hi\"\"\" ,-2e3,\"two\r\nlines\"\r\n"
                + "B,Q, +7 ,\r\n"
                + "\r\n,,,\r\n\r\n\n";
        Project p = project(csv, ",\"columns\":{\"case\":\"Load, case\"}");
        assertEquals(List.of("G, dead", "say \"hi\""), List.copyOf(p.station("A").cases().keySet()));
        assertEquals(new InternalForces(1.5, 0, 0, 0, 0, 0), p.forces("A", "G, dead"));
        assertEquals(-2000, p.forces("A", "say \"hi\"").n(), 0);
        assertEquals(7, p.forces("B", "Q").n(), 0);
    }

    @Test
    void semicolonDelimiterWithDecimalComma() throws IOException, ProjectFormatException {
        Project p = project("station;case;N;Mx\nA;G;-1,25;3,5E2\nA;Q;\"1,5\";0\n",
                ",\"delimiter\":\";\",\"decimalSeparator\":\",\"");
        assertEquals(new InternalForces(-1.25, 0, 0, 350, 0, 0), p.forces("A", "G"));
        assertEquals(1.5, p.forces("A", "Q").n(), 0);
    }

    @Test
    void tabDelimiterKeepsSpacesInsideIds() throws IOException, ProjectFormatException {
        Project p = project("station\tcase\tT\nA\tdead load\t 12.5 \n", ",\"delimiter\":\"\\t\"");
        assertEquals(12.5, p.forces("A", "dead load").t(), 0);
    }

    @Test
    void headerRowSkipsTitleLinesAndUnknownStationsCanBeSkipped() throws IOException, ProjectFormatException {
        String csv = "Frame forces export, job 0000\n\"units: kN, m\"\nMember,LC,Fx\nA,1,2\nZ9,1,5\nB,1,3\n";
        Project p = project(csv, ",\"headerRow\":3,\"unknownStations\":\"skip\",\"columns\":{\"station\":\"Member\","
                + "\"case\":\"LC\",\"N\":\"Fx\"}");
        assertEquals(2, p.forces("A", "1").n(), 0);
        assertEquals(3, p.forces("B", "1").n(), 0);
    }

    @Test
    void columnMappingScaleAndMissingDefaultComponents() throws IOException, ProjectFormatException {
        // a frame program's local axes: Fx axial, Fy and Fz shears, Mx torque; scale flips N and doubles My
        String csv = "Member,LoadCase,Fx,Fy,Fz,Mx,My,Mz,Extra\nA,G,10,1,2,3,4,5,ignored\n";
        Project p = project(csv, ",\"columns\":{\"station\":\"Member\",\"case\":\"LoadCase\",\"N\":\"Fx\","
                + "\"Vx\":\"Fy\",\"Vy\":\"Fz\",\"Mx\":\"My\",\"My\":\"Mz\",\"T\":\"Mx\"},\"scale\":{\"N\":-1,\"My\":-2}");
        assertEquals(new InternalForces(-10, 1, 2, 4, -10, 3), p.forces("A", "G"));
        // default names: only N and T in the header (in any order), the other components are 0
        Project q = project("case,station,T,N\nG,A,7,8\n", "");
        assertEquals(new InternalForces(8, 0, 0, 0, 0, 7), q.forces("A", "G"));
    }

    @Test
    void kilonewtonMetreBecomesNewtonMillimetreExactly() throws IOException, ProjectFormatException {
        UnitSystem kNm = new UnitSystem("m", "kN");
        assertEquals(1e6, UnitFactors.moment(kNm, UnitSystem.MM_N), 0);
        assertEquals(1e3, UnitFactors.force(kNm, UnitSystem.MM_N), 0);
        assertEquals(1e3, UnitFactors.length(kNm, UnitSystem.MM_N), 0);
        assertEquals(1e-6, UnitFactors.moment(UnitSystem.MM_N, kNm), 0);
        assertEquals(1, UnitFactors.moment(kNm, kNm), 0);
        Project p = project("station,case,N,Vx,Vy,Mx,My,T\nA,G,1.5,-0.25,3,2.5,-0.125,0.001\n",
                ",\"units\":{\"length\":\"m\",\"force\":\"kN\"}");
        // 0.001 kN·m is not a binary fraction: its product with 1e6 rounds to the double nearest 1000, which is 1000
        assertEquals(new InternalForces(1500, -250, 3000, 2.5e6, -125000, 1000), p.forces("A", "G"));
    }

    @Test
    void imperialAndMetricFactors() {
        UnitSystem kipFt = new UnitSystem("ft", "kip");
        UnitSystem lbfIn = new UnitSystem("in", "lbf");
        UnitSystem cmMN = new UnitSystem("cm", "MN");
        assertEquals(4448.2216152605, UnitFactors.force(kipFt, UnitSystem.MM_N), 0);
        assertEquals(304.8, UnitFactors.length(kipFt, UnitSystem.MM_N), 0);
        // 1 kip·ft = 1 355 817.948 331 400 4 N·mm (4448.2216152605 × 304.8, an exact decimal product). Tolerance:
        // the two constants and the product are each rounded once (≤ 1.1e-16 relative each); 4e-16 covers them
        assertEquals(1355817.9483314004, UnitFactors.moment(kipFt, UnitSystem.MM_N), 1355817.9483314004 * 4e-16);
        // 1 kip·ft = 12 000 lbf·in exactly; four rounded constants, two products and a division: 8e-16 relative
        assertEquals(12000, UnitFactors.moment(kipFt, lbfIn), 12000 * 8e-16);
        assertEquals(1e7, UnitFactors.moment(cmMN, UnitSystem.MM_N), 0);
        assertEquals(25.4, UnitFactors.length(lbfIn, UnitSystem.MM_N), 0);
        assertEquals(1, UnitFactors.force(lbfIn, lbfIn), 0);
    }

    @Test
    void tableCasesFollowTheFileCasesAndCombinationsUseThem() throws IOException, ProjectFormatException {
        Files.writeString(dir.resolve("loads.csv"), "station,case,Mx\nA,Q,-5\nA,W,2\n");
        Project p = ProjectReader.parse(HEAD + "\"stations\":{\"A\":{\"section\":\"s\",\"forces\":{\"G\":{\"Mx\":-3}}}},"
                + "\"loadTables\":[{\"file\":\"loads.csv\"}],\"combinations\":{\"ULS\":{\"G\":1.35,\"Q\":1.5}}}",
                "test", dir);
        assertEquals(List.of("G", "Q", "W"), List.copyOf(p.station("A").cases().keySet()));
        assertEquals(1.35 * -3 + 1.5 * -5, p.forces("A", "ULS").mx(), 0);
    }

    @Test
    void combinationNamedLikeATableCaseIsRejected() throws IOException {
        Files.writeString(dir.resolve("loads.csv"), "station,case,Mx\nA,ULS,-5\n");
        ProjectFormatException e = assertThrows(ProjectFormatException.class, () -> ProjectReader.parse(HEAD
                + "\"stations\":{\"A\":{\"section\":\"s\"}},\"loadTables\":[{\"file\":\"loads.csv\"}],"
                + "\"combinations\":{\"ULS\":{\"ULS\":1}}}", "test", dir));
        assertEquals("$.combinations.ULS", e.path());
    }

    @Test
    void readResolvesTablesAgainstTheProjectFolder() throws IOException, ProjectFormatException {
        Path model = Files.createDirectories(dir.resolve("job/model"));
        Files.createDirectories(dir.resolve("job/tables"));
        Files.writeString(dir.resolve("job/tables/loads.csv"), "station,case,N\nA,G,4\n");
        Files.writeString(model.resolve("more.csv"), "station,case,N\nA,Q,5\n");
        Path file = model.resolve("p.tensio.json");
        Files.writeString(file, HEAD + "\"stations\":{\"A\":{\"section\":\"s\"}},\"loadTables\":["
                + "{\"file\":\"../tables/loads.csv\"},{\"file\":\"more.csv\"}]}");
        Project p = ProjectReader.read(file);
        assertEquals(4, p.forces("A", "G").n(), 0);
        assertEquals(5, p.forces("A", "Q").n(), 0);
        // the same text without its folder cannot find the tables
        ProjectFormatException e = assertThrows(ProjectFormatException.class,
                () -> ProjectReader.parse(Files.readString(file), "p.tensio.json"));
        assertEquals("$.loadTables[0].file", e.path());
        assertTrue(e.getMessage().contains("without its folder"), e.getMessage());
    }

    @Test
    void fiftyThousandRowsReadCorrectly() throws IOException, ProjectFormatException {
        int stations = 500;
        int cases = 100;
        StringBuilder json = new StringBuilder("{");
        for (int s = 0; s < stations; s++) {
            json.append(s == 0 ? "" : ",").append("\"S").append(s).append("\":{\"section\":\"s\"}");
        }
        json.append('}');
        StringBuilder csv = new StringBuilder("Member,LoadCase,Fx,Fy,Fz,Mx,My,Mz\r\n");
        for (int c = 0; c < cases; c++) {
            for (int s = 0; s < stations; s++) {
                csv.append('S').append(s).append(",LC").append(c);
                for (int k = 0; k < 6; k++) {
                    csv.append(',').append(value(s, c, k));
                }
                csv.append("\r\n");
            }
        }
        Project p = project(csv.toString(), json.toString(), ",\"units\":{\"length\":\"m\",\"force\":\"kN\"},"
                + "\"columns\":{\"station\":\"Member\",\"case\":\"LoadCase\",\"N\":\"Fx\",\"Vx\":\"Fy\",\"Vy\":\"Fz\","
                + "\"Mx\":\"My\",\"My\":\"Mz\",\"T\":\"Mx\"}");
        assertEquals(stations, p.stations().size());
        int n = 0;
        for (int s = 0; s < stations; s++) {
            List<String> ids = List.copyOf(p.station("S" + s).cases().keySet());
            assertEquals(cases, ids.size());
            for (int c = 0; c < cases; c++) {
                assertEquals("LC" + c, ids.get(c));
                InternalForces f = p.forces("S" + s, "LC" + c);
                // file columns Fx Fy Fz Mx My Mz (k = 0..5) give N Vx Vy T Mx My; kN → N ×1e3, kN·m → N·mm ×1e6,
                // one multiplication each: the same double as this expression
                assertEquals(Double.parseDouble(value(s, c, 0)) * 1e3, f.n(), 0);
                assertEquals(Double.parseDouble(value(s, c, 1)) * 1e3, f.vx(), 0);
                assertEquals(Double.parseDouble(value(s, c, 2)) * 1e3, f.vy(), 0);
                assertEquals(Double.parseDouble(value(s, c, 3)) * 1e6, f.t(), 0);
                assertEquals(Double.parseDouble(value(s, c, 4)) * 1e6, f.mx(), 0);
                assertEquals(Double.parseDouble(value(s, c, 5)) * 1e6, f.my(), 0);
                n++;
            }
        }
        assertEquals(50_000, n);
    }

    /** A reproducible cell value with three decimals and a sign, as an export writes it. */
    private static String value(int s, int c, int k) {
        long h = (s * 7919L + c * 104729L + k * 1299709L) % 200_001L - 100_000L;
        return String.format(Locale.ROOT, "%.3f", h / 1000.0);
    }

    @Test
    void csvReaderRowsAndFields() throws IOException, CsvReader.SyntaxException {
        CsvReader r = new CsvReader(new StringReader("\uFEFFa, b ,\"c,\"\"d\"\"\"\r\n\r\n\"x\ny\",2\rlast"), ',');
        List<String> rows = new ArrayList<>();
        while (r.next()) {
            List<String> fields = new ArrayList<>();
            for (int i = 0; i < r.size(); i++) {
                fields.add(r.get(i));
            }
            rows.add(r.row() + ":" + fields + (r.isBlank() ? " blank" : ""));
        }
        assertEquals(List.of("1:[a, b, c,\"d\"]", "2:[] blank", "3:[x\ny, 2]", "4:[last]"), rows);
    }

    @Test
    void numberScanner() {
        assertEquals(1.5, LoadTableReader.number("1.5", '.'), 0);
        assertEquals(-0.5, LoadTableReader.number("-.5", '.'), 0);
        assertEquals(5, LoadTableReader.number("5.", '.'), 0);
        assertEquals(1200, LoadTableReader.number("+1.2E+3", '.'), 0);
        assertEquals(1.5e-3, LoadTableReader.number("1,5e-3", ','), 0);
        assertEquals(Double.POSITIVE_INFINITY, LoadTableReader.number("1e999", '.'));
        for (String bad : new String[] {"", "+", "-", ".", "e5", "1e", "1e+", "1.2.3", "1,5", "1 0", "0x1p3", "NaN",
            "Infinity", "1d", "1f", "1_000", "\u0661"}) {
            assertTrue(Double.isNaN(LoadTableReader.number(bad, '.')), bad);
        }
        assertTrue(Double.isNaN(LoadTableReader.number("1.5", ',')));
    }
}
