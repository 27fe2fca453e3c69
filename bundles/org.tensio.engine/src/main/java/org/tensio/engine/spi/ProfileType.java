package org.tensio.engine.spi;

import java.util.List;
import java.util.Map;

import org.tensio.engine.profile.ProfileDef;

/**
 * A parameterised profile type contributed by a bundle or jar outside Tensio (e.g. a firm's own extrusion
 * family). Once registered (see {@link Extensions}), a section's {@code "profile"} names it by {@link #type()}
 * with its parameters as keys, exactly like the built-in IFC4 types; the reader rejects unknown and missing
 * parameters naming them, then {@link #create} validates the values.
 * <p>
 * Lengths in the file's length unit. The profile is placed as IFC4 places parameterised profiles (centre of
 * the bounding box at the origin, x along the width, y along the depth); the section's {@code "offset"} moves
 * it. Implementations must be stateless and thread-safe, with a public no-argument constructor.
 *
 * @since 0.1
 */
public interface ProfileType {

    /**
     * @return the type name as written in the project file: letters and digits, starting with an upper-case
     *         letter, ending in {@code "Profile"} (e.g. {@code "HexagonBarProfile"}); never a built-in name
     */
    String type();

    /** @return every parameter name (lowerCamelCase), required and optional, in the order the type lists them */
    List<String> parameterNames();

    /** @return the parameters that must be given; the others default to 0 when absent */
    List<String> requiredParameterNames();

    /**
     * @param parameters values by name, length unit; holds every required name, and only known names
     * @return the profile, whose {@link ProfileDef#type()} is {@link #type()}
     * @throws IllegalArgumentException naming the parameter and its value when the values do not make a profile
     */
    ProfileDef create(Map<String, Double> parameters);
}
