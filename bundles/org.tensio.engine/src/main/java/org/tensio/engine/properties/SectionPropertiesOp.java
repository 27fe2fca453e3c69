package org.tensio.engine.properties;

import java.util.ArrayList;
import java.util.List;

import org.tensio.engine.geometry.Bounds;
import org.tensio.engine.geometry.HalfPlane;
import org.tensio.engine.geometry.Moments;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;

/**
 * Computes exact {@link SectionProperties} by boundary integration (Green's theorem), arcs integrated as
 * arcs. Moments are accumulated in a frame centred on the section's bounding box so that sections far from
 * the origin lose no digits to cancellation.
 * <p>
 * Composite sections: each part's moments are weighted by its modular ratio n = E / E_ref. The plastic
 * moduli are geometric (unweighted). The plastic neutral axes are found by bisection on the exactly clipped
 * area to a relative width of 1e-14 of the section's extent.
 *
 * @since 0.1
 */
public final class SectionPropertiesOp {

    private final Section section;
    private final double ox;
    private final double oy;
    private final List<Region> local = new ArrayList<>();
    private final double[] ratio;

    private SectionPropertiesOp(Section section) {
        this.section = section;
        Bounds b = section.bounds();
        this.ox = 0.5 * (b.minX() + b.maxX());
        this.oy = 0.5 * (b.minY() + b.maxY());
        this.ratio = new double[section.parts().size()];
        double eRef = section.referenceMaterial().e();
        for (int i = 0; i < section.parts().size(); i++) {
            SectionPart p = section.parts().get(i);
            local.add(p.region().translated(-ox, -oy));
            ratio[i] = p.material().e() / eRef;
        }
    }

    /** @return the exact properties of {@code section} */
    public static SectionProperties compute(Section section) {
        return new SectionPropertiesOp(section).compute();
    }

    private SectionProperties compute() {
        Moments w = Moments.ZERO;
        Moments geo = Moments.ZERO;
        for (int i = 0; i < local.size(); i++) {
            Moments m = local.get(i).moments();
            w = w.plus(m.times(ratio[i]));
            geo = geo.plus(m);
        }
        double a = w.area();
        if (!(a > 0)) {
            throw new IllegalArgumentException("section '" + section.name() + "': area must be positive, got " + a);
        }
        double xcl = w.sx() / a, ycl = w.sy() / a;
        double ixx = w.syy() - a * ycl * ycl;
        double iyy = w.sxx() - a * xcl * xcl;
        double ixy = w.sxy() - a * xcl * ycl;
        double mean = 0.5 * (ixx + iyy);
        double half = 0.5 * (ixx - iyy);
        double rad = Math.hypot(half, ixy);
        double i1 = mean + rad, i2 = mean - rad;
        double angle = rad <= 1e-14 * Math.abs(mean) ? 0.0 : Math.toDegrees(0.5 * Math.atan2(-2 * ixy, ixx - iyy));
        if (angle <= -90) {
            angle += 180;
        }
        Bounds b = section.bounds();
        // round-off below 1e-14 of the section's size or stiffness (a few dozen ulps) is reported as exactly zero
        double size = b.diagonal();
        double xc = snap(xcl + ox, size), yc = snap(ycl + oy, size);
        ixy = snap(ixy, Math.sqrt(Math.abs(ixx * iyy)));
        double plasticY = plasticAxis(geo.area(), true);
        double plasticX = plasticAxis(geo.area(), false);
        double zx = plasticModulus(plasticY, true);
        double zy = plasticModulus(plasticX, false);
        Torsion tor = closedFormTorsion(xc, yc);
        return new SectionProperties(section.name(), section.referenceMaterial().name(), section.isComposite(), a,
                new Point2(xc, yc), ixx, iyy, ixy, i1, i2, angle, Math.sqrt(ixx / a), Math.sqrt(iyy / a),
                ixx / (b.maxY() - yc), ixx / (yc - b.minY()), iyy / (b.maxX() - xc), iyy / (xc - b.minX()), zx, zy,
                snap(plasticY + oy, size), snap(plasticX + ox, size), tor == null ? null : tor.j, tor == null ? null : tor.centre,
                tor == null ? null : 0.0, tor == null ? null : tor.source, b.minX(), b.minY(), b.maxX(), b.maxY());
    }

    /** @return 0 when |v| is below 1e-14 of {@code scale}, else v */
    static double snap(double v, double scale) {
        return Math.abs(v) < 1e-14 * scale ? 0.0 : v;
    }

    /** Bisection for the equal-area axis, local frame; {@code horizontal} for the axis parallel to x. */
    private double plasticAxis(double totalArea, boolean horizontal) {
        Bounds b = section.bounds();
        double lo = horizontal ? b.minY() - oy : b.minX() - ox;
        double hi = horizontal ? b.maxY() - oy : b.maxX() - ox;
        double tol = 1e-14 * (hi - lo);
        for (int it = 0; it < 200 && hi - lo > tol; it++) {
            double mid = 0.5 * (lo + hi);
            double beyond = clipped(mid, horizontal).area();
            if (beyond > 0.5 * totalArea) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /** Geometric moments of the material beyond the cut (y ≥ c or x ≥ c), local frame. */
    private Moments clipped(double c, boolean horizontal) {
        HalfPlane h = horizontal ? HalfPlane.above(c) : HalfPlane.rightOf(c);
        Moments m = Moments.ZERO;
        for (Region r : local) {
            m = m.plus(h.clippedMoments(r));
        }
        return m;
    }

    private double plasticModulus(double c, boolean horizontal) {
        Moments total = Moments.ZERO;
        for (Region r : local) {
            total = total.plus(r.moments());
        }
        Moments beyond = clipped(c, horizontal);
        double aB = beyond.area(), aR = total.area() - aB;
        double sB = horizontal ? beyond.sy() : beyond.sx();
        double sR = (horizontal ? total.sy() : total.sx()) - sB;
        return (sB - c * aB) + (c * aR - sR);
    }

    private record Torsion(double j, Point2 centre, String source) {
    }

    /** Closed forms for a single solid or hollow circle: J = π(ro⁴ − ri⁴)/2, shear centre at the centre, Cw = 0. */
    private Torsion closedFormTorsion(double xc, double yc) {
        if (section.parts().size() != 1) {
            return null;
        }
        SectionPart p = section.parts().get(0);
        String type = p.profile().type();
        Double r = p.profile().parameters().get("radius");
        if (r == null) {
            return null;
        }
        if (type.equals("CircleProfile")) {
            return new Torsion(Math.PI * Math.pow(r, 4) / 2, new Point2(xc, yc), SectionProperties.CLOSED_FORM_CIRCLE);
        }
        Double t = p.profile().parameters().get("wallThickness");
        if (type.equals("CircleHollowProfile") && t != null) {
            double ri = r - t;
            return new Torsion(Math.PI * (Math.pow(r, 4) - Math.pow(ri, 4)) / 2, new Point2(xc, yc), SectionProperties.CLOSED_FORM_TUBE);
        }
        return null;
    }
}
