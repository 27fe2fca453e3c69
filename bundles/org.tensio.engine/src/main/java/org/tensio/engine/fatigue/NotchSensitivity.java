package org.tensio.engine.fatigue;

/**
 * Notch sensitivity q of a notch of root radius r, giving the fatigue stress-concentration factor
 * Kf = 1 + q (Kt − 1). Steels only: both fits are for steels.
 * <ul>
 * <li>{@link #neuber}: the Neuber (Kuhn–Hardrath) form q = 1 / (1 + √a/√r) with the fit of √a against Sut of
 * Shigley's Mechanical Engineering Design, 9th/10th ed., Eqs. 6-34 and 6-35 (from memory): Sut in kpsi,
 * √a in √in, bending and axial √a = 0.246 − 3.08e−3 Sut + 1.51e−5 Sut² − 2.67e−8 Sut³, torsion
 * √a = 0.190 − 2.51e−3 Sut + 1.35e−5 Sut² − 2.67e−8 Sut³; fitted for 50 ≤ Sut ≤ 250 kpsi (345 to 1724 MPa),
 * outside of which it is refused.</li>
 * <li>{@link #peterson}: Peterson's form q = 1 / (1 + a/r) with a = 0.0254 (2070/Sut)^1.8 mm (Sut in MPa; the inch
 * form a = 0.001 (300/Sut[ksi])^1.8 in) for bending and axial loading and 0.6 a in torsion, as W. D. Pilkey and
 * D. F. Pilkey, Peterson's Stress Concentration Factors, 3rd ed., ch. 1 give it for steels (from memory).</li>
 * </ul>
 * Lengths in mm and strengths in MPa: the caller converts from the project's units.
 *
 * @since 0.1
 */
public enum NotchSensitivity {
    /** Neuber (Kuhn–Hardrath) form with Shigley's √a fit. */
    neuber,
    /** Peterson's form with his characteristic length for steels. */
    peterson;

    /** 1 kpsi in MPa (6.894757293168361, from 1 lbf = 4.4482216152605 N and 1 in = 25.4 mm exactly). */
    public static final double MPA_PER_KPSI = 4.4482216152605e3 / (25.4 * 25.4);
    /** Lowest Sut of the Neuber fit, MPa (50 kpsi). */
    public static final double NEUBER_MIN_MPA = 50 * MPA_PER_KPSI;
    /** Highest Sut of the Neuber fit, MPa (250 kpsi). */
    public static final double NEUBER_MAX_MPA = 250 * MPA_PER_KPSI;

    /**
     * @param sutMpa ultimate strength, MPa
     * @param torsion true for the shear (torsion) constant
     * @return the Neuber constant √a, √mm
     * @throws IllegalArgumentException naming the value when Sut lies outside the fit
     */
    public static double neuberRootA(double sutMpa, boolean torsion) {
        if (!(sutMpa >= NEUBER_MIN_MPA * (1 - 1e-12) && sutMpa <= NEUBER_MAX_MPA * (1 + 1e-12))) {
            throw new IllegalArgumentException("Sut: " + MarinFactors.n(sutMpa) + " MPa lies outside the Neuber-constant"
                    + " fit (50 to 250 kpsi, " + MarinFactors.n(NEUBER_MIN_MPA) + " to " + MarinFactors.n(NEUBER_MAX_MPA)
                    + " MPa); give q or Kf, or use notchSensitivity \"peterson\"");
        }
        double s = sutMpa / MPA_PER_KPSI;
        double rootAIn = torsion ? 0.190 - 2.51e-3 * s + 1.35e-5 * s * s - 2.67e-8 * s * s * s
                : 0.246 - 3.08e-3 * s + 1.51e-5 * s * s - 2.67e-8 * s * s * s;
        return rootAIn * Math.sqrt(25.4);
    }

    /**
     * @param sutMpa  ultimate strength, MPa
     * @param torsion true for torsion
     * @return Peterson's characteristic length a, mm
     */
    public static double petersonA(double sutMpa, boolean torsion) {
        if (!(sutMpa > 0) || !Double.isFinite(sutMpa)) {
            throw new IllegalArgumentException("Sut: must be positive and finite, got " + sutMpa + " MPa");
        }
        double a = 0.0254 * Math.pow(2070 / sutMpa, 1.8);
        return torsion ? 0.6 * a : a;
    }

    /**
     * @param sutMpa  ultimate strength, MPa
     * @param rMm     notch root radius, mm, &gt; 0
     * @param torsion true for the shear (torsion) sensitivity
     * @return q in [0, 1)
     */
    public double q(double sutMpa, double rMm, boolean torsion) {
        if (!(rMm > 0) || !Double.isFinite(rMm)) {
            throw new IllegalArgumentException("radius: the notch root radius must be positive, got " + rMm + " mm");
        }
        return switch (this) {
            case neuber -> 1 / (1 + neuberRootA(sutMpa, torsion) / Math.sqrt(rMm));
            case peterson -> 1 / (1 + petersonA(sutMpa, torsion) / rMm);
        };
    }

    /** @return a source text for reports */
    public String source() {
        return switch (this) {
            case neuber -> "Neuber form 1/(1 + √a/√r), √a fit of Shigley's Mechanical Engineering Design, 9th/10th ed.,"
                    + " Eqs. 6-34, 6-35 (from memory)";
            case peterson -> "Peterson form 1/(1 + a/r), a = 0.0254 (2070/Sut)^1.8 mm (0.6 a in torsion), Pilkey,"
                    + " Peterson's Stress Concentration Factors, 3rd ed., ch. 1 (from memory)";
        };
    }
}
