package org.tensio.engine.spi;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.ServiceConfigurationError;
import java.util.ServiceLoader;
import java.util.regex.Pattern;

import org.tensio.engine.profile.ProfileTypes;
import org.tensio.engine.section.Criterion;

/**
 * The contributed check criteria and profile types the engine knows besides its built-in ones. Immutable;
 * checked on construction: names well formed, no clash with a built-in name, no name contributed twice.
 * <p>
 * How contributions are found, one mechanism per environment:
 * <ul>
 * <li>outside OSGi (the {@code ./tensio} command line, build servers): {@link #discover(ClassLoader)} reads the
 * {@link ServiceLoader} registrations ({@code META-INF/services/org.tensio.engine.spi.CheckCriterion} and
 * {@code ...ProfileType}) of the jars on the class path or handed to the command line with
 * {@code --extensions};</li>
 * <li>inside OSGi (the workbench and its headless application): the bundle {@code org.tensio.extensions} reads
 * the extension points {@code org.tensio.extensions.criteria} and {@code org.tensio.extensions.profileTypes} and
 * registers each contribution as an OSGi service, which the engine's DS component collects.</li>
 * </ul>
 *
 * @since 0.1
 */
public final class Extensions {

    private static final Pattern CRITERION_ID = Pattern.compile("[a-z][A-Za-z0-9]{0,63}");
    private static final Pattern PROFILE_TYPE = Pattern.compile("[A-Z][A-Za-z0-9]{0,56}Profile");
    private static final Extensions NONE = new Extensions(List.of(), List.of());

    private final Map<String, CheckCriterion> criteria;
    private final Map<String, ProfileType> profileTypes;

    private Extensions(List<? extends CheckCriterion> criteria, List<? extends ProfileType> profileTypes) {
        Map<String, CheckCriterion> c = new LinkedHashMap<>();
        for (CheckCriterion k : criteria) {
            String id = k.id();
            if (id == null || !CRITERION_ID.matcher(id).matches()) {
                throw new IllegalArgumentException("criterion " + k.getClass().getName() + ": id '" + id
                        + "' must be letters and digits starting with a lower-case letter (at most 64)");
            }
            if (builtInCriterion(id)) {
                throw new IllegalArgumentException("criterion " + k.getClass().getName() + ": id '" + id
                        + "' is a built-in criterion");
            }
            CheckCriterion old = c.putIfAbsent(id, k);
            if (old != null) {
                throw new IllegalArgumentException("criterion '" + id + "' is contributed twice, by "
                        + old.getClass().getName() + " and " + k.getClass().getName());
            }
        }
        Map<String, ProfileType> p = new LinkedHashMap<>();
        for (ProfileType t : profileTypes) {
            String type = t.type();
            if (type == null || !PROFILE_TYPE.matcher(type).matches()) {
                throw new IllegalArgumentException("profile type " + t.getClass().getName() + ": name '" + type
                        + "' must be letters and digits starting with an upper-case letter and ending in 'Profile'");
            }
            if (ProfileTypes.names().contains(type) || ProfileTypes.ARBITRARY.contains(type)) {
                throw new IllegalArgumentException("profile type " + t.getClass().getName() + ": '" + type
                        + "' is a built-in profile type");
            }
            List<String> names = t.parameterNames();
            if (names == null || names.isEmpty() || !names.containsAll(t.requiredParameterNames())) {
                throw new IllegalArgumentException("profile type '" + type + "': parameterNames " + names
                        + " must list every required parameter " + t.requiredParameterNames());
            }
            ProfileType old = p.putIfAbsent(type, t);
            if (old != null) {
                throw new IllegalArgumentException("profile type '" + type + "' is contributed twice, by "
                        + old.getClass().getName() + " and " + t.getClass().getName());
            }
        }
        this.criteria = Collections.unmodifiableMap(c);
        this.profileTypes = Collections.unmodifiableMap(p);
    }

    /** @return no contributions: the built-in criteria and profile types only */
    public static Extensions none() {
        return NONE;
    }

    /**
     * @return these contributions
     * @throws IllegalArgumentException naming the contribution when a name is malformed, built in or repeated
     */
    public static Extensions of(List<? extends CheckCriterion> criteria, List<? extends ProfileType> profileTypes) {
        if (criteria.isEmpty() && profileTypes.isEmpty()) {
            return NONE;
        }
        return new Extensions(criteria, profileTypes);
    }

    /**
     * The contributions registered with {@link ServiceLoader} in the jars {@code loader} sees (outside OSGi).
     *
     * @throws IllegalArgumentException naming the provider when one cannot be loaded or breaks the rules above
     */
    public static Extensions discover(ClassLoader loader) {
        try {
            List<CheckCriterion> c = new ArrayList<>();
            ServiceLoader.load(CheckCriterion.class, loader).forEach(c::add);
            List<ProfileType> p = new ArrayList<>();
            ServiceLoader.load(ProfileType.class, loader).forEach(p::add);
            return of(c, p);
        } catch (ServiceConfigurationError e) {
            throw new IllegalArgumentException("extensions: " + e.getMessage(), e);
        }
    }

    /** @return the contributed criteria by id, in the order found */
    public Map<String, CheckCriterion> criteria() {
        return criteria;
    }

    /** @return the contributed profile types by type name, in the order found */
    public Map<String, ProfileType> profileTypes() {
        return profileTypes;
    }

    /** @return the contributed criterion with this id, if any */
    public Optional<CheckCriterion> criterion(String id) {
        return Optional.ofNullable(criteria.get(id));
    }

    /** @return the contributed profile type with this name, if any */
    public Optional<ProfileType> profileType(String type) {
        return Optional.ofNullable(profileTypes.get(type));
    }

    /** @return true when nothing is contributed */
    public boolean isEmpty() {
        return criteria.isEmpty() && profileTypes.isEmpty();
    }

    private static boolean builtInCriterion(String id) {
        for (Criterion c : Criterion.values()) {
            if (c.name().equals(id)) {
                return true;
            }
        }
        return false;
    }

    @Override
    public String toString() {
        return "Extensions[criteria=" + criteria.keySet() + ", profileTypes=" + profileTypes.keySet() + "]";
    }
}
