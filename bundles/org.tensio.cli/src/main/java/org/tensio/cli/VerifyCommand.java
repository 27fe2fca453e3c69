package org.tensio.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.tensio.engine.io.AtomicFiles;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.verification.RecordFormat;
import org.tensio.engine.verification.VerificationRecord;
import org.tensio.engine.verification.VerificationRunner;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code tensio verify [--format text|json|csv|html] [--output FILE]}: runs the engine's published check cases
 * and writes the verification record (every case's quantity, value, reference and its source, errors,
 * tolerance and why, pass/fail; engine version, UTC date, Java, OS, caution) to stdout or, atomically
 * ({@link AtomicFiles}: a temporary file in the same folder, fsync, then ATOMIC_MOVE over the target), to FILE.
 * Exit codes: 0 every case passed, 1 some case failed, 2 bad usage (e.g. FILE's folder does not exist).
 */
@Command(name = "verify", mixinStandardHelpOptions = true,
        description = "Run the engine's published check cases and write the verification record"
                + " (exit 0: all pass, 1: some case failed, 2: bad usage).")
final class VerifyCommand implements Callable<Integer> {

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "text, json, csv or html (default: ${DEFAULT-VALUE})")
    RecordFormat format;

    @Option(names = "--output", paramLabel = "FILE", description = "write the record to FILE (atomically) instead of stdout")
    Path output;

    @Override
    public Integer call() throws Exception {
        Path target = output == null ? null : checkedTarget(output);
        VerificationRecord record = VerificationRunner.run(SectionAnalysisService.create());
        String rendered = format.render(record);
        if (target == null) {
            PrintWriter out = spec.commandLine().getOut();
            out.print(rendered);
            out.flush();
        } else {
            writeAtomically(target, rendered.getBytes(StandardCharsets.UTF_8));
            spec.commandLine().getErr().println("verify: " + record.cases().size() + " cases, " + record.passedCount()
                    + " passed, " + record.failedCount() + " failed; record written to " + target);
        }
        return record.passed() ? Main.OK : Main.FAILED_CHECK;
    }

    /** Rejects, before the run, a target whose folder is missing or that names a folder. */
    private static Path checkedTarget(Path file) {
        Path abs = file.toAbsolutePath().normalize();
        Path dir = abs.getParent();
        if (dir == null || !Files.isDirectory(dir)) {
            throw new IllegalArgumentException("--output: folder '" + dir + "' does not exist");
        }
        if (Files.isDirectory(abs)) {
            throw new IllegalArgumentException("--output: '" + file + "' is a folder, not a file");
        }
        return abs;
    }

    /** Through the engine's atomic writer: readers see the old file or the whole new one, never a partial one. */
    private static void writeAtomically(Path target, byte[] bytes) {
        try {
            AtomicFiles.write(target, bytes);
        } catch (IOException e) {
            throw new IllegalArgumentException("--output: cannot write '" + target + "': " + e, e);
        }
    }
}
