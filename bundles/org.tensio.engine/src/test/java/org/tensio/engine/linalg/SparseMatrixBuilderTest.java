package org.tensio.engine.linalg;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;
import org.tensio.engine.linalg.SparseMatrixBuilder.Input;

/**
 * Assembly semantics of {@link SparseMatrixBuilder} and the operations of {@link SymmetricCsr}. Expected values
 * are exact sums of small integers or dyadic fractions, so comparisons are exact (tolerance 0) unless stated;
 * "common practice, no source" for the assembly conventions themselves.
 */
class SparseMatrixBuilderTest {

    @Test
    void oneTriangleAddsEachOffDiagonalContributionToBothEntries() {
        SparseMatrixBuilder b = new SparseMatrixBuilder(3, Input.ONE_TRIANGLE);
        b.add(2, 1, 1.5);
        b.add(1, 2, 2.0); // the same pair from the other triangle: summed
        b.add(2, 1, 0.25); // duplicate: summed
        b.add(1, 1, 4);
        b.add(1, 1, 1);
        SymmetricCsr a = b.build();
        assertEquals(3.75, a.get(2, 1), 0);
        assertEquals(3.75, a.get(1, 2), 0);
        assertEquals(5, a.get(1, 1), 0);
        assertEquals(0, a.get(0, 0), 0);
        assertEquals(3, a.nonZeros()); // (1,1), (1,2), (2,1)
        assertArrayEquals(new double[] {0, 5, 0}, a.diagonal(), 0);
    }

    @Test
    void bothTrianglesKeepsTheSymmetricPart() {
        SparseMatrixBuilder b = new SparseMatrixBuilder(2, Input.BOTH_TRIANGLES);
        b.add(0, 1, 3);
        b.add(1, 0, 3);
        b.add(0, 0, 2);
        assertEquals(3, b.build().get(0, 1), 0);
        b.add(1, 0, 1); // now a01 = 3, a10 = 4: the symmetric part is 3.5
        SymmetricCsr a = b.build();
        assertEquals(3.5, a.get(0, 1), 0);
        assertEquals(3.5, a.get(1, 0), 0);
        assertEquals(2, a.get(0, 0), 0);
    }

    @Test
    void elementMatrixIsAddedOnceInEitherMode() {
        double[] k = {2, -1, -1, -1, 2, -1, -1, -1, 2};
        int[] dofs = {4, 0, 2};
        for (Input mode : Input.values()) {
            SparseMatrixBuilder b = new SparseMatrixBuilder(5, mode);
            b.addElement(dofs, k);
            b.addElement(dofs, k);
            SymmetricCsr a = b.build();
            assertEquals(4, a.get(4, 4), 0, mode.toString());
            assertEquals(-2, a.get(0, 4), 0, mode.toString());
            assertEquals(-2, a.get(2, 0), 0, mode.toString());
            assertEquals(0, a.get(1, 1), 0, mode.toString());
            assertEquals(9, a.nonZeros(), mode.toString());
        }
    }

    @Test
    void repeatedDofInAnElementLandsOnTheDiagonalTwice() {
        SparseMatrixBuilder b = new SparseMatrixBuilder(1, Input.ONE_TRIANGLE);
        b.addElement(new int[] {0, 0}, new double[] {1, 2, 2, 3});
        assertEquals(1 + 2 + 2 + 3, b.build().get(0, 0), 0);
    }

    @Test
    void multiplyMatchesADenseProductAndTheBuilderIsReusable() {
        Random rnd = new Random(42);
        int n = 40;
        double[][] dense = new double[n][n];
        SparseMatrixBuilder b = new SparseMatrixBuilder(n, Input.ONE_TRIANGLE, 10);
        for (int t = 0; t < 600; t++) {
            int i = rnd.nextInt(n);
            int j = rnd.nextInt(n);
            double v = rnd.nextInt(9) - 4; // small integers: all sums exact
            b.add(i, j, v);
            dense[i][j] += v;
            if (i != j) {
                dense[j][i] += v;
            }
        }
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = rnd.nextInt(7) - 3;
        }
        SymmetricCsr a = b.build();
        double[] y = a.multiply(x);
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += dense[i][j] * x[j];
                assertEquals(dense[i][j], a.get(i, j), 0);
            }
            assertEquals(s, y[i], 0);
        }
        b.add(3, 3, 1);
        assertEquals(dense[3][3] + 1, b.build().get(3, 3), 0);
        assertEquals(dense[3][3], a.get(3, 3), 0, "a built matrix is immutable");
    }

    @Test
    void rowsLongerThanTheInsertionSortLimitAreSortedToo() {
        int n = 300;
        SparseMatrixBuilder b = new SparseMatrixBuilder(n, Input.ONE_TRIANGLE);
        for (int j = n - 1; j >= 0; j--) {
            b.add(n - 1, j, j + 1);
            b.add(j, n - 1, 1); // the same entries again, through the other triangle
        }
        SymmetricCsr a = b.build();
        assertEquals(n, a.rowLength(n - 1));
        for (int j = 0; j < n - 1; j++) {
            assertEquals(j + 2, a.get(n - 1, j), 0);
            assertEquals(j + 2, a.get(j, n - 1), 0);
        }
        assertEquals(n + 1, a.get(n - 1, n - 1), 0, "diagonal: n + 1, added twice but once per call");
    }

    @Test
    void pinnedReplacesRowsAndColumnsByIdentity() {
        SymmetricCsr a = Meshes.laplace5(3).a();
        SymmetricCsr p = a.pinned(new int[] {4, 4, 0});
        assertEquals(1, p.get(4, 4), 0);
        assertEquals(0, p.get(4, 1), 0);
        assertEquals(0, p.get(1, 4), 0);
        assertEquals(1, p.get(0, 0), 0);
        assertEquals(-1, p.get(1, 2), 0);
        assertEquals(4, p.get(1, 1), 0);
        assertEquals(1, p.rowLength(4));
    }

    @Test
    void badArgumentsAreRejectedNamingFieldAndValue() {
        SparseMatrixBuilder b = new SparseMatrixBuilder(3, Input.ONE_TRIANGLE);
        assertMessage(assertThrows(IllegalArgumentException.class, () -> b.add(3, 0, 1)), "i = 3");
        assertMessage(assertThrows(IllegalArgumentException.class, () -> b.add(0, -1, 1)), "j = -1");
        assertMessage(assertThrows(IllegalArgumentException.class, () -> b.add(0, 1, Double.NaN)), "NaN");
        assertMessage(assertThrows(IllegalArgumentException.class, () -> new SparseMatrixBuilder(-2, Input.BOTH_TRIANGLES)),
                "n = -2");
        assertMessage(assertThrows(IllegalArgumentException.class, () -> b.addElement(new int[] {0, 1}, new double[3])),
                "k.length = 3");
        assertMessage(assertThrows(IllegalArgumentException.class, () -> b.addElement(new int[] {0, 5}, new double[4])),
                "dofs[1] = 5");
        SymmetricCsr a = b.build();
        assertMessage(assertThrows(IllegalArgumentException.class, () -> a.multiply(new double[2], new double[3])),
                "x.length = 2");
        assertMessage(assertThrows(IllegalArgumentException.class, () -> a.pinned(new int[] {7})), "pinned[0] = 7");
    }

    private static void assertMessage(Exception e, String fragment) {
        assertTrue(e.getMessage().contains(fragment), () -> "message '" + e.getMessage() + "' lacks '" + fragment + "'");
    }
}
