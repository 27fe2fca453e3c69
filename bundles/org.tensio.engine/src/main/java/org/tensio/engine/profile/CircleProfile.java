package org.tensio.engine.profile;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;

/**
 * A solid circle (IFC4 {@code IfcCircleProfileDef}), centred at the origin.
 *
 * @param radius radius, length unit, finite and &gt; 0
 * @since 0.1
 */
public record CircleProfile(double radius) implements ProfileDef {

    /** Type name in the project file. */
    public static final String TYPE = "CircleProfile";

    /** @throws IllegalArgumentException when {@code radius} is not finite and positive */
    public CircleProfile {
        Check.positive("radius", radius);
    }

    @Override
    public String type() {
        return TYPE;
    }

    /** @return the disc, built on each call: one contour of two half arcs, counter-clockwise */
    @Override
    public Region region() {
        return new Region(Contour.circle(new Point2(0, 0), radius));
    }

    /** @return {@code radius} */
    @Override
    public Map<String, Double> parameters() {
        Map<String, Double> p = new LinkedHashMap<>();
        p.put("radius", radius);
        return Collections.unmodifiableMap(p);
    }
}
