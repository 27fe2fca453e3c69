package org.tensio.engine.checks;

import java.lang.management.ManagementFactory;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Finds out once per JVM whether {@link EnvelopeKernel}'s vector path can run, without referring to the
 * incubating module in this class: the module {@value #MODULE} must be in the boot layer (the JVM was started with
 * {@code --add-modules jdk.incubator.vector}), the system property {@value #PROPERTY} must not be {@code false},
 * the JIT must not be limited to the client compiler, and the vector class ({@value #VECTOR_CLASS}, loaded
 * reflectively) must link — inside OSGi the bundle sees the module's package only through its optional import —
 * and reproduce the scalar kernel bit for bit on a small self-test. Otherwise {@link #PATH} is null and
 * {@link #STATUS} says why; nothing is thrown.
 */
final class VectorSupport {

    /** The incubating module. */
    static final String MODULE = "jdk.incubator.vector";
    /** The class compiled against it. */
    static final String VECTOR_CLASS = "org.tensio.engine.checks.VectorEnvelopeKernel";
    /** System property: {@code false} turns the vector path off. */
    static final String PROPERTY = "tensio.envelope.vector";

    /** The vector implementation, as the scalar kernel sees it. */
    interface Path {
        /** @return one thread's worker over the tiles of a run */
        TileWorker worker(EnvelopeKernel kernel, double[] cases, EnvelopeKernel.Options options,
                EnvelopeKernel.Result result, AtomicInteger next, int tiles);

        /** @return doubles per vector */
        int lanes();
    }

    /** The vector path, or null when it cannot run. */
    static final Path PATH;
    /** Why the vector path is or is not used, one line. */
    static final String STATUS;

    static {
        Path path = null;
        String status;
        try {
            status = obstacle();
            if (status == null) {
                path = (Path) Class.forName(VECTOR_CLASS, true, VectorSupport.class.getClassLoader())
                        .getDeclaredConstructor().newInstance();
                status = selfTest(path);
                if (status == null) {
                    status = "vector path: Vector API, " + path.lanes() + " doubles per vector";
                } else {
                    path = null;
                }
            }
        } catch (LinkageError | ReflectiveOperationException | RuntimeException e) {
            path = null;
            status = "scalar path: the vector class does not link (" + e + ")";
        }
        PATH = path;
        STATUS = status;
    }

    private VectorSupport() {
    }

    /** @return why the vector class must not even be loaded, or null */
    private static String obstacle() {
        if ("false".equals(System.getProperty(PROPERTY))) {
            return "scalar path: -D" + PROPERTY + "=false";
        }
        if (ModuleLayer.boot().findModule(MODULE).isEmpty()) {
            return "scalar path: module " + MODULE + " is not in the boot layer (start the JVM with --add-modules "
                    + MODULE + ")";
        }
        if (ModuleLayer.boot().findModule("java.management").isPresent()) {
            String limit = clientCompilerOnly(ManagementFactory.getRuntimeMXBean().getInputArguments());
            if (limit != null) {
                return "scalar path: " + limit + " limits the JIT to the client compiler, which does not compile"
                        + " the Vector API to vector instructions";
            }
        }
        return null;
    }

    /**
     * @return the JVM option (the last one wins, as in HotSpot) that keeps the server compiler C2 from running, or
     *         null: -Xint, or -XX:TieredStopAtLevel=0..3 while tiered compilation is on
     */
    static String clientCompilerOnly(List<String> jvmArguments) {
        String level = null;
        boolean tiered = true;
        boolean interpreted = false;
        for (String a : jvmArguments) {
            if (a.equals("-Xint")) {
                interpreted = true;
            } else if (a.equals("-Xmixed") || a.equals("-Xcomp")) {
                interpreted = false;
            } else if (a.startsWith("-XX:TieredStopAtLevel=")) {
                level = a;
            } else if (a.equals("-XX:-TieredCompilation")) {
                tiered = false;
            } else if (a.equals("-XX:+TieredCompilation")) {
                tiered = true;
            }
        }
        if (interpreted) {
            return "-Xint";
        }
        if (tiered && level != null && !level.endsWith("=4")) {
            return level;
        }
        return null;
    }

    /**
     * Runs both paths on a small field (two tiles, a partial vector, three chunks, exact ties, τmax, skipping on
     * and off) and compares every value bit for bit and every case.
     *
     * @return null when they agree, else what differs
     */
    private static String selfTest(Path path) {
        int n = 2 * 16 + path.lanes() + 3, nc = 3 * EnvelopeKernel.chunkSize(1) + 5;
        double[][] c = new double[9][n];
        long seed = 0x9E3779B97F4A7C15L;
        for (int k = 0; k < 9; k++) {
            for (int i = 0; i < n; i++) {
                seed = seed * 6364136223846793005L + 1442695040888963407L;
                c[k][i] = ((seed >>> 11) * 0x1.0p-53 - 0.5) * (k < 3 ? 1e-4 : 1e-3);
            }
        }
        double[] f = new double[EnvelopeKernel.COMPONENTS * nc];
        for (int i = 0; i < f.length; i++) {
            seed = seed * 6364136223846793005L + 1442695040888963407L;
            f[i] = ((seed >>> 11) * 0x1.0p-53 - 0.5) * 1e6 * (i % 17 == 0 ? 10 : 1);
        }
        System.arraycopy(f, 0, f, f.length - 2 * EnvelopeKernel.COMPONENTS, EnvelopeKernel.COMPONENTS); // a tie
        EnvelopeKernel k = new EnvelopeKernel(c[0], c[1], c[2], c[3], c[4], c[5], c[6], c[7], c[8]);
        for (boolean skip : new boolean[] {false, true}) {
            EnvelopeKernel.Options o = new EnvelopeKernel.Options(16, 1, true, skip,
                    EnvelopeKernel.Implementation.SCALAR);
            EnvelopeKernel.Result want = k.envelope(f, o);
            EnvelopeKernel.Result got = new EnvelopeKernel.Result(n, nc, true, EnvelopeKernel.Implementation.VECTOR);
            int tiles = (n + o.tile() - 1) / o.tile();
            TileWorker.runAll(new TileWorker[] {path.worker(k, f, o, got, new AtomicInteger(), tiles)}, "");
            String d = difference(want, got);
            if (d != null) {
                return "scalar path: the vector path's self-test differs from the scalar kernel (" + d + ")";
            }
        }
        return null;
    }

    /** @return null when a and b hold the same bits and cases, else the first difference */
    static String difference(EnvelopeKernel.Result a, EnvelopeKernel.Result b) {
        if (a.size() != b.size() || a.hasTauMax() != b.hasTauMax()) {
            return "sizes " + a + ", " + b;
        }
        for (int i = 0; i < a.size(); i++) {
            boolean same = bits(a.sigmaZMax(i)) == bits(b.sigmaZMax(i)) && bits(a.sigmaZMin(i)) == bits(b.sigmaZMin(i))
                    && bits(a.vonMises(i)) == bits(b.vonMises(i)) && a.sigmaZMaxCase(i) == b.sigmaZMaxCase(i)
                    && a.sigmaZMinCase(i) == b.sigmaZMinCase(i) && a.vonMisesCase(i) == b.vonMisesCase(i);
            if (same && a.hasTauMax()) {
                same = bits(a.tauMax(i)) == bits(b.tauMax(i)) && a.tauMaxCase(i) == b.tauMaxCase(i);
            }
            if (!same) {
                return "point " + i;
            }
        }
        return null;
    }

    private static long bits(double v) {
        return Double.doubleToRawLongBits(v);
    }
}
