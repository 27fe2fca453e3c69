package org.tensio.engine.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.tensio.engine.geometry.ArcSegment;
import org.tensio.engine.geometry.Bounds;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.geometry.Segment;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.profile.ArbitraryProfileWithVoids;
import org.tensio.engine.profile.CircleProfile;
import org.tensio.engine.profile.IShapeProfile;
import org.tensio.engine.profile.RectangleProfile;
import org.tensio.engine.project.Project;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;
import org.tensio.engine.units.UnitSystem;

/** Reading valid project files: the documented examples, arcs, composites and defaults. */
class ProjectReaderTest {

    /** The examples live in docs/ at the repository root; tests run in the bundle folder. */
    private static final Path EXAMPLES = Path.of("../../docs/examples");

    private static final String MATERIALS = "{\"tensio\":1,\"materials\":{\"m\":{\"E\":210000,\"nu\":0.3}},";

    private static Project parse(String json) throws ProjectFormatException {
        return ProjectReader.parse(json, "test");
    }

    private static Region onlyRegion(Project p, String section) {
        List<SectionPart> parts = p.section(section).parts();
        assertEquals(1, parts.size());
        return parts.get(0).region();
    }

    private static Project arbitrary(String outer) throws ProjectFormatException {
        return parse(MATERIALS + "\"sections\":{\"s\":{\"material\":\"m\",\"profile\":{\"type\":\"ArbitraryClosedProfile\","
                + "\"outer\":" + outer + "}}}}");
    }

    @Test
    void demoParses() throws IOException, ProjectFormatException {
        Project p = ProjectReader.read(EXAMPLES.resolve("demo.tensio.json"));
        assertEquals(UnitSystem.MM_N, p.units());
        assertEquals(List.of("C45_QT", "E355", "S355", "EN_AW_6082_T6"), List.copyOf(p.materials().keySet()));
        assertEquals(List.of("drive_shaft", "idler_axle", "platform_beam", "bracket", "guide_rail"),
                List.copyOf(p.sections().keySet()));
        assertEquals(6, p.stations().size());
        assertEquals(List.of("ULS", "SLS"), List.copyOf(p.combinations().keySet()));
        assertEquals(List.of("drive_shaft_sprocket"), List.copyOf(p.fatigue().stations().keySet()));

        assertEquals(new CircleProfile(30), p.section("drive_shaft").parts().get(0).profile());
        assertEquals(new IShapeProfile(150, 300, 7.1, 10.7, 15, 0), p.section("platform_beam").parts().get(0).profile());
        // IPE 300: A = 53.81 cm² (ArcelorMittal Sections and Merchant Bars sales programme, IPE table)
        assertEquals(5381, onlyRegion(p, "platform_beam").moments().area(), 1.0);
        // tube 60 x 5: A = π (30² − 25²) (elementary geometry)
        assertEquals(Math.PI * (900 - 625), onlyRegion(p, "idler_axle").moments().area(), 1e-9);

        // bracket: 120 x 60 block + half disc r 30 − corner rounding r 10 (square minus quarter disc) − hole r 11
        double bracket = 120 * 60 + Math.PI * 900 / 2 - (100 - Math.PI * 100 / 4) - Math.PI * 121;
        Region b = onlyRegion(p, "bracket");
        assertInstanceOf(ArbitraryProfileWithVoids.class, p.section("bracket").parts().get(0).profile());
        assertEquals(bracket, b.moments().area(), 1e-9 * bracket);
        assertEquals(1, b.holes().size());
        assertEquals(new Bounds(0, 0, 150, 60), b.bounds());

        Section rail = p.section("guide_rail");
        assertTrue(rail.isComposite());
        assertEquals("S355", rail.referenceMaterial().name());

        InternalForces g = p.forces("platform_beam_midspan", "G");
        assertEquals(new InternalForces(0, 0, -2000, -25e6, 0, 0), g);
        InternalForces uls = p.forces("platform_beam_midspan", "ULS");
        assertEquals(1.35 * -25e6 + 1.5 * -55e6, uls.mx(), 1e-6);
        assertEquals(new InternalForces(0, 0, 0, -0.2e6, 0, 0), p.forces("idler_axle_midspan", "G"));
    }

    @Test
    void demoStressesAreRealistic() throws IOException, ProjectFormatException {
        // σ = M / W with W of a solid circle π d³ / 32 (elementary beam theory): tens to hundreds of MPa
        Project p = ProjectReader.read(EXAMPLES.resolve("demo.tensio.json"));
        InternalForces f = p.forces("drive_shaft_bearing", "ULS");
        double w = Math.PI * Math.pow(60, 3) / 32;
        double sigma = Math.hypot(f.mx(), f.my()) / w;
        assertTrue(sigma > 10 && sigma < 370, "bending stress " + sigma + " MPa");
        double tau = f.t() / (2 * w);
        assertTrue(tau > 10 && tau < 200, "torsion stress " + tau + " MPa");
    }

