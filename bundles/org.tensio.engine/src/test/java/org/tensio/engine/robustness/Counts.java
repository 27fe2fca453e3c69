package org.tensio.engine.robustness;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.atomic.AtomicLongArray;

import org.tensio.engine.io.AtomicFiles;

/**
 * How many generated inputs each family of the robustness suite ran, and how many were rejected (correctly:
 * the {@link Harness} checked the error) and accepted (with finite results). {@link #write()} puts the totals
 * in {@code target/robustness/counts.txt} (the test's working folder is the engine module), rewritten after
 * every test class so that the file holds the totals of the whole run.
 */
final class Counts {

    private static final Map<String, AtomicLongArray> FAMILIES = new TreeMap<>();

    private Counts() {
    }

    private static synchronized AtomicLongArray of(String family) {
        return FAMILIES.computeIfAbsent(family, k -> new AtomicLongArray(5));
    }

    static void generated(String family) {
        of(family).incrementAndGet(0);
    }

    static void rejected(String family) {
        of(family).incrementAndGet(1);
    }

    static void accepted(String family) {
        of(family).incrementAndGet(2);
    }

    /** An accepted input that the stress or check evaluation then refused with a clear error (overflow). */
    static void refusedLater(String family) {
        of(family).incrementAndGet(3);
    }

    /** An accepted input that also went through meshing, the finite-element solution and the check. */
    static void fullPath(String family) {
        of(family).incrementAndGet(4);
    }

    /** @return generated inputs of all families */
    static synchronized long totalGenerated() {
        long n = 0;
        for (AtomicLongArray a : FAMILIES.values()) {
            n += a.get(0);
        }
        return n;
    }

    /** Writes the totals (atomically, through the utility under test elsewhere). */
    static synchronized void write() {
        StringBuilder sb = new StringBuilder();
        sb.append("# Tensio robustness suite: generated inputs per family; rejected = ended in a ProjectFormatException"
                + " naming the field, accepted = read with finite results\n");
        sb.append("# refused later = accepted, then a stress or check evaluation refused it with a clear error (values"
                + " too far apart for double arithmetic); full path = accepted ones also meshed, solved and checked\n");
        sb.append(String.format("%-28s %10s %10s %10s %14s %10s%n", "family", "generated", "rejected", "accepted",
                "refused later", "full path"));
        long[] t = new long[5];
        for (Map.Entry<String, AtomicLongArray> e : FAMILIES.entrySet()) {
            AtomicLongArray v = e.getValue();
            sb.append(String.format("%-28s %10d %10d %10d %14d %10d%n", e.getKey(), v.get(0), v.get(1), v.get(2),
                    v.get(3), v.get(4)));
            for (int i = 0; i < 5; i++) {
                t[i] += v.get(i);
            }
        }
        sb.append(String.format("%-28s %10d %10d %10d %14d %10d%n", "total", t[0], t[1], t[2], t[3], t[4]));
        try {
            Path dir = Path.of("target", "robustness");
            Files.createDirectories(dir);
            AtomicFiles.writeString(dir.resolve("counts.txt"), sb);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
