package com.fenwickroe.tensio.housekit;

import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.spi.CheckCriterion;

/**
 * House rule FR-7 of the fictitious firm Fenwick &amp; Roe: a linear interaction of normal and shear stress,
 * deliberately more conservative than von Mises for shear-heavy points. Demand |σz| + 2·τ with
 * τ = √(τzx² + τzy²); capacity 0.9·fy/γ (the house's extra 10 % margin), or the material's
 * {@code allowable.equivalent} when given. An invented rule to show the extension mechanism, not a code check.
 */
public final class HouseCombinedCriterion implements CheckCriterion {

    /** The id a material lists in {@code "criteria"}. */
    public static final String ID = "houseCombined";

    /** The house margin on fy/γ. */
    public static final double MARGIN = 0.9;

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String description() {
        return "FR-7 house rule: |σz| + 2τ against 0.9·fy/γ (or allowable.equivalent)";
    }

    @Override
    public double demand(double sigmaZ, double tauZX, double tauZY) {
        return Math.abs(sigmaZ) + 2 * Math.hypot(tauZX, tauZY);
    }

    @Override
    public double capacity(MaterialLimits limits) {
        if (limits.allowableEquivalent() != null) {
            return limits.allowableEquivalent();
        }
        if (limits.yieldStrength() == null) {
            throw new IllegalArgumentException("needs fy or allowable.equivalent");
        }
        return MARGIN * limits.yieldStrength() / limits.partialFactor();
    }
}
