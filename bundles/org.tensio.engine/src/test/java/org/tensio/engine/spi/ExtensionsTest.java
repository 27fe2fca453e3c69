package org.tensio.engine.spi;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.tensio.engine.checks.CheckOp;
import org.tensio.engine.checks.CheckReport;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.io.ProjectFormatException;
import org.tensio.engine.profile.ProfileDef;
import org.tensio.engine.project.Project;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * Contributed criteria and profile types: the reader accepts them by name, rejects their misuse naming the JSON
 * path, and the check evaluates them at every sample point like the built-in criteria. The numbers are closed
 * forms of elementary beam theory (uniform σ = N/A; σ = M·c/I of a rectangle, Gere &amp; Goodno, Mechanics of
 * Materials, 8th ed., eq. 5-13 / 5-19).
 */
class ExtensionsTest {

    /** A test rule: demand |σz| + 2τ, capacity 0.8·fy/γ. */
    static class Linear implements CheckCriterion {
        @Override
        public String id() {
            return "testLinear";
        }

        @Override
        public String description() {
            return "|σz| + 2τ against 0.8 fy/γ";
        }

        @Override
        public double demand(double s, double tx, double ty) {
            return Math.abs(s) + 2 * Math.hypot(tx, ty);
        }

        @Override
        public double capacity(MaterialLimits l) {
            if (l.yieldStrength() == null) {
                throw new IllegalArgumentException("needs fy");
            }
            return 0.8 * l.yieldStrength() / l.partialFactor();
        }
    }

    /** A test profile family: a square bar of side {@code side}, with an optional square hole {@code hole}. */
    record SquareBar(double side, double hole) implements ProfileDef {
        SquareBar {
            if (!(side > 0)) {
                throw new IllegalArgumentException("side: must be positive, got " + side);
            }
            if (!(hole >= 0 && hole < side)) {
                throw new IllegalArgumentException("hole: must be in [0, side), got " + hole);
            }
        }

        @Override
        public String type() {
            return "TestSquareBarProfile";
        }

        @Override
        public Region region() {
            Contour outer = square(side);
            return hole == 0 ? new Region(outer) : new Region(outer, List.of(square(hole)));
        }

        private static Contour square(double a) {
            double h = a / 2;
            return Contour.polygon(List.of(new Point2(-h, -h), new Point2(h, -h), new Point2(h, h), new Point2(-h, h)));
        }

        @Override
        public Map<String, Double> parameters() {
            return Map.of("side", side, "hole", hole);
        }
    }

    static class SquareBarType implements ProfileType {
        @Override
        public String type() {
            return "TestSquareBarProfile";
        }

        @Override
        public List<String> parameterNames() {
            return List.of("side", "hole");
        }

        @Override
        public List<String> requiredParameterNames() {
            return List.of("side");
        }

        @Override
        public ProfileDef create(Map<String, Double> p) {
            return new SquareBar(p.get("side"), p.get("hole"));
        }
    }

    private static final Extensions EXT = Extensions.of(List.of(new Linear()), List.of(new SquareBarType()));
    private static final SectionAnalysisService ENGINE = SectionAnalysisService.create(EXT);

    private static String project(String criteria, String profile, String forces) {
        return "{\"tensio\": 1, \"units\": {\"length\": \"mm\", \"force\": \"N\"},"
                + " \"materials\": {\"steel\": {\"E\": 210000, \"nu\": 0.3, \"fy\": 300, \"partialFactor\": 1.2,"
                + " \"criteria\": " + criteria + "}},"
                + " \"sections\": {\"bar\": {\"material\": \"steel\", \"profile\": " + profile + "}},"
                + " \"stations\": {\"s1\": {\"section\": \"bar\", \"forces\": {\"c1\": " + forces + "}}}}";
    }

    private static final String BAR = "{\"type\": \"TestSquareBarProfile\", \"side\": 40}";

    @Test
    void contributedProfileIsReadAndHasTheClosedFormProperties() throws Exception {
        Project p = ENGINE.parseProject(project("[\"vonMises\"]", "{\"type\": \"TestSquareBarProfile\", \"side\": 40,"
                + " \"hole\": 20}", "{\"N\": 1000}"), "t");
        SectionProperties sp = ENGINE.properties(p.section("bar"));
        assertEquals(40 * 40 - 20 * 20, sp.area(), 1e-9, "A = a² − b²");
        assertEquals((Math.pow(40, 4) - Math.pow(20, 4)) / 12, sp.ixx(), 1e-6, "I = (a⁴ − b⁴)/12");
    }

