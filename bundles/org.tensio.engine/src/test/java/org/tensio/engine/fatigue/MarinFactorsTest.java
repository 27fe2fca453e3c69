package org.tensio.engine.fatigue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.tensio.engine.profile.CircleProfile;
import org.tensio.engine.profile.RectangleProfile;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.properties.SectionPropertiesOp;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.section.Material;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;

/**
 * The endurance-limit corrections against their published formulas and against the worked examples of
 * J. E. Shigley, Mechanical Engineering Design (R. G. Budynas, J. K. Nisbett), 9th ed., ch. 6 (example numbers
 * and printed values from memory; the 10th edition has the same examples). The printed results have three
 * significant digits, so a tolerance of half a unit of the last printed digit is used, widened where the SI
 * surface constants of Table 6-2 (rounded to three digits: 4.51 for 2.70 × 6.8948^0.265 = 4.504) are compared
 * with an example worked in kpsi.
 */
class MarinFactorsTest {

    private static final double KPSI = NotchSensitivity.MPA_PER_KPSI;

    @Test
    void surfaceFactorIsTheTable62Power() {
        // the formula itself, exactly (Shigley Eq. 6-19 with Table 6-2 SI constants)
        for (SurfaceFinish f : SurfaceFinish.values()) {
            for (double sut : new double[] {300, 690, 1200}) {
                assertEquals(f.a() * Math.pow(sut, f.b()), MarinFactors.surface(f, sut).value(), 1e-15);
            }
        }
        assertEquals(4.51, SurfaceFinish.machined.a());
        assertEquals(-0.265, SurfaceFinish.machined.b());
        assertEquals(57.7, SurfaceFinish.hotRolled.a());
        assertEquals(-0.718, SurfaceFinish.hotRolled.b());
        assertEquals(1.58, SurfaceFinish.ground.a());
        assertEquals(272, SurfaceFinish.asForged.a());
        assertEquals(-0.995, SurfaceFinish.asForged.b());
    }

    /**
     * Shigley 9th ed. Example 6-3 (from memory): 1015 hot-rolled bar machined to 1 in, reversed axial load,
     * 99 % reliability, Sut at temperature 49.0 kpsi: ka = 2.70 (49)^−0.265 = 0.963, kc = 0.85, ke = 0.814,
     * Se = 0.963 × 1 × 0.85 × 1 × 0.814 × 24.5 = 16.3 kpsi. Tolerances: ka 0.963 ± 0.0005 plus the SI constant's
     * 0.14 % rounding; Se 16.3 ± 0.05 kpsi (0.31 %) plus the same.
     */
    @Test
    void shigleyExample6_3AxialEnduranceLimit() {
        double sut = 49.0 * KPSI;
        double ka = MarinFactors.surface(SurfaceFinish.machined, sut).value();
        assertEquals(0.963, ka, 0.0005 + 0.0015 * 0.963);
        double ke = MarinFactors.reliability(0.99).value();
        assertEquals(0.814, ke, 0.0005);
        double sePrime = MarinFactors.steelEnduranceEstimate(sut).value();
        assertEquals(24.5 * KPSI, sePrime, 1e-12);
        double se = ka * MarinFactors.sizeAxial().value() * 0.85 * ke * sePrime / KPSI;
        assertEquals(16.3, se, 0.05 + 0.0015 * 16.3);
    }

    /**
     * Shigley 9th ed. Example 6-4 (from memory): a 32 mm shaft in bending; rotating kb = (32/7.62)^−0.107 =
     * 0.858; non-rotating de = 0.370 d = 11.84 mm, kb = 0.954. The non-rotating equivalent diameter comes from
     * this engine's exact 95 %-stress area of the round section (0.01046 d², Table 6-3), so it is 0.3696 d, not
     * the printed 0.370 d: kb changes by 0.1 × 0.107 %, well inside ± 0.0005.
     */
    @Test
    void shigleyExample6_4SizeFactorRotatingAndNonRotating() {
        assertEquals(0.858, MarinFactors.size(32, "given").value(), 0.0005);
        Section s = new Section("shaft", List.of(SectionPart.of(new CircleProfile(16), 0, 0,
                new Material("steel", 210000, 0.3, 355.0))));
        SectionProperties p = SectionPropertiesOp.compute(s);
        CycleLoads rotating = CycleLoads.rotating(new InternalForces(0, 0, 0, 1e6, 0, 0));
        assertEquals(0.858, EquivalentDiameter.sizeFactor(s, p, rotating, null, 1).value(), 0.0005);
        CycleLoads still = CycleLoads.of(InternalForces.ZERO, new InternalForces(0, 0, 0, 1e6, 0, 0));
        Factor kb = EquivalentDiameter.sizeFactor(s, p, still, null, 1);
        assertEquals(0.954, kb.value(), 0.0005);
        // Table 6-3: A95 = 0.01046 d² for a non-rotating round bar (four printed digits: ± 0.000005 d²)
        assertEquals(0.01046 * 32 * 32, EquivalentDiameter.a95(s, p, 1e6, 0), 0.000005 * 32 * 32);
        // exact: 2 (θ0 − sin θ0 cos θ0) r² with cos θ0 = 0.95 (two circular segments)
        double t0 = Math.acos(0.95);
        assertEquals(2 * (t0 - Math.sin(t0) * 0.95) * 256, EquivalentDiameter.a95(s, p, 0.6e6, -0.8e6), 1e-9 * 256);
    }

