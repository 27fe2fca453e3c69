package org.tensio.engine.linalg;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.tensio.engine.linalg.SparseMatrixBuilder.Input;

/**
 * Orderings are permutations, deterministic, and nested dissection reduces fill. Fill figures: on a k × k
 * 5-point grid the row-by-row (banded) order gives nnz(L) ≈ k³ while nested dissection gives
 * (31/4)·k²·log₂k + O(k²) (George 1973; George &amp; Liu 1981, §8.1 — from memory), so on 200 × 200 the ratio
 * must be well above 3. Measured here: natural 8 000 199, coordinate nested dissection 1 249 932 (6.4×), graph
 * nested dissection 944 627 (8.5×), reverse Cuthill–McKee 5 393 100.
 */
class OrderingTest {

    private static List<Ordering> all(Meshes.Mesh m) {
        List<Ordering> list = new ArrayList<>();
        list.add(Ordering.natural(m.n()));
        list.add(Ordering.nestedDissection(m.a(), m.x(), m.y()));
        list.add(Ordering.nestedDissection(m.a()));
        list.add(Ordering.reverseCuthillMcKee(m.a()));
        list.add(Ordering.automatic(m.a(), m.x(), m.y()));
        list.add(Ordering.automatic(m.a(), null, null));
        return list;
    }

    private static void assertPermutation(Ordering o, int n) {
        assertEquals(n, o.size());
        boolean[] seen = new boolean[n];
        int[] p = o.toArray();
        for (int k = 0; k < n; k++) {
            int old = p[k];
            assertTrue(old >= 0 && old < n, o + ": entry " + k + " = " + old);
            assertTrue(!seen[old], o + ": " + old + " repeated");
            seen[old] = true;
            assertEquals(k, o.oldToNew(old));
            assertEquals(old, o.newToOld(k));
        }
    }

    @Test
    void everyOrderingIsAPermutation() {
        List<Meshes.Mesh> meshes = List.of(Meshes.laplace5(1), Meshes.laplace5(37), Meshes.p1Square(23, 0.2, 5),
                Meshes.p2Square(9, 0.15, 6), disconnected());
        for (Meshes.Mesh m : meshes) {
            for (Ordering o : all(m)) {
                assertPermutation(o, m.n());
            }
        }
    }

    @Test
    void orderingsAreDeterministic() {
        Meshes.Mesh m = Meshes.p2Square(12, 0.2, 9);
        assertArrayEquals(Ordering.nestedDissection(m.a(), m.x(), m.y()).toArray(),
                Ordering.nestedDissection(m.a(), m.x(), m.y()).toArray());
        assertArrayEquals(Ordering.nestedDissection(m.a()).toArray(), Ordering.nestedDissection(m.a()).toArray());
        assertArrayEquals(Ordering.reverseCuthillMcKee(m.a()).toArray(), Ordering.reverseCuthillMcKee(m.a()).toArray());
    }

    @Test
    void methodsAreReported() {
        Meshes.Mesh m = Meshes.laplace5(20);
        assertEquals(Ordering.Method.NESTED_DISSECTION_COORDINATES, Ordering.automatic(m.a(), m.x(), m.y()).method());
        assertEquals(Ordering.Method.NESTED_DISSECTION_GRAPH, Ordering.automatic(m.a(), null, null).method());
        assertEquals(Ordering.Method.NATURAL, Ordering.natural(3).method());
        assertEquals(Ordering.Method.GIVEN, Ordering.of(new int[] {2, 0, 1}).method());
    }

    @Test
    void nestedDissectionReducesFillOnA200By200Grid() {
        Meshes.Mesh m = Meshes.laplace5(200);
        long natural = fill(m, Ordering.natural(m.n()));
        long coordinates = fill(m, Ordering.nestedDissection(m.a(), m.x(), m.y()));
        long graph = fill(m, Ordering.nestedDissection(m.a()));
        long rcm = fill(m, Ordering.reverseCuthillMcKee(m.a()));
        String report = "nnz(L): natural " + natural + ", ND coordinates " + coordinates + ", ND graph " + graph
                + ", RCM " + rcm;
        // banded order: fill stays inside the envelope and fills it (George & Liu 1981, ch. 4 — from memory); row i
        // of L spans columns i − k … i (k + 1 entries) beyond the first grid row, whose rows hold 1, 2, 2, … entries
        int k = 200;
        assertEquals((long) (m.n() - k) * (k + 1) + 2 * k - 1, natural, report);
        assertTrue(natural >= 3 * coordinates, report);
        assertTrue(natural >= 3 * graph, report);
        assertTrue(rcm < natural, report);
    }

    @Test
    void nestedDissectionReducesFillOnAnIrregularP2Mesh() {
        Meshes.Mesh m = Meshes.p2Square(60, 0.2, 11);
        long natural = fill(m, Ordering.natural(m.n()));
        long coordinates = fill(m, Ordering.nestedDissection(m.a(), m.x(), m.y()));
        assertTrue(natural >= 3 * coordinates, "nnz(L): natural " + natural + ", ND coordinates " + coordinates);
    }

    @Test
    void givenPermutationIsValidated() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Ordering.of(new int[] {0, 2, 2}));
        assertTrue(e.getMessage().contains("newToOld[2] = 2"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Ordering.of(new int[] {0, 3}));
        assertTrue(e.getMessage().contains("newToOld[1] = 3"), e.getMessage());
        Meshes.Mesh m = Meshes.laplace5(3);
        e = assertThrows(IllegalArgumentException.class,
                () -> Ordering.nestedDissection(m.a(), new double[9], new double[] {0, 0, 0, 0, Double.NaN, 0, 0, 0, 0}));
        assertTrue(e.getMessage().contains("node 4"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Ordering.nestedDissection(m.a(), new double[8], new double[9]));
        assertTrue(e.getMessage().contains("x.length = 8"), e.getMessage());
    }

    private static long fill(Meshes.Mesh m, Ordering o) {
        return new CholeskySymbolic(m.a(), new boolean[m.n()], o).nnzL;
    }

    /** Three grids side by side without connections, plus isolated nodes and coincident coordinates. */
    static Meshes.Mesh disconnected() {
        Meshes.Mesh g = Meshes.laplace5(15);
        int n1 = g.n();
        int n = 3 * n1 + 40;
        SparseMatrixBuilder b = new SparseMatrixBuilder(n, Input.ONE_TRIANGLE);
        double[] x = new double[n];
        double[] y = new double[n];
        int[] rs = g.a().rowStart();
        int[] ci = g.a().columns();
        double[] v = g.a().values();
        for (int copy = 0; copy < 3; copy++) {
            int off = copy * n1;
            for (int i = 0; i < n1; i++) {
                x[off + i] = g.x()[i] + (copy == 2 ? 0 : 20 * copy);
                y[off + i] = g.y()[i]; // copy 2 lies on top of copy 0
                for (int p = rs[i]; p < rs[i + 1]; p++) {
                    if (ci[p] <= i) {
                        b.add(off + i, off + ci[p], v[p]);
                    }
                }
            }
        }
        for (int i = 3 * n1; i < n; i++) {
            b.add(i, i, 1);
            x[i] = 5;
            y[i] = 5;
        }
        return new Meshes.Mesh(b.build(), x, y, new int[0]);
    }
}
