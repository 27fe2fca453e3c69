package org.tensio.engine.fatigue;

import java.util.List;
import java.util.Locale;

/**
 * The Marin-type corrections of the endurance limit, Se = ka·kb·kc·kd·ke·kf·Se', and the estimate of Se' for
 * steels, each as a {@link Factor} carrying its formula, inputs and source. Static only.
 * <p>
 * Source of every formula here: J. E. Shigley, Mechanical Engineering Design (Budynas, Nisbett), 9th and 10th
 * editions, section 6-9 ("Endurance limit modifying factors"), Eqs. 6-8, 6-19, 6-20, 6-24, 6-27 and Table 6-5
 * (from memory, equation numbers included; the tests check the printed examples). Inputs in MPa and mm: the caller converts from the
 * project's units.
 *
 * @since 0.1
 */
public final class MarinFactors {

    /** Shigley's source text for the factors. */
    public static final String SHIGLEY = "Shigley's Mechanical Engineering Design, 9th/10th ed., sec. 6-9";

    /** Reliabilities of Shigley's Table 6-5, in the order of {@link #RELIABILITY_ZA}. */
    public static final List<Double> RELIABILITIES = List.of(0.5, 0.9, 0.95, 0.99, 0.999, 0.9999, 0.99999, 0.999999);
    /** Standard normal variates za of Shigley's Table 6-5 (as printed there). */
    static final double[] RELIABILITY_ZA = {0, 1.288, 1.645, 2.326, 3.091, 3.719, 4.265, 4.753};

    /** Equivalent diameters beyond this (mm) lie outside the size-factor fit (Shigley Eq. 6-20: up to 254 mm). */
    public static final double SIZE_FIT_MAX_MM = 254;
    /** Below this (mm) the fit is not defined (Shigley Eq. 6-20 starts at 2.79 mm); kb = 1 is used. */
    public static final double SIZE_FIT_MIN_MM = 2.79;
    /** Highest temperature of the temperature-factor fit, °C (1000 °F). */
    public static final double TEMPERATURE_MAX_C = (1000 - 32) / 1.8;

    private MarinFactors() {
    }

    /**
     * The rotating-beam endurance limit of a steel estimated from its ultimate strength: Se' = 0.5 Sut for
     * Sut ≤ 1400 MPa, 700 MPa above (Shigley Eq. 6-8).
     *
     * @param sutMpa ultimate strength, MPa
     * @return Se', MPa
     */
    public static Factor steelEnduranceEstimate(double sutMpa) {
        positive(sutMpa, "Sut");
        boolean capped = sutMpa > 1400;
        double v = capped ? 700 : 0.5 * sutMpa;
        return new Factor("Se'", "rotating-beam endurance limit", v, capped ? "700 MPa for Sut > 1400 MPa (steels; "
                + SHIGLEY + ", Eq. 6-8)" : "0.5 Sut = 0.5 × " + n(sutMpa) + " MPa (steels, Sut ≤ 1400 MPa; " + SHIGLEY
                        + ", Eq. 6-8)");
    }

    /**
     * Surface factor ka = a·Sut^b (Shigley Eq. 6-19, Table 6-2).
     *
     * @param finish the surface finish
     * @param sutMpa ultimate strength, MPa
     */
    public static Factor surface(SurfaceFinish finish, double sutMpa) {
        if (finish == null) {
            throw new IllegalArgumentException("surface: a finish is required, got null");
        }
        double v = finish.factor(sutMpa);
        return new Factor("ka", "surface finish", v, finish + ": a·Sut^b = " + n(finish.a()) + " × " + n(sutMpa)
                + "^(" + n(finish.b()) + ") (" + SHIGLEY + ", Eq. 6-19, Table 6-2)");
    }

    /**
     * Size factor for bending and torsion of a round bar of (equivalent) diameter d (Shigley Eq. 6-20):
     * kb = (d/7.62)^−0.107 for 2.79 ≤ d ≤ 51 mm (Shigley also writes it 1.24 d^−0.107, which is 0.2 % lower; the
     * quotient form is the one his examples use), 1.51 d^−0.157 for 51 &lt; d ≤ 254 mm. Below
     * 2.79 mm kb = 1 (the fit starts there); above 254 mm the second fit is extrapolated (it keeps falling,
     * which is conservative) and the source says so.
     *
     * @param dMm     the diameter, or the equivalent diameter of a non-rotating or non-round section, mm
     * @param dSource how d was obtained, quoted in the source
     */
    public static Factor size(double dMm, String dSource) {
        positive(dMm, "equivalent diameter");
        String src = " (" + SHIGLEY + ", Eq. 6-20; d " + dSource + ")";
        if (dMm < SIZE_FIT_MIN_MM) {
            return new Factor("kb", "size", 1.0, "1: d = " + n(dMm) + " mm is below the fit's 2.79 mm" + src);
        }
        if (dMm <= 51) {
            return new Factor("kb", "size", Math.pow(dMm / 7.62, -0.107), "(d/7.62)^−0.107, d = " + n(dMm) + " mm" + src);
        }
        return new Factor("kb", "size", 1.51 * Math.pow(dMm, -0.157), "1.51 d^−0.157, d = " + n(dMm) + " mm"
                + (dMm > SIZE_FIT_MAX_MM ? ", extrapolated beyond the fit's 254 mm" : "") + src);
    }

