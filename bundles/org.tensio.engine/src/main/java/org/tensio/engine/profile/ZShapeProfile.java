package org.tensio.engine.profile;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tensio.engine.geometry.Region;

/**
 * A Z-section with parallel flanges (IFC4 {@code IfcZShapeProfileDef}), point-symmetric about the origin.
 * Placement as IFC4: centre of the bounding box (here also the centroid) at the origin. The web is centred
 * on x = 0 and runs along y; the top flange extends towards −x and the bottom flange towards +x, like the
 * letter Z.
 * <p>
 * <b>Flange width convention:</b> {@code flangeWidth} is measured from the flange tip to the <em>far</em>
 * face of the web, i.e. it includes the web thickness. The top flange spans
 * {@code x ∈ [-(flangeWidth - webThickness/2), webThickness/2]}, the bottom one the mirror image, and the
 * overall width is {@code 2·flangeWidth - webThickness}.
 * <p>
 * Rounded corners are true circular arcs: two root fillets of radius {@code filletRadius} in the re-entrant
 * corners between web and flanges, and two roundings of radius {@code edgeRadius} at the inner edges of the
 * flange tips. The two outer corners where web and flange meet stay sharp.
 * <p>
 * Validation, beyond positive finite dimensions and non-negative radii: the IFC4 where-rule
 * {@code flangeThickness < depth/2}; {@code webThickness < flangeWidth} (so that the flanges protrude); the
 * fit of the roundings: {@code edgeRadius <= flangeThickness},
 * {@code filletRadius + edgeRadius <= flangeWidth - webThickness}, {@code filletRadius <= depth -
 * flangeThickness}.
 *
 * @param depth           overall depth along y, length unit, &gt; 0
 * @param flangeWidth     flange width from tip to the far face of the web, length unit, &gt; 0
 * @param webThickness    web thickness, length unit, &gt; 0
 * @param flangeThickness flange thickness, length unit, &gt; 0
 * @param filletRadius    root radius between web and flanges, length unit, &ge; 0 (IFC4 optional)
 * @param edgeRadius      radius at the inner edges of the flange tips, length unit, &ge; 0 (IFC4 optional)
 * @since 0.1
 */
public record ZShapeProfile(double depth, double flangeWidth, double webThickness, double flangeThickness,
        double filletRadius, double edgeRadius) implements ProfileDef {

    /** Type name in the project file. */
    public static final String TYPE = "ZShapeProfile";

    /** @throws IllegalArgumentException naming the parameter when a dimension is invalid or a radius does not fit */
    public ZShapeProfile {
        Check.positive("depth", depth);
        Check.positive("flangeWidth", flangeWidth);
        Check.positive("webThickness", webThickness);
        Check.positive("flangeThickness", flangeThickness);
        Check.nonNegative("filletRadius", filletRadius);
        Check.nonNegative("edgeRadius", edgeRadius);
        Check.lessThan("flangeThickness", flangeThickness, depth / 2, "half the depth");
        Check.lessThan("webThickness", webThickness, flangeWidth, "the flangeWidth");
        double scale = Math.max(depth, 2 * flangeWidth);
        double outstand = flangeWidth - webThickness;
        RoundedOutline.checkFlangeRoundings("edgeRadius", edgeRadius, filletRadius, flangeThickness, outstand,
                "flangeWidth - webThickness", scale);
        Check.atMost("filletRadius", filletRadius, depth - flangeThickness, scale,
                "along the web, depth - flangeThickness");
    }

    /** A Z-section with sharp corners. */
    public ZShapeProfile(double depth, double flangeWidth, double webThickness, double flangeThickness) {
        this(depth, flangeWidth, webThickness, flangeThickness, 0, 0);
    }

    @Override
    public String type() {
        return TYPE;
    }

    /** @return the section, built on each call: one closed chain of lines and circular arcs, counter-clockwise */
    @Override
    public Region region() {
        double w = webThickness / 2;
        double tip = flangeWidth - w;
        double hy = depth / 2;
        double yf = hy - flangeThickness;
        return new Region(new RoundedOutline()
                .corner(-w, -hy)
                .flangeToWeb(tip, -hy, -yf, w, edgeRadius, filletRadius)
                .corner(w, hy)
                .flangeToWeb(-tip, hy, yf, -w, edgeRadius, filletRadius)
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
