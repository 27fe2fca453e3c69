package org.tensio.ui.editor.overlay;

/** The quantity a contour shows. */
public enum Quantity {
    /** Normal stress σz, signed (tension positive), force/length². */
    SIGMA_Z(true),
    /** Resultant shear stress τ = √(τzx² + τzy²), force/length². */
    TAU(false),
    /** von Mises equivalent √(σz² + 3τ²), force/length². */
    VON_MISES(false),
    /** Utilisation = demand / capacity, the largest over the material's criteria (dimensionless). */
    UTILISATION(false);

    private final boolean signed;

    Quantity(boolean signed) {
        this.signed = signed;
    }

    /** @return true when the quantity takes both signs (diverging colour scale about zero) */
    public boolean signed() {
        return signed;
    }
}
