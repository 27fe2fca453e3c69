package org.tensio.ui.editor.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.tensio.ui.editor.model.ProjectModel;

import com.google.gson.JsonElement;
import com.google.gson.JsonParser;

/**
 * The editing model writes back what it read: every example project (with descriptions, units, load tables,
 * limits) parsed into the model and written again is the same JSON (keys the model does not edit are kept).
 */
class ModelRoundTripTest {

    @Test
    void everyExampleRoundTrips() throws Exception {
        Path examples = Path.of(System.getProperty("tensio.demo", "../../docs/examples/demo.tensio.json")).getParent();
        List<Path> files;
        try (Stream<Path> walk = Files.walk(examples)) {
            files = walk.filter(p -> p.toString().endsWith(".tensio.json")).sorted().toList();
        }
        assertFalse(files.isEmpty(), "examples in " + examples);
        for (Path file : files) {
            String text = Files.readString(file);
            JsonElement original = JsonParser.parseString(text);
            String written = ProjectModel.parse(text).toText();
            assertEquals(original, JsonParser.parseString(written), file.toString());
            assertEquals(written, ProjectModel.parse(written).toText(), "writing is stable: " + file);
        }
    }
}
