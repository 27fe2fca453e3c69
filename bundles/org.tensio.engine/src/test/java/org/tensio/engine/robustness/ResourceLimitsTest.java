package org.tensio.engine.robustness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.LineSegment;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Segment;
import org.tensio.engine.io.ProjectFormatException;
import org.tensio.engine.io.ProjectReader;
import org.tensio.engine.mesh.MeshBudget;
import org.tensio.engine.mesh.MeshGenerator;
import org.tensio.engine.mesh.MeshOptions;
import org.tensio.engine.profile.ArbitraryClosedProfile;
import org.tensio.engine.profile.ProfileTypes;
import org.tensio.engine.section.Material;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;

/**
 * Huge inputs end in a clear error naming the limit and the numbers, quickly and without exhausting memory: a
 * 10⁶-vertex polygon (in a file, and built through the API for the mesher), a file above 16 MiB, nesting 100 000
 * deep, more stations, station load cases and combinations than the limits, and sections whose mesh would exceed
 * the element or vertex limit or the heap (the {@link MeshBudget} estimate, checked before meshing).
 */
class ResourceLimitsTest {

    static final String FAMILY = "huge-inputs";

    private static final String HEAD = "{\"tensio\": 1, \"materials\": {\"m\": {\"E\": 210000, \"nu\": 0.3}}, "
            + "\"sections\": {\"s\": {\"material\": \"m\", \"profile\": {\"type\": \"RectangleProfile\", \"xDim\": 10, "
            + "\"yDim\": 20}}}";

    private static ProjectFormatException rejected(Path file) {
        Counts.generated(FAMILY);
        ProjectFormatException e = assertTimeoutPreemptively(Harness.TIME_LIMIT,
                () -> assertThrows(ProjectFormatException.class, () -> ProjectReader.read(file)));
        Harness.checkRejection(e, Harness.PathRule.ANY, file.getFileName().toString(), "");
        Counts.rejected(FAMILY);
        return e;
    }

    private static Path write(Path dir, String name, String... parts) throws IOException {
        Path f = dir.resolve(name);
        try (BufferedWriter w = Files.newBufferedWriter(f, StandardCharsets.UTF_8)) {
            for (String p : parts) {
                w.write(p);
            }
        }
        return f;
    }

    @Test
    void aMillionVertexPolygonIsRejectedAtItsLoop(@TempDir Path dir) throws IOException {
        StringBuilder sb = new StringBuilder(14_000_000);
        sb.append("{\"tensio\": 1, \"materials\": {\"m\": {\"E\": 210000, \"nu\": 0.3}}, \"sections\": {\"s\": "
                + "{\"material\": \"m\", \"profile\": {\"type\": \"ArbitraryClosedProfile\", \"outer\": [");
        int n = 1_000_000;
        for (int i = 0; i < n; i++) {
            double t = 2 * Math.PI * i / n;
            sb.append(i == 0 ? "" : ",").append('[').append(Math.round(400 * Math.cos(t))).append(',')
                    .append(Math.round(400 * Math.sin(t))).append(']');
        }
        sb.append("]}}}}");
        Path f = write(dir, "million.tensio.json", sb.toString());
        assertTrue(Files.size(f) < ProjectReader.MAX_FILE_BYTES, "the file itself is within the size limit");
        ProjectFormatException e = rejected(f);
        assertEquals("$.sections.s.profile.outer", e.path(), e.getMessage());
        assertTrue(e.getMessage().contains("more than"), e.getMessage());
    }

    @Test
    void aLoopAboveTheVertexLimitIsNamed(@TempDir Path dir) throws IOException {
        StringBuilder sb = new StringBuilder();
        sb.append("{\"tensio\": 1, \"materials\": {\"m\": {\"E\": 210000, \"nu\": 0.3}}, \"sections\": {\"s\": "
                + "{\"material\": \"m\", \"profile\": {\"type\": \"ArbitraryClosedProfile\", \"outer\": [");
        int n = ProjectReader.MAX_LOOP_VERTICES + 1;
        for (int i = 0; i < n; i++) {
            sb.append(i == 0 ? "" : ",").append('[').append(i).append(',').append(i % 2).append(']');
        }
        sb.append("]}}}}");
        ProjectFormatException e = rejected(write(dir, "loop.tensio.json", sb.toString()));
        assertEquals("$.sections.s.profile.outer", e.path());
        assertTrue(e.getMessage().contains("more than " + ProjectReader.MAX_LOOP_VERTICES + " vertices"), e.getMessage());
    }

    @Test
    void aFileAboveSixteenMebibytesIsRejectedBeforeReading(@TempDir Path dir) throws IOException {
        Path f = write(dir, "big.tensio.json", HEAD, ", \"description\": \"", "x".repeat(17 * 1024 * 1024), "\"}");
        ProjectFormatException e = rejected(f);
        assertTrue(e.getMessage().contains("more than the limit of " + ProjectReader.MAX_FILE_BYTES), e.getMessage());
    }

    @Test
    void deepNestingIsRejectedWithoutAStackOverflow(@TempDir Path dir) throws IOException {
        int depth = 100_000;
        ProjectFormatException e = rejected(write(dir, "deep.tensio.json", HEAD, ", \"name\": ", "[".repeat(depth),
                "]".repeat(depth), "}"));
        assertTrue(e.getMessage().contains("deeper than " + ProjectReader.MAX_DEPTH), e.getMessage());
    }

