package org.tensio.engine.profile;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tensio.engine.geometry.Region;

/**
 * A tee with parallel flange and web faces (IFC4 {@code IfcTShapeProfileDef}). Placement as IFC4: centre of
 * the bounding box at the origin (not the centroid, which lies towards the flange); the flange is at the
 * top (+y), the web is centred on x = 0 and runs downwards.
 * <p>
 * Rounded corners are true circular arcs: two root fillets of radius {@code filletRadius} between web and
 * flange, two roundings of radius {@code flangeEdgeRadius} at the lower edges of the flange tips and two of
 * radius {@code webEdgeRadius} at the edges of the web toe. IFC4's optional {@code WebSlope} and
 * {@code FlangeSlope} are not supported ({@link ProfileTypes} accepts them only as 0).
 * <p>
 * Validation, beyond positive finite dimensions and non-negative radii: the IFC4 where-rules
 * {@code flangeThickness < depth} and {@code webThickness < flangeWidth}, plus the fit of the roundings:
 * {@code webEdgeRadius <= webThickness/2}, {@code flangeEdgeRadius <= flangeThickness},
 * {@code filletRadius + flangeEdgeRadius <= (flangeWidth - webThickness)/2},
 * {@code filletRadius + webEdgeRadius <= depth - flangeThickness}.
 *
 * @param depth            overall depth along y, length unit, &gt; 0
 * @param flangeWidth      flange width along x, length unit, &gt; 0
 * @param webThickness     web thickness, length unit, &gt; 0
 * @param flangeThickness  flange thickness, length unit, &gt; 0
 * @param filletRadius     root radius between web and flange, length unit, &ge; 0 (IFC4 optional)
 * @param flangeEdgeRadius radius at the lower edges of the flange tips, length unit, &ge; 0 (IFC4 optional)
 * @param webEdgeRadius    radius at the edges of the web toe, length unit, &ge; 0 (IFC4 optional)
 * @since 0.1
 */
public record TShapeProfile(double depth, double flangeWidth, double webThickness, double flangeThickness,
        double filletRadius, double flangeEdgeRadius, double webEdgeRadius) implements ProfileDef {

    /** Type name in the project file. */
    public static final String TYPE = "TShapeProfile";

    /** @throws IllegalArgumentException naming the parameter when a dimension is invalid or a radius does not fit */
    public TShapeProfile {
        Check.positive("depth", depth);
        Check.positive("flangeWidth", flangeWidth);
        Check.positive("webThickness", webThickness);
        Check.positive("flangeThickness", flangeThickness);
        Check.nonNegative("filletRadius", filletRadius);
        Check.nonNegative("flangeEdgeRadius", flangeEdgeRadius);
        Check.nonNegative("webEdgeRadius", webEdgeRadius);
        Check.lessThan("flangeThickness", flangeThickness, depth, "the depth");
        Check.lessThan("webThickness", webThickness, flangeWidth, "the flangeWidth");
        double scale = Math.max(depth, flangeWidth);
        double outstand = (flangeWidth - webThickness) / 2;
        double webLength = depth - flangeThickness;
        Check.atMost("webEdgeRadius", webEdgeRadius, webThickness / 2, scale, "across the web toe, webThickness/2");
        Check.atMost("webEdgeRadius", webEdgeRadius, webLength, scale, "along the web, depth - flangeThickness");
        RoundedOutline.checkFlangeRoundings("flangeEdgeRadius", flangeEdgeRadius, filletRadius, flangeThickness,
                outstand, "(flangeWidth - webThickness)/2", scale);
        Check.atMost("filletRadius", filletRadius, webLength - webEdgeRadius, scale,
                "between the flange and the web toe");
    }

    /** A tee with sharp corners. */
    public TShapeProfile(double depth, double flangeWidth, double webThickness, double flangeThickness) {
        this(depth, flangeWidth, webThickness, flangeThickness, 0, 0, 0);
    }

    @Override
    public String type() {
        return TYPE;
    }

    /** @return the section, built on each call: one closed chain of lines and circular arcs, counter-clockwise */
    @Override
    public Region region() {
        double hx = flangeWidth / 2;
        double hy = depth / 2;
        double w = webThickness / 2;
        double yf = hy - flangeThickness;
        return new Region(new RoundedOutline()
                .corner(-w, -hy, webEdgeRadius).corner(w, -hy, webEdgeRadius)
                .webToFlange(w, yf, hx, hy, filletRadius, flangeEdgeRadius)
                .flangeToWeb(-hx, hy, yf, -w, flangeEdgeRadius, filletRadius)
                .contour());
    }

    /**
     * @return {@code depth, flangeWidth, webThickness, flangeThickness, filletRadius, flangeEdgeRadius,
     *         webEdgeRadius}
     */
    @Override
    public Map<String, Double> parameters() {
        Map<String, Double> p = new LinkedHashMap<>();
        p.put("depth", depth);
        p.put("flangeWidth", flangeWidth);
        p.put("webThickness", webThickness);
        p.put("flangeThickness", flangeThickness);
        p.put("filletRadius", filletRadius);
        p.put("flangeEdgeRadius", flangeEdgeRadius);
        p.put("webEdgeRadius", webEdgeRadius);
        return Collections.unmodifiableMap(p);
    }
}
