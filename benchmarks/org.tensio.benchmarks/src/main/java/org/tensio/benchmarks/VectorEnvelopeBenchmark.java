package org.tensio.benchmarks;

import java.util.Arrays;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.tensio.engine.checks.EnvelopeKernel;

/**
 * {@link VectorEnvelopeKernel} (Vector API, register-blocked) on the data of {@link EnvelopeBenchmark}, 1 and 2
 * threads. Its fork runs with {@code --add-modules jdk.incubator.vector}. Before measuring, the setup checks on
 * a slice of the data (4 101 points: a partial last vector, 300 cases: a partial last chunk) that it gives the
 * engine kernel's result exactly (values with ==, cases equal), and fails the run otherwise.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 1)
@Fork(value = 1, jvmArgsAppend = {"-Xmx6g", "--add-modules=jdk.incubator.vector"})
public class VectorEnvelopeBenchmark {

    @Param({"1", "2"})
    public int threads;

    private VectorEnvelopeKernel kernel;

    @Setup(Level.Trial)
    public void setup(EnvelopeBenchmark.Data d) {
        int n = Math.min(4101, d.points), nc = Math.min(300, d.cases);
        double[][] c = new double[9][];
        for (int k = 0; k < 9; k++) {
            c[k] = Arrays.copyOf(d.c[k], n);
        }
        double[] f = Arrays.copyOf(d.table, 6 * nc);
        EnvelopeKernel.Result want = new EnvelopeKernel(c[0], c[1], c[2], c[3], c[4], c[5], c[6], c[7], c[8])
                .envelope(f, EnvelopeKernel.Options.defaults().withSkip(false));
        String diff = new VectorEnvelopeKernel(c[0], c[1], c[2], c[3], c[4], c[5], c[6], c[7], c[8]).envelope(f, 2)
                .differenceFrom(want);
        if (diff != null) {
            throw new IllegalStateException("vector kernel differs from the engine kernel: " + diff);
        }
        double[][] a = d.c;
        kernel = new VectorEnvelopeKernel(a[0], a[1], a[2], a[3], a[4], a[5], a[6], a[7], a[8]);
    }

    @Benchmark
    public VectorEnvelopeKernel.Result vector(EnvelopeBenchmark.Data d) {
        return kernel.envelope(d.table, threads);
    }
}
