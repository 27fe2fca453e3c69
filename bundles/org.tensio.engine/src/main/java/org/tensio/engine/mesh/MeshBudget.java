package org.tensio.engine.mesh;

import org.tensio.engine.geometry.ArcSegment;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.geometry.Segment;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;

/**
 * What meshing and solving a section will cost, estimated before any of it is done, and the limits that keep a
 * huge section from exhausting the Java heap or running for hours.
 * <p>
 * <b>Elements.</b> The boundary is cut as {@link MeshGenerator} cuts it (edges no longer than the target size h,
 * arcs also by angle, the grading steps at re-entrant corners): {@code boundaryVertices} counts those cuts. The
 * interior lattice gives area / (0.433 h²) triangles (a triangle of the lattice has area √3/4 · h²); a boundary
 * cut finer than the lattice adds about two triangles per vertex (the Delaunay triangulation of a polygon of n
 * vertices has n − 2 triangles, Ruppert's refinement grades them into the lattice). The estimate is
 * {@code interior + 2 · boundaryVertices}; measured against the meshes the generator makes with the default
 * options it is 1.1–1.9× the actual count for a rectangle, a circle, an IPE 300, a rectangular and a thin circular
 * tube, 3.2× for a 1000 × 1 strip (the lattice does not fit in it) and 0.98–1.03× for wavy polygons of 2 000 and
 * 20 000 short edges.
 * <p>
 * <b>Memory.</b> Nodes ≈ 2 × elements (6-node triangles). The heap needed is estimated as
 * {@value #MESH_BYTES_PER_ELEMENT} bytes per element for the mesh (Tinfour's vertices and quad-edges, the
 * assembly maps and the final arrays) plus {@value #SOLVE_BYTES_PER_ELEMENT} + {@value #FACTOR_BYTES_PER_LOG}
 * · log₂(elements) bytes per element for the finite-element solution: the triplets and the matrix, the
 * nested-dissection Cholesky factor (whose non-zeros grow as n log n on a planar mesh — George 1973, from
 * memory) and the solution fields. The constants were calibrated here (Tensio 0.1, Java 17, serial GC) as the
 * smallest {@code -Xmx} with which meshing and solving completed: a 100 × 50 rectangle at 40 000 elements
 * (between 64 and 96 MiB) and 160 000 elements (280–360 MiB), and an IPE 300 with fillets at 160 000 elements
 * (420–520 MiB); the formula gives 108, 469 and 469 MiB: within or above the measured range (up to 1.5× for
 * compact sections, whose factor is relatively smaller). It is an estimate, not a bound: the check refuses only what clearly would not
 * fit.
 * <p>
 * <b>Limits.</b> At most {@value #MAX_ELEMENTS} elements and {@value #MAX_BOUNDARY_VERTICES} boundary vertices
 * per section (whatever the heap), and the memory estimate must not exceed the heap the JVM may still use
 * ({@link Runtime#maxMemory()} minus what is in use now).
 *
 * @param section          the section's name
 * @param boundaryVertices vertices the boundary is cut into
 * @param elements         estimated number of 6-node triangles
 * @param meshBytes        estimated heap for meshing, bytes
 * @param solveBytes       estimated heap for the finite-element solution including the Cholesky factor, bytes
 * @since 0.1
 */
public record MeshBudget(String section, long boundaryVertices, long elements, long meshBytes, long solveBytes) {

    /** Most elements a section may be meshed into. */
    public static final long MAX_ELEMENTS = 5_000_000;
    /** Most vertices a section's boundary may be cut into. */
    public static final long MAX_BOUNDARY_VERTICES = 1_000_000;
    /** Heap per element for meshing, bytes (calibration in the class comment). */
    public static final long MESH_BYTES_PER_ELEMENT = 900;
    /** Heap per element for the solution besides the factor's logarithmic growth, bytes. */
    public static final long SOLVE_BYTES_PER_ELEMENT = 100;
    /** Heap per element and per doubling of the element count for the Cholesky factor, bytes. */
    public static final long FACTOR_BYTES_PER_LOG = 120;

    /** Validates: counts and bytes not negative. */
    public MeshBudget {
        if (boundaryVertices < 0 || elements < 0 || meshBytes < 0 || solveBytes < 0) {
            throw new IllegalArgumentException("mesh budget: counts and bytes must not be negative");
        }
    }

