package org.tensio.engine.mesh;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.CancellationException;

import org.tensio.engine.geometry.ArcSegment;
import org.tensio.engine.geometry.Bounds;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.LineSegment;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.geometry.Segment;
import org.tensio.engine.linalg.ProgressMonitor;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;
import org.tinfour.common.IConstraint;
import org.tinfour.common.IQuadEdge;
import org.tinfour.common.PolygonConstraint;
import org.tinfour.common.SimpleTriangle;
import org.tinfour.common.Vertex;
import org.tinfour.refinement.RuppertRefiner;
import org.tinfour.standard.IncrementalTin;

/**
 * Meshes a section into 6-node triangles: boundaries are cut into edges no longer than the target size
 * (arcs also by angle, and graded geometrically towards re-entrant corners), the interior is seeded with a
 * triangular lattice, Tinfour builds the constrained Delaunay triangulation of every part (adjacent parts
 * share their interface edges; holes are left out), Ruppert refinement raises the minimum angle, and
 * mid-side nodes are added — on the true arc for edges on circular or elliptic boundaries.
 * <p>
 * Refinement is capped (a few times the seeded vertex count) so that input angles below about 60°, for
 * which Ruppert's algorithm need not terminate, cannot make it run away; the mesh then has a smaller
 * minimum angle near such corners, reported by {@link Mesh#minAngleDeg()}.
 * <p>
 * Tinfour works on coordinates relative to the centre of the section's bounding box, divided by a power of two
 * near 1/100 of its diagonal (exact), so that a section far from the origin or of a very small or very large unit
 * scale is triangulated as the same section of moderate size near the origin (the robustness suite found
 * triangulations that never ended for a circle of radius 1e-10); nodes are mapped back to the section frame.
 * Before any work, {@link MeshBudget} refuses sections whose mesh would exceed the element, vertex or memory
 * limits.
 *
 * @since 0.1
 */
public final class MeshGenerator {

    /** Re-entrant corners sharper than this (interior angle above 180° + value) are flagged, degrees. */
    public static final double REENTRANT_THRESHOLD_DEG = 0.5;

    private record ArcParam(int arc, double t) {
    }

    private final Section section;
    private final MeshOptions options;
    private final ProgressMonitor monitor;
    private final double tol;
    private final double h;
    private final Map<Long, List<Vertex>> grid = new HashMap<>();
    private final IdentityHashMap<Vertex, List<ArcParam>> onArc = new IdentityHashMap<>();
    private final List<ArcSegment> arcs = new ArrayList<>();
    private final List<Singularity> singularities = new ArrayList<>();
    private final List<Vertex> vertices = new ArrayList<>();
    private final double gridCell;
    /** Centre of the section's bounding box: Tinfour works on coordinates relative to it. */
    private final double ox;
    private final double oy;
    /** Power of two near diagonal / 100: Tinfour works on coordinates divided by it (exact). */
    private final double scale;

    private MeshGenerator(Section section, MeshOptions options, ProgressMonitor monitor) {
        this.section = section;
        this.options = options;
        this.monitor = monitor == null ? ProgressMonitor.NONE : monitor;
        Bounds b = section.bounds();
        this.tol = 1e-9 * b.diagonal();
        double area = 0;
        for (SectionPart p : section.parts()) {
            area += Math.abs(p.region().moments().area());
        }
        this.h = edgeLength(area, options);
        this.gridCell = Math.max(tol * 1e3, 1e-6 * b.diagonal());
        this.ox = 0.5 * (b.minX() + b.maxX());
        this.oy = 0.5 * (b.minY() + b.maxY());
        this.scale = Math.scalb(1.0, Math.getExponent(b.diagonal() / 100));
    }

    /** @return the target edge length for a section of {@code area} (length²): given, or from the element count */
    static double edgeLength(double area, MeshOptions options) {
        return options.maxEdge() > 0 ? options.maxEdge() : Math.sqrt(area / (options.targetElements() * 0.433));
    }

