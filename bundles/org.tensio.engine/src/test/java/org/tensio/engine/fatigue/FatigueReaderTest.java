package org.tensio.engine.fatigue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.tensio.engine.io.ProjectFormatException;
import org.tensio.engine.io.ProjectReader;
import org.tensio.engine.project.Project;

/** The {@code fatigue} block of the project file: what it gives, and each rejection with its path and value. */
class FatigueReaderTest {

    static final String BASE = """
            {"tensio": 1, "materials": {"st": {"E": 210000, "nu": 0.3, "fy": 370, "fu": 630},
                                        "soft": {"E": 70000, "nu": 0.33}},
             "sections": {"s": {"material": "st", "profile": {"type": "CircleProfile", "radius": 20}},
                          "flat": {"material": "st", "profile": {"type": "RectangleProfile", "xDim": 40, "yDim": 10}},
                          "alu": {"material": "soft", "profile": {"type": "CircleProfile", "radius": 20}}},
             "stations": {"A": {"section": "s", "forces": {"G": {"Mx": 1e5, "T": 2e5}}},
                          "B": {"section": "flat", "forces": {"G": {"Mx": 1e5}}},
                          "C": {"section": "alu", "forces": {}}},
             "combinations": {"ULS": {"G": 1.35}},
             "fatigue": FATIGUE}
            """;

    static final String GOOD = """
            {"materials": {"st": {"estimate": "steel", "surface": "machined", "reliability": 0.99, "temperature": 80}},
             "stations": {"A": {"histories": {"run": {"rotating": "ULS", "alternating": {"T": 1e4}}},
               "notches": [{"type": "shoulderFillet", "kt": 1.9, "kts": 1.5, "radius": 2},
                           {"type": "keyseat", "location": {"points": [[0, 20]], "within": 3}},
                           {"type": "retainingRingGroove", "location": {"radiusBand": [19, 20]}}],
               "criteria": ["fatigueGoodman", "langer"], "requiredFactor": 2, "miscellaneous": 0.9}}}
            """;

    static Project parse(String fatigue) throws ProjectFormatException {
        return ProjectReader.parse(BASE.replace("FATIGUE", fatigue), "f.tensio.json");
    }

