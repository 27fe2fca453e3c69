package org.tensio.engine.section;

import java.util.List;

/**
 * What a material is checked against. Stresses in the project's stress unit.
 * <p>
 * Capacity of each {@link Criterion}: a directly given allowable wins; otherwise it is derived from the yield
 * strength (or for {@link Criterion#maxPrincipal} the ultimate strength) divided by the partial factor γ, as
 * the criterion's Javadoc says. A criterion with neither is rejected when the limits are built, naming the
 * material and the missing key.
 *
 * @param material            material id
 * @param criteria            built-in criteria to check
 * @param contributedCriteria ids of contributed criteria to check as well ({@code org.tensio.engine.spi.CheckCriterion},
 *                            resolved by the check against the engine's extensions); together with
 *                            {@code criteria} at least one
 * @param partialFactor       γ ≥ 1 dividing strengths (1.0 when not given)
 * @param yieldStrength       fy, or null
 * @param ultimateStrength    fu, or null
 * @param allowableNormal     given allowable normal stress, or null
 * @param allowableShear      given allowable shear stress, or null
 * @param allowableEquivalent given allowable equivalent (von Mises / Tresca) stress, or null
 * @since 0.1
 */
public record MaterialLimits(String material, List<Criterion> criteria, List<String> contributedCriteria,
        double partialFactor, Double yieldStrength, Double ultimateStrength, Double allowableNormal,
        Double allowableShear, Double allowableEquivalent) {

    /** Limits with built-in criteria only. */
    public MaterialLimits(String material, List<Criterion> criteria, double partialFactor, Double yieldStrength,
            Double ultimateStrength, Double allowableNormal, Double allowableShear, Double allowableEquivalent) {
        this(material, criteria, List.of(), partialFactor, yieldStrength, ultimateStrength, allowableNormal,
                allowableShear, allowableEquivalent);
    }

    /** Validates; every built-in criterion must have a capacity. */
    public MaterialLimits {
        contributedCriteria = contributedCriteria == null ? List.of() : List.copyOf(contributedCriteria);
        if (material == null || criteria == null || criteria.isEmpty() && contributedCriteria.isEmpty()) {
            throw new IllegalArgumentException("materials." + material + ".criteria: at least one criterion is needed");
        }
        criteria = List.copyOf(criteria);
        if (!(partialFactor >= 1) || !Double.isFinite(partialFactor)) {
            throw new IllegalArgumentException("materials." + material + ".partialFactor must be ≥ 1, got " + partialFactor);
        }
        for (Double v : new Double[] {yieldStrength, ultimateStrength, allowableNormal, allowableShear, allowableEquivalent}) {
            if (v != null && (!(v > 0) || !Double.isFinite(v))) {
                throw new IllegalArgumentException("materials." + material + ": strengths and allowables must be positive, got " + v);
            }
        }
        for (Criterion c : criteria) {
            if (capacityOrNull(c, partialFactor, yieldStrength, ultimateStrength, allowableNormal, allowableShear,
                    allowableEquivalent) == null) {
                throw new IllegalArgumentException("materials." + material + ".criteria: '" + c
                        + "' needs fy or an allowable (allowable." + (c == Criterion.shear || c == Criterion.maxShear ? "shear"
                                : c == Criterion.normal || c == Criterion.maxPrincipal ? "normal" : "equivalent") + ")");
            }
        }
    }

    /** @return the capacity (allowable stress) for {@code c}, stress unit */
    public double capacity(Criterion c) {
        return capacityOrNull(c, partialFactor, yieldStrength, ultimateStrength, allowableNormal, allowableShear,
                allowableEquivalent);
    }

    private static Double capacityOrNull(Criterion c, double g, Double fy, Double fu, Double an, Double as, Double ae) {
        return switch (c) {
            case vonMises, tresca -> ae != null ? ae : fy != null ? fy / g : null;
            case maxPrincipal -> an != null ? an : fu != null ? fu / g : fy != null ? fy / g : null;
            case maxShear -> as != null ? as : fy != null ? fy / (2 * g) : null;
            case normal -> an != null ? an : fy != null ? fy / g : null;
            case shear -> as != null ? as : fy != null ? fy / (Math.sqrt(3) * g) : null;
        };
    }

    /** @return demand of criterion {@code c} for the stress state (σz, τzx, τzy), stress unit, ≥ 0 */
    public static double demand(Criterion c, double sigmaZ, double tauZX, double tauZY) {
        double t2 = tauZX * tauZX + tauZY * tauZY;
        double r = Math.sqrt(0.25 * sigmaZ * sigmaZ + t2);
        return switch (c) {
            case vonMises -> Math.sqrt(sigmaZ * sigmaZ + 3 * t2);
            case tresca -> 2 * r;
            case maxPrincipal -> Math.abs(sigmaZ) / 2 + r;
            case maxShear -> r;
            case normal -> Math.abs(sigmaZ);
            case shear -> Math.sqrt(t2);
        };
    }
}
