package org.tensio.cli.report;

import java.util.ArrayList;
import java.util.List;

import org.tensio.engine.geometry.ArcSegment;
import org.tensio.engine.geometry.Bounds;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Segment;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;

/**
 * Maps the section frame (x right, y up, length unit) to a drawing's pixel frame (y down) with one scale for both
 * axes.
 *
 * @param scale px per length unit
 * @param minX  section x drawn at {@code left}
 * @param maxY  section y drawn at {@code top}
 * @param left  px
 * @param top   px
 */
record View(double scale, double minX, double maxY, double left, double top) {

    /** Fits {@code b} into the box (left, top, width, height), centred horizontally, at the top of the box. */
    static View fit(Bounds b, double left, double top, double width, double height) {
        double w = Math.max(b.width(), 1e-300), h = Math.max(b.height(), 1e-300);
        double k = Math.min(width / w, height / h);
        return new View(k, b.minX(), b.maxY(), left + (width - k * w) / 2, top);
    }

    double px(double x) {
        return left + (x - minX) * scale;
    }

    double py(double y) {
        return top + (maxY - y) * scale;
    }

    /** @return the contour as a pixel ring; arcs sampled every 4° at most (chord sag below 0.07 % of the radius) */
    double[] ring(Contour c) {
        List<Double> xy = new ArrayList<>();
        for (Segment s : c.segments()) {
            int n = 1;
            if (s instanceof ArcSegment a) {
                n = Math.max(2, (int) Math.ceil(Math.abs(a.sweep()) / Math.toRadians(4)));
            }
            for (int i = 0; i < n; i++) {
                Point2 p = i == 0 ? s.start() : s.pointAt((double) i / n);
                xy.add(px(p.x()));
                xy.add(py(p.y()));
            }
        }
        double[] r = new double[xy.size()];
        for (int i = 0; i < r.length; i++) {
            r[i] = xy.get(i);
        }
        return r;
    }

    /** @return outer boundary and holes of a part as pixel rings (fill with the even-odd rule) */
    List<double[]> rings(SectionPart part) {
        List<double[]> out = new ArrayList<>();
        for (Contour c : part.region().contours()) {
            out.add(ring(c));
        }
        return out;
    }

    /** @return all parts' rings */
    List<double[]> rings(Section s) {
        List<double[]> out = new ArrayList<>();
        for (SectionPart p : s.parts()) {
            out.addAll(rings(p));
        }
        return out;
    }
}
