package org.tensio.engine.profile;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;

/**
 * A circular hollow section, i.e. a tube (IFC4 {@code IfcCircleHollowProfileDef}), centred at the origin.
 * As in IFC4, {@code radius} is the <em>outer</em> radius; the bore has radius
 * {@code radius - wallThickness}.
 *
 * @param radius        outer radius, length unit, finite and &gt; 0
 * @param wallThickness wall thickness, length unit, 0 &lt; wallThickness &lt; radius
 * @since 0.1
 */
public record CircleHollowProfile(double radius, double wallThickness) implements ProfileDef {

    /** Type name in the project file. */
    public static final String TYPE = "CircleHollowProfile";

    /** @throws IllegalArgumentException naming the parameter when a dimension is invalid */
    public CircleHollowProfile {
        Check.positive("radius", radius);
        Check.positive("wallThickness", wallThickness);
        Check.lessThan("wallThickness", wallThickness, radius, "the radius");
    }

    @Override
    public String type() {
        return TYPE;
    }

    /** @return the annulus, built on each call: outer circle and one circular hole */
    @Override
    public Region region() {
        Point2 o = new Point2(0, 0);
        return new Region(Contour.circle(o, radius), List.of(Contour.circle(o, radius - wallThickness)));
    }

    /** @return {@code radius, wallThickness} */
    @Override
    public Map<String, Double> parameters() {
        Map<String, Double> p = new LinkedHashMap<>();
        p.put("radius", radius);
        p.put("wallThickness", wallThickness);
        return Collections.unmodifiableMap(p);
    }
}