    @Test
    void readsEveryPart() throws Exception {
        FatigueData d = parse(GOOD).fatigue();
        assertEquals(1.0, d.mpaPerStressUnit());
        FatigueMaterial m = d.materials().get("st");
        assertEquals(630, m.sut());
        assertEquals(370.0, m.sy());
        assertEquals(FatigueMaterial.Basis.steelEstimate, m.basis());
        assertEquals(SurfaceFinish.machined, m.conditions().surface());
        FatigueStation s = d.stations().get("A");
        assertEquals(List.of(FatigueCriterion.fatigueGoodman, FatigueCriterion.langer), s.criteria());
        assertEquals(3, s.notches().size());
        assertTrue(s.notches().get(1).location() instanceof NotchLocation.NearPoints);
        assertEquals(new NotchLocation.RadiusBand(19, 20), s.notches().get(2).location());
        assertEquals("ULS", s.histories().get("run").rotating());
        assertEquals(1e4, s.histories().get("run").alternating().t());
        assertEquals(2.0, s.requiredFactor());
        assertEquals(0.9, s.conditions().miscellaneous());
        assertTrue(ProjectReader.parse(BASE.replace("\"fatigue\": FATIGUE", "\"name\": \"x\""), "x").fatigue().isEmpty());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            unknown key      | {"stations": {"A": {"histories": {"h": {"mean": {"T": 1}}}, "notch": []}}} | $.fatigue.stations.A.notch | unknown key 'notch'
            no stations      | {"materials": {}} | $.fatigue | missing required key 'stations'
            unknown station  | {"materials": {"st": {"estimate": "steel", "surface": "ground"}}, "stations": {"Z": {"histories": {}}}} | $.fatigue.stations.Z | unknown station 'Z'
            unknown material | {"materials": {"xx": {"estimate": "steel"}}, "stations": {}} | $.fatigue.materials.xx | unknown material 'xx'
            no fatigue data  | {"stations": {"A": {"histories": {"h": {"mean": {"T": 1}}}}}} | $.fatigue.stations.A | no material of section 's' has fatigue data
            two bases        | {"materials": {"st": {"estimate": "steel", "enduranceLimit": 300}}, "stations": {}} | $.fatigue.materials.st.estimate | more than one of
            bad estimate     | {"materials": {"st": {"estimate": "cast iron"}}, "stations": {}} | $.fatigue.materials.st.estimate | estimate must be "steel"
            bad surface      | {"materials": {"st": {"estimate": "steel", "surface": "polished"}}, "stations": {}} | $.fatigue.materials.st.surface | unknown surface 'polished'
            bad reliability  | {"materials": {"st": {"estimate": "steel", "reliability": 0.98}}, "stations": {}} | $.fatigue.materials.st.reliability | reliability: 0.98 is not one of
            hot              | {"materials": {"st": {"estimate": "steel", "temperature": 700}}, "stations": {}} | $.fatigue.materials.st.temperature | temperature: 700 °C lies beyond
            no surface       | {"materials": {"st": {"estimate": "steel"}}, "stations": {"A": {"histories": {"h": {"rotating": "G"}}}}} | $.fatigue.stations.A | no surface finish for material 'st'
            unknown case     | {"materials": {"st": {"estimate": "steel", "surface": "ground"}}, "stations": {"A": {"histories": {"h": {"rotating": "Q"}}}}} | $.fatigue.stations.A.histories.h.rotating | has no load case or combination 'Q'
            lone maximum     | {"materials": {"st": {"estimate": "steel", "surface": "ground"}}, "stations": {"A": {"histories": {"h": {"maximum": "G"}}}}} | $.fatigue.stations.A.histories.h | 'maximum' and 'minimum' are given together
            empty history    | {"materials": {"st": {"estimate": "steel", "surface": "ground"}}, "stations": {"A": {"histories": {"h": {}}}}} | $.fatigue.stations.A.histories.h | a load history needs
            rotating flat    | {"materials": {"st": {"estimate": "steel", "surface": "ground"}}, "stations": {"B": {"histories": {"h": {"rotating": "G"}}}}} | $.fatigue.stations.B.histories.h.rotating | needs the station's 'equivalentDiameter'
            bad criterion    | {"materials": {"st": {"estimate": "steel", "surface": "ground"}}, "stations": {"A": {"histories": {"h": {"rotating": "G"}}, "criteria": ["goodman"]}}} | $.fatigue.stations.A.criteria[0] | unknown criterion 'goodman'
            bad notch type   | {"materials": {"st": {"estimate": "steel", "surface": "ground"}}, "stations": {"A": {"histories": {"h": {"rotating": "G"}}, "notches": [{"type": "thread"}]}}} | $.fatigue.stations.A.notches[0].type | unknown type 'thread'
            kt below 1       | {"materials": {"st": {"estimate": "steel", "surface": "ground"}}, "stations": {"A": {"histories": {"h": {"rotating": "G"}}, "notches": [{"type": "keyseat", "kt": 0.8}]}}} | $.fatigue.stations.A.notches[0].kt | kt: 0.8 must be at least 1
            hole without kt  | {"materials": {"st": {"estimate": "steel", "surface": "ground"}}, "stations": {"A": {"histories": {"h": {"rotating": "G"}}, "notches": [{"type": "transverseHole"}]}}} | $.fatigue.stations.A.notches[0] | has no first-pass value
            bad location     | {"materials": {"st": {"estimate": "steel", "surface": "ground"}}, "stations": {"A": {"histories": {"h": {"rotating": "G"}}, "notches": [{"type": "keyseat", "location": "inside"}]}}} | $.fatigue.stations.A.notches[0].location | location must be "surface"
            neuber range     | {"materials": {"st": {"estimate": "steel", "surface": "ground", "fu": 2000}}, "stations": {"A": {"histories": {"h": {"rotating": "G"}}, "notches": [{"type": "keyseat", "radius": 0.5}]}}} | $.fatigue.stations.A.notches[0] | lies outside the Neuber-constant fit
            string number    | {"materials": {"st": {"enduranceLimit": "300"}}, "stations": {}} | $.fatigue.materials.st.enduranceLimit | expected a number, got the string "300"
            fy above fu      | {"materials": {"st": {"estimate": "steel", "fy": 700}}, "stations": {}} | $.fatigue.materials.st.fy | fy 700 is above fu 630
            no fy            | {"materials": {"soft": {"estimate": "steel", "fu": 300, "surface": "ground"}}, "stations": {"C": {"histories": {"h": {"mean": {"T": 1}}}, "criteria": ["fatigueSoderberg"]}}} | $.fatigue.stations.C.criteria[0] | needs fy
            required below 1 | {"materials": {"st": {"estimate": "steel", "surface": "ground"}}, "stations": {"A": {"histories": {"h": {"rotating": "G"}}, "requiredFactor": 0.5}}} | $.fatigue.stations.A.requiredFactor | requiredFactor: 0.5 must be at least 1
            """)
    void rejects(String name, String fatigue, String path, String message) {
        ProjectFormatException e = assertThrows(ProjectFormatException.class, () -> parse(fatigue), name);
        assertEquals(path, e.path(), e.getMessage());
        assertTrue(e.getMessage().contains(message), e.getMessage());
        assertTrue(e.getMessage().endsWith("(in f.tensio.json)"), e.getMessage());
    }

    /** Aluminium: a strength at a stated number of cycles, and the default criteria without fy. */
    @Test
    void strengthAtCyclesWithoutFy() throws Exception {
        Project p = parse("""
                {"materials": {"soft": {"fatigueStrength": 96, "cycles": 5e8, "fu": 310, "surface": "machined",
                   "notchSensitivity": "peterson"}},
                 "stations": {"C": {"histories": {"h": {"alternating": {"Mx": 2e5}}}}}}
                """);
        FatigueStation s = p.fatigue().stations().get("C");
        assertEquals(List.of(FatigueCriterion.fatigueGoodman, FatigueCriterion.fatigueGerber), s.criteria());
        FatigueMaterial m = p.fatigue().materials().get("soft");
        assertEquals(FatigueMaterial.Basis.strengthAtCycles, m.basis());
        assertEquals(5e8, m.cycles());
        assertEquals(NotchSensitivity.peterson, m.sensitivity());
    }
}
