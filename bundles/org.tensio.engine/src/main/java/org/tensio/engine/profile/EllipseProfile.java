package org.tensio.engine.profile;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;

/**
 * A solid ellipse (IFC4 {@code IfcEllipseProfileDef}), centred at the origin, axes along x and y.
 *
 * @param semiAxis1 semi-axis along x, length unit, finite and &gt; 0
 * @param semiAxis2 semi-axis along y, length unit, finite and &gt; 0
 * @since 0.1
 */
public record EllipseProfile(double semiAxis1, double semiAxis2) implements ProfileDef {

    /** Type name in the project file. */
    public static final String TYPE = "EllipseProfile";

    /** @throws IllegalArgumentException naming the parameter when a semi-axis is not finite and positive */
    public EllipseProfile {
        Check.positive("semiAxis1", semiAxis1);
        Check.positive("semiAxis2", semiAxis2);
    }

    @Override
    public String type() {
        return TYPE;
    }

    /** @return the ellipse, built on each call: two exact half elliptic arcs, counter-clockwise */
    @Override
    public Region region() {
        return new Region(Contour.ellipse(new Point2(0, 0), semiAxis1, semiAxis2));
    }

    /** @return {@code semiAxis1, semiAxis2} */
    @Override
    public Map<String, Double> parameters() {
        Map<String, Double> p = new LinkedHashMap<>();
        p.put("semiAxis1", semiAxis1);
        p.put("semiAxis2", semiAxis2);
        return Collections.unmodifiableMap(p);
    }
}
