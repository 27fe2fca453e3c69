package org.tensio.engine.checks;

import java.util.concurrent.atomic.AtomicInteger;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.LongVector;
import jdk.incubator.vector.VectorMask;
import jdk.incubator.vector.VectorOperators;
import jdk.incubator.vector.VectorSpecies;

/**
 * The vector path of {@link EnvelopeKernel} ({@link EnvelopeKernel.Implementation#VECTOR}), written with the
 * JDK's incubating Vector API and register-blocked: one vector of points ({@link #SPECIES}, 8 doubles with
 * AVX-512) keeps its nine coefficients and its running extremes in registers while every case streams past as
 * six broadcasts. Loaded only by {@link VectorSupport}, reflectively, when the module is there; this is the only
 * class of the engine that refers to {@code jdk.incubator.vector}.
 * <p>
 * <b>Same bits as the scalar path.</b> σz, τzx, τzy and the squares are the same fused expressions in the same
 * order ({@link EnvelopeKernel#sigmaZ} etc.), the cases are taken in the same chunks of
 * {@link EnvelopeKernel#chunkSize(int)} with the same strict merge (an equal value keeps the earlier chunk), and
 * the governing case is found by the same final pass ({@link EnvelopeKernel#firstCase}). Within a chunk each
 * extreme is a 64-bit integer max or min on order-preserving keys of the doubles, key = bits ^ ((bits >> 63) &
 * 0x7fff_ffff_ffff_ffff), which orders as {@link Math#max} and {@link Math#min} do on non-NaN values (−0.0 below
 * +0.0); the squares are never negative, so their raw bits order as they do. The keys are cheaper than
 * {@code Math.max}'s vectorised NaN and −0.0 handling. Points past the tile's last full vector are computed with
 * the scalar expressions in the same chunk order.
 * <p>
 * <b>Skipping.</b> With {@link EnvelopeKernel.Options#skip()}, per tile the same bounds and the same
 * {@link EnvelopeKernel#SEEDS} seeds as the scalar path give thresholds, and the cases whose bounds are strictly
 * below them are left out of the tile's case list before its vectors run. The thresholds are not raised while
 * the cases run (a vector sees all cases before the next vector starts), so this path skips fewer point-cases
 * than the scalar one; the result is the same. No value can overflow: {@link EnvelopeKernel} runs this path only
 * when a bound on every square is finite.
 */
final class VectorEnvelopeKernel implements VectorSupport.Path {

    /** The preferred species of the machine (512 bits with AVX-512). */
    static final VectorSpecies<Double> SPECIES = DoubleVector.SPECIES_PREFERRED;
    /** Longs of the same shape, for the order-preserving keys. */
    static final VectorSpecies<Long> LONGS = SPECIES.withLanes(long.class);

    VectorEnvelopeKernel() {
    }

    @Override
    public int lanes() {
        return SPECIES.length();
    }

    @Override
    public TileWorker worker(EnvelopeKernel kernel, double[] cases, EnvelopeKernel.Options options,
            EnvelopeKernel.Result result, AtomicInteger next, int tiles) {
        return new Worker(kernel, cases, options, result, next, tiles);
    }

    /** One thread: per tile the case list (after skipping), then the vectors, then the scalar tail. */
    private static final class Worker extends TileWorker {
        final EnvelopeKernel k;
        final double[] f;
        final int nc;
        final boolean tau;
        final boolean skip;
        final int chunk;
        final int chunks;
        final double[] a1;
        final double[] a2;
        final double[] a3;
        final double[] b1;
        final double[] b2;
        final double[] b3;
        final double[] c1;
        final double[] c2;
        final double[] c3;
        /** The tile's cases in table order; chunk ck is keep[from[ck]] .. keep[from[ck + 1] − 1]. */
        final int[] keep;
        final int[] from;
        final double[] bSU;
        final double[] bSL;
        final double[] bVm;
        final double[] bTm;
        /** One vector's running extremes and chunks, read back per lane. */
        final double[] lane;
        final double[] laneChunk;
        /** Scratch of {@link #extremes}: σz max, σz min, von Mises square max, τmax square max. */
        final double[] ext = new double[4];