    @Test
    void metreKilonewtonExampleParses() throws IOException, ProjectFormatException {
        Project p = ProjectReader.read(EXAMPLES.resolve("units-m-kN.tensio.json"));
        assertEquals(new UnitSystem("m", "kN"), p.units());
        assertEquals("kPa", p.units().stressUnit());
        assertEquals(Math.PI * 0.02 * 0.02, onlyRegion(p, "rod").moments().area(), 1e-15);
        assertEquals(1.35 * 45 + 1.5 * 110, p.forces("top", "ULS").n(), 1e-12);
    }

    @Test
    void throughArcGivesTheExactQuarterCircle() throws ProjectFormatException {
        // quarter disc r = 10: A = π r² / 4, centroid 4r / (3π) from both edges (elementary geometry)
        double s = 10 * Math.sqrt(0.5);
        Region r = onlyRegion(arbitrary("[[0,0],[10,0],{\"through\":[" + s + "," + s + "]},[0,10]]"), "s");
        assertEquals(25 * Math.PI, r.moments().area(), 1e-12 * 25 * Math.PI);
        assertEquals(40 / (3 * Math.PI), r.moments().sx() / r.moments().area(), 1e-12);
        assertEquals(40 / (3 * Math.PI), r.moments().sy() / r.moments().area(), 1e-12);
        ArcSegment arc = (ArcSegment) r.outer().segments().get(1);
        assertEquals(10, arc.a(), 1e-12);
        assertEquals(Math.PI / 2, Math.abs(arc.sweep()), 1e-12);
    }

    @ParameterizedTest
    @ValueSource(strings = {
        "[[0,0],[10,0],{\"centre\":[0,0],\"turn\":\"ccw\"},[0,10]]",
        "[[0,0],[0,10],{\"centre\":[0,0],\"turn\":\"cw\"},[10,0]]",
        "[[0,10],[0,0],[10,0],{\"through\":[7.0710678118654755,7.0710678118654755]}]",
        "[[10,0],{\"centre\":[0,0],\"turn\":\"ccw\"},[0,10],[0,0]]"})
    void arcFormsAndClosingArcsGiveTheSameQuarterCircle(String outer) throws ProjectFormatException {
        Region r = onlyRegion(arbitrary(outer), "s");
        assertEquals(25 * Math.PI, r.moments().area(), 1e-12 * 25 * Math.PI);
        assertEquals(1, r.outer().segments().stream().filter(ArcSegment.class::isInstance).count());
    }

    @Test
    void oneVertexAndACentreMakeAFullCircle() throws ProjectFormatException {
        Region r = onlyRegion(arbitrary("[[15,5],{\"centre\":[5,5],\"turn\":\"cw\"}]"), "s");
        assertEquals(100 * Math.PI, r.moments().area(), 1e-12 * 100 * Math.PI);
        assertEquals(new Bounds(-5, -5, 15, 15), r.bounds());
    }

    @Test
    void twoVerticesAndTwoArcsMakeACircle() throws ProjectFormatException {
        Region r = onlyRegion(arbitrary("[[10,0],{\"through\":[0,10]},[-10,0],{\"through\":[0,-10]}]"), "s");
        assertEquals(100 * Math.PI, r.moments().area(), 1e-12 * 100 * Math.PI);
    }

    @Test
    void clockwiseLoopsAreNormalised() throws ProjectFormatException {
        Region r = onlyRegion(arbitrary("[[0,0],[0,20],[100,20],[100,0]]"), "s");
        assertEquals(2000, r.moments().area(), 0);
    }

    @Test
    void compositeParses() throws ProjectFormatException {
        Project p = parse("{\"tensio\":1,\"materials\":{\"steel\":{\"E\":210000,\"nu\":0.3,\"fy\":355},"
                + "\"alu\":{\"E\":70000,\"nu\":0.33}},\"sections\":{\"c\":{\"description\":\"steel flat under an aluminium bar\","
                + "\"parts\":[{\"material\":\"steel\",\"profile\":{\"type\":\"RectangleProfile\",\"xDim\":100,\"yDim\":12},"
                + "\"offset\":[0,6]},{\"material\":\"alu\",\"profile\":{\"type\":\"RectangleProfile\",\"xDim\":60,"
                + "\"yDim\":40},\"offset\":[0,32]}]}}}");
        Section c = p.section("c");
        assertEquals(2, c.parts().size());
        assertTrue(c.isComposite());
        SectionPart steel = c.parts().get(0);
        SectionPart alu = c.parts().get(1);
        assertEquals(new RectangleProfile(100, 12), steel.profile());
        assertEquals(355.0, steel.material().fy());
        assertEquals(70000, alu.material().e());
        assertEquals(32, alu.offsetY());
        assertEquals(new Bounds(-30, 12, 30, 52), alu.region().bounds());
        assertEquals(new Bounds(-50, 0, 50, 52), c.bounds());
        // parts share the line y = 12: touching is allowed
        assertEquals(1200 + 2400, steel.region().moments().area() + alu.region().moments().area(), 1e-9);
    }

