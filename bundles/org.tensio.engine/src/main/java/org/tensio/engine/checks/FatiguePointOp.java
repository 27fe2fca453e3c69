package org.tensio.engine.checks;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.fatigue.FatigueMaterial;
import org.tensio.engine.fatigue.FatigueStation;
import org.tensio.engine.fatigue.NotchFactors;
import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.mesh.Mesh;
import org.tensio.engine.mesh.Singularity;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.PointStressOp;
import org.tensio.engine.stress.ShearMethod;
import org.tensio.engine.stress.StressComponents;

/**
 * The fatigue check at one chosen point of a section (the stress-point view, a pointer over the section): for a
 * fatigue station of the project on this section, every load history and criterion of the station evaluated at
 * that point for the material found there — σa', σm', σmax', Se, the notch factors that act at the point, the
 * factor of safety and the utilisation — by the same rules as {@link FatigueCheckOp}, which reports the
 * governing sample point of the whole section instead. At a sample point of the check (a mesh node) both give the
 * same numbers to round-off (the unit stresses come from {@link PointStressOp} with the finite-element fields,
 * the reference of {@link UnitStressField}).
 * <p>
 * <b>Surface.</b> A notch that acts on the section's surface (a shoulder fillet, a groove) applies where the point
 * lies within {@code surfaceTolerance} of the boundary of the finite-element mesh (outer and inner, the edges of
 * the 6-node triangles taken as two straight halves through their mid-side nodes); {@link FatigueCheckOp} takes
 * the mesh's boundary nodes. {@link #defaultSurfaceTolerance()} ({@link #SURFACE_TOLERANCE} of the section's
 * bounding-box diagonal) lets a point typed or pointed at near the outer fibre count as on it.
 * <p>
 * Built once per section (it keeps the boundary and the rules it has resolved); {@link #evaluate} is cheap
 * (six point evaluations and the cycle algebra). Thread-safe: evaluations are serialised.
 *
 * @since 0.1
 */
public final class FatiguePointOp {

    /**
     * The default surface tolerance as a fraction of the section's bounding-box diagonal: 0.5 % (about four pixels
     * at a section editor's fitted zoom; a 0.35 mm band on a 50 mm shaft). Common practice, no source.
     */
    public static final double SURFACE_TOLERANCE = 0.005;

    private final Project project;
    private final Section section;
    private final SectionProperties props;
    private final FiniteElementSolution fe;
    /** Boundary segments of the mesh, four doubles each (x0, y0, x1, y1). */
    private final double[] boundary;
    private final Map<String, FatigueRules> rules = new HashMap<>();

    /**
     * The fatigue results at one point.
     *
     * @param station         the station id
     * @param point           the point, section frame, length unit
     * @param material        the material at the point
     * @param onSurface       whether the point counts as on the section's surface (notches acting on the surface
     *                        apply)
     * @param surfaceDistance the point's distance from the mesh boundary, length unit
     * @param results         per load history (file order) and criterion (the station's order) the result at the
     *                        point, with its {@link org.tensio.engine.fatigue.FatigueDetail}; empty when the
     *                        material has no fatigue data
     * @param notes           why something is not evaluated, empty when all is
     */
    public record Result(String station, Point2 point, String material, boolean onSurface, double surfaceDistance,
            List<CheckResult> results, List<String> notes) {

        /** Copies the lists. */
        public Result {
            results = List.copyOf(results);
            notes = List.copyOf(notes);
        }

        /** @return the result with the largest utilisation (the first such), or null when there is none */
        public CheckResult governing() {
            CheckResult best = null;
            for (CheckResult r : results) {
                if (best == null || r.utilisation() > best.utilisation()) {
                    best = r;
                }
            }
            return best;
        }
    }

