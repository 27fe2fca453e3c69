package org.tensio.engine.profile;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Region;

/**
 * A rectangular hollow section (IFC4 {@code IfcRectangleHollowProfileDef}), centred at the origin, with
 * optionally rounded outer and inner corners (true circular arcs).
 * <p>
 * Validation, beyond positive finite dimensions: the IFC4 where-rules
 * {@code wallThickness < xDim/2}, {@code wallThickness < yDim/2},
 * {@code innerFilletRadius <= min(xDim, yDim)/2 - wallThickness}, {@code outerFilletRadius <= min(xDim, yDim)/2},
 * and one rule of this implementation: the wall must not vanish at a corner. With the inner corner arc
 * centred at {@code (xDim/2 - t - ri, yDim/2 - t - ri)} and the outer one at {@code (xDim/2 - ro, yDim/2 - ro)},
 * the inner arc stays strictly inside the outer one exactly when
 * {@code ro < (2 + √2)·t + ri} (hand derivation: the inner arc's farthest point from the outer centre lies on
 * the diagonal at distance {@code √2 (ro - t - ri) + ri}, which must be below {@code ro}).
 *
 * @param xDim              outer width along x, length unit, &gt; 0
 * @param yDim              outer depth along y, length unit, &gt; 0
 * @param wallThickness     wall thickness, length unit, &gt; 0
 * @param innerFilletRadius radius of the inner corners, length unit, &ge; 0 (0: sharp; IFC4 optional)
 * @param outerFilletRadius radius of the outer corners, length unit, &ge; 0 (0: sharp; IFC4 optional)
 * @since 0.1
 */
public record RectangleHollowProfile(double xDim, double yDim, double wallThickness, double innerFilletRadius,
        double outerFilletRadius) implements ProfileDef {

    /** Type name in the project file. */
    public static final String TYPE = "RectangleHollowProfile";

    /** @throws IllegalArgumentException naming the parameter when a dimension is invalid or a radius does not fit */
    public RectangleHollowProfile {
        Check.positive("xDim", xDim);
        Check.positive("yDim", yDim);
        Check.positive("wallThickness", wallThickness);
        Check.nonNegative("innerFilletRadius", innerFilletRadius);
        Check.nonNegative("outerFilletRadius", outerFilletRadius);
        Check.lessThan("wallThickness", wallThickness, xDim / 2, "half the xDim");
        Check.lessThan("wallThickness", wallThickness, yDim / 2, "half the yDim");
        double scale = Math.max(xDim, yDim);
        Check.atMost("outerFilletRadius", outerFilletRadius, Math.min(xDim, yDim) / 2, scale,
                "the outer corners (half the smaller outer dimension)");
        Check.atMost("innerFilletRadius", innerFilletRadius, Math.min(xDim, yDim) / 2 - wallThickness, scale,
                "the inner corners (half the smaller inner dimension)");
        Check.lessThan("outerFilletRadius", outerFilletRadius,
                (2 + Math.sqrt(2)) * wallThickness + innerFilletRadius,
                "(2 + sqrt(2)) * wallThickness + innerFilletRadius, so that the wall does not vanish at the corners");
    }

    /** A hollow rectangle with sharp corners. */
    public RectangleHollowProfile(double xDim, double yDim, double wallThickness) {
        this(xDim, yDim, wallThickness, 0, 0);
    }

    @Override
    public String type() {
        return TYPE;
    }

    /** @return the section, built on each call: rounded outer rectangle with one rounded rectangular hole */
    @Override
    public Region region() {
        double hx = xDim / 2;
        double hy = yDim / 2;
        return new Region(rounded(hx, hy, outerFilletRadius),
                List.of(rounded(hx - wallThickness, hy - wallThickness, innerFilletRadius)));
    }

    private static Contour rounded(double hx, double hy, double r) {
        return new RoundedOutline().corner(-hx, -hy, r).corner(hx, -hy, r).corner(hx, hy, r).corner(-hx, hy, r)
                .contour();
    }

    /** @return {@code xDim, yDim, wallThickness, innerFilletRadius, outerFilletRadius} */
    @Override
    public Map<String, Double> parameters() {
        Map<String, Double> p = new LinkedHashMap<>();
        p.put("xDim", xDim);
        p.put("yDim", yDim);
        p.put("wallThickness", wallThickness);
        p.put("innerFilletRadius", innerFilletRadius);
        p.put("outerFilletRadius", outerFilletRadius);
        return Collections.unmodifiableMap(p);
    }
}
