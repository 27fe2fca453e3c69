package org.tensio.engine.profile;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tensio.engine.geometry.Region;

/**
 * A doubly symmetric I-section with parallel flanges (IFC4 {@code IfcIShapeProfileDef}), e.g. IPE, HE, W.
 * Placement as IFC4: centre of the bounding box (here also the centroid) at the origin, flanges along x,
 * web along y.
 * <p>
 * Rounded corners are true circular arcs: four root fillets of radius {@code filletRadius} between the web
 * and the flanges, and four edge roundings of radius {@code flangeEdgeRadius} at the inner side of the
 * flange tips (the outer flange corners stay sharp). IFC4's optional {@code FlangeSlope} (tapered flanges)
 * is not supported: there is no such component, and {@link ProfileTypes} accepts {@code flangeSlope} only
 * as 0.
 * <p>
 * Validation, beyond positive finite dimensions and non-negative radii: the IFC4 where-rules
 * {@code webThickness < overallWidth}, {@code 2·flangeThickness < overallDepth},
 * {@code filletRadius <= (overallWidth - webThickness)/2} and {@code filletRadius <= (overallDepth -
 * 2·flangeThickness)/2}, tightened so that both roundings fit together:
 * {@code flangeEdgeRadius <= flangeThickness} and
 * {@code filletRadius + flangeEdgeRadius <= (overallWidth - webThickness)/2}.
 *
 * @param overallWidth     flange width along x, length unit, &gt; 0
 * @param overallDepth     overall depth along y, length unit, &gt; 0
 * @param webThickness     web thickness, length unit, &gt; 0
 * @param flangeThickness  flange thickness, length unit, &gt; 0
 * @param filletRadius     root radius between web and flanges, length unit, &ge; 0 (0: sharp; IFC4 optional)
 * @param flangeEdgeRadius radius at the inner edges of the flange tips, length unit, &ge; 0 (IFC4 optional)
 * @since 0.1
 */
public record IShapeProfile(double overallWidth, double overallDepth, double webThickness, double flangeThickness,
        double filletRadius, double flangeEdgeRadius) implements ProfileDef {

    /** Type name in the project file. */
    public static final String TYPE = "IShapeProfile";

    /** @throws IllegalArgumentException naming the parameter when a dimension is invalid or a radius does not fit */
    public IShapeProfile {
        Check.positive("overallWidth", overallWidth);
        Check.positive("overallDepth", overallDepth);
        Check.positive("webThickness", webThickness);
        Check.positive("flangeThickness", flangeThickness);
        Check.nonNegative("filletRadius", filletRadius);
        Check.nonNegative("flangeEdgeRadius", flangeEdgeRadius);
        Check.lessThan("webThickness", webThickness, overallWidth, "the overallWidth");
        Check.lessThan("flangeThickness", flangeThickness, overallDepth / 2, "half the overallDepth");
        double scale = Math.max(overallWidth, overallDepth);
        double outstand = (overallWidth - webThickness) / 2;
        RoundedOutline.checkFlangeRoundings("flangeEdgeRadius", flangeEdgeRadius, filletRadius, flangeThickness,
                outstand, "(overallWidth - webThickness)/2", scale);
        Check.atMost("filletRadius", filletRadius, (overallDepth - 2 * flangeThickness) / 2, scale,
                "along the web between the flanges");
    }

    /** An I-section with sharp corners. */
    public IShapeProfile(double overallWidth, double overallDepth, double webThickness, double flangeThickness) {
        this(overallWidth, overallDepth, webThickness, flangeThickness, 0, 0);
    }

    /** An I-section with root fillets and sharp flange tips (rolled sections such as IPE and HE). */
    public IShapeProfile(double overallWidth, double overallDepth, double webThickness, double flangeThickness,
            double filletRadius) {
        this(overallWidth, overallDepth, webThickness, flangeThickness, filletRadius, 0);
    }

    @Override
    public String type() {
        return TYPE;
    }

    /** @return the section, built on each call: one closed chain of lines and circular arcs, counter-clockwise */
    @Override
    public Region region() {
        double hx = overallWidth / 2;
        double hy = overallDepth / 2;
        double w = webThickness / 2;
        double yf = hy - flangeThickness;
        double rf = filletRadius;
        double re = flangeEdgeRadius;
        return new Region(new RoundedOutline()
                .corner(-hx, -hy)
                .flangeToWeb(hx, -hy, -yf, w, re, rf)
                .webToFlange(w, yf, hx, hy, rf, re)
                .flangeToWeb(-hx, hy, yf, -w, re, rf)
                .corner(-w, -yf, rf).corner(-hx, -yf, re)
                .contour());
    }

    /** @return {@code overallWidth, overallDepth, webThickness, flangeThickness, filletRadius, flangeEdgeRadius} */
    @Override
    public Map<String, Double> parameters() {
        Map<String, Double> p = new LinkedHashMap<>();
        p.put("overallWidth", overallWidth);
        p.put("overallDepth", overallDepth);
        p.put("webThickness", webThickness);
        p.put("flangeThickness", flangeThickness);
        p.put("filletRadius", filletRadius);
        p.put("flangeEdgeRadius", flangeEdgeRadius);
        return Collections.unmodifiableMap(p);
    }
}
