package org.tensio.ui.results.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tensio.ui.results.app.CheckApplication;

/**
 * The headless application ({@code -application org.tensio.ui.results.check}) gives what {@code tensio check}
 * gives: the same standard output, standard error and exit code, in every format and for passing, failing and
 * bad input. (tests/cli/e2e-headless-check.sh does the same with the materialised product.)
 */
class CheckApplicationTest {

    @Test
    void sameOutputAndExitCodesAsTheCommandLine(@TempDir Path dir) throws Exception {
        Path demo = WorkbenchFixture.demo();
        Path failing = dir.resolve("fail.tensio.json");
        Files.writeString(failing, """
                {"tensio": 1, "units": {"length": "mm", "force": "N"},
                 "materials": {"S355": {"E": 210000, "nu": 0.3, "fy": 355}},
                 "sections": {"bar": {"material": "S355", "profile": {"type": "RectangleProfile", "xDim": 60, "yDim": 20}}},
                 "stations": {"B": {"section": "bar", "forces": {"G": {"Mx": 2e6}}}}, "combinations": {}}
                """, StandardCharsets.UTF_8);
        Path bad = dir.resolve("bad.tensio.json");
        Files.writeString(bad, "{\"tensio\": 1, \"materials\": 5}", StandardCharsets.UTF_8);

        Path passing = dir.resolve("pass.tensio.json");
        Files.writeString(passing, Files.readString(failing).replace("2e6", "1e6"), StandardCharsets.UTF_8);

        compare(0, demo.toString(), "--format", "json"); // the demo once (each run solves its five sections)
        compare(0, passing.toString());
        compare(0, passing.toString(), "--format", "csv");
        compare(1, failing.toString(), "--format", "json");
        compare(1, failing.toString());
        compare(2, bad.toString());
        compare(2, dir.resolve("missing.tensio.json").toString());
        compare(2, demo.toString(), "--format", "yaml");
    }

    private static void compare(int exit, String... args) {
        StringWriter out = new StringWriter(), err = new StringWriter();
        int code = CheckApplication.run(args, new PrintWriter(out), new PrintWriter(err));
        String[] cliArgs = new String[args.length + 1];
        cliArgs[0] = "check";
        System.arraycopy(args, 0, cliArgs, 1, args.length);
        Cli.Run cli = Cli.run(cliArgs);
        String what = String.join(" ", args);
        assertEquals(exit, cli.exit(), "tensio check " + what + ": " + cli.err());
        assertEquals(cli.exit(), code, what);
        assertEquals(cli.out(), out.toString(), what);
        assertEquals(cli.err(), err.toString(), what);
        if (exit == 2) {
            assertTrue(err.toString().startsWith("tensio"), "one line naming the problem: " + err);
        }
    }
}
