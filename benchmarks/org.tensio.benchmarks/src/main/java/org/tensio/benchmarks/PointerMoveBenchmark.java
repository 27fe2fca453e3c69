package org.tensio.benchmarks;

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
import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.fem.SectionSolver;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.mesh.MeshGenerator;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.properties.SectionPropertiesOp;
import org.tensio.engine.section.Criterion;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.section.Section;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.PointStressOp;
import org.tensio.engine.stress.ShearMethod;

/**
 * What the workbench's stress-point view computes on each pointer move (bundle org.tensio.ui.results,
 * {@code PointEvaluator}): {@link PointStressOp#evaluate} with the finite-element shear and torsion on an
 * already solved section (point location in the mesh, smoothed fields, exact σz, the elementary shear cuts through
 * the point, principal stresses) and the utilisation of two criteria. Evaluation only: the solution is computed once
 * in the set-up. The I-section of {@link WarpingProblem} on about {@code elements} triangles; the forces combine
 * every component so that no branch is skipped. Each invocation evaluates one point of a fixed path over flange,
 * fillet and web, in turn.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgsAppend = {"-Xmx2g"})
public class PointerMoveBenchmark {

    /** Approximate number of triangles of the mesh (the issue asks for 20 000). */
    @Param({"2500", "20000"})
    public int elements;

    private Section section;
    private SectionProperties props;
    private FiniteElementSolution fe;
    private MaterialLimits limits;
    private final InternalForces forces = new InternalForces(15000, 1200, -11700, -1.1625e8, 2.5e6, 4e5);
    private Point2[] path;
    private int next;

    /** Meshes and solves once. */
    @Setup(Level.Trial)
    public void setUp() {
        section = WarpingProblem.section();
        props = SectionPropertiesOp.compute(section);
        fe = SectionSolver.solve(section,
                MeshGenerator.generate(section, org.tensio.engine.mesh.MeshOptions.elements(elements), null), null);
        props = props.withTorsion(fe.jWarping(), fe.shearCentre(), fe.cw(), SectionProperties.FINITE_ELEMENT);
        limits = new MaterialLimits("S355", java.util.List.of(Criterion.vonMises, Criterion.maxShear), 1.0, 355.0,
                null, null, null, null);
        path = new Point2[400];
        for (int i = 0; i < 200; i++) {
            path[i] = new Point2(-70 + 0.7 * i, -145); // along the bottom flange
            path[200 + i] = new Point2(1.0, -138 + 1.38 * i); // up the web, through the fillet region
        }
        System.out.printf("%n# mesh: %d elements, %d nodes%n", fe.mesh().elementCount(), fe.mesh().nodeCount());
    }

    /** One pointer move: the stress state at the next point of the path and its largest utilisation. */
    @Benchmark
    public double pointerMove() {
        Point2 p = path[next];
        next = (next + 1) % path.length;
        PointStress s = PointStressOp.evaluate(section, props, fe, ShearMethod.finiteElement, forces, p, "b", "ULS");
        double best = 0;
        for (Criterion c : limits.criteria()) {
            best = Math.max(best, MaterialLimits.demand(c, s.total().sigmaZ(), s.total().tauZX(), s.total().tauZY())
                    / limits.capacity(c));
        }
        return best;
    }
}
