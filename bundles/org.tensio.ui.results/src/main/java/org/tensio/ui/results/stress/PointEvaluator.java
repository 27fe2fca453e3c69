package org.tensio.ui.results.stress;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.checks.LoadCases;
import org.tensio.engine.checks.MaterialCriteria;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.PointStressOp;
import org.tensio.engine.stress.ShearMethod;
import org.tensio.ui.selection.SectionPoint;

/**
 * Evaluates a point on a {@link PreparedSection}: {@link PointStressOp#evaluate(org.tensio.engine.section.Section,
 * org.tensio.engine.properties.SectionProperties, org.tensio.engine.fem.FiniteElementSolution, ShearMethod,
 * org.tensio.engine.loads.InternalForces, Point2, String, String)} with the finite-element shear — exactly what
 * {@code SectionAnalysisService.stressAt} and {@code tensio stress} compute — and the utilisations of the point's
 * material ({@link MaterialLimits#demand} / {@link MaterialLimits#capacity}). Evaluation only: no mesh, no solve.
 * No SWT; any thread.
 * <p>
 * A point without a station takes the first station (file order) of its section; a point without a case takes,
 * among the station's cases and combinations, the one with the largest utilisation at the point (the largest von
 * Mises stress when the material has no limits). Contributed criteria of the material count like the built-in
 * ones. When the station has a fatigue check, the report also carries the fatigue results at the point for every
 * load history and fatigue criterion ({@link org.tensio.engine.checks.FatiguePointOp}, the rules of the check;
 * notches on the surface act within
 * {@link org.tensio.engine.checks.FatiguePointOp#defaultSurfaceTolerance()} of the boundary); a station without load cases
 * whose fatigue histories give the forces shows the static state under no load ({@link #NO_CASE}).
 */
public final class PointEvaluator {

    private PointEvaluator() {
    }

    /**
     * @return the report, or null when the section has no station to take forces from
     * @throws IllegalArgumentException when the point lies outside the section, or names an unknown station or case
     */
    public static PointReport evaluate(PreparedSection prepared, SectionPoint point) {
        Project project = prepared.project();
        String stationId = point.stationId() != null ? point.stationId() : firstStation(project, point.sectionId());
        if (stationId == null) {
            return null;
        }
        Station station = project.station(stationId);
        if (!station.sectionId().equals(prepared.section().name())) {
            throw new IllegalArgumentException("point.sectionId: station '" + stationId + "' has section '"
                    + station.sectionId() + "', not '" + prepared.section().name() + "'");
        }
        Point2 at = new Point2(point.x(), point.y());
        PointReport best = null;
        if (point.caseId() != null && !isHistoryOnly(prepared, station, point.caseId())) {
            best = report(prepared, stationId, point.caseId(), at, false);
        } else {
            for (String caseId : LoadCases.at(project, station, null)) {
                PointReport r = report(prepared, stationId, caseId, at, true);
                if (best == null || score(r) > score(best)) {
                    best = r;
                }
            }
        }
        if (best == null && prepared.fatigue() != null && prepared.fatigue().station(stationId) != null) {
            // a fatigue-only station (its histories give the forces): the static state under no load
            best = report(prepared, stationId, NO_CASE, at, false);
        }
        return best == null ? null : fatigue(prepared, stationId, at, best);
    }

    /**
     * @return true when {@code id} names a fatigue load history of the station and no load case or combination
     *         there (a part showing a fatigue quantity may pass its history as the point's case): the static case
     *         is then chosen as for a point without a case
     */
    public static boolean isHistoryOnly(PreparedSection prepared, Station station, String id) {
        if (prepared.fatigue() == null) {
            return false;
        }
        var fs = prepared.fatigue().station(station.id());
        return fs != null && fs.histories().containsKey(id)
                && !LoadCases.at(prepared.project(), station, null).contains(id);
    }

    /** The case id shown for a station without load cases whose fatigue histories give its forces. */
    public static final String NO_CASE = "\u2014"; //$NON-NLS-1$


    private static PointReport fatigue(PreparedSection p, String stationId, Point2 at, PointReport r) {
        if (p.fatigue() == null) {
            boolean wanted = p.project().fatigue().station(stationId) != null;
            return wanted ? r.withFatigue(null, Messages.PointEvaluator_fatigueNoSolution) : r;
        }
        if (p.fatigue().station(stationId) == null) {
            return r;
        }
        try {
            return r.withFatigue(p.fatigue().evaluate(stationId, at, p.fatigue().defaultSurfaceTolerance()), null);
        } catch (IllegalArgumentException e) {
            return r.withFatigue(null, e.getMessage());
        }
    }

    private static double score(PointReport r) {
        if (r.governing() != null) {
            return r.utilisation();
        }
        return r.stress().principal() == null ? Math.abs(r.stress().sigmaZ()) : r.stress().principal().vonMises();
    }

    private static PointReport report(PreparedSection p, String stationId, String caseId, Point2 at, boolean chosen) {
        InternalForces f = NO_CASE.equals(caseId) ? InternalForces.ZERO : p.project().forces(stationId, caseId);
        // the fields only where the service's stressAt uses them, so that methods and numbers are the same
        boolean fields = f.vx() != 0 || f.vy() != 0 || !p.props().torsionClosedForm() && f.t() != 0;
        PointStress s = PointStressOp.evaluate(p.section(), p.props(), fields ? p.solution() : null,
                ShearMethod.finiteElement, f, at, stationId, caseId);
        Map<String, Double> u = new LinkedHashMap<>();
        String governing = null;
        MaterialLimits limits = p.project().limits().get(s.material());
        if (limits != null && s.total() != null) {
            double sz = s.total().sigmaZ(), tx = s.total().tauZX(), ty = s.total().tauZY();
            for (MaterialCriteria.Rule rule : MaterialCriteria.of(limits, p.extensions())) {
                u.put(rule.name(), rule.utilisation(sz, tx, ty));
            }
            for (Map.Entry<String, Double> e : u.entrySet()) {
                if (governing == null || e.getValue() > u.get(governing)) {
                    governing = e.getKey();
                }
            }
        }
        return new PointReport(p.section().name(), s, u, governing, chosen, p.project().units(), null, null);
    }

    private static String firstStation(Project project, String sectionId) {
        List<String> ids = new ArrayList<>();
        for (Station st : project.stations().values()) {
            if (st.sectionId().equals(sectionId)) {
                ids.add(st.id());
            }
        }
        return ids.isEmpty() ? null : ids.get(0);
    }
}
