package org.tensio.engine.project;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * A linear combination of load cases: forces = Σ factor × case forces.
 *
 * @param id      combination id in the project file
 * @param factors factor by load-case id, in file order
 * @since 0.1
 */
public record Combination(String id, Map<String, Double> factors) {

    /** Copies the factor map, keeping its order; rejects non-finite factors. */
    public Combination {
        if (id == null || factors == null || factors.isEmpty()) {
            throw new IllegalArgumentException("combination '" + id + "' needs at least one case factor");
        }
        for (Map.Entry<String, Double> e : factors.entrySet()) {
            if (e.getValue() == null || !Double.isFinite(e.getValue())) {
                throw new IllegalArgumentException("combinations." + id + "." + e.getKey()
                        + ": factor must be a finite number, got " + e.getValue());
            }
        }
        factors = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(factors));
    }
}
