package org.tensio.engine.verification;

import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;

import org.tensio.engine.geometry.ArcSegment;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.LineSegment;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.geometry.Segment;
import org.tensio.engine.profile.ArbitraryClosedProfile;
import org.tensio.engine.profile.ArbitraryProfileWithVoids;
import org.tensio.engine.profile.ProfileDef;
import org.tensio.engine.section.Material;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;

/**
 * Shapes and exact rigid/similarity transforms for the verification and property tests. Everything here is
 * built from the public geometry API only; transforms map each end point through one function so that
 * joints stay bit-identical, as {@link Contour} requires.
 */
public final class Shapes {

    /** Structural steel, E = 210 000 N/mm², ν = 0.3 (EN 1993-1-1 §3.2.6). */
    public static final Material STEEL = new Material("S355", 210_000, 0.3, 355.0);

    private Shapes() {
    }

    /** @return a one-part steel section of {@code profile} placed with its origin at (dx, dy) */
    public static Section section(ProfileDef profile, double dx, double dy) {
        return new Section("test", List.of(SectionPart.of(profile, dx, dy, STEEL)));
    }

    /** @return a one-part steel section of {@code profile} placed at the origin */
    public static Section section(ProfileDef profile) {
        return section(profile, 0, 0);
    }

    /** @return a one-part steel section of an arbitrary region (coordinates kept as given) */
    public static Section section(Region region) {
        return section(region.holes().isEmpty() ? new ArbitraryClosedProfile(region.outer())
                : new ArbitraryProfileWithVoids(region.outer(), region.holes()));
    }

    /** @return polygon from (x0, y0, x1, y1, ...) */
    public static Contour polygon(double... xy) {
        List<Point2> pts = new ArrayList<>();
        for (int i = 0; i < xy.length; i += 2) {
            pts.add(new Point2(xy[i], xy[i + 1]));
        }
        return Contour.polygon(pts);
    }

    /** @return the axis-aligned rectangle [x0, x1] × [y0, y1], counter-clockwise */
    public static Contour box(double x0, double y0, double x1, double y1) {
        return polygon(x0, y0, x1, y0, x1, y1, x0, y1);
    }

    /**
     * A doubly symmetric I-section centred at the origin, x along the flanges, with four root fillets of radius
     * {@code r} (true quarter circles tangent to web and flange), sharp flange edges. r = 0 gives a sharp I.
     * Built here independently of {@code IShapeProfile}, so that the two constructions can be compared.
     */
    public static Region iSection(double h, double b, double tw, double tf, double r) {
        double x1 = b / 2, y1 = h / 2, xw = tw / 2, yf = h / 2 - tf;
        if (r == 0) {
            return new Region(polygon(x1, -y1, x1, -yf, xw, -yf, xw, yf, x1, yf, x1, y1, -x1, y1, -x1, yf, -xw, yf,
                    -xw, -yf, -x1, -yf, -x1, -y1));
        }
        // counter-clockwise from the bottom-right flange tip; edges 2, 4, 10, 12 are the root fillets
        Point2[] pts = {
            new Point2(x1, -y1), new Point2(x1, -yf), new Point2(xw + r, -yf), new Point2(xw, -yf + r),
            new Point2(xw, yf - r), new Point2(xw + r, yf), new Point2(x1, yf), new Point2(x1, y1),
            new Point2(-x1, y1), new Point2(-x1, yf), new Point2(-xw - r, yf), new Point2(-xw, yf - r),
            new Point2(-xw, -yf + r), new Point2(-xw - r, -yf), new Point2(-x1, -yf), new Point2(-x1, -y1) };
        List<Segment> s = new ArrayList<>();
        for (int i = 0; i < pts.length; i++) {
            Point2 p = pts[i], q = pts[(i + 1) % pts.length];
            if (i == 2 || i == 4 || i == 10 || i == 12) {
                // re-entrant corner: centre in the void at (±(tw/2 + r), ±(h/2 − tf − r)), arc turns clockwise
                double cy = (i == 2 || i == 12) ? -(yf - r) : yf - r;
                s.add(ArcSegment.circular(new Point2(Math.signum(p.x()) * (xw + r), cy), p, q, false));
            } else {
                s.add(new LineSegment(p, q));
            }
        }
        return new Region(new Contour(s));
    }

    // ---- exact transforms -------------------------------------------------------------------------------

    /** @return the region rotated counter-clockwise by {@code angle} radians about the origin (circular arcs only) */
    public static Region rotated(Region r, double angle) {
        double c = Math.cos(angle), s = Math.sin(angle);
        return map(r, p -> p.rotated(c, s), seg -> {
            ArcSegment a = circular(seg);
            return new ArcSegment(a.centre().rotated(c, s), a.a(), a.b(), a.startParam() + angle, a.sweep(),
                    a.start().rotated(c, s), a.end().rotated(c, s));
        });
    }

    /** @return the region scaled by {@code f} about the origin */
    public static Region scaled(Region r, double f) {
        UnaryOperator<Point2> t = p -> new Point2(f * p.x(), f * p.y());
        return map(r, t, seg -> {
            ArcSegment a = (ArcSegment) seg;
            return new ArcSegment(t.apply(a.centre()), f * a.a(), f * a.b(), a.startParam(), a.sweep(),
                    t.apply(a.start()), t.apply(a.end()));
        });
    }

    /** @return the mirror image x → −x (orientation is renormalised by {@link Region}) */
    public static Region mirroredX(Region r) {
        UnaryOperator<Point2> t = p -> new Point2(-p.x(), p.y());
        return map(r, t, seg -> {
            ArcSegment a = (ArcSegment) seg;
            // (−a cos θ, b sin θ) = (a cos(π − θ), b sin(π − θ))
            return new ArcSegment(t.apply(a.centre()), a.a(), a.b(), Math.PI - a.startParam(), -a.sweep(),
                    t.apply(a.start()), t.apply(a.end()));
        });
    }

    private static ArcSegment circular(Segment seg) {
        ArcSegment a = (ArcSegment) seg;
        if (!a.isCircular()) {
            throw new IllegalArgumentException("rotation of an axis-aligned elliptic arc is not an arc of the same kind");
        }
        return a;
    }

    private static Region map(Region r, UnaryOperator<Point2> pt, UnaryOperator<Segment> arc) {
        List<Contour> holes = new ArrayList<>();
        for (Contour h : r.holes()) {
            holes.add(map(h, pt, arc));
        }
        return new Region(map(r.outer(), pt, arc), holes);
    }

    private static Contour map(Contour k, UnaryOperator<Point2> pt, UnaryOperator<Segment> arc) {
        List<Segment> out = new ArrayList<>();
        for (Segment s : k.segments()) {
            out.add(s instanceof LineSegment l ? new LineSegment(pt.apply(l.start()), pt.apply(l.end())) : arc.apply(s));
        }
        return new Contour(out);
    }
}
