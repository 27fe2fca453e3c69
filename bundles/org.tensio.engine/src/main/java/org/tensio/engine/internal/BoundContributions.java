package org.tensio.engine.internal;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

import org.tensio.engine.spi.Extensions;

/**
 * The contributions of one kind (check criteria or profile types) bound to the engine's DS component, kept so
 * that binding or unbinding one costs time independent of how many are bound: each contribution is validated
 * alone when it is bound (malformed or built-in names, through {@link Extensions#of}), and a name already in
 * force is refused with the message {@code Extensions.of} gives for that pair. Of clashing contributions the
 * first bound is in force; when it is unbound, the next one bound under that name takes its place.
 * <p>
 * Each refusal is logged once, at {@code WARNING}, when the contribution is bound. Not thread-safe: the
 * component guards every call with its lock.
 *
 * @param <T> the contribution type
 */
final class BoundContributions<T> {

    /** A valid contribution and the order it was bound in. */
    private record Bound<T>(T value, long order) {
    }

    private final Function<T, String> name;
    private final Function<List<T>, Extensions> validation;
    private final System.Logger log;
    /** valid contributions by name, each list in bind order; the first is in force */
    private final Map<String, List<Bound<T>>> byName = new HashMap<>();
    /** the name each valid contribution had when bound (a contribution's name is not expected to change) */
    private final Map<T, String> names = new IdentityHashMap<>();
    private long bindings;

    /**
     * @param name       the contribution's name ({@code CheckCriterion::id} or {@code ProfileType::type})
     * @param validation builds extensions of the listed contributions alone, throwing
     *                   {@link IllegalArgumentException} as {@link Extensions#of} does
     * @param log        where refusals go
     */
    BoundContributions(Function<T, String> name, Function<List<T>, Extensions> validation, System.Logger log) {
        this.name = name;
        this.validation = validation;
        this.log = log;
    }

    /**
     * Binds {@code contribution}: malformed or built-in ones are refused; one whose name is in force waits behind
     * it. Either refusal is logged.
     *
     * @return true when the contribution is now in force
     */
    boolean add(T contribution) {
        String refused = refusal(List.of(contribution));
        if (refused != null) {
            log.log(System.Logger.Level.WARNING, refused);
            return false;
        }
        String n = name.apply(contribution);
        List<Bound<T>> same = byName.computeIfAbsent(n, k -> new ArrayList<>(1));
        if (!same.isEmpty()) {
            String clash = refusal(List.of(same.get(0).value(), contribution));
            log.log(System.Logger.Level.WARNING, clash != null ? clash : "contribution '" + n + "' is contributed twice");
        }
        same.add(new Bound<>(contribution, bindings++));
        names.put(contribution, n);
        return same.size() == 1;
    }

    /** Unbinds {@code contribution} (nothing happens when it was refused or is not bound). */
    void remove(T contribution) {
        String n = names.remove(contribution);
        if (n == null) {
            return;
        }
        List<Bound<T>> same = byName.get(n);
        same.removeIf(b -> b.value() == contribution);
        if (same.isEmpty()) {
            byName.remove(n);
        }
    }

    /** @return the contributions in force, in the order they were bound */
    List<T> inForce() {
        List<Bound<T>> first = new ArrayList<>(byName.size());
        for (List<Bound<T>> same : byName.values()) {
            first.add(same.get(0));
        }
        first.sort((a, b) -> Long.compare(a.order(), b.order()));
        List<T> values = new ArrayList<>(first.size());
        for (Bound<T> b : first) {
            values.add(b.value());
        }
        return values;
    }

    private String refusal(List<T> contributions) {
        try {
            validation.apply(contributions);
            return null;
        } catch (IllegalArgumentException e) {
            return e.getMessage();
        }
    }
}
