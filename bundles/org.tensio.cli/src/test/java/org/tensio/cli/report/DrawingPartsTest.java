package org.tensio.cli.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

/** The pieces the drawings are made of: contour band cutting, band levels, the colour scale, number format. */
class DrawingPartsTest {

    @Test
    void bandsPartitionATriangleExactly() {
        // f = x on the triangle (0,0), (1,0), (0,1): the part with x ≤ 1/2 has area 1/2 − (1/2)(1/2)² = 3/8
        // (elementary geometry); tolerance: a few ulps of the exact clip arithmetic
        List<List<double[]>> bands = new ArrayList<>(List.of(new ArrayList<>(), new ArrayList<>()));
        Bands.clip(new double[] {0, 1, 0}, new double[] {0, 0, 1}, new double[] {0, 1, 0}, new double[] {0, 0.5, 1},
                bands);
        assertEquals(0.375, area(bands.get(0)), 1e-15);
        assertEquals(0.125, area(bands.get(1)), 1e-15);
    }

    @Test
    void aTriangleInsideOneBandIsKeptWhole() {
        List<List<double[]>> bands = new ArrayList<>(List.of(new ArrayList<>(), new ArrayList<>(), new ArrayList<>()));
        Bands.clip(new double[] {0, 2, 0}, new double[] {0, 0, 2}, new double[] {1.1, 1.2, 1.9}, new double[] {0, 1, 2, 3},
                bands);
        assertEquals(0, bands.get(0).size());
        assertEquals(1, bands.get(1).size());
        assertEquals(2.0, area(bands.get(1)), 0);
    }

    private static double area(List<double[]> rings) {
        double a = 0;
        for (double[] r : rings) {
            int n = r.length / 2;
            for (int i = 0; i < n; i++) {
                int j = (i + 1) % n;
                a += r[2 * i] * r[2 * j + 1] - r[2 * j] * r[2 * i + 1];
            }
        }
        return Math.abs(a) / 2;
    }

    @Test
    void levelsAreNiceAndCoverTheRange() {
        double[] l = Bands.levels(3.2, 212.3, 10);
        assertTrue(l[0] <= 3.2 && l[l.length - 1] >= 212.3);
        assertEquals(25.0, l[1] - l[0], 1e-12, "range 209.1 / 10 = 20.9: the next nice step is 25");
        assertEquals(0.0, l[0], 0);
        double[] c = Bands.levels(5, 5, 10);
        assertEquals(2, c.length, "a constant field is one band");
        assertTrue(c[0] < 5 && c[1] > 5);
    }

    @Test
    void rampRunsFromNavyToBrickWithDistinctBands() {
        assertEquals("#172b4d", Ramp.at(0));
        assertEquals("#9a2f22", Ramp.at(1));
        // neighbouring bands of a 12-band legend differ by at least 0.03 in OKLab (a just-noticeable difference is
        // about 0.02 there: from memory, common practice, no source)
        for (int i = 0; i < 11; i++) {
            double[] a = Ramp.toLab(Ramp.rgb((i + 0.5) / 12)), b = Ramp.toLab(Ramp.rgb((i + 1.5) / 12));
            double d = Math.sqrt(Math.pow(a[0] - b[0], 2) + Math.pow(a[1] - b[1], 2) + Math.pow(a[2] - b[2], 2));
            assertTrue(d >= 0.03, "bands " + i + " and " + (i + 1) + " differ by " + d);
        }
    }

    @Test
    void numbersReadWell() {
        assertEquals("8.3562×10⁷", Fmt.sig(83562000.0, 5));
        assertEquals("1.5×10⁻⁴", Fmt.sig(1.5e-4, 5));
        assertEquals("−0.5", Fmt.sig(-0.5, 3));
        assertEquals("1200", Fmt.sig(1200.0, 6));
        assertEquals("0.734", Fmt.fixed(0.7344, 3));
        assertEquals("0.000", Fmt.fixed(-1e-9, 3));
        assertEquals("—", Fmt.sig(null, 3));
    }
}
