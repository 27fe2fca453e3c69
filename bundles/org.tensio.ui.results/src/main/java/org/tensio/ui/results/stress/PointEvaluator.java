package org.tensio.ui.results.stress;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.checks.LoadCases;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.section.Criterion;
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
 * Mises stress when the material has no limits).
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
        if (point.caseId() != null) {
            return report(prepared, stationId, point.caseId(), at, false);
        }
        PointReport best = null;
        for (String caseId : LoadCases.at(project, station, null)) {
            PointReport r = report(prepared, stationId, caseId, at, true);
            if (best == null || score(r) > score(best)) {
                best = r;
            }
        }
        return best;
    }

    private static double score(PointReport r) {
        if (r.governing() != null) {
            return r.utilisation();
        }
        return r.stress().principal() == null ? Math.abs(r.stress().sigmaZ()) : r.stress().principal().vonMises();
    }

    private static PointReport report(PreparedSection p, String stationId, String caseId, Point2 at, boolean chosen) {
        InternalForces f = p.project().forces(stationId, caseId);
        // the fields only where the service's stressAt uses them, so that methods and numbers are the same
        boolean fields = f.vx() != 0 || f.vy() != 0 || !p.props().torsionClosedForm() && f.t() != 0;
        PointStress s = PointStressOp.evaluate(p.section(), p.props(), fields ? p.solution() : null,
                ShearMethod.finiteElement, f, at, stationId, caseId);
        Map<Criterion, Double> u = new LinkedHashMap<>();
        Criterion governing = null;
        MaterialLimits limits = p.project().limits().get(s.material());
        if (limits != null && s.total() != null) {
            for (Criterion c : limits.criteria()) {
                double v = MaterialLimits.demand(c, s.total().sigmaZ(), s.total().tauZX(), s.total().tauZY())
                        / limits.capacity(c);
                u.put(c, v);
                if (governing == null || v > u.get(governing)) {
                    governing = c;
                }
            }
        }
        return new PointReport(p.section().name(), s, u, governing, chosen, p.project().units());
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
