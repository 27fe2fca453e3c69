package org.tensio.engine.fatigue;

/**
 * The factors of one notch as used: Kt, q and Kf in bending, axial loading and torsion, with their sources.
 *
 * @param notch     the notch as described
 * @param kt        Kt, bending
 * @param ktAxial   Kt, axial
 * @param kts       Kts, torsion
 * @param q         notch sensitivity, bending and axial (NaN when Kf was given)
 * @param qs        notch sensitivity, torsion (NaN when Kfs was given)
 * @param kf        Kf, bending
 * @param kfAxial   Kf, axial
 * @param kfs       Kfs, torsion
 * @param ktSource  where Kt and Kts come from
 * @param qSource   where q and qs come from
 * @since 0.1
 */
public record NotchFactors(Notch notch, double kt, double ktAxial, double kts, double q, double qs, double kf,
        double kfAxial, double kfs, String ktSource, String qSource) {

    /** No notch: every factor 1. */
    public static final NotchFactors NONE = new NotchFactors(null, 1, 1, 1, Double.NaN, Double.NaN, 1, 1, 1, "no notch",
            "no notch");

    /**
     * Derives the factors of {@code n} (see {@link Notch}).
     *
     * @param n           the notch
     * @param sutMpa      the material's ultimate strength, MPa
     * @param mmPerLength millimetres per length unit of the project (for the radius)
     * @param method      the notch-sensitivity form
     * @throws IllegalArgumentException naming the value when the notch-sensitivity fit does not cover Sut
     */
    public static NotchFactors of(Notch n, double sutMpa, double mmPerLength, NotchSensitivity method) {
        boolean firstPassKt = n.kt() == null, firstPassKts = n.kts() == null;
        double kt = firstPassKt ? n.type().firstPassKt() : n.kt();
        double kts = firstPassKts ? n.type().firstPassKts() : n.kts();
        double kta = n.ktAxial() != null ? n.ktAxial() : kt;
        String ktSource = (firstPassKt || firstPassKts ? "first-pass " + (firstPassKt ? "Kt" : "")
                + (firstPassKt && firstPassKts ? " and " : "") + (firstPassKts ? "Kts" : "") + " for the type "
                + n.type().description() + " (Shigley's Mechanical Engineering Design, 9th/10th ed., Table 7-1, from"
                + " memory)" : "Kt and Kts given")
                + (n.ktAxial() == null ? "; axial Kt = bending Kt (common practice, no source)" : "; axial Kt given");
        double q, qs;
        String qSource;
        if (n.radius() != null) {
            double rMm = n.radius() * mmPerLength;
            q = n.q() != null ? n.q() : needsQ(n.kf(), n.kfAxial()) ? method.q(sutMpa, rMm, false) : Double.NaN;
            qs = n.qs() != null ? n.qs() : n.kfs() == null ? method.q(sutMpa, rMm, true) : Double.NaN;
            qSource = (n.q() != null || n.qs() != null ? "q given where stated; otherwise " : "") + method.source()
                    + ", r = " + MarinFactors.n(rMm) + " mm";
        } else {
            q = n.q() != null ? n.q() : 1;
            qs = n.qs() != null ? n.qs() : 1;
            qSource = n.q() != null && n.qs() != null ? "q and qs given"
                    : "no notch radius given: q = 1 where not stated (Kf = Kt, conservative)";
        }
        double kf = n.kf() != null ? n.kf() : 1 + q * (kt - 1);
        double kfa = n.kfAxial() != null ? n.kfAxial() : 1 + q * (kta - 1);
        double kfs = n.kfs() != null ? n.kfs() : 1 + qs * (kts - 1);
        if (n.kf() != null || n.kfs() != null || n.kfAxial() != null) {
            qSource += "; Kf given where stated";
        }
        return new NotchFactors(n, kt, kta, kts, q, qs, kf, kfa, kfs, ktSource, qSource);
    }

    private static boolean needsQ(Double kf, Double kfAxial) {
        return kf == null || kfAxial == null;
    }
}
