package org.tensio.engine.stress;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.geometry.Chords;
import org.tensio.engine.geometry.HalfPlane;
import org.tensio.engine.geometry.Moments;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.loads.InternalForces;
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
    /** Method name: exact closed form for a circle or tube. */
    public static final String TORSION_EXACT_CIRCULAR = "exactCircular";
    /** Method name: torsion not needed because T = 0. */
    public static final String TORSION_NOT_REQUIRED = "notRequired";
    /** Method name: torsion needed but not available for this section. */
    public static final String TORSION_UNAVAILABLE = "unavailable";

    private PointStressOp() {
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
        double th = cuts.widthHorizontal(), tv = cuts.widthVertical();
        double vxZy = th > 0 ? (ixx * cuts.qyHorizontal() - ixy * cuts.qxHorizontal()) / (d * th) : 0;
        double vyZy = th > 0 ? (iyy * cuts.qxHorizontal() - ixy * cuts.qyHorizontal()) / (d * th) : 0;
        double vxZx = tv > 0 ? (ixx * cuts.qyVertical() - ixy * cuts.qxVertical()) / (d * tv) : 0;
        double vyZx = tv > 0 ? (iyy * cuts.qxVertical() - ixy * cuts.qyVertical()) / (d * tv) : 0;
        contrib.put(ForceComponent.VX, new StressComponents(0, forces.vx() * vxZx, forces.vx() * vxZy));
        contrib.put(ForceComponent.VY, new StressComponents(0, forces.vy() * vyZx, forces.vy() * vyZy));

        List<String> warnings = new ArrayList<>();
        String torsionMethod;
        boolean complete = true;
        if (props.j() != null && props.shearCentre() != null) {
            double j = props.j();
            double rx = point.x() - props.shearCentre().x(), ry = point.y() - props.shearCentre().y();
            contrib.put(ForceComponent.T, new StressComponents(0, -forces.t() * ry / j, forces.t() * rx / j));
            torsionMethod = forces.t() == 0 ? TORSION_NOT_REQUIRED : TORSION_EXACT_CIRCULAR;
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
        if (section.parts().size() > 1 && (forces.vx() != 0 || forces.vy() != 0)) {
            warnings.add("elementary shear on a composite section assumes a uniform τ across each cut");
        }
        return new PointStress(stationId, caseId, point, partIndex, part.material().name(), forces, total.sigmaZ(),
                complete ? total : null, complete ? PrincipalStresses.of(total) : null, contrib, cuts,
                SHEAR_ELEMENTARY, torsionMethod, List.copyOf(warnings));
    }

    /** Contributions below 1e-12 of the largest one at the point are round-off: report them as zero. */
    private static void snapRoundOff(Map<ForceComponent, StressComponents> contrib) {
        double max = 0;
        for (StressComponents c : contrib.values()) {
            max = Math.max(max, Math.max(Math.abs(c.sigmaZ()), Math.max(Math.abs(c.tauZX()), Math.abs(c.tauZY()))));
        }
        double eps = 1e-12 * max;
        for (Map.Entry<ForceComponent, StressComponents> e : contrib.entrySet()) {
            StressComponents c = e.getValue();
            e.setValue(new StressComponents(Math.abs(c.sigmaZ()) < eps ? 0 : c.sigmaZ(),
                    Math.abs(c.tauZX()) < eps ? 0 : c.tauZX(), Math.abs(c.tauZY()) < eps ? 0 : c.tauZY()));
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
