package org.tensio.engine.profile;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tensio.engine.geometry.Region;

/**
 * An angle with legs of constant thickness (IFC4 {@code IfcLShapeProfileDef}), equal or unequal legs.
 * Placement as IFC4: centre of the bounding box at the origin (not the centroid); the vertical leg (length
 * {@code depth}, along y) is on the −x side, the horizontal leg (length {@code width}, along x) at the
 * bottom (−y), so the heel is the corner (−width/2, −depth/2).
 * <p>
 * Rounded corners are true circular arcs: the root fillet of radius {@code filletRadius} at the inner
 * corner and roundings of radius {@code edgeRadius} at the inner edges of both leg toes. IFC4's optional
 * {@code LegSlope} is not supported ({@link ProfileTypes} accepts {@code legSlope} only as 0).
 * <p>
 * {@code width} is optional in IFC4 (equal legs when absent); here a {@code width} of 0 means "equal to
 * {@code depth}" and is stored as {@code depth}, so {@link #width()} and {@link #parameters()} always
 * report the actual leg length.
 * <p>
 * Validation, beyond positive finite dimensions and non-negative radii: the IFC4 where-rule
 * {@code thickness < depth} and {@code thickness < width}, plus the fit of the roundings:
 * {@code edgeRadius <= thickness}, {@code filletRadius + edgeRadius <= width - thickness} and
 * {@code <= depth - thickness}.
 *
 * @param depth        length of the vertical leg, along y, length unit, &gt; 0
 * @param width        length of the horizontal leg, along x, length unit, &gt; 0 (0 on input: equal to depth)
 * @param thickness    leg thickness, length unit, &gt; 0
 * @param filletRadius root radius, length unit, &ge; 0 (IFC4 optional)
 * @param edgeRadius   toe radius at the leg ends, length unit, &ge; 0 (IFC4 optional)
 * @since 0.1
 */
public record LShapeProfile(double depth, double width, double thickness, double filletRadius, double edgeRadius)
        implements ProfileDef {

    /** Type name in the project file. */
    public static final String TYPE = "LShapeProfile";

    /** @throws IllegalArgumentException naming the parameter when a dimension is invalid or a radius does not fit */
    public LShapeProfile {
        Check.positive("depth", depth);
        Check.nonNegative("width", width);
        if (width == 0) {
            width = depth;
        }
        Check.positive("thickness", thickness);
        Check.nonNegative("filletRadius", filletRadius);
        Check.nonNegative("edgeRadius", edgeRadius);
        Check.lessThan("thickness", thickness, depth, "the depth");
        Check.lessThan("thickness", thickness, width, "the width");
        double scale = Math.max(depth, width);
        Check.atMost("edgeRadius", edgeRadius, thickness, scale, "on the leg ends, whose length is the thickness");
        Check.atMost("edgeRadius", edgeRadius, Math.min(width, depth) - thickness, scale,
                "along the inner face of the shorter leg");
        Check.atMost("filletRadius", filletRadius, width - thickness - edgeRadius, scale,
                "between the vertical leg and the toe of the horizontal leg");
        Check.atMost("filletRadius", filletRadius, depth - thickness - edgeRadius, scale,
                "between the horizontal leg and the toe of the vertical leg");
    }

    /** An equal-leg angle ({@code width = depth}) with root and toe radii. */
    public LShapeProfile(double depth, double thickness, double filletRadius, double edgeRadius) {
        this(depth, depth, thickness, filletRadius, edgeRadius);
    }

    /** An equal-leg angle ({@code width = depth}) with sharp corners. */
    public LShapeProfile(double depth, double thickness) {
        this(depth, depth, thickness, 0, 0);
    }

    @Override
    public String type() {
        return TYPE;
    }

    /** @return the section, built on each call: one closed chain of lines and circular arcs, counter-clockwise */
    @Override
    public Region region() {
        double hx = width / 2;
        double hy = depth / 2;
        return new Region(new RoundedOutline()
                .corner(-hx, -hy).corner(hx, -hy)
                .corner(hx, -hy + thickness, edgeRadius)
                .corner(-hx + thickness, -hy + thickness, filletRadius)
                .corner(-hx + thickness, hy, edgeRadius)
                .corner(-hx, hy)
                .contour());
    }

    /** @return {@code depth, width, thickness, filletRadius, edgeRadius} */
    @Override
    public Map<String, Double> parameters() {
        Map<String, Double> p = new LinkedHashMap<>();
        p.put("depth", depth);
        p.put("width", width);
        p.put("thickness", thickness);
        p.put("filletRadius", filletRadius);
        p.put("edgeRadius", edgeRadius);
        return Collections.unmodifiableMap(p);
    }
}
