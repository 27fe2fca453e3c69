package org.tensio.engine.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.tensio.engine.geometry.ArcSegment;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.LineSegment;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Segment;
import org.tensio.engine.profile.ArbitraryClosedProfile;
import org.tensio.engine.profile.ArbitraryProfileWithVoids;
import org.tensio.engine.profile.ProfileDef;
import org.tensio.engine.profile.ProfileTypes;
import org.tensio.engine.section.SectionValidator.Kind;
import org.tensio.engine.section.SectionValidator.Problem;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

/**
 * Geometry validation of sections, rule by rule, with the location reported. Rules: OGC Simple Features
 * polygon validity as implemented by JTS IsValidOp (self-touching rings invalid), plus the zero-area and
 * composite-overlap rules of docs/file-format.md.
 */
class SectionValidatorTest {

    private static final Material STEEL = new Material("S355", 210000, 0.3, 355.0);
    private static final Material ALU = new Material("6082", 70000, 0.33, 260.0);

    private static Contour poly(double... xy) {
        List<Point2> pts = new ArrayList<>();
        for (int i = 0; i < xy.length; i += 2) {
            pts.add(new Point2(xy[i], xy[i + 1]));
        }
        return Contour.polygon(pts);
    }

    private static Section single(ProfileDef profile) {
        return new Section("s", List.of(SectionPart.of(profile, 0, 0, STEEL)));
    }

    private static Section withVoids(Contour outer, Contour... voids) {
        return single(new ArbitraryProfileWithVoids(outer, List.of(voids)));
    }

    private static Problem problem(Section s) {
        Optional<Problem> p = SectionValidator.check(s);
        assertTrue(p.isPresent(), "expected a problem");
        return p.get();
    }

    private static final Contour PLATE = poly(0, 0, 100, 0, 100, 20, 0, 20);

