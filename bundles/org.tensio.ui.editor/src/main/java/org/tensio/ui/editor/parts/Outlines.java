package org.tensio.ui.editor.parts;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.geometry.ArcSegment;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.geometry.Segment;
import org.tensio.engine.profile.ProfileTypes;
import org.tensio.ui.editor.model.ArcMarker;
import org.tensio.ui.editor.model.Loop;
import org.tensio.ui.editor.model.Part;
import org.tensio.ui.editor.model.Profile;
import org.tensio.ui.editor.model.Vertex;

import com.google.gson.JsonElement;

/**
 * The loops of a part as polylines in the section frame (length unit, y up, the part's offset applied), for
 * drawing: arbitrary profiles from the editing model (arcs sampled every {@value #ARC_STEP_DEG}° at most),
 * parametric ones from the engine's profile definition. A part whose loops cannot be built (invalid values
 * while editing) gives its vertices joined straight, or nothing; the validation reports why.
 */
public final class Outlines {

    /** Largest angle between two samples of an arc, degrees (a chord error below 0.1 % of the radius). */
    static final double ARC_STEP_DEG = 5;

    private Outlines() {
    }

    /** @return the part's loops, outer first, each as {x0, y0, x1, y1, ...} */
    public static List<double[]> of(Part part) {
        Profile profile = part.profile();
        List<double[]> loops = new ArrayList<>();
        if (profile.isArbitrary()) {
            for (Loop loop : profile.loops()) {
                loops.add(sample(loop, part.offsetX(), part.offsetY()));
            }
            return loops;
        }
        Region region;
        try {
            region = ProfileTypes.create(profile.type(), parameters(profile)).region()
                    .translated(part.offsetX(), part.offsetY());
        } catch (RuntimeException invalid) {
            return loops;
        }
        for (Contour c : region.contours()) {
            loops.add(sample(c.segments()));
        }
        return loops;
    }

    private static Map<String, Double> parameters(Profile profile) {
        Map<String, Double> p = new LinkedHashMap<>();
        for (String name : profile.parameterNames()) {
            JsonElement e = profile.parameter(name);
            if (e != null && e.isJsonPrimitive() && e.getAsJsonPrimitive().isNumber()) {
                p.put(name, e.getAsDouble());
            } else {
                throw new IllegalArgumentException(name + ": not a number");
            }
        }
        return p;
    }

    private static double[] sample(Loop loop, double dx, double dy) {
        List<Vertex> vs = loop.vertices();
        List<Double> out = new ArrayList<>();
        for (int i = 0; i < vs.size(); i++) {
            Vertex a = vs.get(i);
            Vertex b = vs.get((i + 1) % vs.size());
            out.add(a.x() + dx);
            out.add(a.y() + dy);
            ArcMarker arc = a.arcToNext();
            if (arc == null) {
                continue;
            }
            Segment s;
            try {
                Point2 p0 = new Point2(a.x(), a.y());
                Point2 p1 = new Point2(b.x(), b.y());
                Point2 m = new Point2(arc.x(), arc.y());
                s = arc.kind() == ArcMarker.Kind.THROUGH ? ArcSegment.through(p0, m, p1)
                        : ArcSegment.circular(m, p0, p1, arc.kind() == ArcMarker.Kind.CENTRE_CCW);
            } catch (RuntimeException invalid) {
                continue;
            }
            int n = steps(s);
            for (int k = 1; k < n; k++) {
                Point2 p = s.pointAt((double) k / n);
                out.add(p.x() + dx);
                out.add(p.y() + dy);
            }
        }
        double[] xy = new double[out.size()];
        for (int i = 0; i < xy.length; i++) {
            xy[i] = out.get(i);
        }
        return xy;
    }

    private static double[] sample(List<Segment> segments) {
        List<Double> out = new ArrayList<>();
        for (Segment s : segments) {
            int n = steps(s);
            for (int k = 0; k < n; k++) {
                Point2 p = s.pointAt((double) k / n);
                out.add(p.x());
                out.add(p.y());
            }
        }
        double[] xy = new double[out.size()];
        for (int i = 0; i < xy.length; i++) {
            xy[i] = out.get(i);
        }
        return xy;
    }

    private static int steps(Segment s) {
        if (s instanceof ArcSegment arc) {
            return Math.max(2, (int) Math.ceil(Math.abs(Math.toDegrees(arc.sweep())) / ARC_STEP_DEG));
        }
        return 1;
    }

    /** @return {minX, minY, maxX, maxY} of all loops, or null when there are none */
    public static double[] bounds(List<double[]> loops) {
        double[] b = { Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
                Double.NEGATIVE_INFINITY };
        for (double[] p : loops) {
            for (int i = 0; i + 1 < p.length; i += 2) {
                b[0] = Math.min(b[0], p[i]);
                b[1] = Math.min(b[1], p[i + 1]);
                b[2] = Math.max(b[2], p[i]);
                b[3] = Math.max(b[3], p[i + 1]);
            }
        }
        return b[0] <= b[2] ? b : null;
    }
}
