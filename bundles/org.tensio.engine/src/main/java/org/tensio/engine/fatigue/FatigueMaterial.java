package org.tensio.engine.fatigue;

/**
 * The fatigue data of one material. Stresses in the project's stress unit.
 * <p>
 * The fatigue strength before corrections is one of: a given endurance limit Se' ({@link Basis#given}); the
 * estimate for steels from Sut ({@link Basis#steelEstimate}, {@link MarinFactors#steelEnduranceEstimate}); or,
 * for materials without an endurance limit (aluminium alloys), a fatigue strength Sf' at a stated number of
 * cycles ({@link Basis#strengthAtCycles}): the results then hold for that life only.
 *
 * @param material    material id
 * @param sut         ultimate tensile strength, &gt; 0
 * @param sy          yield strength, or null (then the criteria that need it cannot be chosen)
 * @param basis       how Se' (or Sf') is obtained
 * @param strength    Se' or Sf' when given, else null
 * @param cycles      the life of Sf' for {@link Basis#strengthAtCycles}, else null
 * @param conditions  default service conditions of this material (a station may override them)
 * @param sensitivity the notch-sensitivity form
 * @since 0.1
 */
public record FatigueMaterial(String material, double sut, Double sy, Basis basis, Double strength, Double cycles,
        FatigueConditions conditions, NotchSensitivity sensitivity) {

    /** How the uncorrected fatigue strength is obtained. */
    public enum Basis {
        /** Se' given. */
        given,
        /** Se' estimated from Sut by the rule for steels. */
        steelEstimate,
        /** Sf' given at a number of cycles. */
        strengthAtCycles
    }

    /** Validates, naming the field and the value. */
    public FatigueMaterial {
        if (material == null || basis == null || conditions == null || sensitivity == null) {
            throw new IllegalArgumentException("fatigue material: id, basis, conditions and sensitivity are required");
        }
        if (!(sut > 0) || !Double.isFinite(sut)) {
            throw new IllegalArgumentException("fu: must be positive, got " + sut);
        }
        if (sy != null && (!(sy > 0) || !Double.isFinite(sy) || sy > sut)) {
            throw new IllegalArgumentException("fy: must be positive and not above fu " + sut + ", got " + sy);
        }
        if ((basis == Basis.steelEstimate) != (strength == null)) {
            throw new IllegalArgumentException("enduranceLimit: a strength is given unless it is estimated, got "
                    + strength + " for " + basis);
        }
        if (strength != null && (!(strength > 0) || !(strength < sut))) {
            throw new IllegalArgumentException("enduranceLimit: must be positive and below fu " + sut + ", got "
                    + strength);
        }
        if ((basis == Basis.strengthAtCycles) != (cycles != null)) {
            throw new IllegalArgumentException("cycles: given with a fatigue strength, and only then, got " + cycles);
        }
        if (cycles != null && !(cycles >= 1 && Double.isFinite(cycles))) {
            throw new IllegalArgumentException("cycles: must be at least 1, got " + cycles);
        }
    }
}
