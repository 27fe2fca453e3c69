package org.tensio.engine.linalg;

/**
 * Progress reporting and cooperative cancellation for long linear-algebra operations (the numeric
 * factorisation of {@link SparseCholesky}, the iterations of {@link ConjugateGradient}). Headless: no UI type
 * is involved; a workbench adapts its own progress monitor to this interface.
 * <p>
 * Threading: the operation may call this monitor from worker threads, but never from two threads at once
 * (calls are serialised by the caller). Implementations must be cheap: {@link #isCancelled()} is polled every
 * few thousand eliminated columns (or every few dozen CG iterations).
 *
 * @since 0.1
 */
public interface ProgressMonitor {

    /** A monitor that ignores progress and never cancels. */
    ProgressMonitor NONE = new ProgressMonitor() {
        @Override
        public void worked(double fraction) {
            // ignored
        }

        @Override
        public boolean isCancelled() {
            return false;
        }
    };

    /**
     * Reports progress.
     *
     * @param fraction cumulative fraction of the work done so far, in [0, 1] and non-decreasing across calls
     *                 (not an increment); for a factorisation it is the share of the estimated floating-point
     *                 operations completed, and the last call passes exactly 1
     */
    void worked(double fraction);

    /**
     * Polled by the operation; once it returns true the operation stops at the next poll and throws
     * {@link java.util.concurrent.CancellationException}. Partial results are discarded.
     *
     * @return true when the caller wants the operation abandoned
     */
    boolean isCancelled();
}
