package org.tensio.engine.profile;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tensio.engine.geometry.Region;

/**
 * A solid rectangle (IFC4 {@code IfcRectangleProfileDef}), centred at the origin.
 *
 * @param xDim width along x, length unit, finite and &gt; 0
 * @param yDim depth along y, length unit, finite and &gt; 0
 * @since 0.1
 */
public record RectangleProfile(double xDim, double yDim) implements ProfileDef {

    /** Type name in the project file. */
    public static final String TYPE = "RectangleProfile";

    /** @throws IllegalArgumentException naming the parameter when a dimension is not finite and positive */
    public RectangleProfile {
        Check.positive("xDim", xDim);
        Check.positive("yDim", yDim);
    }

    @Override
    public String type() {
        return TYPE;
    }

    /** @return the rectangle, built on each call: four line segments, counter-clockwise */
    @Override
    public Region region() {
        double hx = xDim / 2;
        double hy = yDim / 2;
        return new Region(new RoundedOutline().corner(-hx, -hy).corner(hx, -hy).corner(hx, hy).corner(-hx, hy)
                .contour());
    }

    /** @return {@code xDim, yDim} */
    @Override
    public Map<String, Double> parameters() {
        Map<String, Double> p = new LinkedHashMap<>();
        p.put("xDim", xDim);
        p.put("yDim", yDim);
        return Collections.unmodifiableMap(p);
    }
}
