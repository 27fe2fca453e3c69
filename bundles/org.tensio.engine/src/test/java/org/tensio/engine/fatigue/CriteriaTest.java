package org.tensio.engine.fatigue;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * The fatigue criteria and the cycle algebra. Sources: J. E. Shigley, Mechanical Engineering Design, 9th ed.,
 * Tables 6-6 to 6-8 and Example 6-12 (from memory).
 */
class CriteriaTest {

    /**
     * Shigley 9th ed. Example 6-12 (from memory): 1.5 in bar of cold-drawn 1050 (Sut = 100, Sy = 84 kpsi), axial
     * load 0 to 16 kip, Kf = 1.85: Se = 33.9 kpsi (with kc = 0.85), σa = σm = 8.38 kpsi; Gerber nf = 3.66, ASME
     * elliptic nf = 3.75, Langer ny = 5.01. Here with the printed Se and stresses: tolerance half a unit of the
     * last printed digit of n plus the 0.15 % rounding of the printed 33.9 and 8.38.
     */
    @Test
    void shigleyExample6_12() {
        double se = 33.9, sa = 8.38, sm = 8.38, sut = 100, sy = 84;
        assertEquals(3.66, FatigueCriterion.fatigueGerber.factorOfSafety(sa, sm, 0, se, sut, sy), 0.005 + 0.0015 * 3.66);
        assertEquals(3.75, FatigueCriterion.fatigueAsmeElliptic.factorOfSafety(sa, sm, 0, se, sut, sy),
                0.005 + 0.0015 * 3.75);
        assertEquals(5.01, FatigueCriterion.langer.factorOfSafety(sa, sm, 0, se, sut, sy), 0.005 + 0.0015 * 5.01);
    }

    /** The stable Gerber form equals Shigley's Table 6-7 expression; each line's n against its equation. */
    @Test
    void closedFormsOfTheLines() {
        Random r = new Random(7);
        for (int k = 0; k < 200; k++) {
            double se = 100 + 300 * r.nextDouble(), sut = 2.2 * se + 500 * r.nextDouble(), sy = 0.5 * sut + 0.4 * sut
                    * r.nextDouble();
            double sa = 1 + 300 * r.nextDouble(), sm = 1 + 300 * r.nextDouble();
            double gerber = 0.5 * Math.pow(sut / sm, 2) * (sa / se) * (-1 + Math.sqrt(1 + Math.pow(2 * sm * se / (sut * sa),
                    2)));
            assertEquals(gerber, FatigueCriterion.fatigueGerber.factorOfSafety(sa, sm, 0, se, sut, sy), 1e-9 * gerber);
            assertEquals(1 / (sa / se + sm / sut), FatigueCriterion.fatigueGoodman.factorOfSafety(sa, sm, 0, se, sut, sy),
                    1e-12);
            assertEquals(1 / (sa / se + sm / sy), FatigueCriterion.fatigueSoderberg.factorOfSafety(sa, sm, 0, se, sut, sy),
                    1e-12);
            assertEquals(1 / Math.sqrt(Math.pow(sa / se, 2) + Math.pow(sm / sy, 2)),
                    FatigueCriterion.fatigueAsmeElliptic.factorOfSafety(sa, sm, 0, se, sut, sy), 1e-12);
            // a point on the Gerber line: n σa/Se + (n σm/Sut)² = 1
            double n = FatigueCriterion.fatigueGerber.factorOfSafety(sa, sm, 0, se, sut, sy);
            assertEquals(1, n * sa / se + Math.pow(n * sm / sut, 2), 1e-12);
        }
        assertEquals(1000.0 / 200, FatigueCriterion.fatigueGerber.factorOfSafety(0, 200, 0, 300, 1000, 500), 1e-12);
        assertEquals(300.0 / 150, FatigueCriterion.fatigueGerber.factorOfSafety(150, 0, 0, 300, 1000, 500), 1e-12);
    }

    /** σa' and σmax' against a brute-force scan of the cycle (10⁵ phases; the scan's error is below 1e-9). */
    @Test
    void cycleStressAgainstAScan() {
        Random r = new Random(11);
        for (int k = 0; k < 50; k++) {
            double[] m = v(r), c = v(r), s = k % 5 == 0 ? new double[3] : v(r);
            double amp = 0, peak = 0;
            int n = 100_000;
            for (int i = 0; i < n; i++) {
                double t = 2 * Math.PI * i / n, co = Math.cos(t), si = Math.sin(t);
                double[] a = {c[0] * co + s[0] * si, c[1] * co + s[1] * si, c[2] * co + s[2] * si};
                amp = Math.max(amp, CycleStress.mean(a));
                peak = Math.max(peak, CycleStress.mean(new double[] {m[0] + a[0], m[1] + a[1], m[2] + a[2]}));
            }
            assertEquals(amp, CycleStress.alternating(c, s), 1e-8 * amp);
            assertEquals(peak, CycleStress.peak(m, c, s)[0], 1e-8 * peak);
        }
        // in phase: √(σa² + 3 τa²), Shigley Eq. 7-5
        assertEquals(Math.sqrt(100 + 3 * 25), CycleStress.alternating(new double[] {10, 3, 4}, new double[3]), 1e-13);
    }

    private static double[] v(Random r) {
        return new double[] {200 * r.nextDouble() - 100, 100 * r.nextDouble() - 50, 100 * r.nextDouble() - 50};
    }
}
