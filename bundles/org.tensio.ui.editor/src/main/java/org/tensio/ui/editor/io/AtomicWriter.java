package org.tensio.ui.editor.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes a file atomically: the text goes to a temporary file in the same folder, which is then moved over the
 * target with {@link StandardCopyOption#ATOMIC_MOVE}, so readers see the old file or the new one, never a
 * partial one, and a failed save leaves the old file as it was. (A local utility: the engine has no shared one
 * yet.)
 */
public final class AtomicWriter {

    private AtomicWriter() {
    }

    /**
     * Writes {@code text} as UTF-8 to {@code target}.
     *
     * @throws IOException when the temporary file cannot be written or moved (the target is then unchanged)
     */
    public static void write(Path target, String text) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        Path temp = Files.createTempFile(folder, "." + absolute.getFileName(), ".tmp"); //$NON-NLS-1$ //$NON-NLS-2$
        try {
            Files.writeString(temp, text, StandardCharsets.UTF_8);
            Files.move(temp, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } finally {
            Files.deleteIfExists(temp);
        }
    }
}
