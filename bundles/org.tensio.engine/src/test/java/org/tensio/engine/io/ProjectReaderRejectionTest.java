package org.tensio.engine.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every rejection rule of the project format: the exception's path and a message that names the value.
 * Most cases are data in {@code src/test/resources/io/bad-inputs.txt} and, for load tables (CSV files),
 * {@code load-table-bad-inputs.txt}; those that need generated input (sizes, depths, bytes) are here. Rules
 * from the format specification, docs/file-format.md.
 */
class ProjectReaderRejectionTest {

    private static final String PREFIX = BadInputs.expand("%P%");

    static Stream<Arguments> badInputs() {
        return BadInputs.cases().stream();
    }

    @ParameterizedTest(name = "line {0}: {1}")
    @MethodSource("badInputs")
    void rejectsWithPathAndValue(int line, String expectedPath, String fragment, String json) {
        ProjectFormatException e = assertThrows(ProjectFormatException.class,
                () -> ProjectReader.parse(json, "bad-inputs.txt:" + line));
        assertEquals(expectedPath, e.path(), () -> "line " + line + ": " + e.getMessage());
        assertTrue(e.getMessage().contains(fragment),
                () -> "line " + line + ": message should contain '" + fragment + "' but was: " + e.getMessage());
        assertTrue(e.getMessage().startsWith(expectedPath + ": "), e.getMessage());
        assertTrue(e.getMessage().endsWith("(in bad-inputs.txt:" + line + ")"), e.getMessage());
        assertEquals(-1, e.getMessage().indexOf('\n'), "one-line message");
    }

    static Stream<Arguments> badLoadTables() {
        return BadInputs.tableCases().stream();
    }

    @ParameterizedTest(name = "line {0}: {1}")
    @MethodSource("badLoadTables")
    void rejectsLoadTablesNamingFileRowAndColumn(int line, String expectedPath, String fragment, byte[] csv,
            String json, @TempDir Path dir) throws IOException {
        Files.write(dir.resolve("loads.csv"), csv);
        String source = "load-table-bad-inputs.txt:" + line;
        ProjectFormatException e = assertThrows(ProjectFormatException.class,
                () -> ProjectReader.parse(json, source, dir));
        assertEquals(expectedPath, e.path(), () -> "line " + line + ": " + e.getMessage());
        assertTrue(e.getMessage().contains(fragment),
                () -> "line " + line + ": message should contain '" + fragment + "' but was: " + e.getMessage());
        assertTrue(e.getMessage().startsWith(expectedPath + ": "), e.getMessage());
        assertTrue(e.getMessage().endsWith("(in " + source + ")"), e.getMessage());
        assertEquals(-1, e.getMessage().indexOf('\n'), "one-line message");
    }

    @Test
    void rejectsLoadTableWithMoreThanAMillionDataRows(@TempDir Path dir) throws IOException {
        assertEquals(1_000_000, ProjectReader.MAX_TABLE_ROWS);
        // rows of a station the project does not have, skipped: the limit counts them all the same
        StringBuilder csv = new StringBuilder(7_000_100).append("station,case,N\n");
        for (int i = 0; i <= ProjectReader.MAX_TABLE_ROWS; i++) {
            csv.append("Z,G,1\n");
        }
        Files.writeString(dir.resolve("loads.csv"), csv);
        ProjectFormatException e = assertThrows(ProjectFormatException.class,
                () -> ProjectReader.parse(tableProject(",\"unknownStations\":\"skip\""), "big", dir));
        assertEquals("$.loadTables[0].file", e.path());
        assertTrue(e.getMessage().contains("loads.csv has more than 1000000 data rows (the limit; row 1000002)"),
                e.getMessage());
    }

    @Test
    void acceptsLoadTableWithAMillionDataRows(@TempDir Path dir) throws IOException, ProjectFormatException {
        StringBuilder csv = new StringBuilder(7_000_100).append("station,case,N\nA,G,1\n");
        for (int i = 1; i < ProjectReader.MAX_TABLE_ROWS; i++) {
            csv.append("Z,G,1\n");
        }
        csv.append("\n,,\n\n");
        Files.writeString(dir.resolve("loads.csv"), csv);
        assertEquals(1.0, ProjectReader.parse(tableProject(",\"unknownStations\":\"skip\""), "big", dir)
                .forces("A", "G").n());
    }

