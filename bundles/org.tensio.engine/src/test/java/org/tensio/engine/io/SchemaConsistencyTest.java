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
import org.tensio.engine.section.Criterion;
import org.tensio.engine.units.UnitSystem;

/**
 * docs/tensio-project.schema.json agrees with the engine: profile types and their parameters (from
 * {@link ProfileTypes}), units, force components, the keys the reader accepts at each level, material
 * criteria ({@link Criterion}) and the load-table options. Structure and ranges of the schema itself were
 * checked with a draft 2020-12 validator (python-jsonschema 4.26) against the examples when it was written.
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

    private static Set<String> keys(JsonObject def) {
        return new java.util.TreeSet<>(def.getAsJsonObject("properties").keySet());
    }

    @Test
    void objectKeysMatchTheReader() throws IOException {
        JsonObject schema = schema();
        JsonObject defs = schema.getAsJsonObject("$defs");
        assertEquals(new java.util.TreeSet<>(ProjectReader.ROOT_KEYS), keys(schema));
        assertEquals(new java.util.TreeSet<>(ProjectReader.MATERIAL_KEYS), keys(defs.getAsJsonObject("material")));
        assertEquals(new java.util.TreeSet<>(ProjectReader.ALLOWABLE_KEYS),
                keys(defs.getAsJsonObject("material").getAsJsonObject("properties").getAsJsonObject("allowable")));
        assertEquals(new java.util.TreeSet<>(ProjectReader.STATION_KEYS), keys(defs.getAsJsonObject("station")));
        assertEquals(List.of("section"), strings(defs.getAsJsonObject("station").get("required")));
        assertEquals(new java.util.TreeSet<>(ProjectReader.LOAD_TABLE_KEYS), keys(defs.getAsJsonObject("loadTable")));
        assertEquals(List.of("file"), strings(defs.getAsJsonObject("loadTable").get("required")));
    }

    @Test
    void fatigueKeysMatchTheReader() throws IOException {
        JsonObject defs = schema().getAsJsonObject("$defs");
        assertEquals(new java.util.TreeSet<>(FatigueReader.FATIGUE_KEYS), keys(defs.getAsJsonObject("fatigue")));
        assertEquals(new java.util.TreeSet<>(FatigueReader.MATERIAL_KEYS), keys(defs.getAsJsonObject("fatigueMaterial")));
        assertEquals(new java.util.TreeSet<>(FatigueReader.STATION_KEYS), keys(defs.getAsJsonObject("fatigueStation")));
        assertEquals(new java.util.TreeSet<>(FatigueReader.HISTORY_KEYS), keys(defs.getAsJsonObject("loadHistory")));
        assertEquals(new java.util.TreeSet<>(FatigueReader.NOTCH_KEYS), keys(defs.getAsJsonObject("notch")));
        List<String> criteria = new ArrayList<>();
        for (org.tensio.engine.fatigue.FatigueCriterion c : org.tensio.engine.fatigue.FatigueCriterion.values()) {
            criteria.add(c.name());
        }
        assertEquals(criteria, strings(defs.getAsJsonObject("fatigueStation").getAsJsonObject("properties")
                .getAsJsonObject("criteria").getAsJsonObject("items").get("enum")));
        List<String> notches = new ArrayList<>();
        for (org.tensio.engine.fatigue.NotchType t : org.tensio.engine.fatigue.NotchType.values()) {
            notches.add(t.name());
        }
        assertEquals(notches, strings(defs.getAsJsonObject("notch").getAsJsonObject("properties")
                .getAsJsonObject("type").get("enum")));
        List<String> finishes = new ArrayList<>();
        for (org.tensio.engine.fatigue.SurfaceFinish f : org.tensio.engine.fatigue.SurfaceFinish.values()) {
            finishes.add(f.name());
        }
        assertEquals(finishes, strings(defs.getAsJsonObject("fatigueStation").getAsJsonObject("properties")
                .getAsJsonObject("surface").get("enum")));
        List<Double> reliabilities = new ArrayList<>();
        defs.getAsJsonObject("fatigueMaterial").getAsJsonObject("properties").getAsJsonObject("reliability")
                .getAsJsonArray("enum").forEach(e -> reliabilities.add(e.getAsDouble()));
        assertEquals(org.tensio.engine.fatigue.MarinFactors.RELIABILITIES, reliabilities);
    }

    @Test
    void criteriaMatchTheEngine() throws IOException {
        JsonObject criteria = schema().getAsJsonObject("$defs").getAsJsonObject("material")
                .getAsJsonObject("properties").getAsJsonObject("criteria");
        List<String> names = new ArrayList<>();
        for (Criterion c : Criterion.values()) {
            names.add(c.name());
        }
        assertEquals(names, strings(criteria.getAsJsonObject("items").get("enum")));
        assertEquals(List.of("vonMises"), strings(criteria.get("default")));
    }

    @Test
    void loadTableOptionsMatchTheReader() throws IOException {
        JsonObject table = schema().getAsJsonObject("$defs").getAsJsonObject("loadTable").getAsJsonObject("properties");
        assertEquals(LoadTableReader.COLUMN_KEYS, List.copyOf(table.getAsJsonObject("columns")
                .getAsJsonObject("properties").keySet()));
        List<String> components = new ArrayList<>();
        for (ForceComponent c : ForceComponent.values()) {
            components.add(c.key());
        }
        assertEquals(components, List.copyOf(table.getAsJsonObject("scale").getAsJsonObject("properties").keySet()));
        JsonObject units = table.getAsJsonObject("units").getAsJsonObject("properties");
        assertEquals(UnitSystem.LENGTHS, strings(units.getAsJsonObject("length").get("enum")));
        assertEquals(UnitSystem.FORCES, strings(units.getAsJsonObject("force").get("enum")));
        assertEquals(ProjectReader.DELIMITERS, strings(table.getAsJsonObject("delimiter").get("enum")));
        assertEquals(ProjectReader.DECIMAL_SEPARATORS, strings(table.getAsJsonObject("decimalSeparator").get("enum")));
        assertEquals(ProjectReader.UNKNOWN_STATIONS, strings(table.getAsJsonObject("unknownStations").get("enum")));
        assertEquals(ProjectReader.MAX_TABLE_ROWS, table.getAsJsonObject("headerRow").get("maximum").getAsInt());
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
