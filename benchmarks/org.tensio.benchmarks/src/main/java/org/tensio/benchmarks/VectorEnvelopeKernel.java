package org.tensio.benchmarks;

import java.util.concurrent.atomic.AtomicInteger;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.LongVector;
import jdk.incubator.vector.VectorMask;
import jdk.incubator.vector.VectorOperators;
import jdk.incubator.vector.VectorSpecies;
import org.tensio.engine.checks.EnvelopeKernel;

/**
 * The envelope kernel of {@link EnvelopeKernel} (largest and smallest σz, largest von Mises stress, with the
 * first governing case) written with the JDK's incubating Vector API, register-blocked: one vector of points
 * (8 doubles with AVX-512) keeps its nine coefficients and the running extremes in registers while every case
 * streams past as six broadcasts. Benchmark-only: it needs {@code --add-modules jdk.incubator.vector} at compile
 * and run time; the engine's {@link EnvelopeKernel} (plain Java, auto-vectorised by C2) is the portable version
 * and gives the same bits.
 * <p>
 * Per case and vector: 13 arithmetic instructions (3 of them multiplies, 10 fused multiply-adds), 3 integer
 * instructions making σz an order-preserving long key and three 64-bit integer max/min for the extremes of the
 * current chunk of {@link #CHUNK} cases (cheaper than {@link Math#max}'s NaN and −0.0 handling or a compare and
 * a blend); at the end of a chunk the chunk extremes are folded into the running ones with the chunk number. The governing case is then found per
 * point by re-evaluating the cases of that chunk with {@link EnvelopeKernel#sigmaZ} and
 * {@link EnvelopeKernel#vonMisesSquare} — the same fused expressions in the same order, hence the same bits — and
 * taking the first equal one. Points past the last full vector are done with those scalar expressions. No
 * skipping.
 */
public final class VectorEnvelopeKernel {

    /** The preferred species of the machine (512 bits with AVX-512). */
    public static final VectorSpecies<Double> SPECIES = DoubleVector.SPECIES_PREFERRED;
    /** Longs of the same shape, for the order-preserving keys. */
    static final VectorSpecies<Long> LONGS = SPECIES.withLanes(long.class);
    /** Cases per chunk. */
    public static final int CHUNK = 64;
    /** Points per work item handed to a thread. */
    static final int BLOCK = 512;

    private final double[] a1;
    private final double[] a2;
    private final double[] a3;
    private final double[] b1;
    private final double[] b2;
    private final double[] b3;
    private final double[] c1;
    private final double[] c2;
    private final double[] c3;
    private final EnvelopeKernel scalar;
    private final int size;

    /** The nine coefficient arrays as for {@link EnvelopeKernel} (not copied). */
    public VectorEnvelopeKernel(double[] a1, double[] a2, double[] a3, double[] b1, double[] b2, double[] b3,
            double[] c1, double[] c2, double[] c3) {
        this.scalar = new EnvelopeKernel(a1, a2, a3, b1, b2, b3, c1, c2, c3); // validates
        this.a1 = a1;
        this.a2 = a2;
        this.a3 = a3;
        this.b1 = b1;
        this.b2 = b2;
        this.b3 = b3;
        this.c1 = c1;
        this.c2 = c2;
        this.c3 = c3;
        this.size = a1.length;
    }

    /** The envelope: per point the largest and smallest σz, the largest von Mises stress and their cases. */
    public static final class Result {
        public final double[] sigmaZMax;
        public final double[] sigmaZMin;
        public final double[] vonMises;
        public final int[] sigmaZMaxCase;
        public final int[] sigmaZMinCase;
        public final int[] vonMisesCase;

        Result(int n) {
            sigmaZMax = new double[n];
            sigmaZMin = new double[n];
            vonMises = new double[n];
            sigmaZMaxCase = new int[n];
            sigmaZMinCase = new int[n];
            vonMisesCase = new int[n];
        }

