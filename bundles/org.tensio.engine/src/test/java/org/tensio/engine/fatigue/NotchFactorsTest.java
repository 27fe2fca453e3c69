package org.tensio.engine.fatigue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Notch sensitivity and fatigue stress-concentration factors against J. E. Shigley, Mechanical Engineering Design,
 * 9th ed. (from memory): Eqs. 6-33 to 6-35, Example 6-6, Table 7-1; Peterson's form as Pilkey, Peterson's Stress
 * Concentration Factors, 3rd ed., ch. 1 gives it (from memory).
 */
class NotchFactorsTest {

    private static final NotchLocation SURFACE = new NotchLocation.Surface();

    /**
     * Shigley 9th ed. Example 6-6 (from memory): steel shaft in bending, Sut = 690 MPa, shoulder fillet r = 3 mm
     * between 32 and 38 mm, Kt = 1.65 (Fig. A-15-9); Eq. 6-35a gives √a = 0.0622 √in = 0.313 √mm and
     * Kf = 1 + (1.65 − 1)/(1 + 0.313/√3) = 1.55. Tolerances half a unit of the printed last digit; the printed
     * √mm value is the printed √in value converted, so it carries that one's rounding too (± 0.00005 × √25.4).
     */
    @Test
    void shigleyExample6_6ShoulderFilletKf() {
        double rootA = NotchSensitivity.neuberRootA(690, false);
        assertEquals(0.313, rootA, 0.0005 + 0.00005 * Math.sqrt(25.4));
        assertEquals(0.0622, rootA / Math.sqrt(25.4), 0.00005);
        Notch n = new Notch(NotchType.shoulderFillet, 1.65, null, null, 3.0, null, null, null, null, null, SURFACE);
        NotchFactors f = NotchFactors.of(n, 690, 1, NotchSensitivity.neuber);
        assertEquals(1.55, f.kf(), 0.005);
        assertEquals(1 + 0.65 / (1 + rootA / Math.sqrt(3)), f.kf(), 1e-15);
        // axial: the bending Kt when none is given (common practice, no source)
        assertEquals(f.kf(), f.kfAxial(), 0);
        assertTrue(f.ktSource().contains("Table 7-1"), f.ktSource());
    }

    /** The √a polynomials (Shigley Eq. 6-35a, b) at 100 kpsi, written out. */
    @Test
    void neuberPolynomials() {
        double s = 100;
        double bend = 0.246 - 3.08e-3 * s + 1.51e-5 * s * s - 2.67e-8 * s * s * s;
        double tors = 0.190 - 2.51e-3 * s + 1.35e-5 * s * s - 2.67e-8 * s * s * s;
        assertEquals(bend * Math.sqrt(25.4), NotchSensitivity.neuberRootA(100 * NotchSensitivity.MPA_PER_KPSI, false),
                1e-14);
        assertEquals(tors * Math.sqrt(25.4), NotchSensitivity.neuberRootA(100 * NotchSensitivity.MPA_PER_KPSI, true),
                1e-14);
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class,
                () -> NotchSensitivity.neuberRootA(300, false));
        assertTrue(ex.getMessage().startsWith("Sut: 300 MPa"), ex.getMessage());
    }

    /**
     * Shigley Table 7-1 first-pass values (from memory), with q = 1 (no radius given: Kf = Kt).
     */
    @Test
    void firstPassValuesOfTable7_1() {
        double[][] expected = {{2.7, 2.2}, {1.7, 1.5}, {2.14, 3.0}, {5.0, 3.0}};
        NotchType[] types = {NotchType.shoulderFillet, NotchType.shoulderFilletWellRounded, NotchType.keyseat,
            NotchType.retainingRingGroove};
        for (int i = 0; i < types.length; i++) {
            NotchFactors f = NotchFactors.of(new Notch(types[i], null, null, null, null, null, null, null, null, null,
                    SURFACE), 690, 1, NotchSensitivity.neuber);
            assertEquals(expected[i][0], f.kf(), 0, types[i].name());
            assertEquals(expected[i][1], f.kfs(), 0, types[i].name());
        }
        assertThrows(IllegalArgumentException.class, () -> new Notch(NotchType.transverseHole, null, null, null, null,
                null, null, null, null, null, SURFACE));
    }

    /** Peterson: a = 0.0254 (2070/Sut)^1.8 mm (0.6 a in torsion), q = 1/(1 + a/r) (from memory). */
    @Test
    void petersonForm() {
        double a = 0.0254 * Math.pow(2070 / 690.0, 1.8);
        assertEquals(1 / (1 + a / 2.0), NotchSensitivity.peterson.q(690, 2, false), 1e-15);
        assertEquals(1 / (1 + 0.6 * a / 2.0), NotchSensitivity.peterson.q(690, 2, true), 1e-15);
        // the inch form 0.001 (300/Sut[ksi])^1.8 in is the same constant: 300 ksi = 2068.4 MPa, rounded to 2070 in
        // the SI form, a 0.14 % change of a
        double aIn = 0.001 * Math.pow(300 / (690 / NotchSensitivity.MPA_PER_KPSI), 1.8) * 25.4;
        assertEquals(aIn, a, 0.002 * a);
    }

    @Test
    void givenFactorsWinAndRadiusUsesTheProjectLengthUnit() {
        Notch n = new Notch(NotchType.keyseat, null, null, null, 0.02, null, null, 1.9, null, null, SURFACE);
        // radius 0.02 in = 0.508 mm
        NotchFactors f = NotchFactors.of(n, 690, 25.4, NotchSensitivity.neuber);
        assertEquals(1.9, f.kf(), 0);
        double qs = NotchSensitivity.neuber.q(690, 0.508, true);
        assertEquals(1 + qs * (3.0 - 1), f.kfs(), 1e-15);
    }
}
