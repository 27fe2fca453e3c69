package org.tensio.engine.fatigue;

/**
 * The kind of stress raiser at a shaft station, with first-pass stress-concentration factors for a design
 * iteration before the geometry is known.
 * <p>
 * First-pass values: Shigley's Mechanical Engineering Design, 9th/10th ed., Table 7-1 ("First iteration
 * estimates for stress-concentration factors Kt and Kts", bending and torsion; from memory). That table gives no
 * axial value: the bending value is used for axial loading as a first pass (common practice, no source; for
 * shoulder fillets the axial Kt is of the same order). A transverse hole has no first-pass value: Kt and Kts must
 * be given (Peterson's charts for a round bar with a transverse hole).
 *
 * @since 0.1
 */
public enum NotchType {
    /** Shoulder fillet, sharp (r/d ≈ 0.02): Kt = 2.7, Kts = 2.2. */
    shoulderFillet(2.7, 2.2, "shoulder fillet, sharp (r/d = 0.02)"),
    /** Shoulder fillet, well rounded (r/d ≈ 0.1): Kt = 1.7, Kts = 1.5. */
    shoulderFilletWellRounded(1.7, 1.5, "shoulder fillet, well rounded (r/d = 0.1)"),
    /** End-mill keyseat (r/d ≈ 0.02): Kt = 2.14, Kts = 3.0. */
    keyseat(2.14, 3.0, "end-mill keyseat (r/d = 0.02)"),
    /** Retaining-ring groove: Kt = 5.0, Kts = 3.0. */
    retainingRingGroove(5.0, 3.0, "retaining-ring groove"),
    /** Transverse hole: no first-pass value; Kt and Kts must be given. */
    transverseHole(Double.NaN, Double.NaN, "transverse hole");

    private final double kt;
    private final double kts;
    private final String description;

    NotchType(double kt, double kts, String description) {
        this.kt = kt;
        this.kts = kts;
        this.description = description;
    }

    /** @return true when Shigley's Table 7-1 gives first-pass values for this type */
    public boolean hasFirstPass() {
        return !Double.isNaN(kt);
    }

    /** @return first-pass Kt in bending (NaN for {@link #transverseHole}) */
    public double firstPassKt() {
        return kt;
    }

    /** @return first-pass Kts in torsion (NaN for {@link #transverseHole}) */
    public double firstPassKts() {
        return kts;
    }

    /** @return a description for reports */
    public String description() {
        return description;
    }
}
