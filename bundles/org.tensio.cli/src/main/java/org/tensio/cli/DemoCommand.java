package org.tensio.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code tensio demo}: runs {@code properties} on the bundled demo project, {@code stress} at the points the
 * demo tour lists and {@code check} on the whole project, printing readable results.
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = "Run properties, stress and check on the bundled demo project (a fictitious grain-dryer conveyor).")
final class DemoCommand implements Callable<Integer> {

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Option(names = "--file", paramLabel = "FILE", description = "demo project (default: docs/examples/demo.tensio.json under tensio.home)")
    Path file;

    @Override
    public Integer call() throws Exception {
        Path demo = file != null ? file : DemoTour.defaultDemoFile();
        if (!Files.isRegularFile(demo)) {
            throw new IllegalArgumentException("--file: demo project not found at '" + demo + "'");
        }
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        out.println("Tensio demo: " + demo);
        out.println();
        out.println("$ tensio properties " + demo.getFileName());
        int code = Main.execute(out, err, "properties", demo.toString());
        if (code != Main.OK) {
            return code;
        }
        for (String[] stop : DemoTour.stops(demo)) {
            out.println();
            out.println("$ tensio stress " + demo.getFileName() + " --station " + stop[0] + " --case " + stop[1] + " --at " + stop[2]);
            code = Main.execute(out, err, "stress", demo.toString(), "--station", stop[0], "--case", stop[1], "--at=" + stop[2]);
            if (code != Main.OK) {
                return code;
            }
        }
        out.println();
        out.println("$ tensio check " + demo.getFileName());
        code = Main.execute(out, err, "check", demo.toString());
        out.println();
        out.println("(tensio check FILE --report DIR writes the signed HTML and PDF report.)");
        return code == Main.BAD_INPUT ? code : Main.OK;
    }
}
