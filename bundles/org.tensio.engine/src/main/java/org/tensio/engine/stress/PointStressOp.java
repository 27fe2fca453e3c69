package org.tensio.engine.stress;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.fem.UnitShear;
import org.tensio.engine.geometry.Chords;
import org.tensio.engine.geometry.HalfPlane;
import org.tensio.engine.geometry.Moments;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.mesh.Singularity;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;

/**
 * The stress state at one point from a station's internal forces, by elementary beam theory on the exact
 * section properties.
 * <ul>
 * <li>σz: biaxial (unsymmetric) flexure with Ixy, in centroidal coordinates X = x − xc, Y = y − yc and
 * D = Ixx·Iyy − Ixy²: σz = n·[N/A + Mx(Iyy·Y − Ixy·X)/D + My(Ixy·Y − Ixx·X)/D], n = E_part / E_ref.</li>
 * <li>τ from Vx, Vy: shear flow on straight cuts through the point. With ∂σz/∂z from dMx/dz = Vy and
 * dMy/dz = −Vx, equilibrium of the material beyond the cut gives
 * τ·t = [(Vy·Iyy − Vx·Ixy)·Qx + (Vx·Ixx − Vy·Ixy)·Qy] / D, where Qx = ∫Y dA and Qy = ∫X dA of that material
 * (E-weighted) and t the cut's total width. The cut parallel to x (material y ≥ y0) gives τzy; the cut parallel
 * to y (material x ≥ x0) gives τzx. This is the average over the cut: exact in the limit of thin walls and
 * narrow rectangles, approximate elsewhere.</li>
 * <li>τ from T: exact for a solid circle and a circular tube, τ = T·r/J circulating counter-clockwise for
 * positive T; for other sections not available (see {@link PointStress}).</li>
 * </ul>
 * Points within {@link #BOUNDARY_TOLERANCE} × the section's bounding-box diagonal of the boundary count as on
 * it (inside).
 *
 * @since 0.1
 */
public final class PointStressOp {

    /** Relative distance within which a point counts as on the boundary. */
    public static final double BOUNDARY_TOLERANCE = 1e-5;

    /** Method name: elementary shear flow on straight cuts. */
    public static final String SHEAR_ELEMENTARY = "elementary";
    /** Method name: shear functions on the finite-element mesh. */
    public static final String SHEAR_FINITE_ELEMENT = "finiteElement";
    /** Method name: warping function on the finite-element mesh. */
    public static final String TORSION_FINITE_ELEMENT = "finiteElement";
    /** Points closer than this fraction of the section diagonal to a sharp re-entrant corner get a warning. */
    public static final double SINGULAR_RADIUS = 0.02;
    /** Method name: exact closed form for a circle or tube. */
    public static final String TORSION_EXACT_CIRCULAR = "exactCircular";
    /** Method name: torsion not needed because T = 0. */
    public static final String TORSION_NOT_REQUIRED = "notRequired";
    /** Method name: torsion needed but not available for this section. */
    public static final String TORSION_UNAVAILABLE = "unavailable";

    private PointStressOp() {
    }

    /**
     * Refuses to report a stress that overflowed (or became NaN): forces, dimensions and moduli so far apart in
     * magnitude that double arithmetic cannot represent the result.
     */
    private static void requireFinite(StressComponents total, Map<ForceComponent, StressComponents> contrib,
            Section section, Point2 point, String stationId, String caseId) {
        boolean finite = Double.isFinite(total.sigmaZ()) && Double.isFinite(total.tauZX()) && Double.isFinite(total.tauZY());
        for (StressComponents c : contrib.values()) {
            finite &= Double.isFinite(c.sigmaZ()) && Double.isFinite(c.tauZX()) && Double.isFinite(c.tauZY());
        }
        if (!finite) {
            throw new IllegalArgumentException("station '" + stationId + "', case '" + caseId + "': the stress at ("
                    + point.x() + ", " + point.y() + ") of section '" + section.name() + "' is not a finite number ("
                    + "sigmaZ = " + total.sigmaZ() + "): the forces, dimensions and moduli are too far apart in "
                    + "magnitude for double arithmetic; check their values and units");
        }
    }

    /**
     * @param section    the section
     * @param props      its properties ({@link org.tensio.engine.properties.SectionPropertiesOp#compute})
     * @param forces     internal forces
     * @param point      the point, section frame
     * @param stationId  for the result and messages
     * @param caseId     for the result and messages
     * @return the stress state
     * @throws IllegalArgumentException when the point lies outside the section
     */
    public static PointStress evaluate(Section section, SectionProperties props, InternalForces forces, Point2 point,
            String stationId, String caseId) {
        return evaluate(section, props, null, ShearMethod.elementary, forces, point, stationId, caseId);
    }

