package org.tensio.benchmarks;

import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;

/**
 * This machine's vector floating-point peak as the JIT reaches it: Horner evaluation of a degree-8 polynomial
 * over 4096 doubles (32 KiB in, 32 KiB out: in L1/L2), 16 FLOPs per element (8 multiply-adds), independent
 * elements so that C2 vectorises the loop and the out-of-order core overlaps the dependency chains.
 * <p>
 * Throughput mode with {@link OperationsPerInvocation} = 16 × 4096: JMH's ops/µs are FLOPs per µs, i.e.
 * <b>divide by 1000 for GFLOP/s</b>. {@code fma} uses {@link Math#fma} (one fused instruction per multiply-add,
 * the hardware peak); {@code mulAdd} the plain {@code y * x + c}, which Java must round twice and C2 therefore
 * compiles to a multiply and an add (half the FMA peak). {@code *2} runs two threads, one array pair each.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 1)
@Fork(1)
public class PeakFlopsBenchmark {

    /** Elements per array. */
    public static final int SIZE = 4096;
    /** FLOPs per element: 8 multiplies + 8 adds. */
    public static final int FLOPS_PER_ELEMENT = 16;

    private double[] x;
    private double[] y;

    @Setup
    public void setup() {
        Random r = new Random(42);
        x = new double[SIZE];
        y = new double[SIZE];
        for (int i = 0; i < SIZE; i++) {
            x[i] = r.nextDouble(); // in [0, 1): the polynomial stays bounded
        }
    }

    @Benchmark
    @OperationsPerInvocation(FLOPS_PER_ELEMENT * SIZE)
    public double[] fma() {
        return hornerFma(x, y);
    }

    @Benchmark
    @Threads(2)
    @OperationsPerInvocation(FLOPS_PER_ELEMENT * SIZE)
    public double[] fma2() {
        return hornerFma(x, y);
    }

    @Benchmark
    @OperationsPerInvocation(FLOPS_PER_ELEMENT * SIZE)
    public double[] mulAdd() {
        return hornerMulAdd(x, y);
    }

    @Benchmark
    @Threads(2)
    @OperationsPerInvocation(FLOPS_PER_ELEMENT * SIZE)
    public double[] mulAdd2() {
        return hornerMulAdd(x, y);
    }

    static double[] hornerFma(double[] x, double[] y) {
        for (int i = 0; i < x.length; i++) {
            double t = x[i];
            double p = Math.fma(0.0078125, t, -0.0234375);
            p = Math.fma(p, t, 0.046875);
            p = Math.fma(p, t, -0.078125);
            p = Math.fma(p, t, 0.1171875);
            p = Math.fma(p, t, -0.1640625);
            p = Math.fma(p, t, 0.21875);
            p = Math.fma(p, t, -0.28125);
            p = Math.fma(p, t, 0.3515625);
            y[i] = p;
        }
        return y;
    }

    static double[] hornerMulAdd(double[] x, double[] y) {
        for (int i = 0; i < x.length; i++) {
            double t = x[i];
            double p = 0.0078125 * t - 0.0234375;
            p = p * t + 0.046875;
            p = p * t - 0.078125;
            p = p * t + 0.1171875;
            p = p * t - 0.1640625;
            p = p * t + 0.21875;
            p = p * t - 0.28125;
            p = p * t + 0.3515625;
            y[i] = p;
        }
        return y;
    }
}