    /**
     * @return the mesh of {@code section} with {@code options}; {@code monitor} may be null
     * @throws IllegalArgumentException naming the section and the numbers when the {@link MeshBudget} estimate
     *                                  exceeds its element or vertex limit or the heap still available, before
     *                                  any meshing is done
     */
    public static Mesh generate(Section section, MeshOptions options, ProgressMonitor monitor) {
        MeshBudget.estimate(section, options).requireFitsHeap();
        return new MeshGenerator(section, options, monitor).run();
    }

    /** @return the mesh of {@code section} with the default options (checked as {@link #generate(Section, MeshOptions, ProgressMonitor)}) */
    public static Mesh generate(Section section) {
        return generate(section, MeshOptions.defaults(), null);
    }

    private Mesh run() {
        List<IConstraint> constraints = new ArrayList<>();
        List<Integer> constraintPart = new ArrayList<>();
        for (int p = 0; p < section.parts().size(); p++) {
            Region r = section.parts().get(p).region();
            for (int k = 0; k < r.contours().size(); k++) {
                List<Vertex> ring = discretise(p, r.contours().get(k));
                constraints.add(new PolygonConstraint(ring));
                constraintPart.add(k == 0 ? p : -1);
            }
        }
        if (section.parts().size() > 1) {
            splitAtForeignVertices(constraints);
        }
        List<List<Vertex>> rings = new ArrayList<>(constraints.size());
        for (IConstraint c : constraints) {
            rings.add(new ArrayList<>(c.getVertices()));
        }
        seedInterior();
        checkCancel(0.1);
        RuntimeException last = null;
        for (double f : SPACINGS) {
            try {
                List<IConstraint> fresh = new ArrayList<>(rings.size());
                for (List<Vertex> ring : rings) {
                    fresh.add(new PolygonConstraint(ring));
                }
                IncrementalTin tin = new IncrementalTin(h / scale * f);
                tin.add(vertices, null);
                tin.addConstraints(fresh, true);
                checkCancel(0.2);
                refine(tin);
                checkCancel(0.7);
                return assemble(tin, constraintPart);
            } catch (CancellationException | IllegalArgumentException e) {
                throw e;
            } catch (RuntimeException e) {
                last = e;
            }
        }
        throw new IllegalArgumentException("section '" + section.name() + "': the triangulator (Tinfour) failed on this "
                + "boundary: " + last + "; try other mesh options (e.g. another element count)", last);
    }

    private void refine(IncrementalTin tin) {
        RuppertRefiner refiner = new RuppertRefiner(tin, options.minAngleDeg());
        int cap = 3 * vertices.size() + 20_000;
        for (int i = 0; i < cap; i++) {
            if (refiner.refineOnce() == null) {
                break;
            }
            if ((i & 1023) == 0) {
                checkCancel(0.2 + 0.5 * i / cap);
            }
        }
    }

    /** A triangulation with a zero-area triangle: tried again with another nominal spacing. */
    private static final class DegenerateTriangulation extends RuntimeException {
        private static final long serialVersionUID = 1L;

        DegenerateTriangulation(String message) {
            super(message);
        }
    }

    /**
     * Nominal point spacings tried, as multiples of h. Tinfour 2.1.9's constraint insertion fails now and then on
     * valid boundaries (a NullPointerException or "constraint not added", or a triangle of zero area; found by the
     * robustness suite on about 5 % of random polygons with acute corners, depending on their scale); its tolerances
     * derive from the nominal point spacing, so the triangulation is tried again with other spacings, which recovers
     * about half of those. What still fails is reported naming the section.
     */
    private static final double[] SPACINGS = {1, 10, 3};

    private void checkCancel(double fraction) {
        if (monitor.isCancelled()) {
            throw new CancellationException("meshing of section '" + section.name() + "' cancelled");
        }
        monitor.worked(fraction);
    }

    // ---------------------------------------------------------------- boundary