    /** Shigley Table 6-3 (from memory): a rectangle h × b in bending about one axis, A95 = 0.05 h b, de = 0.808 √(hb). */
    @Test
    void rectangleEquivalentDiameter() {
        Section s = new Section("flat", List.of(SectionPart.of(new RectangleProfile(40, 10), 0, 0,
                new Material("steel", 210000, 0.3, 355.0))));
        SectionProperties p = SectionPropertiesOp.compute(s);
        assertEquals(0.05 * 400, EquivalentDiameter.a95(s, p, 1e5, 0), 1e-12 * 400);
        CycleLoads still = CycleLoads.of(InternalForces.ZERO, new InternalForces(0, 0, 0, 1e5, 0, 0));
        Factor kb = EquivalentDiameter.sizeFactor(s, p, still, null, 1);
        double de = Math.sqrt(0.05 * 400 / EquivalentDiameter.A95_ROUND);
        assertEquals(0.808 * 20, de, 0.0005 * 20); // the printed three digits
        assertEquals(Math.pow(de / 7.62, -0.107), kb.value(), 1e-12);
        assertTrue(kb.source().contains("95 %"), kb.source());
    }

    @Test
    void sizeFactorRanges() {
        // Shigley Eq. 6-20 (from memory): the two fits, and kb = 1 below 2.79 mm
        assertEquals(Math.pow(20 / 7.62, -0.107), MarinFactors.size(20, "given").value(), 1e-15);
        assertEquals(1.51 * Math.pow(100, -0.157), MarinFactors.size(100, "given").value(), 1e-15);
        assertEquals(1.0, MarinFactors.size(2, "given").value());
        assertTrue(MarinFactors.size(300, "given").source().contains("extrapolated"));
        // the two fits meet near 51 mm within 1 % (they are separate fits)
        assertEquals(MarinFactors.size(51, "").value(), 1.51 * Math.pow(51, -0.157), 0.01);
    }

    /**
     * Shigley 9th ed. Example 6-5 (from memory): at 450 °F the fit gives kd = 1.007 (three digits, ± 0.0005),
     * (Se)450 = 1.007 × 39.0 = 39.3 kpsi. Room temperature gives 1.
     */
    @Test
    void shigleyExample6_5Temperature() {
        double c = (450 - 32) / 1.8;
        Factor kd = MarinFactors.temperature(c);
        assertEquals(1.007, kd.value(), 0.0005);
        assertEquals(39.3, kd.value() * 39.0, 0.05);
        // at 70 °F the polynomial gives 0.99995: the fit's own value at its lower end (exact arithmetic)
        double f = 70;
        assertEquals(0.975 + 0.432e-3 * f - 0.115e-5 * f * f + 0.104e-8 * f * f * f - 0.595e-12 * f * f * f * f,
                MarinFactors.temperature((70.0001 - 32) / 1.8).value(), 1e-6);
        assertEquals(1.0, MarinFactors.temperature(20).value());
        assertThrows(IllegalArgumentException.class, () -> MarinFactors.temperature(600));
    }

    /** Shigley Table 6-5 (from memory): ke printed to three digits; ke = 1 − 0.08 za exactly. */
    @Test
    void reliabilityTable6_5() {
        Map<Double, Double> printed = Map.of(0.5, 1.000, 0.9, 0.897, 0.95, 0.868, 0.99, 0.814, 0.999, 0.753, 0.9999, 0.702,
                0.99999, 0.659, 0.999999, 0.620);
        for (Map.Entry<Double, Double> e : printed.entrySet()) {
            assertEquals(e.getValue(), MarinFactors.reliability(e.getKey()).value(), 0.0005, "R = " + e.getKey());
        }
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class, () -> MarinFactors.reliability(0.98));
        assertTrue(ex.getMessage().startsWith("reliability: 0.98"), ex.getMessage());
    }

    /** Shigley Eq. 6-8 (from memory): Se' = 0.5 Sut up to 1400 MPa, 700 MPa above. */
    @Test
    void steelEstimate() {
        assertEquals(315, MarinFactors.steelEnduranceEstimate(630).value(), 1e-12);
        assertEquals(700, MarinFactors.steelEnduranceEstimate(1400).value(), 1e-12);
        assertEquals(700, MarinFactors.steelEnduranceEstimate(1800).value(), 1e-12);
    }

    @Test
    void enduranceLimitMultipliesEveryFactor() {
        FatigueMaterial m = new FatigueMaterial("C45", 630.0, 370.0, FatigueMaterial.Basis.steelEstimate, null, null,
                new FatigueConditions(SurfaceFinish.machined, 0.99, 60.0, 0.9), NotchSensitivity.neuber);
        Factor kb = MarinFactors.size(40, "given");
        EnduranceLimit e = EnduranceLimit.of(m, m.conditions(), kb, 1);
        double expected = 315 * MarinFactors.surface(SurfaceFinish.machined, 630).value() * kb.value() * 1
                * MarinFactors.temperature(60).value() * MarinFactors.reliability(0.99).value() * 0.9;
        assertEquals(expected, e.value(), 1e-12 * expected);
        assertEquals(List.of("ka", "kb", "kc", "kd", "ke", "kf"), e.factors().stream().map(Factor::symbol).toList());
        assertThrows(IllegalArgumentException.class, () -> EnduranceLimit.of(m, FatigueConditions.NONE, kb, 1));
    }
}