    /**
     * As {@link #evaluate(Section, SectionProperties, InternalForces, Point2, String, String)}, with torsion
     * (any section) and, when {@code shearMethod} is {@link ShearMethod#finiteElement}, shear (homogeneous
     * sections) from the finite-element fields {@code fe}; {@code fe} may be null (elementary methods and
     * closed forms only).
     */
    public static PointStress evaluate(Section section, SectionProperties props, FiniteElementSolution fe,
            ShearMethod shearMethod, InternalForces forces, Point2 point, String stationId, String caseId) {
        List<String> warnings = new ArrayList<>();
        int partIndex = locate(section, point);
        SectionPart part = section.parts().get(partIndex);
        double n = part.material().e() / section.referenceMaterial().e();
        double xc = props.centroid().x(), yc = props.centroid().y();
        double bx = point.x() - xc, by = point.y() - yc;
        double ixx = props.ixx(), iyy = props.iyy(), ixy = props.ixy();
        double d = ixx * iyy - ixy * ixy;

        Map<ForceComponent, StressComponents> contrib = new EnumMap<>(ForceComponent.class);
        contrib.put(ForceComponent.N, new StressComponents(n * forces.n() / props.area(), 0, 0));
        contrib.put(ForceComponent.MX, new StressComponents(n * forces.mx() * (iyy * by - ixy * bx) / d, 0, 0));
        contrib.put(ForceComponent.MY, new StressComponents(n * forces.my() * (ixy * by - ixx * bx) / d, 0, 0));

        ShearCuts cuts = cuts(section, point, xc, yc);
        UnitShear[] unit = null;
        if (fe != null && (forces.t() != 0 || forces.vx() != 0 || forces.vy() != 0)) {
            unit = fe.unitStresses(point, false);
        }
        String shear;
        if (shearMethod == ShearMethod.finiteElement && fe != null && fe.hasShearFields()) {
            UnitShear[] u = unit != null ? unit : fe.unitStresses(point, false);
            contrib.put(ForceComponent.VX, new StressComponents(0, forces.vx() * u[1].tauZX(), forces.vx() * u[1].tauZY()));
            contrib.put(ForceComponent.VY, new StressComponents(0, forces.vy() * u[2].tauZX(), forces.vy() * u[2].tauZY()));
            shear = SHEAR_FINITE_ELEMENT;
        } else {
            double th = cuts.widthHorizontal(), tv = cuts.widthVertical();
            double vxZy = th > 0 ? (ixx * cuts.qyHorizontal() - ixy * cuts.qxHorizontal()) / (d * th) : 0;
            double vyZy = th > 0 ? (iyy * cuts.qxHorizontal() - ixy * cuts.qyHorizontal()) / (d * th) : 0;
            double vxZx = tv > 0 ? (ixx * cuts.qyVertical() - ixy * cuts.qxVertical()) / (d * tv) : 0;
            double vyZx = tv > 0 ? (iyy * cuts.qxVertical() - ixy * cuts.qyVertical()) / (d * tv) : 0;
            contrib.put(ForceComponent.VX, new StressComponents(0, forces.vx() * vxZx, forces.vx() * vxZy));
            contrib.put(ForceComponent.VY, new StressComponents(0, forces.vy() * vyZx, forces.vy() * vyZy));
            shear = SHEAR_ELEMENTARY;
            if (shearMethod == ShearMethod.finiteElement && (forces.vx() != 0 || forces.vy() != 0)) {
                warnings.add(fe == null ? "no finite-element solution: shear by the elementary method"
                        : "composite section: shear by the elementary method (shear functions are computed for"
                                + " homogeneous sections only)");
            }
        }

        String torsionMethod;
        boolean complete = true;
        if (props.torsionClosedForm()) {
            double j = props.j();
            double rx = point.x() - props.shearCentre().x(), ry = point.y() - props.shearCentre().y();
            contrib.put(ForceComponent.T, new StressComponents(0, -forces.t() * ry / j, forces.t() * rx / j));
            torsionMethod = forces.t() == 0 ? TORSION_NOT_REQUIRED : TORSION_EXACT_CIRCULAR;
        } else if (fe != null) {
            UnitShear u = unit != null ? unit[0] : fe.unitStresses(point, false)[0];
            contrib.put(ForceComponent.T, new StressComponents(0, forces.t() * u.tauZX(), forces.t() * u.tauZY()));
            torsionMethod = forces.t() == 0 ? TORSION_NOT_REQUIRED : TORSION_FINITE_ELEMENT;
        } else if (forces.t() == 0) {
            contrib.put(ForceComponent.T, StressComponents.ZERO);
            torsionMethod = TORSION_NOT_REQUIRED;
        } else {
            torsionMethod = TORSION_UNAVAILABLE;
            complete = false;
            warnings.add("torsion T = " + forces.t() + " on section '" + section.name()
                    + "' needs the finite-element torsion solution, not computed in this version: shear and"
                    + " equivalent stresses are not reported (sigmaZ is complete)");
        }
        snapRoundOff(contrib);
        StressComponents total = StressComponents.ZERO;
        for (StressComponents c : contrib.values()) {
            total = total.plus(c);
        }
        if (shear.equals(SHEAR_ELEMENTARY) && section.parts().size() > 1 && (forces.vx() != 0 || forces.vy() != 0)) {
            warnings.add("elementary shear on a composite section assumes a uniform τ across each cut");
        }
        if (fe != null && (forces.t() != 0 || forces.vx() != 0 || forces.vy() != 0)) {
            double near = SINGULAR_RADIUS * section.bounds().diagonal();
            for (Singularity sg : fe.mesh().singularities()) {
                if (Math.hypot(sg.x() - point.x(), sg.y() - point.y()) <= near) {
                    warnings.add(String.format(java.util.Locale.ROOT, "the point is within %.3g of a sharp re-entrant"
                            + " corner at (%.6g, %.6g) (interior angle %.1f°): the elastic shear stress there is"
                            + " singular and grows with mesh refinement; model the fillet instead of trusting this value",
                            near, sg.x(), sg.y(), sg.interiorAngleDeg()));
                    break;
                }
            }
        }
        requireFinite(total, contrib, section, point, stationId, caseId);
        return new PointStress(stationId, caseId, point, partIndex, part.material().name(), forces, total.sigmaZ(),
                complete ? total : null, complete ? PrincipalStresses.of(total) : null, contrib, cuts,
                shear, torsionMethod, List.copyOf(warnings));
    }