    private List<Vertex> discretise(int part, Contour contour) {
        List<Segment> segs = contour.segments();
        int n = segs.size();
        boolean[] reentrantAtStart = new boolean[n];
        for (int i = 0; i < n; i++) {
            Segment in = segs.get((i + n - 1) % n);
            Segment out = segs.get(i);
            Point2 ti = tangentAtEnd(in);
            Point2 to = tangentAtStart(out);
            double interior = interiorAngleDeg(ti, to);
            if (interior > 180 + REENTRANT_THRESHOLD_DEG) {
                reentrantAtStart[i] = true;
                singularities.add(new Singularity(part, out.start().x(), out.start().y(), interior));
            }
        }
        List<Vertex> ring = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Segment s = segs.get(i);
            int arcIndex = -1;
            if (s instanceof ArcSegment arc) {
                arcIndex = arcs.size();
                arcs.add(arc);
            }
            TreeSet<Double> us = new TreeSet<>();
            double len = s.length();
            int pieces = Math.max(1, (int) Math.ceil(len / h - 1e-9));
            if (s instanceof ArcSegment arc) {
                pieces = Math.max(pieces, (int) Math.ceil(Math.toDegrees(Math.abs(arc.sweep())) / options.maxArcStepDeg() - 1e-9));
            }
            for (int k = 0; k < pieces; k++) {
                us.add((double) k / pieces);
            }
            double first = 1.0 / pieces;
            for (int lvl = 1; lvl <= options.cornerLevels(); lvl++) {
                double u = first * Math.pow(0.5, lvl);
                if (reentrantAtStart[i]) {
                    us.add(u);
                }
                if (reentrantAtStart[(i + 1) % n]) {
                    us.add(1 - u);
                }
            }
            for (double u : us) {
                Point2 p = s.pointAt(u);
                Vertex v = vertex(p.x(), p.y());
                if (arcIndex >= 0) {
                    ArcSegment arc = (ArcSegment) s;
                    onArc.computeIfAbsent(v, k -> new ArrayList<>(2))
                            .add(new ArcParam(arcIndex, arc.startParam() + u * arc.sweep()));
                }
                if (ring.isEmpty() || ring.get(ring.size() - 1) != v) {
                    ring.add(v);
                }
            }
            if (arcIndex >= 0) {
                // the arc's end vertex carries the arc's end parameter too
                ArcSegment arc = (ArcSegment) s;
                Vertex end = vertex(arc.end().x(), arc.end().y());
                onArc.computeIfAbsent(end, k -> new ArrayList<>(2)).add(new ArcParam(arcIndex, arc.endParam()));
            }
        }
        if (ring.size() > 1 && ring.get(0) == ring.get(ring.size() - 1)) {
            ring.remove(ring.size() - 1);
        }
        if (ring.size() < 3) {
            throw new IllegalArgumentException("section '" + section.name() + "': a boundary of part " + part
                    + " is too small to mesh at edge length " + h);
        }
        return ring;
    }

    /** @return the interior angle at a corner from the incoming and outgoing tangents, degrees (above 180: re-entrant) */
    static double interiorAngleDeg(Point2 ti, Point2 to) {
        double turn = Math.atan2(ti.x() * to.y() - ti.y() * to.x(), ti.x() * to.x() + ti.y() * to.y());
        return 180 - Math.toDegrees(turn);
    }

    static Point2 tangentAtStart(Segment s) {
        if (s instanceof ArcSegment a) {
            return a.tangentAt(a.startParam());
        }
        LineSegment l = (LineSegment) s;
        return new Point2(l.end().x() - l.start().x(), l.end().y() - l.start().y());
    }

    static Point2 tangentAtEnd(Segment s) {
        if (s instanceof ArcSegment a) {
            return a.tangentAt(a.endParam());
        }
        return tangentAtStart(s);
    }

    /** The vertex at (x, y), shared with any earlier vertex within the tolerance. */
    private Vertex vertex(double x, double y) {
        long gx = (long) Math.floor(x / gridCell), gy = (long) Math.floor(y / gridCell);
        for (long dx = -1; dx <= 1; dx++) {
            for (long dy = -1; dy <= 1; dy++) {
                List<Vertex> cell = grid.get(key(gx + dx, gy + dy));
                if (cell != null) {
                    for (Vertex v : cell) {
                        if (Math.hypot(v.x - (x - ox) / scale, v.y - (y - oy) / scale) <= tol / scale) {
                            return v;
                        }
                    }
                }
            }
        }
        Vertex v = new Vertex((x - ox) / scale, (y - oy) / scale, 0, vertices.size());
        vertices.add(v);
        grid.computeIfAbsent(key(gx, gy), k -> new ArrayList<>(1)).add(v);
        return v;
    }

    private static long key(long gx, long gy) {
        return gx * 0x9E3779B97F4A7C15L ^ gy;
    }

    /** Composite sections: insert other parts' boundary vertices that lie on an edge, so interfaces conform. */
    private void splitAtForeignVertices(List<IConstraint> constraints) {
        List<Vertex> boundary = new ArrayList<>(vertices);
        for (int c = 0; c < constraints.size(); c++) {
            List<Vertex> ring = constraints.get(c).getVertices();
            List<Vertex> out = new ArrayList<>(ring.size());
            boolean changed = false;
            for (int i = 0; i < ring.size(); i++) {
                Vertex a = ring.get(i), b = ring.get((i + 1) % ring.size());
                out.add(a);
                List<double[]> inner = new ArrayList<>();
                double dx = b.x - a.x, dy = b.y - a.y, len2 = dx * dx + dy * dy;
                for (Vertex v : boundary) {
                    if (v == a || v == b) {
                        continue;
                    }
                    double u = ((v.x - a.x) * dx + (v.y - a.y) * dy) / len2;
                    if (u <= 1e-9 || u >= 1 - 1e-9) {
                        continue;
                    }
                    double px = a.x + u * dx - v.x, py = a.y + u * dy - v.y;
                    if (Math.hypot(px, py) <= 1e3 * tol / scale) {
                        inner.add(new double[] {u, v.getIndex()});
                    }
                }
                if (!inner.isEmpty()) {
                    inner.sort((p, q) -> Double.compare(p[0], q[0]));
                    for (double[] iv : inner) {
                        out.add(vertices.get((int) iv[1]));
                    }
                    changed = true;
                }
            }
            if (changed) {
                constraints.set(c, new PolygonConstraint(out));
            }
        }
    }

    /** Triangular lattice of spacing h, kept where it is inside a part and at least 0.45 h from every boundary. */
    private void seedInterior() {
        Bounds b = section.bounds();
        double dy = h * Math.sqrt(3) / 2;
        int rows = (int) Math.ceil(b.height() / dy);
        int cols = (int) Math.ceil(b.width() / h) + 1;
        for (int j = 0; j < rows; j++) {
            double y = b.minY() + (j + 0.5) * dy;
            double off = (j % 2 == 0) ? 0.25 * h : 0.75 * h;
            for (int i = 0; i < cols; i++) {
                double x = b.minX() + off + i * h;
                Point2 p = new Point2(x, y);
                for (SectionPart part : section.parts()) {
                    if (part.region().locate(p, 0.45 * h) == Region.Location.INSIDE) {
                        vertex(x, y);
                        break;
                    }
                }
            }
            if ((j & 63) == 0) {
                checkCancel(0.1 * j / Math.max(1, rows));
            }
        }
    }

    // ---------------------------------------------------------------- assembly

    private Mesh assemble(IncrementalTin tin, List<Integer> constraintPart) {
        List<Vertex> corners = new ArrayList<>();
        IdentityHashMap<Vertex, Integer> index = new IdentityHashMap<>();
        List<int[]> tris = new ArrayList<>();
        List<Integer> triPart = new ArrayList<>();
        Set<Long> constrained = new HashSet<>();
        for (SimpleTriangle t : tin.triangles()) {
            if (t.isGhost()) {
                continue;
            }
            IConstraint region = t.getContainingRegion();
            if (region == null) {
                continue;
            }
            int ci = region.getConstraintIndex();
            int part = ci >= 0 && ci < constraintPart.size() ? constraintPart.get(ci) : -1;
            if (part < 0) {
                continue;
            }
            Vertex[] v = {t.getVertexA(), t.getVertexB(), t.getVertexC()};
            int[] ids = new int[3];
            for (int k = 0; k < 3; k++) {
                Integer id = index.get(v[k]);
                if (id == null) {
                    id = corners.size();
                    index.put(v[k], id);
                    corners.add(v[k]);
                }
                ids[k] = id;
            }
            for (IQuadEdge e : new IQuadEdge[] {t.getEdgeA(), t.getEdgeB(), t.getEdgeC()}) {
                if (e.isConstrained() || e.isConstraintRegionBorder()) {
                    Integer ia = index.get(e.getA()), ib = index.get(e.getB());
                    if (ia != null && ib != null) {
                        constrained.add(edgeKey(ia, ib));
                    }
                }
            }
            tris.add(ids);
            triPart.add(part);
        }
        if (tris.isEmpty()) {
            throw new IllegalArgumentException("section '" + section.name() + "': meshing produced no elements");
        }
        if (tris.size() > MeshBudget.MAX_ELEMENTS) {
            throw new IllegalArgumentException("section '" + section.name() + "': meshing gave " + tris.size()
                    + " elements, more than the limit of " + MeshBudget.MAX_ELEMENTS + "; mesh it more coarsely");
        }
        int nc = corners.size();
        double[] cx = new double[nc], cy = new double[nc];
        List<List<ArcParam>> params = new ArrayList<>(nc);
        for (int i = 0; i < nc; i++) {
            Vertex v = corners.get(i);
            cx[i] = ox + scale * v.x;
            cy[i] = oy + scale * v.y;
            List<ArcParam> ap = onArc.get(v);
            if (ap == null && v.isConstraintMember()) {
                ap = projectOntoArc(i, cx, cy);
            }
            params.add(ap);
        }
        // orientation: counter-clockwise corners
        for (int[] t : tris) {
            double a2 = (cx[t[1]] - cx[t[0]]) * (cy[t[2]] - cy[t[0]]) - (cx[t[2]] - cx[t[0]]) * (cy[t[1]] - cy[t[0]]);
            if (a2 < 0) {
                int s = t[1];
                t[1] = t[2];
                t[2] = s;
            }
            double l2 = Math.max(Math.max(sq(cx[t[1]] - cx[t[0]], cy[t[1]] - cy[t[0]]),
                    sq(cx[t[2]] - cx[t[1]], cy[t[2]] - cy[t[1]])), sq(cx[t[0]] - cx[t[2]], cy[t[0]] - cy[t[2]]));
            if (!(Math.abs(a2) > 1e-10 * l2)) {
                throw new DegenerateTriangulation("a triangle of zero area at (" + cx[t[0]] + ", " + cy[t[0]] + ")");
            }
        }
        Map<Long, Integer> mid = new HashMap<>();
        List<double[]> mids = new ArrayList<>();
        int[] elements = new int[6 * tris.size()];
        int[] parts = new int[tris.size()];
        double minAngle = 180;
        // in the second pass curved edges get their true mid point
        for (int e = 0; e < tris.size(); e++) {
            int[] t = tris.get(e);
            parts[e] = triPart.get(e);
            for (int k = 0; k < 3; k++) {
                int a = t[k], b = t[(k + 1) % 3];
                long key = edgeKey(a, b);
                Integer m = mid.get(key);
                if (m == null) {
                    m = nc + mids.size();
                    mid.put(key, m);
                    double[] mp = midPoint(a, b, cx, cy, params, constrained.contains(key));
                    // a mid-node moved onto an arc far from its chord, relative to the element's height over that
                    // edge, inverts the curved element (found by the robustness suite): triangulate again
                    int c = t[(k + 2) % 3];
                    double ex = cx[b] - cx[a], ey = cy[b] - cy[a], len = Math.hypot(ex, ey);
                    double height = Math.abs(ex * (cy[c] - cy[a]) - ey * (cx[c] - cx[a])) / len;
                    double sagitta = Math.hypot(mp[0] - 0.5 * (cx[a] + cx[b]), mp[1] - 0.5 * (cy[a] + cy[b]));
                    if (sagitta > 0.25 * height) {
                        throw new DegenerateTriangulation("a curved element would invert at (" + mp[0] + ", " + mp[1]
                                + ")");
                    }
                    mids.add(mp);
                }
                elements[6 * e + k] = t[k];
                elements[6 * e + 3 + k] = m;
            }
            minAngle = Math.min(minAngle, minAngle(t, cx, cy));
        }
        double[] x = new double[nc + mids.size()], y = new double[nc + mids.size()];
        System.arraycopy(cx, 0, x, 0, nc);
        System.arraycopy(cy, 0, y, 0, nc);
        for (int i = 0; i < mids.size(); i++) {
            x[nc + i] = mids.get(i)[0];
            y[nc + i] = mids.get(i)[1];
        }
        monitor.worked(1.0);
        return new Mesh(x, y, elements, parts, nc, minAngle, singularities);
    }

    private static double sq(double dx, double dy) {
        return dx * dx + dy * dy;
    }

    private static long edgeKey(int a, int b) {
        return a < b ? ((long) a << 32) | b : ((long) b << 32) | a;
    }

    /** A vertex that refinement put on a boundary chord of an arc: move it onto the arc. */
    private List<ArcParam> projectOntoArc(int i, double[] cx, double[] cy) {
        Point2 p = new Point2(cx[i], cy[i]);
        double step = Math.toRadians(options.maxArcStepDeg());
        for (int k = 0; k < arcs.size(); k++) {
            ArcSegment arc = arcs.get(k);
            double t = arc.paramOf(p);
            if (!arc.inSweep(t)) {
                continue;
            }
            Point2 q = arc.atParam(t);
            double sagitta = Math.max(arc.a(), arc.b()) * (1 - Math.cos(step / 2)) + 10 * tol;
            if (q.distance(p) <= 1.5 * sagitta) {
                cx[i] = q.x();
                cy[i] = q.y();
                List<ArcParam> l = new ArrayList<>(1);
                l.add(new ArcParam(k, arc.unwrap(t)));
                return l;
            }
        }
        return null;
    }

    private double[] midPoint(int a, int b, double[] cx, double[] cy, List<List<ArcParam>> params, boolean boundary) {
        if (boundary && params.get(a) != null && params.get(b) != null) {
            double step = Math.toRadians(options.maxArcStepDeg()) * 1.01;
            for (ArcParam pa : params.get(a)) {
                for (ArcParam pb : params.get(b)) {
                    if (pa.arc() != pb.arc()) {
                        continue;
                    }
                    ArcSegment arc = arcs.get(pa.arc());
                    double ta = arc.unwrap(pa.t()), tb = arc.unwrap(pb.t());
                    double full = Math.abs(arc.sweep());
                    // parameters at the two ends of a full turn coincide: pick the representation that is near
                    if (Math.abs(tb - ta) > Math.PI && Math.abs(full - 2 * Math.PI) < 1e-9) {
                        tb += tb > ta ? -2 * Math.PI : 2 * Math.PI;
                    }
                    if (Math.abs(tb - ta) <= step) {
                        Point2 m = arc.atParam(0.5 * (ta + tb));
                        return new double[] {m.x(), m.y()};
                    }
                }
            }
        }
        return new double[] {0.5 * (cx[a] + cx[b]), 0.5 * (cy[a] + cy[b])};
    }

    private static double minAngle(int[] t, double[] x, double[] y) {
        double min = 180;
        for (int k = 0; k < 3; k++) {
            int a = t[k], b = t[(k + 1) % 3], c = t[(k + 2) % 3];
            double ux = x[b] - x[a], uy = y[b] - y[a], vx = x[c] - x[a], vy = y[c] - y[a];
            double ang = Math.toDegrees(Math.abs(Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy)));
            min = Math.min(min, ang);
        }
        return min;
    }
}
