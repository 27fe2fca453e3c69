package org.tensio.engine.checks;

import java.util.HashMap;
import java.util.Map;

import org.tensio.engine.geometry.Chords;
import org.tensio.engine.geometry.HalfPlane;
import org.tensio.engine.geometry.Moments;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;
import org.tensio.engine.stress.PointStressOp;

/**
 * The elementary shear stresses per unit Vx and Vy at many points of one section, with the cuts shared: τzy comes
 * from the horizontal cut through the point, which depends only on its y, and τzx from the vertical cut, which
 * depends only on its x, so each cut is computed once per distinct y (and x) instead of once per point. The
 * values are those of {@link PointStressOp} with {@link org.tensio.engine.stress.ShearMethod#elementary} and unit
 * forces: the same E-weighted first moments about the centroid, the same widths, the same expressions in the same
 * order, and the same rounding rule (a contribution below 1e-13 of the point's largest shear contribution is
 * reported as zero). Shear flow on straight cuts, τ = V·Q/(I·t) generalised to unsymmetric sections with Ixy:
 * <pre>
 *   τzy per Vx = (Ixx·Qy − Ixy·Qx) / (D·t),  τzy per Vy = (Iyy·Qx − Ixy·Qy) / (D·t)   (cut y = y0, part above)
 *   τzx per Vx = (Ixx·Qy − Ixy·Qx) / (D·t),  τzx per Vy = (Iyy·Qx − Ixy·Qy) / (D·t)   (cut x = x0, part right of it)
 * </pre>
 * D = Ixx·Iyy − Ixy², Q E-weighted first moments of the cut-off part, t the total width of the cut (0 stress for
 * a cut of zero width). Stress per force unit; section frame. Not thread-safe (it caches the cuts).
 */
final class ElementaryShear {

    /** Relative size below which a contribution is round-off, as in {@link PointStressOp}. */
    static final double ROUND_OFF = 1e-13;

    private final Section section;
    private final double eRef;
    private final double xc;
    private final double yc;
    private final double ixx;
    private final double iyy;
    private final double ixy;
    private final double d;
    /** y → {τzy per Vx, τzy per Vy}. */
    private final Map<Double, double[]> horizontal = new HashMap<>();
    /** x → {τzx per Vx, τzx per Vy}. */
    private final Map<Double, double[]> vertical = new HashMap<>();

    ElementaryShear(Section section, SectionProperties props) {
        this.section = section;
        this.eRef = section.referenceMaterial().e();
        this.xc = props.centroid().x();
        this.yc = props.centroid().y();
        this.ixx = props.ixx();
        this.iyy = props.iyy();
        this.ixy = props.ixy();
        this.d = ixx * iyy - ixy * ixy;
    }

    /**
     * @return {τzx, τzy per unit Vx, τzx, τzy per unit Vy} at (x, y), stress per force unit
     */
    double[] at(double x, double y) {
        double[] h = horizontal.computeIfAbsent(y, k -> cut(HalfPlane.above(k)));
        double[] v = vertical.computeIfAbsent(x, k -> cut(HalfPlane.rightOf(k)));
        double[] u = {v[0], h[0], v[1], h[1]};
        double max = 0;
        for (double c : u) {
            max = Math.max(max, Math.abs(c));
        }
        double eps = ROUND_OFF * max;
        for (int k = 0; k < u.length; k++) {
            if (Math.abs(u[k]) < eps) {
                u[k] = 0;
            }
        }
        return u;
    }

    /** @return number of cuts computed so far (horizontal + vertical) */
    int cuts() {
        return horizontal.size() + vertical.size();
    }

    /** {per Vx, per Vy} of the cut along the boundary line of {@code beyond}, the cut-off part inside it. */
    private double[] cut(HalfPlane beyond) {
        double qx = 0, qy = 0, t = 0;
        for (SectionPart part : section.parts()) {
            double n = part.material().e() / eRef;
            Moments m = beyond.clippedMoments(part.region());
            qx += n * (m.sy() - yc * m.area());
            qy += n * (m.sx() - xc * m.area());
            t += Chords.width(part.region(), beyond);
        }
        return new double[] {t > 0 ? (ixx * qy - ixy * qx) / (d * t) : 0, t > 0 ? (iyy * qx - ixy * qy) / (d * t) : 0};
    }
}
