package org.tensio.engine.fem;

import java.util.Arrays;

/** Growable (row, column, value) triplets of a symmetric matrix; only entries with row ≥ column are kept. */
final class Triplets {

    int size;
    int[] rows = new int[1024];
    int[] cols = new int[1024];
    double[] vals = new double[1024];

    void add(int r, int c, double v) {
        if (r < c) {
            int t = r;
            r = c;
            c = t;
        }
        if (size == rows.length) {
            int n = size * 2;
            rows = Arrays.copyOf(rows, n);
            cols = Arrays.copyOf(cols, n);
            vals = Arrays.copyOf(vals, n);
        }
        rows[size] = r;
        cols[size] = c;
        vals[size] = v;
        size++;
    }
}
