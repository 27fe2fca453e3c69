package org.tensio.engine.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import org.junit.jupiter.api.Test;
import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.profile.ProfileTypes;
import org.tensio.engine.units.UnitSystem;

/**
 * docs/tensio-project.schema.json agrees with the engine: profile types and their parameters (from
 * {@link ProfileTypes}), units, force components. Structure and ranges of the schema itself were checked
 * with a draft 2020-12 validator against the examples when it was written.
 */
class SchemaConsistencyTest {

    private static JsonObject schema() throws IOException {
        return JsonParser.parseString(Files.readString(Path.of("../../docs/tensio-project.schema.json")))
                .getAsJsonObject();
    }

    private static List<String> strings(JsonElement array) {
        List<String> out = new ArrayList<>();
        array.getAsJsonArray().forEach(e -> out.add(e.getAsString()));
        return out;
    }

    @Test
    void profileTypesMatchTheRegistry() throws IOException {
        JsonObject defs = schema().getAsJsonObject("$defs");
        List<String> expected = new ArrayList<>(ProfileTypes.names());
        expected.addAll(ProfileTypes.ARBITRARY);
        List<String> declared = strings(defs.getAsJsonObject("profile").getAsJsonObject("properties")
                .getAsJsonObject("type").get("enum"));
        assertEquals(expected, declared);
        for (String type : ProfileTypes.names()) {
            JsonObject def = defs.getAsJsonObject(type);
            List<String> required = strings(def.get("required"));
            assertEquals("type", required.remove(0));
            assertEquals(ProfileTypes.requiredParameterNames(type), required, type);
            Set<String> props = new LinkedHashSet<>(def.getAsJsonObject("properties").keySet());
            props.remove("type");
            for (String name : ProfileTypes.parameterNames(type)) {
                assertTrue(props.remove(name), type + " schema lacks " + name);
            }
            for (String zeroOnly : props) {
                assertEquals(0, def.getAsJsonObject("properties").getAsJsonObject(zeroOnly).get("const").getAsInt(),
                        type + "." + zeroOnly + " must be declared as const 0");
            }
        }
    }

    @Test
    void unitsAndForcesMatchTheEngine() throws IOException {
        JsonObject units = schema().getAsJsonObject("properties").getAsJsonObject("units").getAsJsonObject("properties");
        assertEquals(UnitSystem.LENGTHS, strings(units.getAsJsonObject("length").get("enum")));
        assertEquals(UnitSystem.FORCES, strings(units.getAsJsonObject("force").get("enum")));
        Set<String> components = schema().getAsJsonObject("$defs").getAsJsonObject("forces")
                .getAsJsonObject("properties").keySet();
        List<String> keys = new ArrayList<>();
        for (ForceComponent c : ForceComponent.values()) {
            keys.add(c.key());
        }
        assertEquals(keys, List.copyOf(components));
        assertEquals(ProjectReader.MAX_LOOP_VERTICES,
                schema().getAsJsonObject("$defs").getAsJsonObject("loop").get("maxContains").getAsInt());
    }
}