    /**
     * @param project the project (its fatigue data, forces and units)
     * @param section one of its sections
     * @param props   the section's properties with torsion ({@code SectionAnalysisService.properties})
     * @param fe      the section's finite-element solution ({@code SectionAnalysisService.solution})
     * @throws IllegalArgumentException when an argument is null or belongs to another section
     */
    public FatiguePointOp(Project project, Section section, SectionProperties props, FiniteElementSolution fe) {
        if (project == null || section == null || props == null || fe == null) {
            throw new IllegalArgumentException("project, section, props and fe must not be null");
        }
        if (!section.name().equals(props.section())) {
            throw new IllegalArgumentException("props: properties of section '" + props.section()
                    + "' given for section '" + section.name() + "'");
        }
        this.project = project;
        this.section = section;
        this.props = props;
        this.fe = fe;
        this.boundary = boundary(fe.mesh());
    }

    /** @return {@link #SURFACE_TOLERANCE} × the section's bounding-box diagonal, length unit */
    public double defaultSurfaceTolerance() {
        return SURFACE_TOLERANCE * section.bounds().diagonal();
    }

    /** @return the fatigue station of {@code stationId}, or null when the station has no fatigue check */
    public FatigueStation station(String stationId) {
        return project.fatigue().station(stationId);
    }

    /**
     * @param stationId        a station of this section with a fatigue check ({@link #station})
     * @param at               the point, section frame, length unit
     * @param surfaceTolerance distance from the boundary within which the point counts as on the surface, length
     *                         unit, ≥ 0
     * @return the results at the point
     * @throws IllegalArgumentException when the station is unknown, has no fatigue check or another section, the
     *                                  tolerance is negative or not finite, or the point lies outside the section
     */
    public synchronized Result evaluate(String stationId, Point2 at, double surfaceTolerance) {
        if (!(surfaceTolerance >= 0) || !Double.isFinite(surfaceTolerance)) {
            throw new IllegalArgumentException("surfaceTolerance: must be finite and ≥ 0, got " + surfaceTolerance);
        }
        Station st = project.station(stationId);
        if (!st.sectionId().equals(section.name())) {
            throw new IllegalArgumentException("stationId: station '" + stationId + "' has section '" + st.sectionId()
                    + "', not '" + section.name() + "'");
        }
        FatigueStation fs = station(stationId);
        if (fs == null) {
            throw new IllegalArgumentException("stationId: station '" + stationId + "' has no fatigue check");
        }
        PointUnits units = new PointUnits(at, stationId);
        double dist = surfaceDistance(at);
        boolean onSurface = dist <= surfaceTolerance;
        List<CheckResult> out = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        FatigueMaterial fm = project.fatigue().materials().get(units.material);
        if (fm == null) {
            notes.add("material '" + units.material + "' has no fatigue data: the point is not checked for fatigue");
            return new Result(stationId, at, units.material, onSurface, dist, out, notes);
        }
        boolean singular = false;
        double near = PointStressOp.SINGULAR_RADIUS * section.bounds().diagonal();
        for (Singularity s : fe.mesh().singularities()) {
            singular |= Math.hypot(s.x() - at.x(), s.y() - at.y()) <= near;
        }
        for (String historyId : fs.histories().keySet()) {
            FatigueRules r = rules.computeIfAbsent(stationId + '\u0000' + historyId + '\u0000' + fm.material(),
                    k -> new FatigueRules(project, fs, section, props, historyId, fm));
            int k = r.criteria().size();
            double[] a = new double[k], sm = new double[k], smax = new double[k], d = new double[k];
            NotchFactors nf = r.notchAt(at.x(), at.y(), onSurface);
            double[] peak = r.peak(units, nf); // the same for every criterion of the history
            r.evaluate(units, nf, peak[0], a, sm, smax, d);
            for (int j = 0; j < k; j++) {
                out.add(r.result(j, at, onSurface, singular, a[j], sm[j], smax[j], d[j], peak));
            }
        }
        return new Result(stationId, at, units.material, onSurface, dist, out, notes);
    }