        Worker(EnvelopeKernel k, double[] f, EnvelopeKernel.Options o, EnvelopeKernel.Result r, AtomicInteger next,
                int tiles) {
            super(r, next, tiles, o.tile(), k.size());
            this.k = k;
            this.f = f;
            this.nc = f.length / EnvelopeKernel.COMPONENTS;
            this.tau = o.tauMax();
            this.skip = o.skip();
            this.chunk = EnvelopeKernel.chunkSize(nc);
            this.chunks = (nc + chunk - 1) / chunk;
            double[][] c = k.coefficients();
            a1 = c[0];
            a2 = c[1];
            a3 = c[2];
            b1 = c[3];
            b2 = c[4];
            b3 = c[5];
            c1 = c[6];
            c2 = c[7];
            c3 = c[8];
            keep = new int[nc];
            from = new int[chunks + 1];
            for (int i = 0; i < nc; i++) {
                keep[i] = i;
            }
            for (int ck = 0; ck <= chunks; ck++) {
                from[ck] = Math.min(nc, ck * chunk);
            }
            bSU = skip ? new double[nc] : null;
            bSL = skip ? new double[nc] : null;
            bVm = skip ? new double[nc] : null;
            bTm = skip && tau ? new double[nc] : null;
            lane = new double[SPECIES.length()];
            laneChunk = new double[SPECIES.length()];
        }

        @Override
        void tile(int p0, int p1) {
            int m = skip ? select(p0, p1) : nc;
            evaluated += (long) m * (p1 - p0);
            skipped += (long) (nc - m) * (p1 - p0);
            int p = p0;
            for (int len = SPECIES.length(); p + len <= p1; p += len) {
                vector(p);
            }
            for (; p < p1; p++) {
                scalar(p);
            }
        }

        /**
         * Fills {@link #keep} and {@link #from} with the cases that the seeds' thresholds over the tile cannot
         * exclude (the scalar path's rule: skip when every bound is strictly below its threshold).
         *
         * @return the number of cases kept
         */
        int select(int p0, int p1) {
            k.bounds(p0, p1, f, tau, bSU, bSL, bVm, bTm);
            int[] seeds = EnvelopeKernel.seeds(bVm, nc);
            double thMax = Double.POSITIVE_INFINITY, thMin = Double.NEGATIVE_INFINITY;
            double thVm = Double.POSITIVE_INFINITY, thTm = Double.POSITIVE_INFINITY;
            for (int i = p0; i < p1; i++) {
                extremes(i, seeds, 0, seeds.length);
                thMax = Math.min(thMax, ext[0]);
                thMin = Math.max(thMin, ext[1]);
                thVm = Math.min(thVm, ext[2]);
                thTm = Math.min(thTm, ext[3]);
            }
            int m = 0;
            for (int ck = 0; ck < chunks; ck++) {
                from[ck] = m;
                for (int c = ck * chunk, c1 = Math.min(nc, c + chunk); c < c1; c++) {
                    if (!(bSU[c] < thMax && bSL[c] > thMin && bVm[c] < thVm && (!tau || bTm[c] < thTm))) {
                        keep[m++] = c;
                    }
                }
            }
            from[chunks] = m;
            return m;
        }