    static Stream<Arguments> typicalProfiles() {
        return Stream.of(
                Arguments.of("CircleProfile", Map.of("radius", 25.0)),
                Arguments.of("CircleHollowProfile", Map.of("radius", 30.0, "wallThickness", 5.0)),
                Arguments.of("EllipseProfile", Map.of("semiAxis1", 40.0, "semiAxis2", 15.0)),
                Arguments.of("RectangleProfile", Map.of("xDim", 100.0, "yDim", 20.0)),
                Arguments.of("RectangleHollowProfile", Map.of("xDim", 200.0, "yDim", 100.0, "wallThickness", 8.0,
                        "innerFilletRadius", 8.0, "outerFilletRadius", 16.0)),
                Arguments.of("IShapeProfile", Map.of("overallWidth", 150.0, "overallDepth", 300.0, "webThickness", 7.1,
                        "flangeThickness", 10.7, "filletRadius", 15.0)),
                Arguments.of("UShapeProfile", Map.of("depth", 200.0, "flangeWidth", 75.0, "webThickness", 8.5,
                        "flangeThickness", 11.5, "filletRadius", 11.5, "edgeRadius", 6.0)),
                Arguments.of("LShapeProfile", Map.of("depth", 100.0, "width", 100.0, "thickness", 10.0,
                        "filletRadius", 12.0, "edgeRadius", 6.0)),
                Arguments.of("TShapeProfile", Map.of("depth", 100.0, "flangeWidth", 100.0, "webThickness", 11.0,
                        "flangeThickness", 11.0, "filletRadius", 10.0, "flangeEdgeRadius", 5.0, "webEdgeRadius", 3.0)),
                Arguments.of("ZShapeProfile", Map.of("depth", 160.0, "flangeWidth", 70.0, "webThickness", 8.0,
                        "flangeThickness", 10.0, "filletRadius", 8.0, "edgeRadius", 4.0)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("typicalProfiles")
    void typicalProfilesAreValid(String type, Map<String, Double> parameters) {
        Section s = single(ProfileTypes.create(type, parameters));
        assertEquals(Optional.empty(), SectionValidator.check(s));
    }

    @Test
    void selfIntersectionIsLocated() {
        // edges (0,0)-(100,20) and (100,0)-(0,30) cross at x = 60, y = 12 (solve 0.2x = 30 − 0.3x)
        Problem p = problem(single(new ArbitraryClosedProfile(poly(0, 0, 100, 20, 100, 0, 0, 30))));
        assertEquals(Kind.SELF_INTERSECTION, p.kind());
        assertEquals(0, p.contour());
        assertEquals(60, p.location().x(), 1e-9);
        assertEquals(12, p.location().y(), 1e-9);
        assertEquals("section 's': outer boundary intersects itself at (60, 12)", p.message());
    }

    @Test
    void bowTieIsASelfIntersectionNotAZeroArea() {
        // its two triangles cancel: signed area 0, but the loop is not flat, so the crossing is what is reported
        Problem p = problem(single(new ArbitraryClosedProfile(poly(0, 0, 100, 0, 0, 20, 100, 20))));
        assertEquals(Kind.SELF_INTERSECTION, p.kind());
        assertEquals(50, p.location().x(), 1e-9);
        assertEquals(10, p.location().y(), 1e-9);
    }

    @Test
    @Timeout(10)
    void nearlyStraightArcOfHugeRadiusIsCheap() {
        // through (50, -1e-9): radius 50² / (2 · 1e-9) ≈ 1.25e12, far beyond the section size
        Point2 a = new Point2(0, 0), b = new Point2(100, 0), c = new Point2(100, 20), d = new Point2(0, 20);
        List<Segment> segs = List.of(ArcSegment.through(a, new Point2(50, -1e-9), b), new LineSegment(b, c),
                new LineSegment(c, d), new LineSegment(d, a));
        assertEquals(Optional.empty(), SectionValidator.check(single(new ArbitraryClosedProfile(new Contour(segs)))));
    }

    @Test
    void arcCrossingAnEdgeIsASelfIntersection() {
        // a bulge below the bottom edge of radius 60 whose arc comes back up through the top edge
        Point2 a = new Point2(0, 0), b = new Point2(100, 0), c = new Point2(100, 20), d = new Point2(0, 20);
        List<Segment> segs = List.of(new LineSegment(a, b), ArcSegment.through(b, new Point2(50, -10), c),
                new LineSegment(c, d), new LineSegment(d, a));
        Problem p = problem(single(new ArbitraryClosedProfile(new Contour(segs))));
        assertEquals(Kind.SELF_INTERSECTION, p.kind());
        assertEquals(20, p.location().y(), 1e-6);
    }

    @Test
    void holeOutsideIsRejected() {
        Problem p = problem(withVoids(PLATE, poly(200, 5, 210, 5, 210, 10)));
        assertEquals(Kind.HOLE_OUTSIDE, p.kind());
        assertEquals(1, p.contour());
        assertTrue(p.message().contains("void 0 lies outside the outer boundary"), p.message());
    }

    @Test
    void holeCrossingTheOuterBoundaryIsRejected() {
        Problem p = problem(withVoids(PLATE, poly(90, 5, 110, 5, 110, 10)));
        assertEquals(Kind.HOLE_OUTSIDE, p.kind());
        assertEquals(1, p.contour());
        assertEquals(100, p.location().x(), 1e-9);
        assertEquals(7.5, p.location().y(), 1e-9);
    }

    @Test
    void overlappingHolesAreRejected() {
        Problem p = problem(withVoids(PLATE, poly(10, 5, 30, 5, 30, 15, 10, 15), poly(20, 8, 40, 8, 40, 12)));
        assertEquals(Kind.HOLES_OVERLAP, p.kind());
        assertEquals(2, p.contour());
    }

    @Test
    void nestedHolesAreRejected() {
        Problem p = problem(withVoids(PLATE, poly(10, 5, 30, 5, 30, 15, 10, 15), poly(12, 7, 20, 7, 20, 12)));
        assertEquals(Kind.HOLES_OVERLAP, p.kind());
        assertEquals(2, p.contour());
    }

    @Test
    void holeTouchingTheOuterBoundaryAtOnePointIsAllowed() {
        assertEquals(Optional.empty(), SectionValidator.check(withVoids(PLATE, poly(50, 0, 60, 10, 40, 10))));
    }

    @Test
    void holeCuttingThePlateInTwoIsRejected() {
        Problem p = problem(withVoids(PLATE, poly(50, 0, 60, 10, 50, 20, 40, 10)));
        assertEquals(Kind.DISCONNECTED_INTERIOR, p.kind());
        assertEquals(1, p.contour());
    }

    @Test
    void holesTouchingInAChainAcrossThePlateAreRejected() {
        Contour h1 = poly(10, 0, 20, 10, 10, 18, 5, 10);
        Contour h2 = poly(20, 10, 30, 2, 35, 10, 30, 18);
        Contour h3 = poly(30, 18, 40, 10, 45, 20);
        assertEquals(Kind.DISCONNECTED_INTERIOR, problem(withVoids(PLATE, h1, h2, h3)).kind());
        // without the link to the top edge the material stays connected
        Contour h3free = poly(30, 18, 40, 10, 45, 19);
        assertEquals(Optional.empty(), SectionValidator.check(withVoids(PLATE, h1, h2, h3free)));
    }

    @Test
    void zeroAreaIsRejected() {
        Problem p = problem(single(new ArbitraryClosedProfile(poly(0, 0, 100, 0, 200, 1e-10))));
        assertEquals(Kind.ZERO_AREA, p.kind());
        assertTrue(p.message().contains("area 5E-9"), p.message());
        // just above the limit |A| > 1e-12 · d²: 200 × 1e-6 triangle, A = 1e-4 > 4e-8
        assertEquals(Optional.empty(),
                SectionValidator.check(single(new ArbitraryClosedProfile(poly(0, 0, 100, 0, 200, 1e-6)))));
    }

    @Test
    void overlappingPartsAreRejected() {
        ProfileDef square = ProfileTypes.create("RectangleProfile", Map.of("xDim", 10.0, "yDim", 10.0));
        Section s = new Section("c", List.of(SectionPart.of(square, 0, 0, STEEL), SectionPart.of(square, 5, 0, ALU)));
        Problem p = problem(s);
        assertEquals(Kind.PARTS_OVERLAP, p.kind());
        assertEquals(1, p.part());
        assertEquals(0, p.otherPart());
        assertEquals("section 'c', part 1: overlaps part 0 by an area of 50 around (2.5, 0)", p.message());
    }

    @Test
    void touchingPartsAreAllowed() {
        ProfileDef square = ProfileTypes.create("RectangleProfile", Map.of("xDim", 10.0, "yDim", 10.0));
        Section side = new Section("c", List.of(SectionPart.of(square, 0, 0, STEEL), SectionPart.of(square, 10, 3, ALU)));
        assertEquals(Optional.empty(), SectionValidator.check(side));
        Section corner = new Section("c", List.of(SectionPart.of(square, 0, 0, STEEL), SectionPart.of(square, 10, 10, ALU)));
        assertEquals(Optional.empty(), SectionValidator.check(corner));
    }

    @Test
    void coreFillingATubeTouchesAlongTheArc() {
        ProfileDef tube = ProfileTypes.create("CircleHollowProfile", Map.of("radius", 50.0, "wallThickness", 5.0));
        ProfileDef core = ProfileTypes.create("CircleProfile", Map.of("radius", 45.0));
        Section cft = new Section("cft", List.of(SectionPart.of(tube, 3, 4, STEEL), SectionPart.of(core, 3, 4, ALU)));
        assertEquals(Optional.empty(), SectionValidator.check(cft));
        // a core 0.001 larger overlaps by the annulus π (45.001² − 45²) = 0.28275 (elementary geometry)
        ProfileDef fat = ProfileTypes.create("CircleProfile", Map.of("radius", 45.001));
        Problem p = problem(new Section("cft", List.of(SectionPart.of(tube, 0, 0, STEEL), SectionPart.of(fat, 0, 0, ALU))));
        assertEquals(Kind.PARTS_OVERLAP, p.kind());
        assertTrue(p.message().contains("area of 0.2827"), p.message());
    }

    @Test
    void hugeSectionsAreRejected() {
        Problem p = problem(single(new ArbitraryClosedProfile(poly(0, 0, 1e60, 0, 0, 1e60))));
        assertEquals(Kind.SIZE_OUT_OF_RANGE, p.kind());
    }

    @Test
    void validateThrowsWithTheMessage() {
        Section s = single(new ArbitraryClosedProfile(poly(0, 0, 100, 20, 100, 0, 0, 30)));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> SectionValidator.validate(s));
        assertEquals(problem(s).message(), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new SectionValidator(null));
    }

    @Property(tries = 200)
    void validityDoesNotDependOnPlacement(@ForAll @DoubleRange(min = -1e4, max = 1e4) double dx,
            @ForAll @DoubleRange(min = -1e4, max = 1e4) double dy,
            @ForAll @DoubleRange(min = 1, max = 18) double holeX) {
        // property: translating a section changes neither validity nor the kind of problem
        ProfileDef good = new ArbitraryProfileWithVoids(PLATE,
                List.of(Contour.circle(new Point2(10 + holeX, 10), 5), poly(50, 0, 60, 10, 40, 10)));
        ProfileDef bad = new ArbitraryProfileWithVoids(PLATE, List.of(poly(50, 0, 60, 10, 50, 20, 40, 10)));
        assertEquals(Optional.empty(),
                SectionValidator.check(new Section("s", List.of(SectionPart.of(good, dx, dy, STEEL)))));
        assertEquals(Kind.DISCONNECTED_INTERIOR,
                problem(new Section("s", List.of(SectionPart.of(bad, dx, dy, STEEL)))).kind());
    }
}
