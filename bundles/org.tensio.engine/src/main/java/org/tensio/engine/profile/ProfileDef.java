package org.tensio.engine.profile;

import java.util.Map;

import org.tensio.engine.geometry.Region;

/**
 * A profile definition in the vocabulary of ISO 16739 (IFC4) parameterised profiles. Each implementation is
 * an immutable record whose constructor validates its parameters and throws
 * {@link IllegalArgumentException} naming the parameter (the IFC4 attribute name in lowerCamelCase) and
 * its value.
 * <p>
 * Placement, as IFC4 places parameterised profiles: the centre of the bounding box at the origin, x along
 * the width, y along the depth. Arbitrary profiles keep the coordinates they were given.
 *
 * @since 0.1
 */
public interface ProfileDef {

    /** @return the type name as written in the project file, e.g. {@code "IShapeProfile"} */
    String type();

    /** @return the exact region (arcs kept as arcs) in the profile's own frame */
    Region region();

    /** @return the defining parameters by IFC4 attribute name (lowerCamelCase), length unit; empty for arbitrary profiles */
    Map<String, Double> parameters();
}