        /** One vector of points at p against the tile's cases. */
        private void vector(int p) {
            final VectorSpecies<Double> s = SPECIES;
            final VectorSpecies<Long> sl = LONGS;
            final double[] f = this.f;
            final int[] keep = this.keep;
            final boolean tau = this.tau;
            DoubleVector va1 = DoubleVector.fromArray(s, a1, p), va2 = DoubleVector.fromArray(s, a2, p);
            DoubleVector va3 = DoubleVector.fromArray(s, a3, p), vb1 = DoubleVector.fromArray(s, b1, p);
            DoubleVector vb2 = DoubleVector.fromArray(s, b2, p), vb3 = DoubleVector.fromArray(s, b3, p);
            DoubleVector vc1 = DoubleVector.fromArray(s, c1, p), vc2 = DoubleVector.fromArray(s, c2, p);
            DoubleVector vc3 = DoubleVector.fromArray(s, c3, p);
            DoubleVector three = DoubleVector.broadcast(s, 3.0), quarter = DoubleVector.broadcast(s, 0.25);
            LongVector magnitude = LongVector.broadcast(sl, Long.MAX_VALUE);
            LongVector lowest = LongVector.broadcast(sl, Long.MIN_VALUE);
            LongVector highest = LongVector.broadcast(sl, Long.MAX_VALUE);
            DoubleVector rHi = DoubleVector.broadcast(s, Double.NEGATIVE_INFINITY);
            DoubleVector rLo = DoubleVector.broadcast(s, Double.POSITIVE_INFINITY);
            DoubleVector rVm = rHi, rTm = rHi;
            DoubleVector kHi = DoubleVector.broadcast(s, -1), kLo = kHi, kVm = kHi, kTm = kHi;
            for (int ck = 0; ck < chunks; ck++) {
                int j0 = from[ck], j1 = from[ck + 1];
                if (j0 == j1) {
                    continue;
                }
                LongVector hi = lowest, lo = highest, vm = lowest, tm = lowest;
                for (int j = j0; j < j1; j++) {
                    int o = EnvelopeKernel.COMPONENTS * keep[j];
                    DoubleVector n = DoubleVector.broadcast(s, f[o + EnvelopeKernel.N]);
                    DoubleVector vx = DoubleVector.broadcast(s, f[o + EnvelopeKernel.VX]);
                    DoubleVector vy = DoubleVector.broadcast(s, f[o + EnvelopeKernel.VY]);
                    DoubleVector mx = DoubleVector.broadcast(s, f[o + EnvelopeKernel.MX]);
                    DoubleVector my = DoubleVector.broadcast(s, f[o + EnvelopeKernel.MY]);
                    DoubleVector t = DoubleVector.broadcast(s, f[o + EnvelopeKernel.T]);
                    DoubleVector sz = va3.fma(my, va2.fma(mx, va1.mul(n)));
                    DoubleVector tx = vb3.fma(vy, vb2.fma(vx, vb1.mul(t)));
                    DoubleVector ty = vc3.fma(vy, vc2.fma(vx, vc1.mul(t)));
                    DoubleVector sq = sz.mul(sz), tt = tx.fma(tx, ty.mul(ty));
                    LongVector bits = sz.reinterpretAsLongs();
                    LongVector key = bits.lanewise(VectorOperators.XOR,
                            bits.lanewise(VectorOperators.ASHR, 63).and(magnitude));
                    hi = hi.max(key);
                    lo = lo.min(key);
                    vm = vm.max(three.fma(tt, sq).reinterpretAsLongs());
                    if (tau) {
                        tm = tm.max(quarter.fma(sq, tt).reinterpretAsLongs());
                    }
                }
                DoubleVector c = DoubleVector.broadcast(s, ck);
                DoubleVector v = unkey(hi, magnitude);
                VectorMask<Double> better = v.compare(VectorOperators.GT, rHi);
                rHi = rHi.blend(v, better);
                kHi = kHi.blend(c, better);
                v = unkey(lo, magnitude);
                better = v.compare(VectorOperators.LT, rLo);
                rLo = rLo.blend(v, better);
                kLo = kLo.blend(c, better);
                v = vm.reinterpretAsDoubles();
                better = v.compare(VectorOperators.GT, rVm);
                rVm = rVm.blend(v, better);
                kVm = kVm.blend(c, better);
                if (tau) {
                    v = tm.reinterpretAsDoubles();
                    better = v.compare(VectorOperators.GT, rTm);
                    rTm = rTm.blend(v, better);
                    kTm = kTm.blend(c, better);
                }
            }
            EnvelopeKernel.Result r = this.r;
            rHi.intoArray(r.sMax, p);
            rLo.intoArray(r.sMin, p);
            resolve(p, rHi, kHi, r.sMaxCase, 0);
            resolve(p, rLo, kLo, r.sMinCase, 1);
            resolve(p, rVm, kVm, r.vmCase, 2);
            rVm.lanewise(VectorOperators.SQRT).intoArray(r.vm, p);
            if (tau) {
                resolve(p, rTm, kTm, r.tmCase, 3);
                rTm.lanewise(VectorOperators.SQRT).intoArray(r.tm, p);
            }
        }

