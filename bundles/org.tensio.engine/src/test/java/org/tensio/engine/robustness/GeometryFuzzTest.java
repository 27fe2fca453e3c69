package org.tensio.engine.robustness;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.ShrinkingMode;
import net.jqwik.api.lifecycle.AfterContainer;

import org.tensio.engine.robustness.Harness.PathRule;

/**
 * Generated geometry, valid and invalid: random polygons (stars that cross themselves, collinear and coincident
 * vertices, zero-area slivers, bow-ties, spikes), holes inside, touching, crossing, outside or nested, arcs with odd
 * centres, and every parametric profile with random, zero, negative and extreme dimensions. Every input is a whole
 * project through {@link Harness}; the error must lie within the section that holds the geometry. Every 8th (by
 * seed) accepted input also goes through meshing, the finite-element solution and the check.
 */
class GeometryFuzzTest {

    static final String POLYGONS = "geometry-polygons";
    static final String PROFILES = "geometry-parametric";

    private static final String[][] PARAMETRIC = {
        {"CircleProfile", "radius"},
        {"CircleHollowProfile", "radius", "wallThickness"},
        {"EllipseProfile", "semiAxis1", "semiAxis2"},
        {"RectangleProfile", "xDim", "yDim"},
        {"RectangleHollowProfile", "xDim", "yDim", "wallThickness", "innerFilletRadius", "outerFilletRadius"},
        {"IShapeProfile", "overallWidth", "overallDepth", "webThickness", "flangeThickness", "filletRadius",
            "flangeEdgeRadius"},
        {"UShapeProfile", "depth", "flangeWidth", "webThickness", "flangeThickness", "filletRadius", "edgeRadius"},
        {"LShapeProfile", "depth", "width", "thickness", "filletRadius", "edgeRadius"},
        {"TShapeProfile", "depth", "flangeWidth", "webThickness", "flangeThickness", "filletRadius", "flangeEdgeRadius",
            "webEdgeRadius"},
        {"ZShapeProfile", "depth", "flangeWidth", "webThickness", "flangeThickness", "filletRadius", "edgeRadius"}};

    @Property(tries = 2000, seed = "4711", shrinking = ShrinkingMode.OFF)
    void generatedPolygonsAndHoles(@ForAll long seed) {
        Random r = new Random(seed);
        String outer = loop(r, 0, 0, 50 * Math.pow(10, r.nextInt(5) - 2));
        StringBuilder voids = new StringBuilder("[");
        int nv = r.nextInt(4);
        for (int k = 0; k < nv; k++) {
            if (k > 0) {
                voids.append(',');
            }
            voids.append(loop(r, r.nextGaussian() * 20, r.nextGaussian() * 20, 5 + r.nextDouble() * 30));
        }
        voids.append(']');
        String profile = nv == 0 && r.nextBoolean()
                ? "{\"type\": \"ArbitraryClosedProfile\", \"outer\": " + outer + "}"
                : "{\"type\": \"ArbitraryProfileWithVoids\", \"outer\": " + outer + ", \"voids\": " + voids + "}";
        String json = Bases.project("{\"material\": \"S355\", \"profile\": " + profile + "}");
        Harness.run(POLYGONS, json, null, PathRule.sameEntity("$.sections.s"), Math.floorMod(seed, 8) == 0, false,
                "seed " + seed + ": " + profile);
    }