    /**
     * @param section the section
     * @param options the mesh options
     * @return the estimate for meshing {@code section} with {@code options} and solving on that mesh
     */
    public static MeshBudget estimate(Section section, MeshOptions options) {
        if (section == null || options == null) {
            throw new IllegalArgumentException("mesh budget: section and options must not be null");
        }
        double area = 0;
        for (SectionPart p : section.parts()) {
            area += Math.abs(p.region().moments().area());
        }
        double h = MeshGenerator.edgeLength(area, options);
        double boundary = 0;
        for (SectionPart p : section.parts()) {
            Region r = p.region();
            for (Contour c : r.contours()) {
                java.util.List<Segment> segs = c.segments();
                int n = segs.size();
                for (int i = 0; i < n; i++) {
                    Segment s = segs.get(i);
                    double pieces = Math.max(1, Math.ceil(s.length() / h - 1e-9));
                    if (s instanceof ArcSegment arc) {
                        pieces = Math.max(pieces, Math.ceil(Math.toDegrees(Math.abs(arc.sweep()))
                                / options.maxArcStepDeg() - 1e-9));
                    }
                    double interior = MeshGenerator.interiorAngleDeg(MeshGenerator.tangentAtEnd(segs.get((i + n - 1) % n)),
                            MeshGenerator.tangentAtStart(s));
                    // grading towards a re-entrant corner adds cornerLevels vertices on each of its two edges
                    boundary += pieces + (interior > 180 + MeshGenerator.REENTRANT_THRESHOLD_DEG ? 2 * options.cornerLevels() : 0);
                }
            }
        }
        double interior = area / (0.433 * h * h);
        double elements = interior + 2 * boundary;
        long e = elements >= Long.MAX_VALUE / 4 || !Double.isFinite(elements) ? Long.MAX_VALUE / 4 : (long) Math.ceil(elements);
        long v = boundary >= Long.MAX_VALUE / 4 || !Double.isFinite(boundary) ? Long.MAX_VALUE / 4 : (long) boundary;
        double log = Math.log(Math.max(2, e)) / Math.log(2);
        double mesh = (double) e * MESH_BYTES_PER_ELEMENT;
        double solve = (double) e * (SOLVE_BYTES_PER_ELEMENT + FACTOR_BYTES_PER_LOG * log);
        return new MeshBudget(section.name(), v, e, saturate(mesh), saturate(solve));
    }

    private static long saturate(double bytes) {
        return bytes >= Long.MAX_VALUE / 4 ? Long.MAX_VALUE / 4 : (long) Math.ceil(bytes);
    }

    /** @return mesh plus solution, bytes */
    public long totalBytes() {
        return meshBytes + solveBytes;
    }

    /** @return the heap the JVM may still allocate: maximum heap minus the heap in use now, bytes */
    public static long availableBytes() {
        Runtime r = Runtime.getRuntime();
        return r.maxMemory() - (r.totalMemory() - r.freeMemory());
    }

    /**
     * Refuses a section that exceeds the element or vertex limit or whose estimate exceeds the heap still available.
     * Heap in use may include garbage not yet collected: before refusing for memory, the JVM is asked once to
     * collect ({@link Runtime#gc()}) and the available heap is measured again.
     *
     * @throws IllegalArgumentException naming the section, the estimate and the limit
     */
    public void requireFitsHeap() {
        if (boundaryVertices <= MAX_BOUNDARY_VERTICES && elements <= MAX_ELEMENTS && totalBytes() > availableBytes()) {
            Runtime.getRuntime().gc();
        }
        requireFits(availableBytes());
    }

    /**
     * Refuses a section that exceeds the element or vertex limit or whose estimate exceeds {@code availableBytes}.
     *
     * @param availableBytes the heap that may still be used, bytes (normally {@link #availableBytes()})
     * @throws IllegalArgumentException naming the section, the estimate and the limit
     */
    public void requireFits(long availableBytes) {
        String advice = "; mesh it more coarsely (fewer elements, a larger maxEdge or maxArcStepDeg) or simplify "
                + "the boundary";
        if (boundaryVertices > MAX_BOUNDARY_VERTICES) {
            throw new IllegalArgumentException("section '" + section + "': the boundary would be cut into about "
                    + boundaryVertices + " vertices, more than the limit of " + MAX_BOUNDARY_VERTICES + advice);
        }
        if (elements > MAX_ELEMENTS) {
            throw new IllegalArgumentException("section '" + section + "': meshing would give about " + elements
                    + " elements, more than the limit of " + MAX_ELEMENTS + advice);
        }
        if (totalBytes() > availableBytes) {
            throw new IllegalArgumentException("section '" + section + "': meshing about " + elements
                    + " elements and solving needs an estimated " + mib(totalBytes()) + " MiB (mesh " + mib(meshBytes)
                    + " MiB, finite-element solution with its Cholesky factor " + mib(solveBytes)
                    + " MiB), more than the " + mib(Math.max(0, availableBytes)) + " MiB of heap still available (of "
                    + mib(Runtime.getRuntime().maxMemory()) + " MiB, -Xmx)" + advice + ", or give Java more memory");
        }
    }

    private static long mib(long bytes) {
        return (bytes + (1L << 19)) >> 20;
    }
}
