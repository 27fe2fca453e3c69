package org.tensio.engine.robustness;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import org.tensio.engine.io.AtomicFiles;

/**
 * {@link AtomicFiles}: the whole new content or the untouched old one, also when the writing process is killed
 * with SIGKILL in the middle of a write (a child JVM, {@link SlowWriter}, killed by
 * {@link Process#destroyForcibly()} once its temporary file holds data — on Linux that is SIGKILL).
 */
class AtomicFilesTest {

    private static final byte[] OLD = "the previous report, which must survive\n".repeat(1000)
            .getBytes(StandardCharsets.UTF_8);

    @Test
    void writesAndReplacesWithoutLeavingATemporaryFile(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("out.json");
        AtomicFiles.writeString(f, "first");
        assertEquals("first", Files.readString(f));
        AtomicFiles.write(f, "second".getBytes(StandardCharsets.UTF_8));
        assertEquals("second", Files.readString(f));
        AtomicFiles.writeText(f, w -> w.write("third ✓"));
        assertEquals("third ✓", Files.readString(f));
        assertEquals(List.of("out.json"), names(dir));
    }

    @Test
    void aFailingWriteLeavesThePreviousFileAndNoTemporaryFile(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("report.html");
        Files.write(f, OLD);
        IOException e = assertThrows(IOException.class, () -> AtomicFiles.write(f, out -> {
            out.write(new byte[300_000]);
            throw new IOException("disk full (simulated)");
        }));
        assertEquals("disk full (simulated)", e.getMessage());
        assertArrayEquals(OLD, Files.readAllBytes(f));
        assertEquals(List.of("report.html"), names(dir));
        assertThrows(IllegalArgumentException.class, () -> AtomicFiles.writeString(dir, "x"), "a folder is no target");
        assertThrows(IOException.class, () -> AtomicFiles.writeString(dir.resolve("no/such/folder.txt"), "x"));
    }

    @Test
    void aProcessKilledMidWriteLeavesThePreviousFileIntact(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("results.csv");
        Files.write(f, OLD);
        killMidWrite(f, dir.resolve("started-1"));
        assertArrayEquals(OLD, Files.readAllBytes(f), "the previous file, byte for byte");
        assertOnlyHiddenTemporaries(dir, "results.csv", "started-1");

        Path fresh = dir.resolve("fresh.pdf");
        killMidWrite(fresh, dir.resolve("started-2"));
        assertFalse(Files.exists(fresh), "no partial target after a killed first write");

        // a writer that is left to finish replaces the file completely
        Process p = child(f, dir.resolve("started-3"), 7, 20).start();
        assertTrue(p.waitFor(60, TimeUnit.SECONDS) && p.exitValue() == 0, "writer finished");
        byte[] now = Files.readAllBytes(f);
        assertEquals(20 * 128 * 1024, now.length);
        byte[] sevens = new byte[now.length];
        Arrays.fill(sevens, (byte) 7);
        assertArrayEquals(sevens, now);
    }

    private static void killMidWrite(Path target, Path marker) throws Exception {
        Process p = child(target, marker, 42, 0).start();
        try {
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
            while (!(Files.exists(marker) && temporaryBytes(target) > 0)) {
                assertTrue(p.isAlive(), "the writer died early");
                assertTrue(System.nanoTime() < deadline, "the writer did not start writing");
                Thread.onSpinWait();
                p.waitFor(10, TimeUnit.MILLISECONDS); // wait on the condition, polled
            }
        } finally {
            p.destroyForcibly();
            assertTrue(p.waitFor(60, TimeUnit.SECONDS), "killed writer ended");
        }
        assertEquals(137, p.exitValue(), "killed by SIGKILL (128 + 9)");
        assertTrue(temporaryBytes(target) > 0, "the kill came in the middle of the write");
    }

    private static ProcessBuilder child(Path target, Path marker, int fill, int chunks) throws Exception {
        String javaBin = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        String cp = location(AtomicFiles.class) + java.io.File.pathSeparator + location(SlowWriter.class);
        return new ProcessBuilder(javaBin, "-Xmx64m", "-cp", cp, SlowWriter.class.getName(), target.toString(),
                marker.toString(), Integer.toString(fill), Integer.toString(chunks))
                .redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD);
    }

    private static String location(Class<?> c) throws Exception {
        return Path.of(c.getProtectionDomain().getCodeSource().getLocation().toURI()).toString();
    }

    /** @return the bytes in the hidden temporary files of {@code target} */
    private static long temporaryBytes(Path target) throws IOException {
        long n = 0;
        try (Stream<Path> s = Files.list(target.getParent())) {
            for (Path p : (Iterable<Path>) s::iterator) {
                String name = p.getFileName().toString();
                if (name.startsWith("." + target.getFileName() + ".") && name.endsWith(".tmp")) {
                    n += Files.size(p);
                }
            }
        }
        return n;
    }

    private static void assertOnlyHiddenTemporaries(Path dir, String... expected) throws IOException {
        for (String name : names(dir)) {
            boolean ok = List.of(expected).contains(name) || name.startsWith(".") && name.endsWith(".tmp");
            assertTrue(ok, "unexpected file " + name);
        }
    }

    private static List<String> names(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            List<String> out = new ArrayList<>();
            s.forEach(p -> out.add(p.getFileName().toString()));
            out.sort(null);
            return out;
        }
    }
}
