package org.tensio.example.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tensio.ui.results.app.CheckApplication;

/**
 * The workbench's headless check application finds the example's contributions the OSGi way (extension points →
 * services → the engine's DS component), not with --extensions: the house rule is checked and the sign-off
 * section is in the report.
 */
class HeadlessCheckWithHouseKitTest {

    @Test
    void headlessCheckUsesTheContributions(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("sluice-spindle.tensio.json");
        try (InputStream in = getClass().getResourceAsStream("/sluice-spindle.tensio.json")) {
            Files.write(file, in.readAllBytes());
        }
        StringWriter out = new StringWriter(), err = new StringWriter();
        int code = CheckApplication.run(new String[] {file.toString(), "--format", "json", "--report",
                dir.resolve("report").toString()}, new PrintWriter(out, true), new PrintWriter(err, true));
        assertEquals(0, code, err.toString());
        assertTrue(out.toString().contains("\"criterion\": \"houseCombined\""), out.toString());
        String html = Files.readString(dir.resolve("report/sluice-spindle.report.html"), StandardCharsets.UTF_8);
        assertTrue(html.contains("id=\"x-signOff\""), "contributed report section in the headless report");

        StringWriter err2 = new StringWriter();
        int refused = CheckApplication.run(new String[] {file.toString(), "--extensions", file.toString()},
                new PrintWriter(new StringWriter(), true), new PrintWriter(err2, true));
        assertEquals(2, refused, "--extensions is refused inside OSGi");
        assertTrue(err2.toString().contains("--extensions"), err2.toString());
    }
}