    /** Size factor for purely axial loading: kb = 1 (Shigley, sec. 6-9, "there is no size effect" in axial loading). */
    public static Factor sizeAxial() {
        return new Factor("kb", "size", 1.0, "1: axial loading only, no size effect (" + SHIGLEY + ")");
    }

    /**
     * Load factor of the combined-loading method: kc = 1 with the distortion-energy combination of the
     * components, the axial alternating stress being divided by 0.85 instead (Shigley sec. 6-14).
     */
    public static Factor loadCombined() {
        return new Factor("kc", "load type", 1.0, "1: combined loading by the distortion-energy combination; the"
                + " axial alternating stress is divided by 0.85 instead (" + SHIGLEY + " and sec. 6-14)");
    }

    /**
     * Temperature factor (Shigley Eq. 6-27, a fit of test data for steels from 70 to 1000 °F):
     * kd = 0.975 + 0.432e−3 T − 0.115e−5 T² + 0.104e−8 T³ − 0.595e−12 T⁴ with T in °F. kd = 1 at and below 70 °F
     * (21.1 °C), room temperature.
     *
     * @param celsius operating temperature, °C, at most {@link #TEMPERATURE_MAX_C}
     * @throws IllegalArgumentException naming the value above 537.8 °C (1000 °F)
     */
    public static Factor temperature(double celsius) {
        if (!Double.isFinite(celsius) || celsius > TEMPERATURE_MAX_C + 1e-9) {
            throw new IllegalArgumentException("temperature: " + n(celsius) + " °C lies beyond the fit's 1000 °F ("
                    + n(TEMPERATURE_MAX_C) + " °C); give the fatigue strength at temperature instead");
        }
        double f = 1.8 * celsius + 32;
        if (f <= 70) {
            return new Factor("kd", "temperature", 1.0, "1: " + n(celsius) + " °C is room temperature (at most 70 °F)");
        }
        double v = 0.975 + 0.432e-3 * f - 0.115e-5 * f * f + 0.104e-8 * f * f * f - 0.595e-12 * f * f * f * f;
        return new Factor("kd", "temperature", v, "fourth-order fit in T = " + n(f) + " °F (" + n(celsius) + " °C) ("
                + SHIGLEY + ", Eq. 6-27)");
    }

    /** Temperature factor when no temperature is given: kd = 1 (room temperature). */
    public static Factor roomTemperature() {
        return new Factor("kd", "temperature", 1.0, "1: room temperature (no temperature given)");
    }

    /**
     * Reliability factor ke = 1 − 0.08 za (Shigley Eq. 6-28, Table 6-5), for the reliabilities of that table.
     *
     * @param reliability one of {@link #RELIABILITIES} (0.5 to 0.999999)
     * @throws IllegalArgumentException naming the value and the allowed ones otherwise
     */
    public static Factor reliability(double reliability) {
        for (int i = 0; i < RELIABILITIES.size(); i++) {
            if (Math.abs(RELIABILITIES.get(i) - reliability) <= 1e-12) {
                double za = RELIABILITY_ZA[i];
                return new Factor("ke", "reliability", 1 - 0.08 * za, "1 − 0.08 za, za = " + n(za) + " for "
                        + n(100 * reliability) + " % (" + SHIGLEY + ", Table 6-5)");
            }
        }
        throw new IllegalArgumentException("reliability: " + n(reliability) + " is not one of " + RELIABILITIES
                + " (the reliabilities of Shigley's Table 6-5)");
    }

    /**
     * Miscellaneous-effects factor kf (corrosion, plating, residual stresses, ...): as given.
     *
     * @param value the factor, &gt; 0
     * @param given true when the user gave it (the source says "given"), false for the default 1
     */
    public static Factor miscellaneous(double value, boolean given) {
        positive(value, "miscellaneous");
        return new Factor("kf", "miscellaneous effects", value, given ? "given" : "1: no miscellaneous effects given");
    }

    private static void positive(double v, String what) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + ": must be positive and finite, got " + v);
        }
    }

    /** @return a number for a source text: up to 6 significant digits, never localised */
    static String n(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e9) {
            return Long.toString((long) v);
        }
        String s = String.format(Locale.ROOT, "%.6g", v);
        if (s.contains("e") || s.contains("E")) {
            return s;
        }
        s = s.contains(".") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
        return s;
    }
}
