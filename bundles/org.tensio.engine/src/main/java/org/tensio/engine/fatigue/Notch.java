package org.tensio.engine.fatigue;

/**
 * A stress raiser at a station as the user describes it. Every factor may be given; what is not given is
 * derived: Kt from the first-pass values of its {@link NotchType} (bending value for axial loading), q from the
 * notch root radius by the material's {@link NotchSensitivity} form (q = 1, i.e. Kf = Kt, when no radius is
 * given: conservative), Kf = 1 + q (Kt − 1). See {@link NotchFactors#of}.
 *
 * @param type     the kind of notch
 * @param kt       Kt in bending (theoretical, on the net section), or null for the first-pass value
 * @param kts      Kts in torsion, or null
 * @param ktAxial  Kt in axial loading, or null (then Kt in bending)
 * @param radius   notch root radius, length unit, or null
 * @param q        notch sensitivity in bending and axial loading, 0..1, or null
 * @param qs       notch sensitivity in torsion, 0..1, or null
 * @param kf       fatigue factor Kf in bending, or null to derive it
 * @param kfs      fatigue factor Kfs in torsion, or null
 * @param kfAxial  fatigue factor in axial loading, or null
 * @param location where it acts
 * @since 0.1
 */
public record Notch(NotchType type, Double kt, Double kts, Double ktAxial, Double radius, Double q, Double qs, Double kf,
        Double kfs, Double kfAxial, NotchLocation location) {

    /** Validates: factors ≥ 1, sensitivities in [0, 1], radius &gt; 0; a transverse hole needs Kt and Kts. */
    public Notch {
        if (type == null || location == null) {
            throw new IllegalArgumentException("notch: type and location are required, got " + type + ", " + location);
        }
        atLeastOne(kt, "kt");
        atLeastOne(kts, "kts");
        atLeastOne(ktAxial, "ktAxial");
        atLeastOne(kf, "kf");
        atLeastOne(kfs, "kfs");
        atLeastOne(kfAxial, "kfAxial");
        if (radius != null && (!(radius > 0) || !Double.isFinite(radius))) {
            throw new IllegalArgumentException("radius: the notch root radius must be positive, got " + radius);
        }
        for (Double v : new Double[] {q, qs}) {
            if (v != null && !(v >= 0 && v <= 1)) {
                throw new IllegalArgumentException((v == q ? "q" : "qs") + ": a notch sensitivity lies in [0, 1], got " + v);
            }
        }
        if (!type.hasFirstPass() && ((kt == null && kf == null) || (kts == null && kfs == null))) {
            throw new IllegalArgumentException("kt: a " + type.description() + " has no first-pass value; give kt and"
                    + " kts (or kf and kfs)");
        }
    }

    private static void atLeastOne(Double v, String name) {
        if (v != null && (!(v >= 1) || !Double.isFinite(v))) {
            throw new IllegalArgumentException(name + ": a stress-concentration factor is at least 1, got " + v);
        }
    }
}
