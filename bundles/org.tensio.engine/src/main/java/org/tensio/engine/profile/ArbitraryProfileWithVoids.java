package org.tensio.engine.profile;

import java.util.List;
import java.util.Map;

import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Region;

/**
 * A profile bounded by an arbitrary closed outer contour with any number of voids (IFC4
 * {@code IfcArbitraryProfileDefWithVoids}). The coordinates are kept exactly as given (no re-centring).
 * <p>
 * Built by the project-file reader from contours, not by {@link ProfileTypes}. Orientation is normalised by
 * {@link Region} (outer counter-clockwise, voids clockwise); that the voids lie inside the outer boundary
 * and do not overlap is checked by the section validator, not here. IFC4 requires at least one void; an
 * empty list is accepted here and gives the same region as {@link ArbitraryClosedProfile}.
 *
 * @param outer outer boundary, any orientation, not null
 * @param voids inner boundaries, any orientation, not null and without null elements (copied, unmodifiable)
 * @since 0.1
 */
public record ArbitraryProfileWithVoids(Contour outer, List<Contour> voids) implements ProfileDef {

    /** Type name in the project file. */
    public static final String TYPE = "ArbitraryProfileWithVoids";

    /** @throws IllegalArgumentException when {@code outer}, {@code voids} or one of the voids is null */
    public ArbitraryProfileWithVoids {
        if (outer == null) {
            throw new IllegalArgumentException("outer: null, an arbitrary profile needs an outer contour");
        }
        if (voids == null) {
            throw new IllegalArgumentException("voids: null, pass an empty list for none");
        }
        for (int i = 0; i < voids.size(); i++) {
            if (voids.get(i) == null) {
                throw new IllegalArgumentException("voids: element " + i + " is null");
            }
        }
        voids = List.copyOf(voids);
    }

    @Override
    public String type() {
        return TYPE;
    }

    /** @return the region bounded by {@code outer} with {@code voids} as holes, built on each call */
    @Override
    public Region region() {
        return new Region(outer, voids);
    }

    /** @return an empty map: the geometry is the contours themselves */
    @Override
    public Map<String, Double> parameters() {
        return Map.of();
    }
}