    /**
     * Contributions below 1e-13 of the largest of their kind at the point (normal or shear) are round-off:
     * report them as zero.
     */
    private static void snapRoundOff(Map<ForceComponent, StressComponents> contrib) {
        double maxS = 0, maxT = 0;
        for (StressComponents c : contrib.values()) {
            maxS = Math.max(maxS, Math.abs(c.sigmaZ()));
            maxT = Math.max(maxT, Math.max(Math.abs(c.tauZX()), Math.abs(c.tauZY())));
        }
        double es = 1e-13 * maxS, et = 1e-13 * maxT;
        for (Map.Entry<ForceComponent, StressComponents> e : contrib.entrySet()) {
            StressComponents c = e.getValue();
            e.setValue(new StressComponents(Math.abs(c.sigmaZ()) < es ? 0 : c.sigmaZ(),
                    Math.abs(c.tauZX()) < et ? 0 : c.tauZX(), Math.abs(c.tauZY()) < et ? 0 : c.tauZY()));
        }
    }

    /**
     * @return the index of the part holding the point: the first part strictly inside; failing that, of the
     *         parts whose boundary it lies on, the stiffest (largest E, conservative for σz)
     */
    static int locate(Section section, Point2 p) {
        double tol = BOUNDARY_TOLERANCE * section.bounds().diagonal();
        int best = -1;
        for (int i = 0; i < section.parts().size(); i++) {
            SectionPart part = section.parts().get(i);
            Region.Location loc = part.region().locate(p, tol);
            if (loc == Region.Location.INSIDE) {
                return i;
            }
            if (loc == Region.Location.BOUNDARY
                    && (best < 0 || part.material().e() > section.parts().get(best).material().e())) {
                best = i;
            }
        }
        if (best < 0) {
            throw new IllegalArgumentException("point (" + p.x() + ", " + p.y() + ") lies outside section '"
                    + section.name() + "'");
        }
        return best;
    }

    static ShearCuts cuts(Section section, Point2 p, double xc, double yc) {
        HalfPlane up = HalfPlane.above(p.y());
        HalfPlane right = HalfPlane.rightOf(p.x());
        double eRef = section.referenceMaterial().e();
        double qxh = 0, qyh = 0, th = 0, qxv = 0, qyv = 0, tv = 0;
        for (SectionPart part : section.parts()) {
            double n = part.material().e() / eRef;
            Moments h = up.clippedMoments(part.region());
            Moments v = right.clippedMoments(part.region());
            qxh += n * (h.sy() - yc * h.area());
            qyh += n * (h.sx() - xc * h.area());
            qxv += n * (v.sy() - yc * v.area());
            qyv += n * (v.sx() - xc * v.area());
            th += Chords.width(part.region(), up);
            tv += Chords.width(part.region(), right);
        }
        return new ShearCuts(qxh, qyh, th, qxv, qyv, tv);
    }
}
