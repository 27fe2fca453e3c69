package com.fenwickroe.tensio.housekit;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.profile.ProfileDef;

/**
 * A regular hexagon bar with an optional concentric round bore, from the fictitious firm's own bar stock
 * family: flats top and bottom (parallel to x), centre at the origin. Immutable.
 *
 * @param acrossFlats  distance between opposite flats s (the depth along y), length unit, &gt; 0
 * @param boreDiameter diameter of the bore d, length unit, 0 (solid) ≤ d ≤ 0.8·s
 */
public record HexagonBarProfile(double acrossFlats, double boreDiameter) implements ProfileDef {

    /** The type name in project files. */
    public static final String TYPE = "HexagonBarProfile";

    /** Validates, naming the parameter and the value. */
    public HexagonBarProfile {
        if (!(acrossFlats > 0) || !Double.isFinite(acrossFlats)) {
            throw new IllegalArgumentException("acrossFlats: must be positive and finite, got " + acrossFlats);
        }
        if (!(boreDiameter >= 0) || !(boreDiameter <= 0.8 * acrossFlats)) {
            throw new IllegalArgumentException("boreDiameter: must be between 0 and 0.8·acrossFlats = "
                    + 0.8 * acrossFlats + ", got " + boreDiameter);
        }
    }

    @Override
    public String type() {
        return TYPE;
    }

    @Override
    public Region region() {
        double r = acrossFlats / Math.sqrt(3); // circumradius = side length
        List<Point2> corners = new ArrayList<>(6);
        for (int k = 0; k < 6; k++) {
            double a = Math.toRadians(60 * k);
            corners.add(new Point2(r * Math.cos(a), r * Math.sin(a)));
        }
        Contour outer = Contour.polygon(corners);
        return boreDiameter == 0 ? new Region(outer)
                : new Region(outer, List.of(Contour.circle(new Point2(0, 0), boreDiameter / 2)));
    }

    @Override
    public Map<String, Double> parameters() {
        Map<String, Double> p = new LinkedHashMap<>();
        p.put("acrossFlats", acrossFlats);
        p.put("boreDiameter", boreDiameter);
        return p;
    }
}
