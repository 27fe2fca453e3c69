package org.tensio.ui.editor.ui;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

/**
 * What the editor last read or wrote: the file's bytes. A file whose bytes differ was changed outside the
 * editor (comparing contents, not modification times, which have a coarse resolution on some file systems).
 * Immutable.
 *
 * @param content the bytes, or null when the file did not exist
 */
record FileStamp(byte[] content) {

    static FileStamp of(String text) {
        return new FileStamp(text.getBytes(StandardCharsets.UTF_8));
    }

    static FileStamp read(Path file) {
        try {
            return new FileStamp(Files.readAllBytes(file));
        } catch (IOException e) {
            return new FileStamp(null);
        }
    }

    boolean sameAs(FileStamp other) {
        return Arrays.equals(content, other.content);
    }
}
