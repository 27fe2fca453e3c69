package org.tensio.ui.editor.overlay;

/** The quantity a contour shows. */
public enum Quantity {
    /** Normal stress σz, signed (tension positive), force/length². */
    SIGMA_Z(true, false),
    /** Resultant shear stress τ = √(τzx² + τzy²), force/length². */
    TAU(false, false),
    /** von Mises equivalent √(σz² + 3τ²), force/length². */
    VON_MISES(false, false),
    /**
     * Utilisation = demand / capacity, the largest over the material's criteria, built-in and contributed
     * (dimensionless).
     */
    UTILISATION(false, true),
    /**
     * Fatigue utilisation = 1/n, the largest over the fatigue criteria of the station's fatigue check for one of
     * its load histories, with the notch factors where the notches act (dimensionless; the "case" of the contour
     * is the load-history id).
     */
    FATIGUE_UTILISATION(false, true);

    private final boolean signed;
    private final boolean utilisation;

    Quantity(boolean signed, boolean utilisation) {
        this.signed = signed;
        this.utilisation = utilisation;
    }

    /** @return true when the quantity takes both signs (diverging colour scale about zero) */
    public boolean signed() {
        return signed;
    }

    /**
     * @return true for a utilisation (dimensionless demand / capacity, ≥ 0): the scale ends at 1 and values above
     *         1 get the over-limit band
     */
    public boolean isUtilisation() {
        return utilisation;
    }

    /** @return true when the contour's case is a load history of the station's fatigue check */
    public boolean fatigue() {
        return this == FATIGUE_UTILISATION;
    }
}