    @Test
    void concreteCoreInATubeTouchesButDoesNotOverlap() throws ProjectFormatException {
        Project p = parse("{\"tensio\":1,\"materials\":{\"steel\":{\"E\":210000,\"nu\":0.3},\"concrete\":{\"E\":33000,"
                + "\"nu\":0.2}},\"sections\":{\"cft\":{\"parts\":[{\"material\":\"steel\",\"profile\":{\"type\":"
                + "\"CircleHollowProfile\",\"radius\":100,\"wallThickness\":8},\"offset\":[3,-4]},{\"material\":\"concrete\","
                + "\"profile\":{\"type\":\"ArbitraryClosedProfile\",\"outer\":[[95,-4],{\"through\":[3,88]},[-89,-4],"
                + "{\"centre\":[3,-4],\"turn\":\"ccw\"}]}}]}}}");
        assertEquals(Math.PI * 92 * 92, p.section("cft").parts().get(1).region().moments().area(), 1e-9);
    }

    @Test
    void defaultsAndOptionalKeys() throws ProjectFormatException {
        Project p = parse("{\"tensio\":1,\"name\":\"n\",\"description\":\"d\",\"materials\":{\"m\":{\"E\":210000,"
                + "\"nu\":0.3}},\"sections\":{\"s\":{\"material\":\"m\",\"profile\":{\"type\":\"CircleProfile\",\"radius\":5}}},"
                + "\"stations\":{\"A\":{\"section\":\"s\",\"forces\":{\"LC1\":{\"T\":7},\"LC2\":{}}}}}");
        assertEquals(UnitSystem.MM_N, p.units());
        assertNull(p.materials().get("m").fy());
        assertEquals(new InternalForces(0, 0, 0, 0, 0, 7), p.forces("A", "LC1"));
        assertEquals(InternalForces.ZERO, p.forces("A", "LC2"));
        assertTrue(p.combinations().isEmpty());
        Project bare = parse("{\"tensio\":1,\"materials\":{},\"sections\":{}}");
        assertTrue(bare.sections().isEmpty());
        assertTrue(bare.stations().isEmpty());
    }

    @Test
    void offsetMovesTheProfile() throws ProjectFormatException {
        Project p = parse(MATERIALS + "\"sections\":{\"s\":{\"material\":\"m\",\"offset\":[100,-50],"
                + "\"profile\":{\"type\":\"RectangleProfile\",\"xDim\":20,\"yDim\":10}}}}");
        assertEquals(new Bounds(90, -55, 110, -45), p.section("s").bounds());
    }

    @Test
    void optionalProfileParametersAndZeroSlope() throws ProjectFormatException {
        Project p = parse(MATERIALS + "\"sections\":{\"s\":{\"material\":\"m\",\"profile\":{\"type\":\"IShapeProfile\","
                + "\"overallWidth\":150,\"overallDepth\":300,\"webThickness\":7.1,\"flangeThickness\":10.7,"
                + "\"flangeSlope\":0}}}}");
        assertEquals(new IShapeProfile(150, 300, 7.1, 10.7), p.section("s").parts().get(0).profile());
    }

    @Test
    void readSkipsByteOrderMark(@TempDir Path dir) throws IOException, ProjectFormatException {
        Path f = dir.resolve("bom.json");
        Files.write(f, ("\uFEFF" + MATERIALS + "\"sections\":{}}").getBytes(StandardCharsets.UTF_8));
        assertEquals(1, ProjectReader.read(f).materials().size());
    }

    @Test
    void messageNamesTheSourceFile(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("broken.tensio.json");
        Files.writeString(f, MATERIALS + "\"sections\":{\"shaft\":{\"material\":\"m\",\"profile\":"
                + "{\"type\":\"CircleProfile\",\"radius\":-25}}}}");
        ProjectFormatException e = assertThrows(ProjectFormatException.class, () -> ProjectReader.read(f));
        assertEquals("$.sections.shaft.profile.radius", e.path());
        assertEquals("$.sections.shaft.profile.radius: radius: -25 must be positive (in broken.tensio.json)",
                e.getMessage());
    }

    @Test
    void everyArcIsKeptExactly() throws IOException, ProjectFormatException {
        Project p = ProjectReader.read(EXAMPLES.resolve("demo.tensio.json"));
        List<Segment> outer = onlyRegion(p, "bracket").outer().segments();
        assertEquals(5, outer.size());
        assertEquals(2, outer.stream().filter(ArcSegment.class::isInstance).count());
        assertFalse(onlyRegion(p, "bracket").holes().get(0).segments().stream().anyMatch(s -> !(s instanceof ArcSegment)));
    }
}
