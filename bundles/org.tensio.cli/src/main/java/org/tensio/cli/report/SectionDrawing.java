package org.tensio.cli.report;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.tensio.engine.geometry.Bounds;
import org.tensio.engine.mesh.Mesh;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;

/**
 * The drawing of a section: parts filled by material, the finite-element mesh in thin lines, the outline, the
 * centroid (circle with two filled quarters), the shear centre (diamond with a cross), the principal axes 1–1 and
 * 2–2 (dash-dot), the origin of the section frame (small cross) and the x–y frame.
 */
final class SectionDrawing {

    /** Part tints by material (project order), muted so that mesh lines and symbols stay legible. */
    static final String[] TINTS = {"#c8d5e2", "#e8d9b0", "#cfe1c7", "#e7cbd3", "#d6d0e8", "#d9e4e4"};
    static final String INK = "#1c232b";
    static final String MUTED = "#5b6670";
    static final String ACCENT = "#9a2f22";

    private SectionDrawing() {
    }

    static Scene of(Section s, SectionProperties p, Mesh mesh, Map<String, Integer> materialIndex, String lengthUnit) {
        double boxW = 440, boxH = 320, top = 40, left = 50;
        Bounds b = s.bounds();
        View view = View.fit(b, left, top, boxW, boxH);
        double dh = b.height() * view.scale();
        Map<String, String> tint = new LinkedHashMap<>();
        for (SectionPart part : s.parts()) {
            tint.putIfAbsent(part.material().name(),
                    TINTS[Math.floorMod(materialIndex.getOrDefault(part.material().name(), 0), TINTS.length)]);
        }
        int legendLines = 3 + tint.size();
        double ly0 = top + dh + 44;
        Scene sc = new Scene(540, ly0 + 17 * legendLines + 6, "Section " + s.name() + " with its finite-element mesh");
        sc.bold(12, 18, "Section " + s.name(), 14, Scene.Anchor.START, INK);
        sc.text(528, 18, Fmt.sig(b.width(), 4) + " × " + Fmt.sig(b.height(), 4) + " " + lengthUnit, 11,
                Scene.Anchor.END, MUTED);
        for (SectionPart part : s.parts()) {
            sc.add(new Scene.Shape(view.rings(part), true, true, tint.get(part.material().name()), null, 0, null));
        }
        if (mesh != null) {
            sc.add(new Scene.Shape(meshEdges(mesh, view), false, false, null, "#56636f", 0.3, null));
        }
        for (SectionPart part : s.parts()) {
            sc.add(new Scene.Shape(view.rings(part), true, true, null, INK, 1.1, null));
        }
        double cx = view.px(p.centroid().x()), cy = view.py(p.centroid().y());
        double m = 16;
        axes(sc, cx, cy, p.principalAngleDeg(), view.px(b.minX()) - m, view.py(b.maxY()) - m, view.px(b.maxX()) + m,
                view.py(b.minY()) + m);
        if (b.minX() <= 0 && b.maxX() >= 0 && b.minY() <= 0 && b.maxY() >= 0) {
            double ox = view.px(0), oy = view.py(0);
            sc.line(MUTED, 0.9, null, ox - 5, oy, ox + 5, oy);
            sc.line(MUTED, 0.9, null, ox, oy - 5, ox, oy + 5);
        }
        if (p.shearCentre() != null) {
            double sx = view.px(p.shearCentre().x()), sy = view.py(p.shearCentre().y());
            // coincident symbols: the shear centre's diamond is drawn larger, around the centroid's circle
            boolean close = Math.hypot(sx - cx, sy - cy) < 10;
            shearCentreSymbol(sc, sx, sy, close ? 12 : 6.5);
            centroidSymbol(sc, cx, cy, 6);
        } else {
            centroidSymbol(sc, cx, cy, 6);
        }
        // legend
        double ly = ly0;
        triad(sc, 16, ly0 + 17 * (legendLines - 1) + 2);
        centroidSymbol(sc, 110, ly - 4, 5);
        sc.text(124, ly, "C  centroid " + Fmt.point(p.centroid().x(), p.centroid().y()) + " " + lengthUnit, 11,
                Scene.Anchor.START, INK);
        ly += 17;
        if (p.shearCentre() != null) {
            shearCentreSymbol(sc, 110, ly - 4, 5.5);
            double tiny = 1e-9 * b.diagonal();
            sc.text(124, ly, "S  shear centre " + Fmt.point(snap(p.shearCentre().x(), tiny), snap(p.shearCentre().y(), tiny)) + " "
                    + lengthUnit, 11, Scene.Anchor.START, INK);
        } else {
            sc.text(124, ly, "shear centre not available", 11, Scene.Anchor.START, INK);
        }
        ly += 17;
        sc.line(ACCENT, 1, new double[] {7, 2.5, 1.5, 2.5}, 100, ly - 4, 120, ly - 4);
        sc.text(124, ly, "principal axes 1–1 (I1) and 2–2 (I2); axis 1 at " + Fmt.fixed(p.principalAngleDeg(), 2)
                + "° from +x", 11, Scene.Anchor.START, INK);
        for (Map.Entry<String, String> e : tint.entrySet()) {
            ly += 17;
            sc.polygon(e.getValue(), INK, 0.6, 102, ly - 10, 118, ly - 10, 118, ly + 1, 102, ly + 1);
            sc.text(124, ly, "material " + e.getKey(), 11, Scene.Anchor.START, INK);
        }
        if (mesh != null) {
            sc.text(528, ly, mesh.elementCount() + " six-node triangles, " + mesh.nodeCount() + " nodes", 10,
                    Scene.Anchor.END, MUTED);
        } else {
            sc.text(528, ly, "no finite-element mesh", 10, Scene.Anchor.END, MUTED);
        }
        return sc;
    }