        /**
         * @return null when this equals the engine kernel's result exactly (values compared with ==, so a zero
         *         extreme may differ in sign only), else a description of the first difference
         */
        public String differenceFrom(EnvelopeKernel.Result r) {
            for (int i = 0; i < vonMises.length; i++) {
                if (sigmaZMax[i] != r.sigmaZMax(i) || sigmaZMin[i] != r.sigmaZMin(i) || vonMises[i] != r.vonMises(i)
                        || sigmaZMaxCase[i] != r.sigmaZMaxCase(i) || sigmaZMinCase[i] != r.sigmaZMinCase(i)
                        || vonMisesCase[i] != r.vonMisesCase(i)) {
                    return "point " + i + ": vector " + sigmaZMax[i] + "/" + sigmaZMaxCase[i] + ", " + sigmaZMin[i] + "/"
                            + sigmaZMinCase[i] + ", " + vonMises[i] + "/" + vonMisesCase[i] + "; engine " + r.sigmaZMax(i)
                            + "/" + r.sigmaZMaxCase(i) + ", " + r.sigmaZMin(i) + "/" + r.sigmaZMinCase(i) + ", "
                            + r.vonMises(i) + "/" + r.vonMisesCase(i);
                }
            }
            return null;
        }
    }

    /**
     * @param f       case table, 6 values per case (N, Vx, Vy, Mx, My, T), at least one case
     * @param threads worker threads, ≥ 1; results do not depend on it
     */
    public Result envelope(double[] f, int threads) {
        if (f.length == 0 || f.length % 6 != 0) {
            throw new IllegalArgumentException("cases: 6 values per case and at least one case, got " + f.length);
        }
        Result r = new Result(size);
        int blocks = (size + BLOCK - 1) / BLOCK;
        AtomicInteger next = new AtomicInteger();
        Runnable work = () -> {
            for (int b = next.getAndIncrement(); b < blocks; b = next.getAndIncrement()) {
                block(f, b * BLOCK, Math.min(size, (b + 1) * BLOCK), r);
            }
        };
        if (threads <= 1) {
            work.run();
        } else {
            Thread[] t = new Thread[threads];
            for (int k = 0; k < threads; k++) {
                t[k] = new Thread(work, "vector-envelope-" + k);
                t[k].start();
            }
            for (Thread x : t) {
                try {
                    x.join();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new IllegalStateException("interrupted", e);
                }
            }
        }
        return r;
    }

    private void block(double[] f, int p0, int p1, Result r) {
        int nc = f.length / 6, len = SPECIES.length();
        int p = p0;
        for (; p + len <= p1; p += len) {
            vector(f, nc, p, r);
        }
        for (; p < p1; p++) {
            tail(f, nc, p, r);
        }
    }

