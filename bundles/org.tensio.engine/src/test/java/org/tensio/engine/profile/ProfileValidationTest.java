package org.tensio.engine.profile;

import static org.tensio.engine.profile.ProfileAssertions.assertRejected;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every parameter of every type rejects NaN, infinities and negative values (required ones also 0), with a
 * message naming the parameter; and a table of the geometric fit rules. Rules: IFC4 where-rules of the
 * IfcParameterizedProfileDef subtypes (ISO 16739-1:2018, from memory) plus the fit rules of this package.
 */
class ProfileValidationTest {

    static Stream<Arguments> badNumbers() {
        List<Arguments> cases = new ArrayList<>();
        ProfileTypesTest.examples().forEach(p -> {
            List<String> required = ProfileTypes.requiredParameterNames(p.type());
            for (String name : p.parameters().keySet()) {
                boolean optional = !required.contains(name);
                cases.add(Arguments.of(p, name, Double.NaN, name + ": NaN must be a finite number"));
                cases.add(Arguments.of(p, name, Double.POSITIVE_INFINITY, name + ": Infinity must be a finite number"));
                cases.add(Arguments.of(p, name, Double.NEGATIVE_INFINITY, name + ": -Infinity must be a finite number"));
                cases.add(Arguments.of(p, name, -1.5, name + ": -1.5 must " + (optional ? "not be negative" : "be positive")));
                if (!optional) {
                    cases.add(Arguments.of(p, name, 0.0, name + ": 0 must be positive"));
                }
            }
        });
        return cases.stream();
    }

    @ParameterizedTest(name = "{0} {1} = {2}")
    @MethodSource("badNumbers")
    void rejectsBadNumbers(ProfileDef valid, String name, double value, String message) {
        Map<String, Double> p = new LinkedHashMap<>(valid.parameters());
        p.put(name, value);
        assertRejected(name, message, () -> ProfileTypes.create(valid.type(), p));
    }

    /** type | parameters (name=value, space separated) | field named | message fragment. */
    @ParameterizedTest(name = "{0}: {2}")
    @CsvSource(delimiter = '|', textBlock = """
            CircleHollowProfile    | radius=5 wallThickness=5                                        | wallThickness     | must be less than the radius (5)
            RectangleHollowProfile | xDim=200 yDim=100 wallThickness=50                              | wallThickness     | must be less than half the yDim (50)
            RectangleHollowProfile | xDim=200 yDim=100 wallThickness=10 outerFilletRadius=50.5       | outerFilletRadius | does not fit the outer corners (half the smaller outer dimension) (at most 50)
            RectangleHollowProfile | xDim=200 yDim=100 wallThickness=10 innerFilletRadius=40.5       | innerFilletRadius | does not fit the inner corners (half the smaller inner dimension) (at most 40)
            RectangleHollowProfile | xDim=200 yDim=100 wallThickness=4 innerFilletRadius=1 outerFilletRadius=15 | outerFilletRadius | the wall does not vanish at the corners (14.65685425)
            IShapeProfile | overallWidth=40 overallDepth=200 webThickness=11.1 flangeThickness=10 filletRadius=20 | filletRadius | filletRadius: 20 does not fit between the web and the flange tip (at most 14.45)
            IShapeProfile | overallWidth=100 overallDepth=200 webThickness=6 flangeThickness=40 filletRadius=20 flangeEdgeRadius=30 | filletRadius | between the web and the flange tip (at most 17)
            IShapeProfile | overallWidth=100 overallDepth=200 webThickness=6 flangeThickness=90 filletRadius=11 | filletRadius | along the web between the flanges (at most 10)
            IShapeProfile | overallWidth=100 overallDepth=200 webThickness=6 flangeThickness=10 flangeEdgeRadius=11 | flangeEdgeRadius | on the flange tip, whose height is the flangeThickness (at most 10)
            IShapeProfile | overallWidth=20 overallDepth=200 webThickness=10 flangeThickness=10 flangeEdgeRadius=6 | flangeEdgeRadius | on the flange outstand, (overallWidth - webThickness)/2 (at most 5)
            IShapeProfile | overallWidth=100 overallDepth=200 webThickness=100 flangeThickness=10             | webThickness     | must be less than the overallWidth (100)
            IShapeProfile | overallWidth=100 overallDepth=200 webThickness=6 flangeThickness=100              | flangeThickness  | must be less than half the overallDepth (100)
            UShapeProfile | depth=200 flangeWidth=80 webThickness=6 flangeThickness=11 filletRadius=70 edgeRadius=5 | filletRadius | between the web and the flange tip (at most 69)
            UShapeProfile | depth=200 flangeWidth=80 webThickness=6 flangeThickness=11 edgeRadius=12       | edgeRadius       | on the flange tip
            LShapeProfile | depth=100 width=80 thickness=10 filletRadius=66 edgeRadius=5                  | filletRadius     | between the vertical leg and the toe of the horizontal leg (at most 65)
            LShapeProfile | depth=100 thickness=100                                                       | thickness        | must be less than the depth (100)
            TShapeProfile | depth=100 flangeWidth=100 webThickness=10 flangeThickness=10 webEdgeRadius=6  | webEdgeRadius    | across the web toe, webThickness/2 (at most 5)
            TShapeProfile | depth=50 flangeWidth=100 webThickness=10 flangeThickness=10 filletRadius=36 webEdgeRadius=5 | filletRadius | between the flange and the web toe (at most 35)
            ZShapeProfile | depth=200 flangeWidth=80 webThickness=8 flangeThickness=10 filletRadius=68 edgeRadius=5 | filletRadius | between the web and the flange tip (at most 67)
            ZShapeProfile | depth=200 flangeWidth=80 webThickness=80 flangeThickness=10                   | webThickness     | must be less than the flangeWidth (80)
            """)
    void rejectsRadiiAndThicknessesThatDoNotFit(String type, String parameters, String field, String fragment) {
        Map<String, Double> p = new LinkedHashMap<>();
        for (String kv : parameters.trim().split("\\s+")) {
            String[] parts = kv.split("=");
            p.put(parts[0], Double.parseDouble(parts[1]));
        }
        assertRejected(field, fragment, () -> ProfileTypes.create(type, p));
    }
}