    /** Element edges once each, drawn through the mid-side node (curved edges stay on the curve). */
    static List<double[]> meshEdges(Mesh m, View v) {
        List<double[]> out = new ArrayList<>();
        Set<Long> seen = new HashSet<>();
        int[][] edges = {{0, 3, 1}, {1, 4, 2}, {2, 5, 0}};
        for (int e = 0; e < m.elementCount(); e++) {
            for (int[] ed : edges) {
                int a = m.node(e, ed[0]), c = m.node(e, ed[2]);
                long key = Math.min(a, c) * 4_294_967_296L + Math.max(a, c);
                if (seen.add(key)) {
                    int mid = m.node(e, ed[1]);
                    out.add(new double[] {v.px(m.x(a)), v.py(m.y(a)), v.px(m.x(mid)), v.py(m.y(mid)), v.px(m.x(c)),
                        v.py(m.y(c))});
                }
            }
        }
        return out;
    }

    /** @return 0 for |v| below {@code tiny} (round-off of a symmetric section), else v */
    static double snap(double v, double tiny) {
        return Math.abs(v) < tiny ? 0 : v;
    }

    /**
     * Principal axes through (cx, cy), axis 1 at {@code angleDeg} counter-clockwise from +x, each half-ray ending on
     * the box (x0, y0)–(x1, y1) around the section, labelled 1 and 2 just beyond.
     */
    static void axes(Scene sc, double cx, double cy, double angleDeg, double x0, double y0, double x1, double y1) {
        double t = Math.toRadians(angleDeg);
        double ux = Math.cos(t), uy = -Math.sin(t);
        double[] dash = {9, 3, 1.5, 3};
        double[][] rays = {{ux, uy}, {-ux, -uy}, {uy, -ux}, {-uy, ux}};
        String[] names = {"1", "1", "2", "2"};
        for (int i = 0; i < 4; i++) {
            double dx = rays[i][0], dy = rays[i][1];
            double len = Double.POSITIVE_INFINITY;
            if (dx > 1e-12) {
                len = Math.min(len, (x1 - cx) / dx);
            } else if (dx < -1e-12) {
                len = Math.min(len, (x0 - cx) / dx);
            }
            if (dy > 1e-12) {
                len = Math.min(len, (y1 - cy) / dy);
            } else if (dy < -1e-12) {
                len = Math.min(len, (y0 - cy) / dy);
            }
            len = Math.max(len, 12);
            sc.line(ACCENT, 0.9, dash, cx, cy, cx + len * dx, cy + len * dy);
            sc.bold(cx + (len + 8) * dx, cy + (len + 8) * dy + 4, names[i], 11, Scene.Anchor.MIDDLE, ACCENT);
        }
    }

    /** Circle with the upper-right and lower-left quarters filled. */
    static void centroidSymbol(Scene sc, double x, double y, double r) {
        sc.circle(x, y, r, "#ffffff", INK, 1.1);
        sc.add(new Scene.Shape(List.of(quarter(x, y, r, 0), quarter(x, y, r, 180)), true, false, INK, null, 0, null));
    }

    private static double[] quarter(double x, double y, double r, double fromDeg) {
        int n = 8;
        double[] q = new double[2 * (n + 2)];
        q[0] = x;
        q[1] = y;
        for (int i = 0; i <= n; i++) {
            double a = Math.toRadians(fromDeg + 90.0 * i / n);
            q[2 + 2 * i] = x + r * Math.cos(a);
            q[3 + 2 * i] = y - r * Math.sin(a);
        }
        return q;
    }

    /** Diamond with a cross. */
    static void shearCentreSymbol(Scene sc, double x, double y, double r) {
        sc.polygon("#ffffff", ACCENT, 1.3, x, y - r, x + r, y, x, y + r, x - r, y);
        sc.line(ACCENT, 1, null, x - r * 0.5, y, x + r * 0.5, y);
        sc.line(ACCENT, 1, null, x, y - r * 0.5, x, y + r * 0.5);
    }

    /** x–y frame arrows with their origin at pixel (x, y). */
    static void triad(Scene sc, double x, double y) {
        sc.arrow(x, y, x + 28, y, INK, 1.1, 7);
        sc.arrow(x, y, x, y - 28, INK, 1.1, 7);
        sc.text(x + 31, y + 4, "x", 11, Scene.Anchor.START, INK);
        sc.text(x + 4, y - 26, "y", 11, Scene.Anchor.START, INK);
    }
}
