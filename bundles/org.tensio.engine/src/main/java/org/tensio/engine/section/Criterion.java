package org.tensio.engine.section;

/**
 * Static strength criteria. The names are the file format's and the JSON output's ({@code criterion}): stable.
 * Demands are computed from the beam stress state (σz, τzx, τzy) at a point; capacities from the material's
 * {@link MaterialLimits}.
 *
 * @since 0.1
 */
public enum Criterion {
    /** Demand √(σz² + 3τ²); capacity the equivalent allowable, or fy/γ. */
    vonMises,
    /** Demand σ1 − σ3; capacity the equivalent allowable, or fy/γ. */
    tresca,
    /** Demand max(|σ1|, |σ3|) (for brittle materials); capacity the normal allowable, or fu/γ, or fy/γ. */
    maxPrincipal,
    /** Demand τmax = (σ1 − σ3)/2; capacity the shear allowable, or fy/(2γ). */
    maxShear,
    /** Demand |σz|; capacity the normal allowable, or fy/γ. */
    normal,
    /** Demand √(τzx² + τzy²); capacity the shear allowable, or fy/(√3·γ). */
    shear
}