    /** @return the distance of {@code p} from the boundary of the section's mesh, length unit */
    public double surfaceDistance(Point2 p) {
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i < boundary.length; i += 4) {
            best = Math.min(best, segmentDistance(p.x(), p.y(), boundary[i], boundary[i + 1], boundary[i + 2],
                    boundary[i + 3]));
        }
        return best;
    }

    private static double segmentDistance(double px, double py, double x0, double y0, double x1, double y1) {
        double dx = x1 - x0, dy = y1 - y0, len2 = dx * dx + dy * dy;
        double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((px - x0) * dx + (py - y0) * dy) / len2));
        return Math.hypot(px - (x0 + t * dx), py - (y0 + t * dy));
    }

    /** The boundary edges of {@code m} ({@link Mesh#boundaryEdges()}) as two straight halves each. */
    private static double[] boundary(Mesh m) {
        int[] edges = m.boundaryEdges();
        double[] out = new double[4 * 2 * (edges.length / 3)];
        int n = 0;
        for (int i = 0; i < edges.length; i += 3) {
            for (int h = 0; h < 2; h++) {
                int from = edges[i + h], to = edges[i + h + 1];
                out[n++] = m.x(from);
                out[n++] = m.y(from);
                out[n++] = m.x(to);
                out[n++] = m.y(to);
            }
        }
        return out;
    }

    /**
     * The nine unit-stress coefficients at one point, from six evaluations of {@link PointStressOp} with a unit
     * force each (finite-element shear and torsion, as the check's unit fields).
     */
    private final class PointUnits implements FatigueRules.UnitStresses {
        final double sN, sMx, sMy, tTx, tTy, tVxX, tVxY, tVyX, tVyY;
        final String material;

        PointUnits(Point2 at, String stationId) {
            PointStress axial = PointStressOp.evaluate(section, props, fe, ShearMethod.finiteElement,
                    new InternalForces(1, 0, 0, 0, 0, 0), at, stationId, "unit");
            material = axial.material();
            StressComponents n = axial.total() != null ? axial.total() : new StressComponents(axial.sigmaZ(), 0, 0);
            StressComponents vx = unit(new InternalForces(0, 1, 0, 0, 0, 0), at, stationId);
            StressComponents vy = unit(new InternalForces(0, 0, 1, 0, 0, 0), at, stationId);
            StressComponents mx = unit(new InternalForces(0, 0, 0, 1, 0, 0), at, stationId);
            StressComponents my = unit(new InternalForces(0, 0, 0, 0, 1, 0), at, stationId);
            StressComponents t = unit(new InternalForces(0, 0, 0, 0, 0, 1), at, stationId);
            sN = n.sigmaZ();
            sMx = mx.sigmaZ();
            sMy = my.sigmaZ();
            tTx = t.tauZX();
            tTy = t.tauZY();
            tVxX = vx.tauZX();
            tVxY = vx.tauZY();
            tVyX = vy.tauZX();
            tVyY = vy.tauZY();
        }

        private StressComponents unit(InternalForces f, Point2 at, String stationId) {
            PointStress s = PointStressOp.evaluate(section, props, fe, ShearMethod.finiteElement, f, at, stationId,
                    "unit");
            if (s.total() == null) {
                throw new IllegalArgumentException("station '" + stationId + "': the stress at (" + at.x() + ", "
                        + at.y() + ") is not available: " + String.join("; ", s.warnings()));
            }
            return s.total();
        }

        @Override
        public double sigmaZ(InternalForces f) {
            return sN * f.n() + sMx * f.mx() + sMy * f.my();
        }

        @Override
        public double tauZX(InternalForces f) {
            return tTx * f.t() + tVxX * f.vx() + tVyX * f.vy();
        }

        @Override
        public double tauZY(InternalForces f) {
            return tTy * f.t() + tVxY * f.vx() + tVyY * f.vy();
        }
    }
}
