package org.tensio.engine.fem;

import org.tensio.engine.linalg.Ordering;
import org.tensio.engine.linalg.ProgressMonitor;
import org.tensio.engine.linalg.SparseCholesky;
import org.tensio.engine.linalg.SparseMatrixBuilder;
import org.tensio.engine.linalg.SymmetricCsr;

/** The engine's sparse Cholesky with coordinate nested dissection, behind {@link SpdSolver}. */
final class LinalgSolver implements SpdSolver {

    static final LinalgSolver INSTANCE = new LinalgSolver();

    private LinalgSolver() {
    }

    @Override
    public Factor factor(int n, Triplets t, double[] xy, ProgressMonitor monitor) {
        SparseMatrixBuilder b = new SparseMatrixBuilder(n, SparseMatrixBuilder.Input.ONE_TRIANGLE, t.size);
        for (int k = 0; k < t.size; k++) {
            b.add(t.rows[k], t.cols[k], t.vals[k]);
        }
        SymmetricCsr a = b.build();
        Ordering ordering;
        if (xy != null) {
            double[] x = new double[n], y = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = xy[2 * i];
                y[i] = xy[2 * i + 1];
            }
            ordering = Ordering.automatic(a, x, y);
        } else {
            ordering = Ordering.automatic(a, null, null);
        }
        SparseCholesky c = SparseCholesky.factor(a, new int[0], ordering,
                SparseCholesky.Options.defaults().withMonitor(monitor == null ? ProgressMonitor.NONE : monitor));
        return c::solve;
    }
}
