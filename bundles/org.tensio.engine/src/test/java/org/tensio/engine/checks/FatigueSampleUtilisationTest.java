package org.tensio.engine.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.tensio.engine.fatigue.FatigueDetail;
import org.tensio.engine.fatigue.FatigueStation;
import org.tensio.engine.io.ProjectReader;
import org.tensio.engine.mesh.MeshOptions;
import org.tensio.engine.project.Project;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * {@link FatigueCheckOp#sampleUtilisation}: the fatigue utilisation at every sample, the numbers behind the section
 * editor's fatigue contour. Against the check itself — its governing results are the largest of these per
 * criterion, so the largest over the samples equals the governing utilisation of the station and history (same
 * sample loop: equal to round-off, tolerance 1e-12 relative) — against the notch rules (a keyseat's Kf only within
 * its distance of its point) and against a hand calculation at a node of a plain round shaft, where σa' = M·r/I and
 * σm' = √3·T·r/J (exact on a circle: closed-form torsion, σz linear in the coordinates; J. E. Shigley, Mechanical
 * Engineering Design, 9th ed., Eqs. 7-5, 7-6, from memory) and the modified Goodman line gives
 * 1/n = σa'/Se + σm'/Sut (ibid. Eq. 7-7, from memory).
 */
class FatigueSampleUtilisationTest {

    private static final SectionAnalysisService ENGINE = SectionAnalysisService.create();

    /**
     * A rotating shaft (d = 40) under Mx, My and T: station "plain" without notches, "key" with a keyseat of given
     * Kf = 2 near (0, 20) and bending only, "fillet" with a shoulder fillet all round and both histories.
     */
    private static final String SHAFT = """
            {"tensio": 1, "materials": {"C45": {"E": 210000, "nu": 0.3, "fy": 430, "fu": 650}},
             "sections": {"s": {"material": "C45", "profile": {"type": "CircleProfile", "radius": 20}}},
             "stations": {"plain": {"section": "s", "forces": {"run": {"Mx": 4e5, "My": -3e5, "T": 3e5}}},
                          "key": {"section": "s", "forces": {"run": {"Mx": 2e5}}},
                          "fillet": {"section": "s", "forces": {"run": {"Mx": 2e5, "T": 3e5}}}},
             "fatigue": {"materials": {"C45": {"estimate": "steel", "surface": "machined", "reliability": 0.99}},
               "stations": {"plain": {"histories": {"h": {"rotating": "run"}}, "criteria": ["fatigueGoodman"]},
                            "key": {"histories": {"h": {"rotating": "run"}}, "criteria": ["fatigueGoodman"],
                              "notches": [KEYSEAT]},
                            "fillet": {"histories": {"running": {"rotating": "run"},
                                                     "start": {"rotating": "run", "alternating": {"T": 2e5}}},
                              "notches": [{"type": "shoulderFillet", "kf": 1.7, "kfs": 1.4}]}}}}
            """;

    /** The keyseat of station "key". */
    private static final String KEYSEAT = """
            {"type": "keyseat", "kf": 2, "kfs": 1.5, "location": {"points": [[0, 20]], "within": 4}}""";

    private static Project shaft() throws Exception {
        return ProjectReader.parse(SHAFT.replace("KEYSEAT", KEYSEAT), "samples.tensio.json");
    }

    private static void assertRel(double expected, double actual, double rel, String what) {
        assertEquals(expected, actual, rel * Math.max(1e-300, Math.abs(expected)), what);
    }

    /** @return the largest utilisation among the check's results of one station and history */
    private static double governing(List<CheckResult> results, String station, String history) {
        return results.stream().filter(r -> r.station().equals(station) && r.caseId().equals(history))
                .mapToDouble(CheckResult::utilisation).max().orElseThrow();
    }

    /** On the demo and on the shaft: for every fatigue station and history, max over samples = governing. */
    @Test
    void theLargestSampleIsTheGoverningResult() throws Exception {
        for (Project p : List.of(shaft(), ProjectReader.read(Path.of("../../docs/examples/demo.tensio.json")))) {
            List<CheckResult> check = new FatigueCheckOp(p, ENGINE).results(null);
            FatigueCheckOp op = new FatigueCheckOp(p, ENGINE);
            int pairs = 0;
            for (FatigueStation fs : p.fatigue().stations().values()) {
                for (String h : fs.histories().keySet()) {
                    FatigueCheckOp.SampleUtilisation s = op.sampleUtilisation(fs.station(), h);
                    assertEquals(fs.station(), s.station());
                    assertEquals(h, s.history());
                    assertEquals(s.field().size(), s.utilisation().length);
                    assertTrue(s.notes().isEmpty(), s.notes().toString());
                    double max = Double.NEGATIVE_INFINITY;
                    for (int i = 0; i < s.field().size(); i++) {
                        assertTrue(Double.isFinite(s.at(i)) && s.at(i) >= 0, "sample " + i + ": " + s.at(i));
                        max = Math.max(max, s.at(i));
                    }
                    assertRel(governing(check, fs.station(), h), max, 1e-12, fs.station() + "/" + h);
                    assertEquals(max, s.max(), 0);
                    pairs++;
                }
            }
            assertTrue(pairs >= 2, "histories checked: " + pairs);
        }
    }

