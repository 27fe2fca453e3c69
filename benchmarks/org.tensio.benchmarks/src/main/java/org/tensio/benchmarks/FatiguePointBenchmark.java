package org.tensio.benchmarks;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.tensio.engine.checks.FatiguePointOp;
import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.io.ProjectFormatException;
import org.tensio.engine.io.ProjectReader;
import org.tensio.engine.project.Project;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.PointStressOp;
import org.tensio.engine.stress.ShearMethod;

/**
 * What the stress-point view adds per pointer move at a station with a fatigue check: {@link FatiguePointOp#evaluate}
 * (six unit point evaluations, the cycle algebra for two load histories × six criteria, the notch factors, the
 * surface distance over the mesh boundary) against the static evaluation the view makes anyway
 * ({@link PointStressOp#evaluate} with the finite-element fields), side by side on the same path, so that their
 * ratio is what the fatigue part costs. A solid shaft d = 60 with a shoulder fillet on the surface and a keyseat
 * (an invented drive, like the demo's), default mesh; the points run from the axis to the outer fibre and round it.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgsAppend = {"-Xmx1g"})
public class FatiguePointBenchmark {

    private static final String SHAFT = """
            {"tensio": 1, "materials": {"C45": {"E": 210000, "nu": 0.3, "fy": 370, "fu": 630}},
             "sections": {"shaft": {"material": "C45", "profile": {"type": "CircleProfile", "radius": 30}}},
             "stations": {"key": {"section": "shaft", "forces": {
               "SLS": {"Vx": 900, "Vy": -2600, "Mx": -7e5, "My": 3.5e5, "T": 1e6}}}},
             "fatigue": {"materials": {"C45": {"estimate": "steel", "surface": "machined", "reliability": 0.99}},
               "stations": {"key": {"histories": {"running": {"rotating": "SLS"},
                   "start": {"rotating": "SLS", "alternating": {"T": 3e5}}},
                 "notches": [{"type": "shoulderFillet", "kt": 1.7, "kts": 1.4, "radius": 2.5},
                   {"type": "keyseat", "radius": 1.2, "location": {"points": [[0, 30]], "within": 9}}]}}}}
            """;

    private Project project;
    private Section section;
    private SectionProperties props;
    private FiniteElementSolution fe;
    private FatiguePointOp fatigue;
    private double tolerance;
    private Point2[] path;
    private int next;

    /** Reads, meshes and solves once. */
    @Setup(Level.Trial)
    public void setUp() throws ProjectFormatException {
        SectionAnalysisService engine = SectionAnalysisService.create();
        project = ProjectReader.parse(SHAFT, "bench.tensio.json");
        section = project.section("shaft");
        props = engine.properties(section);
        fe = engine.solution(section);
        fatigue = new FatiguePointOp(project, section, props, fe);
        tolerance = fatigue.defaultSurfaceTolerance();
        path = new Point2[400];
        for (int i = 0; i < 200; i++) {
            path[i] = new Point2(0, -29.99 + 0.3 * i); // across, axis and both fibres
            double a = 2 * Math.PI * i / 200;
            path[200 + i] = new Point2(29.95 * Math.cos(a), 29.95 * Math.sin(a)); // round the surface
        }
        System.out.printf("%n# mesh: %d elements%n", fe.mesh().elementCount());
    }

    /** The static stress state at the next point (what the view computes for the case). */
    @Benchmark
    public double staticPoint() {
        Point2 p = path[next];
        next = (next + 1) % path.length;
        PointStress s = PointStressOp.evaluate(section, props, fe, ShearMethod.finiteElement,
                project.forces("key", "SLS"), p, "key", "SLS");
        return s.principal().vonMises();
    }

    /** The fatigue results at the next point: both histories, the six criteria. */
    @Benchmark
    public double fatiguePoint() {
        Point2 p = path[next];
        next = (next + 1) % path.length;
        return fatigue.evaluate("key", p, tolerance).governing().utilisation();
    }
}
