package org.tensio.engine.robustness;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

import org.tensio.engine.io.AtomicFiles;

/**
 * The child process of {@link AtomicFilesTest}: writes {@code target} through {@link AtomicFiles} in chunks of
 * 128 KiB of the byte {@code fill}, creating {@code marker} once the first chunk has reached the temporary file;
 * with {@code chunks} = 0 it never ends (it is killed), otherwise it writes that many chunks and exits.
 * Arguments: target marker fill chunks.
 */
public final class SlowWriter {

    private SlowWriter() {
    }

    public static void main(String[] args) throws IOException, InterruptedException {
        Path target = Path.of(args[0]);
        Path marker = Path.of(args[1]);
        byte[] chunk = new byte[128 * 1024];
        Arrays.fill(chunk, (byte) Integer.parseInt(args[2]));
        long chunks = Long.parseLong(args[3]);
        AtomicFiles.write(target, out -> {
            for (long i = 0; chunks == 0 || i < chunks; i++) {
                out.write(chunk);
                if (i == 0) {
                    out.flush();
                    Files.createFile(marker);
                }
                if (chunks == 0) {
                    try {
                        Thread.sleep(2);
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                        throw new IOException(e);
                    }
                }
            }
        });
    }
}
