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
import org.tensio.engine.mesh.Mesh;
import org.tensio.engine.mesh.MeshGenerator;
import org.tensio.engine.mesh.MeshOptions;
import org.tensio.engine.section.Section;

/**
 * The engine's whole finite-element path on the I-section of {@link WarpingProblem}: mesh, assemble, order and
 * factorise the warping Laplacian, solve it for ω, Ψ and Φ, then assemble, factorise and solve the Prandtl
 * problem ({@link SectionSolver#solve}).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgsAppend = {"-Xmx8g"})
public class SectionPathBenchmark {

    /** Approximate number of unknowns (P2 nodes). */
    @Param({"10000", "100000", "400000"})
    public int unknowns;

    private Section section;
    private MeshOptions options;
    private Mesh mesh;

    /** Meshes once for {@link #solveOnMesh()} (and to print the mesh size). */
    @Setup(Level.Trial)
    public void setUp() {
        section = WarpingProblem.section();
        options = WarpingProblem.optionsFor(unknowns);
        mesh = MeshGenerator.generate(section, options, null);
        System.out.printf("%n# mesh: %d elements, %d nodes%n", mesh.elementCount(), mesh.nodeCount());
    }

    /** Mesh + assemble + factorise + solve. */
    @Benchmark
    public FiniteElementSolution meshAndSolve() {
        return SectionSolver.solve(section, MeshGenerator.generate(section, options, null), null);
    }

    /** Mesh only (the difference of the two others, measured). */
    @Benchmark
    public Mesh meshOnly() {
        return MeshGenerator.generate(section, options, null);
    }

    /** Assemble + factorise + solve on a prepared mesh. */
    @Benchmark
    public FiniteElementSolution solveOnMesh() {
        return SectionSolver.solve(section, mesh, null);
    }
}
