package org.tensio.engine.checks;

import java.util.concurrent.atomic.AtomicInteger;

/**
 * One thread of an {@link EnvelopeKernel} run: takes tiles of consecutive points from a shared counter until none
 * is left, and computes each tile completely ({@link #tile(int, int)}), so that a point's result never depends on
 * the thread count. Shared by the scalar and the vector implementation.
 */
abstract class TileWorker implements Runnable {

    final EnvelopeKernel.Result r;
    final AtomicInteger next;
    final int tiles;
    /** Points per tile. */
    final int tile;
    /** Points in all. */
    final int size;
    long evaluated;
    long skipped;
    private Throwable failure;

    TileWorker(EnvelopeKernel.Result r, AtomicInteger next, int tiles, int tile, int size) {
        this.r = r;
        this.next = next;
        this.tiles = tiles;
        this.tile = tile;
        this.size = size;
    }

    /** Computes points p0 (inclusive) to p1 (exclusive) completely and counts its point-cases. */
    abstract void tile(int p0, int p1);

    @Override
    public final void run() {
        try {
            for (int k = next.getAndIncrement(); k < tiles; k = next.getAndIncrement()) {
                int p0 = k * tile;
                tile(p0, Math.min(size, p0 + tile));
            }
            r.count(evaluated, skipped);
        } catch (RuntimeException | Error e) {
            failure = e;
            next.set(tiles); // the other workers stop after their current tile
        }
    }

    /**
     * Runs the workers, the first on the calling thread when it is the only one, otherwise each on a daemon thread
     * named {@code name + index}, and waits for all of them (an interrupt is kept and re-asserted, the run
     * finishes). Rethrows the first worker's failure.
     */
    static void runAll(TileWorker[] w, String name) {
        if (w.length == 1) {
            w[0].run();
        } else {
            Thread[] t = new Thread[w.length];
            for (int k = 0; k < w.length; k++) {
                t[k] = new Thread(w[k], name + k);
                t[k].setDaemon(true);
                t[k].start();
            }
            boolean interrupted = false;
            for (int k = 0; k < w.length; k++) {
                while (true) {
                    try {
                        t[k].join();
                        break;
                    } catch (InterruptedException e) {
                        interrupted = true; // finish the run: the workers stop by themselves
                    }
                }
            }
            if (interrupted) {
                Thread.currentThread().interrupt();
            }
        }
        for (TileWorker x : w) {
            if (x.failure instanceof RuntimeException re) {
                throw re;
            } else if (x.failure instanceof Error er) {
                throw er;
            }
        }
    }
}