    /**
     * Bending only, fully reversed, Goodman: the utilisation is Kf·σa/Se, so against the same shaft without the
     * notch the ratio is Kf = 2 at the samples within 4 of (0, 20) and 1 elsewhere.
     */
    @Test
    void aKeyseatAppliesItsKfWithinItsDistanceOnly() throws Exception {
        Project p = shaft();
        Project bare = ProjectReader.parse(SHAFT.replace("KEYSEAT", ""), "bare.tensio.json");
        FatigueCheckOp.SampleUtilisation with = new FatigueCheckOp(p, ENGINE).sampleUtilisation("key", "h");
        FatigueCheckOp.SampleUtilisation without = new FatigueCheckOp(bare, ENGINE).sampleUtilisation("key", "h");
        int covered = 0;
        int others = 0;
        for (int i = 0; i < with.field().size(); i++) {
            double dist = Math.hypot(with.field().x(i), with.field().y(i) - 20);
            if (Math.abs(dist - 4) < 1e-9 || without.at(i) == 0) {
                continue; // on the edge of the notch's reach, or on the neutral axis
            }
            boolean in = dist < 4;
            assertRel(in ? 2 : 1, with.at(i) / without.at(i), 1e-12,
                    "sample " + i + " at (" + with.field().x(i) + ", " + with.field().y(i) + ")");
            if (in) {
                covered++;
            } else {
                others++;
            }
        }
        assertTrue(covered >= 3 && others > covered, covered + " samples covered, " + others + " not");
    }

    /** At a node inside and one on the surface of the plain shaft: Goodman 1/n from M·r/I and √3·T·r/J. */
    @Test
    void aNodeOfAPlainRoundShaftAgainstHandCalculation() throws Exception {
        Project p = shaft();
        FatigueCheckOp op = new FatigueCheckOp(p, ENGINE);
        FatigueDetail d = op.results(null).stream().filter(r -> r.station().equals("plain")).findFirst().orElseThrow()
                .fatigue();
        double se = d.se(), sut = 650;
        double i = Math.PI * Math.pow(20, 4) / 4, j = 2 * i, m = Math.hypot(4e5, -3e5), t = 3e5;
        FatigueCheckOp.SampleUtilisation s = op.sampleUtilisation("plain", "h");
        int inside = -1;
        int surface = -1;
        for (int k = 0; k < s.field().size(); k++) {
            double r = Math.hypot(s.field().x(k), s.field().y(k));
            if (r > 8 && r < 12 && inside < 0) {
                inside = k;
            }
            if (r > 20 - 1e-9 && surface < 0) {
                surface = k;
            }
        }
        assertTrue(inside >= 0 && surface >= 0, "an inner and a surface node");
        for (int k : new int[] { inside, surface }) {
            double r = Math.hypot(s.field().x(k), s.field().y(k));
            double sa = m * r / i, sm = Math.sqrt(3) * t * r / j;
            assertRel(sa / se + sm / sut, s.at(k), 1e-12, "Goodman 1/n at r = " + r);
        }
    }

    /** A denser mesh gives its own samples; the values stay those of the rules (here: the plain shaft's at r). */
    @Test
    void onAnotherMeshTheSamplesAreThatMeshsNodes() throws Exception {
        Project p = shaft();
        var fe = ENGINE.solution(p.section("s"), MeshOptions.elements(600), null);
        FatigueCheckOp op = new FatigueCheckOp(p, ENGINE);
        FatigueCheckOp.SampleUtilisation coarse = op.sampleUtilisation("plain", "h", fe);
        FatigueCheckOp.SampleUtilisation fine = op.sampleUtilisation("plain", "h");
        assertEquals(fe.mesh().nodeCount(), coarse.field().size());
        assertTrue(coarse.field().size() < fine.field().size(), coarse.field().size() + " vs " + fine.field().size());
        // the largest is at the outer fibre on both meshes (a node lies on the circle): the same value
        assertRel(fine.max(), coarse.max(), 1e-12, "largest at r = 20");
    }

    @Test
    void refusesAStationWithoutFatigueCheckOrAnUnknownHistory() throws Exception {
        Project p = ProjectReader.read(Path.of("../../docs/examples/demo.tensio.json"));
        FatigueCheckOp op = new FatigueCheckOp(p, ENGINE);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> op.sampleUtilisation("drive_shaft_bearing", "running"));
        assertTrue(e.getMessage().contains("'drive_shaft_bearing' has no fatigue check"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> op.sampleUtilisation("drive_shaft_sprocket", "ULS"));
        assertTrue(e.getMessage().contains("no load history 'ULS'") && e.getMessage().contains("start_up"),
                e.getMessage());
    }

    /** A composite section: the samples of the material without fatigue data are NaN, with a note. */
    @Test
    void samplesOfAMaterialWithoutFatigueDataAreNaN() throws Exception {
        Project p = ProjectReader.parse(CheckFixtures.FATIGUE_COMPOSITE, "composite.tensio.json");
        FatigueCheckOp.SampleUtilisation s = new FatigueCheckOp(p, ENGINE).sampleUtilisation("A", "h");
        int nan = 0;
        for (int i = 0; i < s.field().size(); i++) {
            boolean plastic = s.field().material(i).equals("pl");
            assertEquals(plastic, Double.isNaN(s.at(i)), "sample " + i + " of " + s.field().material(i));
            nan += plastic ? 1 : 0;
        }
        assertTrue(nan > 0);
        assertTrue(s.notes().get(0).contains("'pl' has no fatigue data"), s.notes().toString());
        assertRel(governing(new FatigueCheckOp(p, ENGINE).results(null), "A", "h"), s.max(), 1e-12, "max over steel");
    }
}
