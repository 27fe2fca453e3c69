package org.tensio.engine.profile;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tensio.engine.geometry.Region;

/**
 * A channel with parallel flanges (IFC4 {@code IfcUShapeProfileDef}), e.g. UPE, PFC. Placement as IFC4:
 * centre of the bounding box at the origin (not the centroid, which lies towards the web); the web is on
 * the −x side, the flanges extend towards +x, depth along y.
 * <p>
 * Rounded corners are true circular arcs: two root fillets of radius {@code filletRadius} between web and
 * flanges, and two roundings of radius {@code edgeRadius} at the inner edges of the flange tips. IFC4's
 * optional {@code FlangeSlope} is not supported ({@link ProfileTypes} accepts {@code flangeSlope} only as 0).
 * <p>
 * Validation, beyond positive finite dimensions and non-negative radii: the IFC4 where-rules
 * {@code flangeThickness < depth/2} and {@code webThickness < flangeWidth}, plus the fit of the roundings:
 * {@code edgeRadius <= flangeThickness}, {@code filletRadius + edgeRadius <= flangeWidth - webThickness},
 * {@code filletRadius <= (depth - 2·flangeThickness)/2}.
 *
 * @param depth           overall depth along y, length unit, &gt; 0
 * @param flangeWidth     overall width along x (web included), length unit, &gt; 0
 * @param webThickness    web thickness, length unit, &gt; 0
 * @param flangeThickness flange thickness, length unit, &gt; 0
 * @param filletRadius    root radius between web and flanges, length unit, &ge; 0 (IFC4 optional)
 * @param edgeRadius      radius at the inner edges of the flange tips, length unit, &ge; 0 (IFC4 optional)
 * @since 0.1
 */
public record UShapeProfile(double depth, double flangeWidth, double webThickness, double flangeThickness,
        double filletRadius, double edgeRadius) implements ProfileDef {

    /** Type name in the project file. */
    public static final String TYPE = "UShapeProfile";

    /** @throws IllegalArgumentException naming the parameter when a dimension is invalid or a radius does not fit */
    public UShapeProfile {
        Check.positive("depth", depth);
        Check.positive("flangeWidth", flangeWidth);
        Check.positive("webThickness", webThickness);
        Check.positive("flangeThickness", flangeThickness);
        Check.nonNegative("filletRadius", filletRadius);
        Check.nonNegative("edgeRadius", edgeRadius);
        Check.lessThan("flangeThickness", flangeThickness, depth / 2, "half the depth");
        Check.lessThan("webThickness", webThickness, flangeWidth, "the flangeWidth");
        double scale = Math.max(depth, flangeWidth);
        double outstand = flangeWidth - webThickness;
        RoundedOutline.checkFlangeRoundings("edgeRadius", edgeRadius, filletRadius, flangeThickness, outstand,
                "flangeWidth - webThickness", scale);
        Check.atMost("filletRadius", filletRadius, (depth - 2 * flangeThickness) / 2, scale,
                "along the web between the flanges");
    }

    /** A channel with sharp corners. */
    public UShapeProfile(double depth, double flangeWidth, double webThickness, double flangeThickness) {
        this(depth, flangeWidth, webThickness, flangeThickness, 0, 0);
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
        double xw = -hx + webThickness;
        double yf = hy - flangeThickness;
        return new Region(new RoundedOutline()
                .corner(-hx, -hy)
                .flangeToWeb(hx, -hy, -yf, xw, edgeRadius, filletRadius)
                .webToFlange(xw, yf, hx, hy, filletRadius, edgeRadius)
                .corner(-hx, hy)
                .contour());
    }

    /** @return {@code depth, flangeWidth, webThickness, flangeThickness, filletRadius, edgeRadius} */
    @Override
    public Map<String, Double> parameters() {
        Map<String, Double> p = new LinkedHashMap<>();
        p.put("depth", depth);
        p.put("flangeWidth", flangeWidth);
        p.put("webThickness", webThickness);
        p.put("flangeThickness", flangeThickness);
        p.put("filletRadius", filletRadius);
        p.put("edgeRadius", edgeRadius);
        return Collections.unmodifiableMap(p);
    }
}
