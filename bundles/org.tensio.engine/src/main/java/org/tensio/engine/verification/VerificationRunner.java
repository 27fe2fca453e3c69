package org.tensio.engine.verification;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.time.Clock;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;

import org.tensio.engine.section.Section;
import org.tensio.engine.service.EngineInfo;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * Runs the engine's published check cases and returns the {@link VerificationRecord}.
 * <p>
 * The cases are data: text fixtures shipped in the engine bundle under {@code verification/} (listed in
 * {@link #FIXTURES}; format in the header of {@code closed-form.txt} and in the package documentation). Each
 * row names the section, the quantity, the reference (formula or printed table value), the tolerance, why
 * that tolerance, and the source of the reference. Every value is computed through the public API a user
 * calls — {@link org.tensio.engine.profile.ProfileTypes} or a contour → {@link Section} →
 * {@link SectionAnalysisService#properties}, {@link SectionAnalysisService#solution(Section)} (default mesh)
 * or {@link SectionAnalysisService#stressAt(org.tensio.engine.project.Project, String, String,
 * org.tensio.engine.geometry.Point2, org.tensio.engine.stress.ShearMethod)}.
 * <p>
 * Cases on different sections are computed in parallel (one thread per available processor), the cases of
 * one section in fixture order on one thread so that its finite-element solution is computed once; the record
 * lists the cases in fixture order and does not depend on the scheduling. A case whose computation throws is
 * recorded as failed with the exception's message. A fixture that cannot be read or parsed is a defect of the
 * engine: {@link IllegalStateException} naming the fixture and line.
 * <p>
 * Use once: {@code new VerificationRunner(service).run()}, or {@link #run(SectionAnalysisService)}.
 *
 * @since 0.1
 */
public final class VerificationRunner {

    /** The fixture families, in record order (resources {@code verification/<name>} of the engine bundle). */
    public static final List<String> FIXTURES = List.of("closed-form.txt", "rolled-section-table.txt", "torsion.txt",
            "thin-walled.txt", "shear.txt", "elementary-shear.txt", "combined-loading.txt", "unsymmetric-bending.txt",
            "fatigue.txt");

    /** The unit system of every case. */
    public static final String UNITS = "mm, N, MPa; angles in degrees";

    private final SectionAnalysisService service;
    private final Clock clock;

    /** A runner on {@code service} with the system clock (UTC). */
    public VerificationRunner(SectionAnalysisService service) {
        this(service, Clock.systemUTC());
    }

    /**
     * @param service the engine, not null
     * @param clock   gives the record's date, not null
     */
    public VerificationRunner(SectionAnalysisService service, Clock clock) {
        if (service == null || clock == null) {
            throw new IllegalArgumentException("verification runner needs a service and a clock, got " + service
                    + " and " + clock);
        }
        this.service = service;
        this.clock = clock;
    }

    /** @return the record of every case in {@link #FIXTURES}, computed by {@code service} */
    public static VerificationRecord run(SectionAnalysisService service) {
        return new VerificationRunner(service).run();
    }

    /** @return the case definitions of every fixture, in record order, without computing them */
    public static List<VerificationCase> cases() {
        return load().stream().map(FixtureParser.Compiled::definition).toList();
    }

    /** @return the record of every case in {@link #FIXTURES} */
    public VerificationRecord run() {
        return run(load());
    }

    /** Computes the given cases (package-private: the tests also run hand-made fixtures). */
    VerificationRecord run(List<FixtureParser.Compiled> compiled) {
        Instant date = clock.instant().truncatedTo(ChronoUnit.SECONDS);
        // group by section instance, in order of first use
        Map<Section, List<Integer>> groups = new IdentityHashMap<>();
        List<List<Integer>> order = new ArrayList<>();
        for (int i = 0; i < compiled.size(); i++) {
            List<Integer> g = groups.get(compiled.get(i).section());
            if (g == null) {
                g = new ArrayList<>();
                groups.put(compiled.get(i).section(), g);
                order.add(g);
            }
            g.add(i);
        }
        CaseResult[] results = new CaseResult[compiled.size()];
        int threads = Math.max(1, Runtime.getRuntime().availableProcessors());
        ForkJoinPool pool = new ForkJoinPool(threads);
        try {
            pool.submit(() -> order.parallelStream().forEach(g -> {
                Quantity.Context ctx = new Quantity.Context(service, compiled.get(g.get(0)).section());
                for (int i : g) {
                    results[i] = compute(compiled.get(i), ctx);
                }
            })).get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("verification interrupted", e);
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            if (c instanceof RuntimeException r) {
                throw r;
            }
            if (c instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(c);
        } finally {
            pool.shutdown();
        }
        return new VerificationRecord(EngineInfo.version(), date, javaVersion(), os(), threads, UNITS,
                VerificationRecord.CAUTION, List.of(results));
    }

    private static CaseResult compute(FixtureParser.Compiled c, Quantity.Context ctx) {
        try {
            return CaseResult.of(c.definition(), c.quantity().evaluate(ctx), c.quantity().computedBy);
        } catch (RuntimeException e) {
            return CaseResult.failed(c.definition(), c.quantity().computedBy, e);
        }
    }

    /** @return every case of {@link #FIXTURES}, parsed */
    static List<FixtureParser.Compiled> load() {
        List<FixtureParser.Compiled> all = new ArrayList<>();
        Set<String> ids = new HashSet<>();
        for (String f : FIXTURES) {
            String name = "verification/" + f;
            for (FixtureParser.Compiled c : FixtureParser.parse(name, resource(name))) {
                if (!ids.add(c.definition().id())) {
                    throw new IllegalStateException(name + ":" + c.definition().line() + ": case id '"
                            + c.definition().id() + "' is used twice");
                }
                all.add(c);
            }
        }
        return all;
    }

    private static String resource(String name) {
        try (InputStream in = VerificationRunner.class.getClassLoader().getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("verification fixture " + name + " is missing from the engine bundle");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read verification fixture " + name, e);
        }
    }

    private static String javaVersion() {
        return System.getProperty("java.version") + " (" + System.getProperty("java.vendor") + ", "
                + System.getProperty("java.vm.name") + ")";
    }

    private static String os() {
        return System.getProperty("os.name") + " " + System.getProperty("os.version") + " ("
                + System.getProperty("os.arch") + ")";
    }
}
