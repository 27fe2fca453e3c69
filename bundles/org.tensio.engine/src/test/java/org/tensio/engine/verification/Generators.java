package org.tensio.engine.verification;

import java.util.ArrayList;
import java.util.List;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;

import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;

/**
 * jqwik generators of valid (simple, properly nested) regions of bounded size for the property tests.
 * <p>
 * Star polygons: n = 3…14 vertices at polar angles 2π(k + j_k)/n + φ with jitter |j_k| ≤ 0.24 and radii in
 * [0.2, 1]·size. Consecutive angles then differ by less than π, so every ray from the origin meets the
 * boundary once: the polygon is simple, star-shaped about the origin, and its copy scaled by ½ about the
 * origin lies strictly inside it (used as a hole). Curved regions use circular arcs only, so that
 * {@link Shapes#rotated} applies to every generated region.
 */
public final class Generators {

    private Generators() {
    }

    /** @return vertex lists of star-shaped simple polygons about the origin, size ≤ 1 */
    public static Arbitrary<List<Point2>> starVertices() {
        return Arbitraries.integers().between(3, 14).flatMap(n -> Combinators.combine(
                Arbitraries.doubles().between(0.2, 1.0).ofScale(6).list().ofSize(n),
                Arbitraries.doubles().between(-0.24, 0.24).ofScale(6).list().ofSize(n),
                Arbitraries.doubles().between(0, 6.283185).ofScale(6))
                .as((radii, jitter, phase) -> {
                    List<Point2> pts = new ArrayList<>(n);
                    for (int k = 0; k < n; k++) {
                        double t = 2 * Math.PI * (k + jitter.get(k)) / n + phase;
                        pts.add(new Point2(radii.get(k) * Math.cos(t), radii.get(k) * Math.sin(t)));
                    }
                    return pts;
                }));
    }

    /** @return star polygons (size ≤ 1, star-shaped about the origin) */
    public static Arbitrary<Region> starPolygons() {
        return starVertices().map(v -> new Region(Contour.polygon(v)));
    }

    /** @return star polygons with a hole: the same polygon scaled by ½ about the origin */
    public static Arbitrary<Region> starPolygonsWithHole() {
        return starVertices().map(Generators::withHalfScaleHole);
    }

    /** @return the star polygon through {@code v} with its copy scaled by ½ about the origin as a hole */
    public static Region withHalfScaleHole(List<Point2> v) {
        List<Point2> half = new ArrayList<>();
        for (Point2 p : v) {
            half.add(new Point2(0.5 * p.x(), 0.5 * p.y()));
        }
        return new Region(Contour.polygon(v), List.of(Contour.polygon(half)));
    }

    /** @return discs of radius 0.1…1 centred within 1 of the origin */
    public static Arbitrary<Region> discs() {
        return Combinators.combine(Arbitraries.doubles().between(-1, 1).ofScale(6),
                Arbitraries.doubles().between(-1, 1).ofScale(6), Arbitraries.doubles().between(0.1, 1).ofScale(6))
                .as((x, y, r) -> new Region(Contour.circle(new Point2(x, y), r)));
    }

    /** @return eccentric annuli: a disc of radius 1 with a circular hole of radius 0.1…0.6, off-centre */
    public static Arbitrary<Region> annuli() {
        return Combinators.combine(Arbitraries.doubles().between(0.1, 0.6).ofScale(6),
                Arbitraries.doubles().between(0, 1).ofScale(6), Arbitraries.doubles().between(0, 6.283185).ofScale(6))
                .as((ri, e, phi) -> {
                    double ecc = e * (0.95 - ri); // keeps the hole inside with a wall of at least 0.05
                    return new Region(Contour.circle(new Point2(0, 0), 1),
                            List.of(Contour.circle(new Point2(ecc * Math.cos(phi), ecc * Math.sin(phi)), ri)));
                });
    }

    /**
     * @return I-sections with root fillets, depth 1, random proportions: sharp (r = 0) or with a fillet of at least
     *         1 % of the available room (tinier arcs trip the ArcSegment translation bug, see
     *         {@code org.tensio.engine.geometry.ArcTranslationTest#tinyFilletFarFromTheOrigin})
     */
    public static Arbitrary<Region> filletedISections() {
        return Combinators.combine(Arbitraries.doubles().between(0.3, 1.2).ofScale(6),
                Arbitraries.doubles().between(0.03, 0.3).ofScale(6), Arbitraries.doubles().between(0.02, 0.15).ofScale(6),
                Arbitraries.oneOf(Arbitraries.just(0.0), Arbitraries.doubles().between(0.01, 0.9).ofScale(6)))
                .as((b, fw, ff, fr) -> {
                    double h = 1, tw = fw * b, tf = ff * h;
                    double r = fr * Math.min((b - tw) / 2, h / 2 - tf);
                    return Shapes.iSection(h, b, tw, tf, r);
                });
    }

    /** @return any of the above: polygons with and without holes, discs, annuli, filleted I-sections */
    public static Arbitrary<Region> regions() {
        return Arbitraries.oneOf(starPolygons(), starPolygonsWithHole(), discs(), annuli(), filletedISections());
    }
}