    @Property(tries = 1500, seed = "815", shrinking = ShrinkingMode.OFF)
    void parametricProfilesWithRandomDimensions(@ForAll long seed) {
        Random r = new Random(seed);
        String[] type = PARAMETRIC[r.nextInt(PARAMETRIC.length)];
        StringBuilder p = new StringBuilder("{\"type\": \"" + type[0] + "\"");
        double scale = Math.pow(10, r.nextInt(9) - 4);
        for (int i = 1; i < type.length; i++) {
            if (i > 2 && r.nextInt(3) == 0) {
                continue; // optional ones left out now and then (required ones too: then it must be named)
            }
            p.append(", \"").append(type[i]).append("\": ").append(num(dimension(r, scale)));
        }
        p.append('}');
        String json = Bases.project("{\"material\": \"S355\", \"profile\": " + p + ", \"offset\": ["
                + num(offset(r)) + ", " + num(offset(r)) + "]}");
        Harness.run(PROFILES, json, null, PathRule.sameEntity("$.sections.s"), Math.floorMod(seed, 8) == 0, false,
                "seed " + seed + ": " + p);
    }

    private static double dimension(Random r, double scale) {
        return switch (r.nextInt(10)) {
            case 0 -> 0;
            case 1 -> -scale * r.nextDouble() * 100;
            case 2 -> scale * 1e-12;
            case 3 -> 1e29 * r.nextDouble();
            default -> scale * (1 + r.nextDouble() * 200);
        };
    }

    private static double offset(Random r) {
        return switch (r.nextInt(4)) {
            case 0 -> 0;
            case 1 -> (r.nextBoolean() ? 1 : -1) * Math.pow(10, r.nextInt(8));
            case 2 -> 1e29;
            default -> r.nextGaussian() * 100;
        };
    }

    /** @return a loop: a random polygon about (cx, cy) of size s, often broken on purpose */
    private static String loop(Random r, double cx, double cy, double s) {
        int kind = r.nextInt(9);
        int n = 3 + r.nextInt(kind == 8 ? 200 : 12);
        List<double[]> pts = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double t = 2 * Math.PI * i / n;
            double rad = switch (kind) {
                case 0 -> s * (0.2 + r.nextDouble()); // star-shaped: may cross after a shuffle below
                case 1 -> s * (i % 2 == 0 ? 1 : 0.3); // star
                default -> s;
            };
            pts.add(new double[] {cx + rad * Math.cos(t), cy + rad * Math.sin(t)});
        }
        switch (kind) {
            case 2 -> java.util.Collections.swap(pts, 0, 1 + r.nextInt(n - 1)); // likely self-intersecting
            case 3 -> pts.add(r.nextInt(pts.size()), pts.get(r.nextInt(pts.size())).clone()); // coincident vertex
            case 4 -> { // collinear / zero-area sliver
                pts.clear();
                for (int i = 0; i < n; i++) {
                    pts.add(new double[] {cx + s * i, cy + (r.nextBoolean() ? 0 : s * 1e-13)});
                }
            }
            case 5 -> { // bow-tie
                pts.clear();
                pts.add(new double[] {cx, cy});
                pts.add(new double[] {cx + s, cy + s});
                pts.add(new double[] {cx + s, cy});
                pts.add(new double[] {cx, cy + s});
            }
            case 6 -> pts.get(r.nextInt(n))[0] += s * 50 * r.nextGaussian(); // spike
            case 7 -> pts.add(pts.get(0).clone()); // first vertex repeated at the end
            default -> {
            }
        }
        StringBuilder sb = new StringBuilder("[");
        for (int i = 0; i < pts.size(); i++) {
            if (i > 0) {
                sb.append(", ");
            }
            sb.append('[').append(num(pts.get(i)[0])).append(", ").append(num(pts.get(i)[1])).append(']');
            if (r.nextInt(12) == 0 && i + 1 < pts.size()) {
                sb.append(r.nextBoolean() ? ", {\"through\": [" + num(cx + r.nextGaussian() * s) + ", "
                        + num(cy + r.nextGaussian() * s) + "]}"
                        : ", {\"centre\": [" + num(cx) + ", " + num(cy) + "], \"turn\": \"" + (r.nextBoolean() ? "ccw"
                                : "cw") + "\"}");
            }
        }
        return sb.append(']').toString();
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.17g", v);
    }

    @AfterContainer
    static void writeCounts() {
        Counts.write();
    }
}
