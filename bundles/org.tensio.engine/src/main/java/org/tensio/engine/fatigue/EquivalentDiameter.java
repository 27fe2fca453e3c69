package org.tensio.engine.fatigue;

import org.tensio.engine.geometry.ArcSegment;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.HalfPlane;
import org.tensio.engine.geometry.LineSegment;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Segment;
import org.tensio.engine.profile.CircleHollowProfile;
import org.tensio.engine.profile.CircleProfile;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;

/**
 * The diameter that enters the size factor kb: the diameter of a rotating round bar, or for a non-rotating or
 * non-round section the equivalent diameter of the 95 %-stress-area method, de = √(A95 / (0.0975 π/4)):
 * A95 is the area stressed to at least 95 % of the peak alternating bending stress, and 0.0975 π/4 d² = 0.0766 d²
 * is that area of a rotating round bar (Shigley's Mechanical Engineering Design, 9th/10th ed., sec. 6-9,
 * Eqs. 6-23, 6-24 and Table 6-3; from memory), so a rotating solid round bar gets de = d exactly.
 * <p>
 * A95 is computed exactly: the alternating bending stress of a non-rotating section is linear over the section,
 * so the part above 95 % of its largest magnitude is the section clipped by two half-planes
 * ({@link HalfPlane#clippedMoments}, arcs kept as arcs); a non-rotating round bar gets 0.01046 d² and
 * de = 0.370 d, a rectangle h × b bent about one axis 0.05 h b and de = 0.808 √(h b) (Table 6-3). A rotating
 * round bar or tube: the annulus between max(ri, 0.95 ro) and ro. A rotating section that is not round needs the
 * diameter given. Without alternating bending: alternating torsion uses the round bar's diameter, or for a
 * non-round section the larger de of bending about either principal axis (the smaller kb, conservative); a
 * purely axial alternating load has kb = 1. Composite sections: the area is not E-weighted.
 *
 * @since 0.1
 */
public final class EquivalentDiameter {

    /** The area of a rotating round bar of unit diameter stressed above 95 % of its peak: π/4 (1 − 0.95²). */
    public static final double A95_ROUND = Math.PI / 4 * (1 - 0.95 * 0.95);

    private EquivalentDiameter() {
    }

    /**
     * @param section         the section
     * @param props           its properties
     * @param loads           the cycle
     * @param given           the diameter given for the station (length unit), or null
     * @param mmPerLengthUnit mm in one length unit
     * @return kb with the diameter and how it was obtained
     * @throws IllegalArgumentException when the section rotates, is not round and no diameter is given
     */
    public static Factor sizeFactor(Section section, SectionProperties props, CycleLoads loads, Double given,
            double mmPerLengthUnit) {
        if (given != null) {
            return MarinFactors.size(given * mmPerLengthUnit, "given");
        }
        boolean bending = loads.bendingAmplitude() > 0;
        boolean torsion = loads.torqueAmplitude() > 0;
        if (!bending && !torsion) {
            return MarinFactors.sizeAxial();
        }
        double[] round = roundRadii(section);
        if (loads.rotating() || (!bending && round != null)) {
            if (round == null) {
                throw new IllegalArgumentException("equivalentDiameter: section '" + section.name() + "' is not round;"
                        + " give the equivalent diameter of the rotating section");
            }
            double ro = round[0], ri = round[1];
            if (ri <= 0.95 * ro) {
                return MarinFactors.size(2 * ro * mmPerLengthUnit, "= outer diameter of the round section");
            }
            double a95 = Math.PI * (ro * ro - ri * ri);
            return MarinFactors.size(Math.sqrt(a95 / A95_ROUND) * mmPerLengthUnit, "= √(A95/0.0766), A95 = "
                    + MarinFactors.n(a95) + " (the whole thin wall, 95 %-stress-area method)");
        }
        double mx, my;
        String how;
        if (bending) {
            mx = loads.cosine().mx();
            my = loads.cosine().my();
            how = "of the alternating bending";
        } else {
            double ax = a95(section, props, 1, 0), ay = a95(section, props, 0, 1);
            double a = Math.max(ax, ay);
            return MarinFactors.size(Math.sqrt(a / A95_ROUND) * mmPerLengthUnit, "= √(A95/0.0766), A95 = "
                    + MarinFactors.n(a) + " of bending about the x or y axis, the larger (torsion only: conservative)");
        }
        double a = a95(section, props, mx, my);
        return MarinFactors.size(Math.sqrt(a / A95_ROUND) * mmPerLengthUnit, "= √(A95/0.0766), A95 = " + MarinFactors.n(a)
                + " " + how + " (95 %-stress-area method, non-rotating)");
    }

