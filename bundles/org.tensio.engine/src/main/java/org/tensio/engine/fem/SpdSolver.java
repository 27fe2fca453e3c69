package org.tensio.engine.fem;

import org.tensio.engine.linalg.ProgressMonitor;

/** Factorises a symmetric positive definite system once and solves it for several right-hand sides. */
interface SpdSolver {

    /** A factorised matrix. */
    interface Factor {
        /** @return x with A x = b */
        double[] solve(double[] b);
    }

    /**
     * @param n       order
     * @param a       lower-triangle triplets (duplicates summed)
     * @param xy      coordinates of each unknown, {x0, y0, x1, y1, ...} (for geometric orderings), may be null
     * @param monitor progress and cancellation
     */
    Factor factor(int n, Triplets a, double[] xy, ProgressMonitor monitor);
}
