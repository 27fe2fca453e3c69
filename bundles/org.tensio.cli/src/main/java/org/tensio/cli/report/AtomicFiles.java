package org.tensio.cli.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.security.SecureRandom;

/** Writes a file atomically: a temporary file in the same folder, then a rename over the target (ATOMIC_MOVE). */
final class AtomicFiles {

    private static final SecureRandom RANDOM = new SecureRandom();

    private AtomicFiles() {
    }

    static void write(Path target, byte[] bytes) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        // a fresh name beside the target (not Files.createTempFile, whose owner-only permissions would carry over)
        Path tmp = dir.resolve("." + target.getFileName() + "." + Long.toUnsignedString(RANDOM.nextLong(), 36) + ".tmp");
        try {
            Files.write(tmp, bytes, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
            Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
