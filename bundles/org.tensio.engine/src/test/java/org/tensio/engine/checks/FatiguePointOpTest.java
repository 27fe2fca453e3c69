package org.tensio.engine.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tensio.engine.fatigue.FatigueDetail;
import org.tensio.engine.fatigue.NotchFactors;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.io.ProjectReader;
import org.tensio.engine.project.Project;
import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * {@link FatiguePointOp}: the fatigue check at one chosen point. Against the whole-section check
 * ({@link FatigueCheckOp}) at its governing sample points — the same rules, so the same numbers to round-off
 * (tolerance 1e-9 relative: the point's unit stresses come from {@link org.tensio.engine.stress.PointStressOp}, the
 * check's from the sampled unit fields, which equal it at a node to round-off) — and against hand calculations at
 * points inside a round shaft, where σa' = Kf·M·r/I and σm' = √3·Kfs·T·r/J (exact on a circle: closed-form
 * torsion, σz linear in y; J. E. Shigley, Mechanical Engineering Design, 9th ed., Eqs. 7-5, 7-6, from memory).
 */
class FatiguePointOpTest {

    private static final SectionAnalysisService ENGINE = SectionAnalysisService.create();

    /** A rotating shaft (d = 40) with a shoulder fillet all round, and a keyseat station on the same section. */
    private static final String SHAFT = """
            {"tensio": 1, "materials": {"C45": {"E": 210000, "nu": 0.3, "fy": 430, "fu": 650}},
             "sections": {"s": {"material": "C45", "profile": {"type": "CircleProfile", "radius": 20}}},
             "stations": {"F": {"section": "s", "forces": {"run": {"Mx": 4e5, "T": 3e5}}},
                          "K": {"section": "s", "forces": {"run": {"Mx": 2e5, "My": -1e5, "T": 3e5}}},
                          "plain": {"section": "s", "forces": {"run": {"Mx": 1e5}}}},
             "fatigue": {"materials": {"C45": {"estimate": "steel", "surface": "machined", "reliability": 0.99}},
               "stations": {"F": {"histories": {"running": {"rotating": "run"}},
                              "notches": [{"type": "shoulderFillet", "kf": 1.7, "kfs": 1.4}]},
                            "K": {"histories": {"running": {"rotating": "run"}, "start": {"maximum": "run", "minimum": "run"}},
                              "criteria": ["fatigueGoodman", "fatigueGerber", "langer"],
                              "notches": [{"type": "keyseat", "location": {"points": [[0, 20]], "within": 4}}]}}}}
            """;

    private static Project project(String json) throws Exception {
        return ProjectReader.parse(json, "point.tensio.json");
    }

    private static FatiguePointOp op(Project p, String section) {
        Section s = p.section(section);
        return new FatiguePointOp(p, s, ENGINE.properties(s), ENGINE.solution(s));
    }

    private static void assertRel(double expected, double actual, double rel, String what) {
        assertEquals(expected, actual, rel * Math.max(1e-300, Math.abs(expected)), what);
    }

    /** At each governing sample of the section check the point op gives the check's numbers. */
    @Test
    void matchesTheSectionCheckAtItsGoverningPoints() throws Exception {
        Project p = project(SHAFT);
        List<CheckResult> check = new FatigueCheckOp(p, ENGINE).results(null);
        assertEquals(6 + 2 * 3, check.size(), "six default criteria at F, three × two histories at K");
        FatiguePointOp op = op(p, "s");
        double tol = 1e-9 * p.section("s").bounds().diagonal();
        for (CheckResult g : check) {
            FatiguePointOp.Result r = op.evaluate(g.station(), g.point(), tol);
            assertTrue(r.onSurface(), g + " lies on the surface");
            CheckResult at = r.results().stream()
                    .filter(c -> c.caseId().equals(g.caseId()) && c.criterion().equals(g.criterion())).findFirst()
                    .orElseThrow();
            String what = g.station() + "/" + g.caseId() + "/" + g.criterion();
            FatigueDetail a = at.fatigue(), b = g.fatigue();
            assertRel(g.utilisation(), at.utilisation(), 1e-9, what + " utilisation");
            assertRel(b.sigmaA(), a.sigmaA(), 1e-9, what + " σa'");
            assertRel(b.sigmaM() + 1, a.sigmaM() + 1, 1e-9, what + " σm'");
            assertRel(b.sigmaMax(), a.sigmaMax(), 1e-9, what + " σmax'");
            assertEquals(b.se(), a.se(), 0, what + " Se");
            assertEquals(b.notch().kf(), a.notch().kf(), 0, what + " Kf");
            assertEquals(b.notch().kfs(), a.notch().kfs(), 0, what + " Kfs");
            assertEquals(b.notchText(), a.notchText(), what);
            assertEquals(b.minimumText(), a.minimumText(), what);
            assertEquals(g.material(), at.material());
        }
    }

    /**
     * Inside the shaft the surface fillet does not act (Kf = Kfs = 1) and the stresses scale with the radius: at
     * r = 12 on the y axis σa' = M·r/I and σm' = √3·T·r/J; on the surface (within the tolerance) Kf, Kfs apply.
     */
    @Test
    void insideAndOnTheSurfaceOfARoundShaftAgainstHandCalculation() throws Exception {
        Project p = project(SHAFT);
        FatiguePointOp op = op(p, "s");
        double i = Math.PI * Math.pow(20, 4) / 4, j = 2 * i, m = 4e5, t = 3e5;
        FatiguePointOp.Result in = op.evaluate("F", new Point2(0, 12), 0.1);
        assertFalse(in.onSurface());
        assertEquals(8, in.surfaceDistance(), 0.02, "20 − 12, less the chord sag of the polygonal mesh boundary");
        FatigueDetail d = in.results().get(0).fatigue();
        assertSame(NotchFactors.NONE, d.notch());
        assertRel(m * 12 / i, d.sigmaA(), 1e-9, "σa' inside");
        assertRel(Math.sqrt(3) * t * 12 / j, d.sigmaM(), 1e-9, "σm' inside");
        assertEquals("fatigueGoodman", in.results().get(0).criterion());
        assertRel(1 / (m * 12 / i / d.se() + Math.sqrt(3) * t * 12 / j / 650), d.factorOfSafety(), 1e-9, "n Goodman");

        // a point 0.05 inside the outer fibre counts as on the surface with a tolerance of 0.1
        FatiguePointOp.Result out = op.evaluate("F", new Point2(0, 19.95), 0.1);
        assertTrue(out.onSurface());
        FatigueDetail s = out.results().get(0).fatigue();
        assertEquals(1.7, s.notch().kf(), 0);
        assertEquals(1.4, s.notch().kfs(), 0);
        assertRel(1.7 * m * 19.95 / i, s.sigmaA(), 1e-9, "σa' at the fillet");
        assertRel(Math.sqrt(3) * 1.4 * t * 19.95 / j, s.sigmaM(), 1e-9, "σm' at the fillet");
        assertEquals(6, out.results().size(), "the six default criteria (fy known)");
        assertSame(out.governing(), out.results().stream().max(java.util.Comparator
                .comparingDouble(CheckResult::utilisation)).orElseThrow());
    }

    /** The keyseat acts within its distance of its point only; both histories are listed in file order. */
    @Test
    void aKeyseatActsNearItsPointOnly() throws Exception {
        Project p = project(SHAFT);
        FatiguePointOp op = op(p, "s");
        FatiguePointOp.Result near = op.evaluate("K", new Point2(0, 19), 0);
        assertEquals(List.of("running", "running", "running", "start", "start", "start"),
                near.results().stream().map(CheckResult::caseId).toList());
        assertTrue(near.results().get(0).fatigue().notch().kf() > 1, "keyseat Kf by the first-pass Kt and q");
        FatiguePointOp.Result far = op.evaluate("K", new Point2(0, -19), 0);
        assertSame(NotchFactors.NONE, far.results().get(0).fatigue().notch());
        // a steady history (max = min case) has no alternating stress
        assertEquals(0, near.results().get(3).fatigue().sigmaA(), 1e-9);
    }

    @Test
    void refusesWhatItCannotEvaluate() throws Exception {
        Project p = project(SHAFT);
        FatiguePointOp op = op(p, "s");
        assertNull(op.station("plain"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> op.evaluate("plain", new Point2(0, 0), 0));
        assertTrue(e.getMessage().contains("'plain' has no fatigue check"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> op.evaluate("F", new Point2(0, 0), -1));
        assertTrue(e.getMessage().startsWith("surfaceTolerance"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> op.evaluate("F", new Point2(30, 0), 0));
        assertTrue(e.getMessage().contains("outside") || e.getMessage().contains("not inside"), e.getMessage());
    }

    /** In a composite section a point of a material without fatigue data gets a note, not a number. */
    @Test
    void aMaterialWithoutFatigueDataGivesANote() throws Exception {
        Project p = project(CheckFixtures.FATIGUE_COMPOSITE);
        FatiguePointOp op = op(p, "c");
        FatiguePointOp.Result r = op.evaluate("A", new Point2(0, 9), 0);
        assertTrue(r.results().isEmpty());
        assertEquals("pl", r.material());
        assertTrue(r.notes().get(0).contains("'pl' has no fatigue data"), r.notes().toString());
        assertNull(r.governing());
        FatiguePointOp.Result s = op.evaluate("A", new Point2(0, 2), 0);
        assertEquals("st", s.material());
        assertEquals(1, s.results().size());
    }
}