        /** The governing cases of one vector's lanes: quantity q's extremes v, reached first in chunks ck. */
        private void resolve(int p, DoubleVector v, DoubleVector ck, int[] cases, int q) {
            v.intoArray(lane, 0);
            ck.intoArray(laneChunk, 0);
            for (int j = 0; j < lane.length; j++) {
                cases[p + j] = k.firstCase(f, chunk, p + j, (int) laneChunk[j], lane[j], q);
            }
        }

        private static DoubleVector unkey(LongVector key, LongVector magnitude) {
            return key.lanewise(VectorOperators.XOR, key.lanewise(VectorOperators.ASHR, 63).and(magnitude))
                    .reinterpretAsDoubles();
        }

        /**
         * Fills {@link #ext} with the largest and smallest σz, the largest von Mises square and (with τmax) the
         * largest τmax square at point i over the cases {@code cases[j0..j1)}, with the scalar expressions and
         * {@link Math#max}/{@link Math#min} as the scalar path folds them.
         */
        private void extremes(int i, int[] cases, int j0, int j1) {
            double hi = Double.NEGATIVE_INFINITY, lo = Double.POSITIVE_INFINITY;
            double vm = Double.NEGATIVE_INFINITY, tm = Double.NEGATIVE_INFINITY;
            for (int j = j0; j < j1; j++) {
                int c = cases[j];
                double s = k.sigmaZ(i, f, c);
                hi = Math.max(hi, s);
                lo = Math.min(lo, s);
                vm = Math.max(vm, k.vonMisesSquare(i, f, c));
                if (tau) {
                    tm = Math.max(tm, k.tauMaxSquare(i, f, c));
                }
            }
            ext[0] = hi;
            ext[1] = lo;
            ext[2] = vm;
            ext[3] = tm;
        }

        /** One point with the scalar expressions, chunk by chunk as the vectors do it. */
        private void scalar(int i) {
            double rHi = Double.NEGATIVE_INFINITY, rLo = Double.POSITIVE_INFINITY;
            double rVm = Double.NEGATIVE_INFINITY, rTm = Double.NEGATIVE_INFINITY;
            int kHi = -1, kLo = -1, kVm = -1, kTm = -1;
            for (int ck = 0; ck < chunks; ck++) {
                int j0 = from[ck], j1 = from[ck + 1];
                if (j0 == j1) {
                    continue;
                }
                extremes(i, keep, j0, j1);
                double hi = ext[0], lo = ext[1], vm = ext[2], tm = ext[3];
                if (hi > rHi) {
                    rHi = hi;
                    kHi = ck;
                }
                if (lo < rLo) {
                    rLo = lo;
                    kLo = ck;
                }
                if (vm > rVm) {
                    rVm = vm;
                    kVm = ck;
                }
                if (tau && tm > rTm) {
                    rTm = tm;
                    kTm = ck;
                }
            }
            EnvelopeKernel.Result r = this.r;
            r.sMax[i] = rHi;
            r.sMin[i] = rLo;
            r.sMaxCase[i] = k.firstCase(f, chunk, i, kHi, rHi, 0);
            r.sMinCase[i] = k.firstCase(f, chunk, i, kLo, rLo, 1);
            r.vmCase[i] = k.firstCase(f, chunk, i, kVm, rVm, 2);
            r.vm[i] = Math.sqrt(rVm);
            if (tau) {
                r.tmCase[i] = k.firstCase(f, chunk, i, kTm, rTm, 3);
                r.tm[i] = Math.sqrt(rTm);
            }
        }
    }
}
