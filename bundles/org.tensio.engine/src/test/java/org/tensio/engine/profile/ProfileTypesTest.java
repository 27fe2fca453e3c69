package org.tensio.engine.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tensio.engine.profile.ProfileAssertions.assertRejected;

import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The registry: round trips, names, and rejected inputs. */
class ProfileTypesTest {

    /** One valid example of every registered type, every optional parameter non-zero where the type has one. */
    static Stream<ProfileDef> examples() {
        return Stream.of(
                new CircleProfile(50),
                new CircleHollowProfile(84.15, 6.3),
                new EllipseProfile(120, 45),
                new RectangleProfile(300, 45.5),
                new RectangleHollowProfile(200, 100, 10, 10, 15),
                new IShapeProfile(150, 300, 7.1, 10.7, 15, 2),
                new UShapeProfile(200, 80, 6, 11, 13, 5),
                new LShapeProfile(150, 90, 10, 12, 6),
                new TShapeProfile(100, 100, 11, 11, 11, 5.5, 4),
                new ZShapeProfile(200, 80, 8, 10, 10, 5));
    }

    @Test
    void namesCoverEveryExampleAndNoArbitraryType() {
        Set<String> names = ProfileTypes.names();
        assertEquals(examples().map(ProfileDef::type).toList(), List.copyOf(names), "registered types, in order");
        for (String arbitrary : ProfileTypes.ARBITRARY) {
            assertTrue(!names.contains(arbitrary), arbitrary + " is built by the file reader");
        }
    }

    @ParameterizedTest
    @MethodSource("examples")
    void roundTripThroughParameters(ProfileDef p) {
        assertEquals(p, ProfileTypes.create(p.type(), p.parameters()), "create(type, parameters()) rebuilds the profile");
        assertEquals(ProfileTypes.parameterNames(p.type()), List.copyOf(p.parameters().keySet()),
                "declared parameter names = parameters() keys, IFC4 order");
    }

    @ParameterizedTest
    @MethodSource("examples")
    void optionalParametersDefaultToZero(ProfileDef p) {
        Map<String, Double> required = new LinkedHashMap<>();
        for (String name : ProfileTypes.requiredParameterNames(p.type())) {
            required.put(name, p.parameters().get(name));
        }
        ProfileDef built = ProfileTypes.create(p.type(), required);
        for (Map.Entry<String, Double> kv : built.parameters().entrySet()) {
            if (!required.containsKey(kv.getKey())) {
                double expected = p.type().equals("LShapeProfile") && kv.getKey().equals("width")
                        ? required.get("depth") : 0;
                assertEquals(expected, kv.getValue(), 0, kv.getKey() + " default (IFC4: absent)");
            }
        }
    }

    @Test
    void rejectsUnknownAndMissingParameters() {
        Map<String, Double> p = new HashMap<>(Map.of("overallWidth", 100.0, "overallDepth", 200.0,
                "webThickness", 6.0, "flangeThickness", 10.0, "filletRadus", 5.0));
        assertRejected("IShapeProfile", "unknown parameter filletRadus", () -> ProfileTypes.create("IShapeProfile", p));
        p.remove("filletRadus");
        p.remove("webThickness");
        assertRejected("IShapeProfile", "missing required parameter webThickness",
                () -> ProfileTypes.create("IShapeProfile", p));
        p.put("webThickness", null);
        assertRejected("IShapeProfile", "webThickness: null", () -> ProfileTypes.create("IShapeProfile", p));
        Map<String, Double> nullKey = new HashMap<>();
        nullKey.put(null, 1.0);
        nullKey.put("radius", 1.0);
        assertRejected("CircleProfile", "unknown parameter null", () -> ProfileTypes.create("CircleProfile", nullKey));
    }

    @Test
    void unsupportedSlopeOnlyAsZero() {
        Map<String, Double> p = new HashMap<>(Map.of("overallWidth", 100.0, "overallDepth", 200.0,
                "webThickness", 6.0, "flangeThickness", 10.0, "flangeSlope", 0.0));
        assertEquals(List.of("flangeSlope"), ProfileTypes.zeroOnlyParameterNames("IShapeProfile"), "IFC4 FlangeSlope");
        assertEquals(List.of("webSlope", "flangeSlope"), ProfileTypes.zeroOnlyParameterNames("TShapeProfile"), "IFC4 slopes");
        assertEquals(new IShapeProfile(100, 200, 6, 10), ProfileTypes.create("IShapeProfile", p), "flangeSlope 0 accepted");
        p.put("flangeSlope", 0.08);
        assertRejected("flangeSlope", "flangeSlope: 0.08 is not supported by IShapeProfile",
                () -> ProfileTypes.create("IShapeProfile", p));
    }

    @Test
    void rejectsUnknownAndArbitraryTypes() {
        assertRejected("type", "'HShapeProfile' is not a known profile type", () -> ProfileTypes.create("HShapeProfile", Map.of()));
        assertRejected("type", "built from contours by the project-file reader",
                () -> ProfileTypes.create("ArbitraryClosedProfile", Map.of()));
        assertRejected("type", "built from contours", () -> ProfileTypes.parameterNames("ArbitraryProfileWithVoids"));
        assertRejected("type", "null", () -> ProfileTypes.create(null, Map.of()));
    }

    @Test
    void constructorValidationPassesThrough() {
        assertRejected("filletRadius", "filletRadius: 20 does not fit between the web and the flange tip (at most 14.45)",
                () -> ProfileTypes.create("IShapeProfile", Map.of("overallWidth", 40.0, "overallDepth", 200.0,
                        "webThickness", 11.1, "flangeThickness", 10.0, "filletRadius", 20.0)));
    }
}