    /**
     * One vector of points against every case. The extremes are kept as order-preserving long keys: for σz,
     * key = bits ^ ((bits >> 63) & 0x7fff_ffff_ffff_ffff) orders as the doubles do (−0.0 just below +0.0, as
     * {@link Math#max} does), so a signed 64-bit max/min (one instruction each with AVX-512) replaces a compare
     * and a blend; the von Mises square is never negative nor −0.0 (fma(3, a, b) of non-negative a, b), so its raw
     * bits order as it does. The map is its own inverse.
     */
    private void vector(double[] f, int nc, int p, Result r) {
        final VectorSpecies<Double> s = SPECIES;
        final VectorSpecies<Long> sl = LONGS;
        DoubleVector va1 = DoubleVector.fromArray(s, a1, p), va2 = DoubleVector.fromArray(s, a2, p);
        DoubleVector va3 = DoubleVector.fromArray(s, a3, p), vb1 = DoubleVector.fromArray(s, b1, p);
        DoubleVector vb2 = DoubleVector.fromArray(s, b2, p), vb3 = DoubleVector.fromArray(s, b3, p);
        DoubleVector vc1 = DoubleVector.fromArray(s, c1, p), vc2 = DoubleVector.fromArray(s, c2, p);
        DoubleVector vc3 = DoubleVector.fromArray(s, c3, p);
        DoubleVector three = DoubleVector.broadcast(s, 3.0);
        LongVector magnitude = LongVector.broadcast(sl, Long.MAX_VALUE);
        LongVector lowest = LongVector.broadcast(sl, Long.MIN_VALUE), highest = LongVector.broadcast(sl, Long.MAX_VALUE);
        LongVector rHi = lowest, rLo = highest, rVm = lowest;
        LongVector kHi = LongVector.zero(sl), kLo = kHi, kVm = kHi;
        for (int k0 = 0, chunk = 0; k0 < nc; k0 += CHUNK, chunk++) {
            int k1 = Math.min(nc, k0 + CHUNK);
            LongVector hi = lowest, lo = highest, vm = lowest;
            for (int c = k0; c < k1; c++) {
                int o = 6 * c;
                DoubleVector n = DoubleVector.broadcast(s, f[o]), vx = DoubleVector.broadcast(s, f[o + 1]);
                DoubleVector vy = DoubleVector.broadcast(s, f[o + 2]), mx = DoubleVector.broadcast(s, f[o + 3]);
                DoubleVector my = DoubleVector.broadcast(s, f[o + 4]), t = DoubleVector.broadcast(s, f[o + 5]);
                // the expressions of EnvelopeKernel: fma(a3, My, fma(a2, Mx, a1·N)) etc.
                DoubleVector sz = va3.fma(my, va2.fma(mx, va1.mul(n)));
                DoubleVector tx = vb3.fma(vy, vb2.fma(vx, vb1.mul(t)));
                DoubleVector ty = vc3.fma(vy, vc2.fma(vx, vc1.mul(t)));
                DoubleVector v = three.fma(tx.fma(tx, ty.mul(ty)), sz.mul(sz));
                LongVector bits = sz.reinterpretAsLongs();
                LongVector key = bits.lanewise(VectorOperators.XOR, bits.lanewise(VectorOperators.ASHR, 63).and(magnitude));
                hi = hi.max(key);
                lo = lo.min(key);
                vm = vm.max(v.reinterpretAsLongs());
            }
            LongVector ck = LongVector.broadcast(sl, chunk);
            VectorMask<Long> m = hi.compare(VectorOperators.GT, rHi);
            rHi = rHi.blend(hi, m);
            kHi = kHi.blend(ck, m);
            m = lo.compare(VectorOperators.LT, rLo);
            rLo = rLo.blend(lo, m);
            kLo = kLo.blend(ck, m);
            m = vm.compare(VectorOperators.GT, rVm);
            rVm = rVm.blend(vm, m);
            kVm = kVm.blend(ck, m);
        }
        DoubleVector hiD = rHi.lanewise(VectorOperators.XOR, rHi.lanewise(VectorOperators.ASHR, 63).and(magnitude))
                .reinterpretAsDoubles();
        DoubleVector loD = rLo.lanewise(VectorOperators.XOR, rLo.lanewise(VectorOperators.ASHR, 63).and(magnitude))
                .reinterpretAsDoubles();
        DoubleVector vmD = rVm.reinterpretAsDoubles();
        hiD.intoArray(r.sigmaZMax, p);
        loD.intoArray(r.sigmaZMin, p);
        vmD.lanewise(VectorOperators.SQRT).intoArray(r.vonMises, p);
        for (int j = 0; j < s.length(); j++) {
            int i = p + j;
            double vm2 = vmD.lane(j);
            if (!(vm2 < Double.POSITIVE_INFINITY)) {
                throw new ArithmeticException("von Mises square at point " + i + " overflows: " + vm2);
            }
            r.sigmaZMaxCase[i] = first(f, nc, i, (int) kHi.lane(j), hiD.lane(j), false);
            r.sigmaZMinCase[i] = first(f, nc, i, (int) kLo.lane(j), loD.lane(j), false);
            r.vonMisesCase[i] = first(f, nc, i, (int) kVm.lane(j), vm2, true);
        }
    }

    private int first(double[] f, int nc, int i, int chunk, double value, boolean vm) {
        for (int c = chunk * CHUNK, k1 = Math.min(nc, c + CHUNK); c < k1; c++) {
            double v = vm ? scalar.vonMisesSquare(i, f, c) : scalar.sigmaZ(i, f, c);
            if (v == value) {
                return c;
            }
        }
        throw new IllegalStateException("no case of chunk " + chunk + " gives " + value + " at point " + i);
    }

    private void tail(double[] f, int nc, int i, Result r) {
        double hi = Double.NEGATIVE_INFINITY, lo = Double.POSITIVE_INFINITY, vm = Double.NEGATIVE_INFINITY;
        int kh = 0, kl = 0, kv = 0;
        for (int c = 0; c < nc; c++) {
            double sz = scalar.sigmaZ(i, f, c), v = scalar.vonMisesSquare(i, f, c);
            if (sz > hi) {
                hi = sz;
                kh = c;
            }
            if (sz < lo) {
                lo = sz;
                kl = c;
            }
            if (v > vm) {
                vm = v;
                kv = c;
            }
        }
        r.sigmaZMax[i] = hi;
        r.sigmaZMin[i] = lo;
        r.vonMises[i] = Math.sqrt(vm);
        r.sigmaZMaxCase[i] = kh;
        r.sigmaZMinCase[i] = kl;
        r.vonMisesCase[i] = kv;
    }
}
