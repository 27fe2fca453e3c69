package org.tensio.engine.fatigue;

/**
 * A fatigue or first-cycle criterion applied to the distortion-energy (von Mises) alternating and mean stresses
 * σa' and σm' of a point, and its factor of safety n. Each gives a demand and a capacity with
 * utilisation = demand / capacity = 1 / n:
 * <ul>
 * <li>the four fatigue lines, capacity Se (the corrected endurance limit or fatigue strength) and demand the
 * equivalent completely reversed stress Se / n:
 * {@link #fatigueGoodman} 1/n = σa'/Se + σm'/Sut, {@link #fatigueSoderberg} 1/n = σa'/Se + σm'/Sy,
 * {@link #fatigueAsmeElliptic} (1/n)² = (σa'/Se)² + (σm'/Sy)², {@link #fatigueGerber}
 * n σa'/Se + (n σm'/Sut)² = 1, i.e. 1/n = (σa' + √(σa'² + (2 σm' Se/Sut)²)) / (2 Se) (the stable form of
 * n = ½ (Sut/σm')² (σa'/Se) [−1 + √(1 + (2 σm' Se/(Sut σa'))²)]);</li>
 * <li>{@link #firstCycleYield}: n = Sy / σmax', σmax' the largest von Mises stress over the cycle (mean and
 * alternating components added with their signs and phases, each amplified by its Kf), capacity Sy;</li>
 * <li>{@link #langer}: the conservative first-cycle yield check n = Sy / (σa' + σm'), capacity Sy.</li>
 * </ul>
 * For the fatigue lines σa' includes the 1/0.85 of the axial alternating stress (combined loading); the two yield
 * checks are given the actual stresses.
 * <p>
 * Source: Shigley's Mechanical Engineering Design, 9th/10th ed., sec. 6-12 (Tables 6-6 to 6-8, fatigue
 * criteria) and sec. 7-4 (shaft design for stress, Eqs. 7-7 to 7-16; equation numbers from memory).
 * Stresses in any one unit; σm' is the von Mises mean stress, ≥ 0 (Shigley's shaft method: compressive means are
 * not credited).
 *
 * @since 0.1
 */
public enum FatigueCriterion {
    /** Modified Goodman line. */
    fatigueGoodman,
    /** Gerber parabola. */
    fatigueGerber,
    /** ASME elliptic (with Sy). */
    fatigueAsmeElliptic,
    /** Soderberg line (with Sy). */
    fatigueSoderberg,
    /** First-cycle yield: σmax' against Sy. */
    firstCycleYield,
    /** Langer line: σa' + σm' against Sy. */
    langer;

    /** @return true for the four lines against Se, false for the two first-cycle yield checks */
    public boolean isFatigueLine() {
        return this == fatigueGoodman || this == fatigueGerber || this == fatigueAsmeElliptic
                || this == fatigueSoderberg;
    }

    /** @return true when the criterion needs the yield strength Sy */
    public boolean needsYield() {
        return this != fatigueGoodman && this != fatigueGerber;
    }

    /**
     * @param sa   σa', ≥ 0
     * @param sm   σm', ≥ 0
     * @param smax σmax', ≥ 0 (used by {@link #firstCycleYield} only)
     * @param se   Se, &gt; 0
     * @param sut  Sut, &gt; 0
     * @param sy   Sy, &gt; 0 (NaN when not known; then the criteria needing it give NaN)
     * @return the demand (stress unit): Se/n for the fatigue lines, σmax' or σa' + σm' for the yield checks
     */
    public double demand(double sa, double sm, double smax, double se, double sut, double sy) {
        return switch (this) {
            case fatigueGoodman -> sa + sm * (se / sut);
            case fatigueSoderberg -> sa + sm * (se / sy);
            case fatigueAsmeElliptic -> Math.hypot(sa, sm * (se / sy));
            case fatigueGerber -> 0.5 * (sa + Math.hypot(sa, 2 * sm * se / sut));
            case firstCycleYield -> smax;
            case langer -> sa + sm;
        };
    }

    /** @return the capacity: Se for the fatigue lines, Sy for the yield checks */
    public double capacity(double se, double sy) {
        return isFatigueLine() ? se : sy;
    }

    /** @return the factor of safety n = capacity / demand (+∞ when the demand is 0) */
    public double factorOfSafety(double sa, double sm, double smax, double se, double sut, double sy) {
        double d = demand(sa, sm, smax, se, sut, sy);
        return d == 0 ? Double.POSITIVE_INFINITY : capacity(se, sy) / d;
    }

    /** @return a short label for reports */
    public String label() {
        return switch (this) {
            case fatigueGoodman -> "modified Goodman";
            case fatigueGerber -> "Gerber";
            case fatigueAsmeElliptic -> "ASME elliptic";
            case fatigueSoderberg -> "Soderberg";
            case firstCycleYield -> "first-cycle yield";
            case langer -> "Langer (yield)";
        };
    }
}
