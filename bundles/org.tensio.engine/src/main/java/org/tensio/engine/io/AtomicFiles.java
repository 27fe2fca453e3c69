package org.tensio.engine.io;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.security.SecureRandom;

/**
 * Writes files so that a reader — or the next run after a crash, a kill or a power cut — sees either the whole
 * previous file or the whole new one, never a mixture or a truncated file. Every file Tensio writes goes
 * through this class (reports, verification records, results, project saves).
 * <p>
 * The method: the content goes to a fresh temporary file in the <em>same folder</em> as the target (a rename is
 * atomic only within one file system), named {@code .<target name>.<random>.tmp} so that it is hidden and never
 * mistaken for the target; the temporary file is flushed and forced to the device ({@code fsync}); then it is
 * renamed over the target with {@link StandardCopyOption#ATOMIC_MOVE} (POSIX {@code rename(2)}); finally the
 * folder itself is forced where the platform allows it, so that the rename survives a power cut. On any
 * failure before the rename the temporary file is deleted and the target is untouched. A process killed with
 * SIGKILL cannot delete its temporary file: it may remain as a hidden {@code .tmp} file beside an intact target.
 * <p>
 * When the file system cannot rename atomically the write fails with
 * {@link java.nio.file.AtomicMoveNotSupportedException}; there is no silent non-atomic fallback. The new file
 * gets the default permissions of the folder (not the owner-only permissions of
 * {@link Files#createTempFile}). Thread-safe: each call uses its own temporary file; two concurrent writes of
 * the same target end with one of the two complete contents.
 *
 * @since 0.1
 */
public final class AtomicFiles {

    /** Writes the content of a file to a stream; the stream is buffered and must not be closed by the callback. */
    @FunctionalInterface
    public interface Content {
        /**
         * @param out where the bytes go
         * @throws IOException to abandon the write (the target is left as it was)
         */
        void writeTo(OutputStream out) throws IOException;
    }

    /** Writes the text of a file; the writer encodes UTF-8, is buffered and must not be closed by the callback. */
    @FunctionalInterface
    public interface TextContent {
        /**
         * @param out where the text goes
         * @throws IOException to abandon the write (the target is left as it was)
         */
        void writeTo(Writer out) throws IOException;
    }

    private static final SecureRandom RANDOM = new SecureRandom();
    private static final int BUFFER = 1 << 16;

    private AtomicFiles() {
    }

    /**
     * Replaces (or creates) {@code target} with {@code bytes}, atomically.
     *
     * @param target the file; its folder must exist
     * @param bytes  the whole new content, not null
     * @throws IOException              when the file cannot be written; the previous file is then unchanged
     * @throws IllegalArgumentException when an argument is null or {@code target} is a folder
     */
    public static void write(Path target, byte[] bytes) throws IOException {
        if (bytes == null) {
            throw new IllegalArgumentException("bytes: the content must not be null");
        }
        write(target, out -> out.write(bytes));
    }

    /**
     * Replaces (or creates) {@code target} with {@code text} encoded as UTF-8, atomically.
     *
     * @throws IOException              when the file cannot be written; the previous file is then unchanged
     * @throws IllegalArgumentException when an argument is null or {@code target} is a folder
     */
    public static void writeString(Path target, CharSequence text) throws IOException {
        if (text == null) {
            throw new IllegalArgumentException("text: the content must not be null");
        }
        write(target, text.toString().getBytes(StandardCharsets.UTF_8));
    }

    /**
     * Replaces (or creates) {@code target} with the text a callback writes (UTF-8), atomically; for content too
     * large to build in memory first.
     *
     * @throws IOException              when the callback or the file system fails; the previous file is unchanged
     * @throws IllegalArgumentException when an argument is null or {@code target} is a folder
     */
    public static void writeText(Path target, TextContent content) throws IOException {
        if (content == null) {
            throw new IllegalArgumentException("content: the callback must not be null");
        }
        write(target, out -> {
            Writer w = new java.io.OutputStreamWriter(out, StandardCharsets.UTF_8);
            content.writeTo(w);
            w.flush();
        });
    }

    /**
     * Replaces (or creates) {@code target} with the bytes a callback writes, atomically. The callback runs once;
     * when it throws, the temporary file is deleted, the target is left as it was and the exception propagates.
     *
     * @param target  the file; its folder must exist
     * @param content writes the whole new content
     * @throws IOException              when the callback or the file system fails; the previous file is unchanged
     * @throws IllegalArgumentException when an argument is null or {@code target} is a folder
     */
    public static void write(Path target, Content content) throws IOException {
        if (target == null || content == null) {
            throw new IllegalArgumentException("target and content must not be null");
        }
        Path abs = target.toAbsolutePath().normalize();
        Path dir = abs.getParent();
        if (dir == null || abs.getFileName() == null) {
            throw new IllegalArgumentException("target: '" + target + "' does not name a file");
        }
        if (Files.isDirectory(abs)) {
            throw new IllegalArgumentException("target: '" + target + "' is a folder, not a file");
        }
        Path tmp = dir.resolve("." + abs.getFileName() + "." + Long.toUnsignedString(RANDOM.nextLong(), 36) + ".tmp");
        boolean moved = false;
        try {
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE)) {
                OutputStream out = new BufferedOutputStream(new NonClosing(Channels.newOutputStream(ch)), BUFFER);
                content.writeTo(out);
                out.flush();
                ch.force(true);
            }
            Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            moved = true;
            forceFolder(dir);
        } finally {
            if (!moved) {
                Files.deleteIfExists(tmp);
            }
        }
    }

    /** Forces the folder's entry table to the device where the platform can open a folder (not on Windows). */
    private static void forceFolder(Path dir) {
        try (FileChannel ch = FileChannel.open(dir, StandardOpenOption.READ)) {
            ch.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // best effort: the rename is done; only its durability across a power cut is not forced here
        }
    }

    /** Keeps a callback from closing the channel before it is forced. */
    private static final class NonClosing extends java.io.FilterOutputStream {
        NonClosing(OutputStream out) {
            super(out);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
        }

        @Override
        public void close() throws IOException {
            flush();
        }
    }
}
