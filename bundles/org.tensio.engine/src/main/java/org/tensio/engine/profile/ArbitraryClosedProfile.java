package org.tensio.engine.profile;

import java.util.Map;

import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Region;

/**
 * A solid profile bounded by one arbitrary closed contour (IFC4 {@code IfcArbitraryClosedProfileDef}, outer
 * curve only). Unlike the parameterised profiles, the coordinates are kept exactly as given: the region is
 * not re-centred on its bounding box.
 * <p>
 * Built by the project-file reader from contours, not by {@link ProfileTypes}. Orientation is normalised by
 * {@link Region} (outer boundary counter-clockwise); simplicity (no self-intersection) is checked by the
 * section validator, not here. Equality is that of the {@link Contour} (identity).
 *
 * @param outer outer boundary in the profile's frame, any orientation, not null
 * @since 0.1
 */
public record ArbitraryClosedProfile(Contour outer) implements ProfileDef {

    /** Type name in the project file. */
    public static final String TYPE = "ArbitraryClosedProfile";

    /** @throws IllegalArgumentException when {@code outer} is null */
    public ArbitraryClosedProfile {
        if (outer == null) {
            throw new IllegalArgumentException("outer: null, an arbitrary profile needs an outer contour");
        }
    }

    @Override
    public String type() {
        return TYPE;
    }

    /** @return the region bounded by {@code outer}, built on each call */
    @Override
    public Region region() {
        return new Region(outer);
    }

    /** @return an empty map: the geometry is the contour itself */
    @Override
    public Map<String, Double> parameters() {
        return Map.of();
    }
}