    @Test
    void rejectsLoadTableLargerThan64MiBBeforeReadingIt(@TempDir Path dir) throws IOException {
        assertEquals(64L * 1024 * 1024, ProjectReader.MAX_TABLE_BYTES);
        try (RandomAccessFile f = new RandomAccessFile(dir.resolve("loads.csv").toFile(), "rw")) {
            f.setLength(ProjectReader.MAX_TABLE_BYTES + 1); // sparse: only the size may be looked at
        }
        ProjectFormatException e = assertThrows(ProjectFormatException.class,
                () -> ProjectReader.parse(tableProject(""), "big", dir));
        assertEquals("$.loadTables[0].file", e.path());
        assertTrue(e.getMessage().contains("'loads.csv' is 67108865 bytes or more, over the limit of 67108864 bytes "
                + "(64 MiB)"), e.getMessage());
    }

    @Test
    void rejectsOverlongCsvField(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("loads.csv"), "station,case,N\nA,G,\"" + "1".repeat(10_001) + "\"\n");
        ProjectFormatException e = assertThrows(ProjectFormatException.class,
                () -> ProjectReader.parse(tableProject(""), "long", dir));
        assertEquals("$.loadTables[0].file", e.path());
        assertTrue(e.getMessage().contains("loads.csv row 2: a field longer than 10000 characters"), e.getMessage());
    }

    @Test
    void rejectsCsvRowWithTooManyFields(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("loads.csv"), "station,case,N" + ",".repeat(10_000) + "\n");
        ProjectFormatException e = assertThrows(ProjectFormatException.class,
                () -> ProjectReader.parse(tableProject(""), "wide", dir));
        assertTrue(e.getMessage().contains("loads.csv row 1: more than 10000 fields in one row"), e.getMessage());
    }

    /** A project with station A (no forces of its own) and one table loads.csv, extra entry members appended. */
    private static String tableProject(String members) {
        return PREFIX + "\"sections\":{\"s\":{\"material\":\"m\",\"profile\":{\"type\":\"CircleProfile\","
                + "\"radius\":25}}},\"stations\":{\"A\":{\"section\":\"s\"}},\"loadTables\":[{\"file\":"
                + "\"loads.csv\"" + members + "}]}";
    }

    @Test
    void rejectsEmptyText() {
        assertPath("$", "empty", "");
        assertPath("$", "empty", "  \n\t ");
        assertPath("$", "empty", null);
    }

    @Test
    void rejectsNestingDeeperThan64() {
        // 64 levels in all are accepted by the JSON layer (the root object is level 1) ...
        String ok = "{\"tensio\":1,\"materials\":{},\"sections\":{},\"description\":" + nested(63) + "}";
        ProjectFormatException shallow = assertThrows(ProjectFormatException.class, () -> ProjectReader.parse(ok, null));
        assertEquals("$.description", shallow.path(), "level 64 reaches the reader, which wants a string");
        // ... level 65 is not
        String deep = "{\"tensio\":1,\"description\":" + nested(64) + "}";
        ProjectFormatException e = assertThrows(ProjectFormatException.class, () -> ProjectReader.parse(deep, null));
        assertTrue(e.getMessage().contains("deeper than 64"), e.getMessage());
        assertEquals("$.description" + "[0]".repeat(63), e.path());
    }

    @Test
    void rejectsHugeNestingWithoutStackOverflow() {
        String deep = "[".repeat(100_000) + "]".repeat(100_000);
        ProjectFormatException e = assertThrows(ProjectFormatException.class, () -> ProjectReader.parse(deep, null));
        assertTrue(e.getMessage().contains("deeper than 64"), e.getMessage());
    }

    @Test
    void rejectsLoopWithMoreThan200000Vertices() {
        int limit = ProjectReader.MAX_LOOP_VERTICES;
        assertEquals(200_000, limit);
        ProjectFormatException e = assertThrows(ProjectFormatException.class,
                () -> ProjectReader.parse(polygonSection(limit + 1), null));
        assertEquals("$.sections.s.profile.outer", e.path());
        assertTrue(e.getMessage().contains("more than 200000 vertices"), e.getMessage());
    }

    @Test
    void acceptsLoopWith200000Vertices() throws ProjectFormatException {
        ProjectReader.parse(polygonSection(ProjectReader.MAX_LOOP_VERTICES), null);
    }

    @Test
    void rejectsFileLargerThan16MiBBeforeReadingIt(@TempDir Path dir) throws IOException {
        Path big = dir.resolve("big.tensio.json");
        try (RandomAccessFile f = new RandomAccessFile(big.toFile(), "rw")) {
            f.setLength(ProjectReader.MAX_FILE_BYTES + 1); // sparse: the reader must look at the size only
        }
        ProjectFormatException e = assertThrows(ProjectFormatException.class, () -> ProjectReader.read(big));
        assertEquals("$", e.path());
        assertTrue(e.getMessage().contains("16777217 bytes"), e.getMessage());
        assertTrue(e.getMessage().contains("big.tensio.json"), e.getMessage());
    }

    @Test
    void rejectsTextLargerThan16MiB() {
        String pad = " ".repeat((int) ProjectReader.MAX_FILE_BYTES);
        ProjectFormatException e = assertThrows(ProjectFormatException.class,
                () -> ProjectReader.parse("{\"tensio\":1}" + pad, null));
        assertEquals("$", e.path());
        assertTrue(e.getMessage().contains((ProjectReader.MAX_FILE_BYTES + 12) + " bytes"), e.getMessage());
    }

    @Test
    void rejectsInvalidUtf8(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("latin1.json");
        Files.write(f, "{\"tensio\":1,\"name\":\"Stra\u00dfe\"}".getBytes(StandardCharsets.ISO_8859_1));
        ProjectFormatException e = assertThrows(ProjectFormatException.class, () -> ProjectReader.read(f));
        assertEquals("$", e.path());
        assertTrue(e.getMessage().contains("not valid UTF-8"), e.getMessage());
    }

    @Test
    void missingFileIsAnIOException(@TempDir Path dir) {
        assertThrows(IOException.class, () -> ProjectReader.read(dir.resolve("nope.json")));
    }

    @Test
    void rejectsOverlongArrayWhileParsing() {
        String json = PREFIX + "\"description\":[" + "0,".repeat(2 * ProjectReader.MAX_LOOP_VERTICES + 1) + "0]}";
        ProjectFormatException e = assertThrows(ProjectFormatException.class, () -> ProjectReader.parse(json, null));
        assertEquals("$.description", e.path());
        assertTrue(e.getMessage().contains("more than 400001 items"), e.getMessage());
    }

    private static void assertPath(String path, String fragment, String json) {
        ProjectFormatException e = assertThrows(ProjectFormatException.class, () -> ProjectReader.parse(json, null));
        assertEquals(path, e.path(), e.getMessage());
        assertTrue(e.getMessage().contains(fragment), e.getMessage());
    }

    private static String nested(int arrays) {
        return "[".repeat(arrays) + "]".repeat(arrays);
    }

    /** A section whose outer loop is a convex polygon of n vertices on a circle of radius 1000. */
    private static String polygonSection(int n) {
        StringBuilder sb = new StringBuilder(PREFIX).append(
                "\"sections\":{\"s\":{\"material\":\"m\",\"profile\":{\"type\":\"ArbitraryClosedProfile\",\"outer\":[");
        for (int i = 0; i < n; i++) {
            double t = 2 * Math.PI * i / n;
            sb.append(i == 0 ? "" : ",").append('[').append(1000 * Math.cos(t)).append(',').append(1000 * Math.sin(t))
                    .append(']');
        }
        return sb.append("]}}}}").toString();
    }
}