    @Test
    void contributedCriterionIsCheckedAtEveryPointLikeBuiltIns() throws Exception {
        // pure axial force: uniform σ = N/A, no shear; demand = |σ|, capacity 0.8·300/1.2 = 200 MPa
        Project axial = ENGINE.parseProject(project("[\"vonMises\", \"testLinear\"]", BAR, "{\"N\": 160000}"), "t");
        CheckReport r = CheckOp.check(axial, ENGINE);
        CheckResult lin = find(r, "testLinear");
        assertEquals(160000.0 / 1600, lin.demand(), 1e-9);
        assertEquals(200, lin.capacity(), 1e-12);
        assertEquals(0.5, lin.utilisation(), 1e-12);
        assertEquals(100.0 / 250, find(r, "vonMises").utilisation(), 1e-12, "fy/γ = 250");
        // bending: σmax = 6M/(b h²) at the extreme fibre, the governing point
        Project bending = ENGINE.parseProject(project("[\"testLinear\"]", BAR, "{\"Mx\": 2.0e6}"), "t");
        CheckResult b = find(CheckOp.check(bending, ENGINE), "testLinear");
        assertEquals(6 * 2.0e6 / (40.0 * 40 * 40), b.demand(), 1e-9);
        assertEquals(20, Math.abs(b.point().y()), 1e-9, "extreme fibre");
        assertEquals(b.demand() / b.capacity(), b.utilisation(), 0.0);
    }

    @Test
    void misuseIsRejectedNamingThePath() {
        ProjectFormatException unknown = assertThrows(ProjectFormatException.class,
                () -> SectionAnalysisService.create().parseProject(project("[\"testLinear\"]", "{\"type\": \"RectangleProfile\","
                        + " \"xDim\": 10, \"yDim\": 10}", "{\"N\": 1}"), "t"));
        assertTrue(unknown.getMessage().contains("materials.steel.criteria[0]"), unknown.getMessage());
        ProjectFormatException twice = assertThrows(ProjectFormatException.class,
                () -> ENGINE.parseProject(project("[\"testLinear\", \"testLinear\"]", BAR, "{\"N\": 1}"), "t"));
        assertTrue(twice.getMessage().contains("criteria[1]"), twice.getMessage());
        ProjectFormatException noFy = assertThrows(ProjectFormatException.class,
                () -> ENGINE.parseProject(project("[\"testLinear\"]", BAR, "{\"N\": 1}").replace("\"fy\": 300, ",
                        "\"allowable\": {\"normal\": 100}, "), "t"));
        assertTrue(noFy.getMessage().contains("criteria[0]") && noFy.getMessage().contains("needs fy"),
                noFy.getMessage());
        ProjectFormatException missing = assertThrows(ProjectFormatException.class,
                () -> ENGINE.parseProject(project("[\"vonMises\"]", "{\"type\": \"TestSquareBarProfile\"}", "{\"N\": 1}"),
                        "t"));
        assertTrue(missing.getMessage().contains("missing required key 'side'"), missing.getMessage());
        ProjectFormatException extra = assertThrows(ProjectFormatException.class,
                () -> ENGINE.parseProject(project("[\"vonMises\"]", "{\"type\": \"TestSquareBarProfile\", \"side\": 4,"
                        + " \"width\": 3}", "{\"N\": 1}"), "t"));
        assertTrue(extra.getMessage().contains("sections.bar.profile.width"), extra.getMessage());
        ProjectFormatException bad = assertThrows(ProjectFormatException.class,
                () -> ENGINE.parseProject(project("[\"vonMises\"]", "{\"type\": \"TestSquareBarProfile\", \"side\": 4,"
                        + " \"hole\": 9}", "{\"N\": 1}"), "t"));
        assertTrue(bad.getMessage().contains("sections.bar.profile.hole"), bad.getMessage());
        ProjectFormatException unknownType = assertThrows(ProjectFormatException.class,
                () -> ENGINE.parseProject(project("[\"vonMises\"]", "{\"type\": \"NoSuchProfile\"}", "{\"N\": 1}"), "t"));
        assertTrue(unknownType.getMessage().contains("TestSquareBarProfile"), "lists the contributed types too: "
                + unknownType.getMessage());
    }

    @Test
    void contributionsMustNotClashOrBeMalformed() {
        CheckCriterion builtInName = new Linear() {
            @Override
            public String id() {
                return "vonMises";
            }
        };
        assertThrows(IllegalArgumentException.class, () -> Extensions.of(List.of(builtInName), List.of()));
        assertThrows(IllegalArgumentException.class, () -> Extensions.of(List.of(new Linear(), new Linear()), List.of()));
        CheckCriterion badId = new Linear() {
            @Override
            public String id() {
                return "Bad id";
            }
        };
        assertThrows(IllegalArgumentException.class, () -> Extensions.of(List.of(badId), List.of()));
        ProfileType builtInType = new SquareBarType() {
            @Override
            public String type() {
                return "RectangleProfile";
            }
        };
        assertThrows(IllegalArgumentException.class, () -> Extensions.of(List.of(), List.of(builtInType)));
        assertTrue(Extensions.discover(getClass().getClassLoader()).isEmpty(), "no registrations on this class path");
    }

    private static CheckResult find(CheckReport r, String criterion) {
        return r.results().stream().filter(c -> c.criterion().equals(criterion)).findFirst()
                .orElseThrow(() -> new AssertionError(criterion + " not in " + r.results()));
    }
}