    /**
     * @return {outer radius, inner radius (0 for a solid bar)} of a single-part circle or tube, else null
     */
    public static double[] roundRadii(Section section) {
        if (section.parts().size() != 1) {
            return null;
        }
        SectionPart p = section.parts().get(0);
        if (p.profile() instanceof CircleProfile c) {
            return new double[] {c.radius(), 0};
        }
        if (p.profile() instanceof CircleHollowProfile t) {
            return new double[] {t.radius(), t.radius() - t.wallThickness()};
        }
        return null;
    }

    /**
     * The area of the section whose bending stress under the moment (mx, my) is at least 95 % of the largest
     * magnitude (both sides of the neutral axis), length².
     */
    public static double a95(Section section, SectionProperties props, double mx, double my) {
        double ixx = props.ixx(), iyy = props.iyy(), ixy = props.ixy(), d = ixx * iyy - ixy * ixy;
        double gx = (-mx * ixy - my * ixx) / d, gy = (mx * iyy + my * ixy) / d;
        double len = Math.hypot(gx, gy);
        if (!(len > 0)) {
            throw new IllegalArgumentException("moment: the bending moment must not be zero for the 95 % area");
        }
        double ux = gx / len, uy = gy / len;
        double hc = ux * props.centroid().x() + uy * props.centroid().y();
        double hi = Double.NEGATIVE_INFINITY, lo = Double.POSITIVE_INFINITY;
        for (SectionPart p : section.parts()) {
            for (Contour c : p.region().contours()) {
                for (Segment s : c.segments()) {
                    double[] r = extent(s, ux, uy);
                    lo = Math.min(lo, r[0]);
                    hi = Math.max(hi, r[1]);
                }
            }
        }
        double peak = Math.max(hi - hc, hc - lo);
        double a = 0;
        HalfPlane top = new HalfPlane(ux, uy, hc + 0.95 * peak), bottom = new HalfPlane(-ux, -uy, -(hc - 0.95 * peak));
        for (SectionPart p : section.parts()) {
            a += Math.abs(top.clippedMoments(p.region()).area()) + Math.abs(bottom.clippedMoments(p.region()).area());
        }
        return a;
    }

    /** @return {min, max} of u·p over the segment (exact for lines and elliptic arcs) */
    static double[] extent(Segment s, double ux, double uy) {
        double lo, hi;
        if (s instanceof LineSegment l) {
            double a = ux * l.start().x() + uy * l.start().y(), b = ux * l.end().x() + uy * l.end().y();
            return new double[] {Math.min(a, b), Math.max(a, b)};
        }
        ArcSegment arc = (ArcSegment) s;
        double a = ux * arc.start().x() + uy * arc.start().y(), b = ux * arc.end().x() + uy * arc.end().y();
        lo = Math.min(a, b);
        hi = Math.max(a, b);
        double t = Math.atan2(uy * arc.b(), ux * arc.a());
        for (double tt : new double[] {t, t + Math.PI}) {
            if (arc.inSweep(tt)) {
                Point2 q = arc.atParam(tt);
                double h = ux * q.x() + uy * q.y();
                lo = Math.min(lo, h);
                hi = Math.max(hi, h);
            }
        }
        return new double[] {lo, hi};
    }
}