    @Test
    void tooManyStationsCasesAndCombinationsAreNamed(@TempDir Path dir) throws IOException {
        StringBuilder st = new StringBuilder(", \"stations\": {");
        for (int i = 0; i <= ProjectReader.MAX_STATIONS; i++) {
            st.append(i == 0 ? "" : ",").append("\"s").append(i).append("\": {\"section\": \"s\", \"forces\": {}}");
        }
        ProjectFormatException e = rejected(write(dir, "stations.tensio.json", HEAD, st.toString(), "}}"));
        assertEquals("$.stations", e.path());
        assertTrue(e.getMessage().contains("more than the limit of " + ProjectReader.MAX_STATIONS), e.getMessage());

        StringBuilder cases = new StringBuilder(", \"stations\": {\"A\": {\"section\": \"s\", \"forces\": {");
        for (int i = 0; i <= ProjectReader.MAX_STATION_CASES; i++) {
            cases.append(i == 0 ? "" : ",").append("\"c").append(i).append("\":{}");
        }
        e = rejected(write(dir, "cases.tensio.json", HEAD, cases.toString(), "}}}}"));
        assertEquals("$.stations.A.forces", e.path());
        assertTrue(e.getMessage().contains("more than " + ProjectReader.MAX_STATION_CASES), e.getMessage());

        StringBuilder combos = new StringBuilder(", \"stations\": {\"A\": {\"section\": \"s\", \"forces\": {\"G\": "
                + "{\"N\": 1}}}}, \"combinations\": {");
        for (int i = 0; i <= ProjectReader.MAX_COMBINATIONS; i++) {
            combos.append(i == 0 ? "" : ",").append("\"u").append(i).append("\": {\"G\": 1}");
        }
        e = rejected(write(dir, "combos.tensio.json", HEAD, combos.toString(), "}}"));
        assertEquals("$.combinations", e.path());
        assertTrue(e.getMessage().contains("more than the limit of " + ProjectReader.MAX_COMBINATIONS), e.getMessage());
    }

    private static Section rectangle(String name) {
        return new Section(name, List.of(SectionPart.of(ProfileTypes.create("RectangleProfile",
                Map.of("xDim", 100.0, "yDim", 50.0)), 0, 0, new Material("m", 210000, 0.3, null))));
    }

    @Test
    void meshingBeyondTheElementLimitIsRefusedBeforeMeshing() {
        Counts.generated(FAMILY);
        Section s = rectangle("huge_plate");
        MeshOptions tiny = new MeshOptions(0.01, 0, 25, 10, 4); // about 1.2e8 elements
        IllegalArgumentException e = assertTimeoutPreemptively(Harness.TIME_LIMIT,
                () -> assertThrows(IllegalArgumentException.class, () -> MeshGenerator.generate(s, tiny, null)));
        assertTrue(e.getMessage().startsWith("section 'huge_plate': meshing would give about "), e.getMessage());
        assertTrue(e.getMessage().contains("more than the limit of " + MeshBudget.MAX_ELEMENTS), e.getMessage());
        Counts.rejected(FAMILY);
    }

    @Test
    void aMillionVertexBoundaryIsRefusedByTheMesher() {
        Counts.generated(FAMILY);
        int n = 1_100_000;
        List<Segment> segs = new ArrayList<>(n);
        Point2 first = null;
        Point2 prev = null;
        for (int i = 0; i < n; i++) {
            double t = 2 * Math.PI * i / n;
            Point2 p = new Point2(100 * Math.cos(t), 100 * Math.sin(t));
            if (prev == null) {
                first = p;
            } else {
                segs.add(new LineSegment(prev, p));
            }
            prev = p;
        }
        segs.add(new LineSegment(prev, first));
        Section s = new Section("disc_polygon", List.of(SectionPart.of(new ArbitraryClosedProfile(new Contour(segs)),
                0, 0, new Material("m", 210000, 0.3, null))));
        IllegalArgumentException e = assertTimeoutPreemptively(Harness.TIME_LIMIT,
                () -> assertThrows(IllegalArgumentException.class, () -> MeshGenerator.generate(s)));
        assertTrue(e.getMessage().startsWith("section 'disc_polygon': the boundary would be cut into about"),
                e.getMessage());
        Counts.rejected(FAMILY);
    }

    @Test
    void theMemoryEstimateRefusesWhatWouldNotFitNamingTheNumbers() {
        Counts.generated(FAMILY);
        MeshBudget b = MeshBudget.estimate(rectangle("big_plate"), MeshOptions.elements(1_000_000));
        // about 1e6 elements: 900 + 100 + 120·log2(1e6) ≈ 3392 bytes each
        assertTrue(b.elements() >= 1_000_000 && b.elements() < 1_100_000, "elements " + b.elements());
        assertEquals(3392.0, (double) b.totalBytes() / b.elements(), 20.0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> b.requireFits(512L << 20));
        assertTrue(e.getMessage().startsWith("section 'big_plate': meshing about " + b.elements() + " elements"),
                e.getMessage());
        assertTrue(e.getMessage().contains("more than the 512 MiB of heap still available"), e.getMessage());
        b.requireFits(b.totalBytes()); // exactly enough passes
        MeshBudget.estimate(rectangle("small"), MeshOptions.defaults()).requireFitsHeap();
        Counts.rejected(FAMILY);
    }

    @AfterAll
    static void writeCounts() {
        Counts.write();
    }
}
