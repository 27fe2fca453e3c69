package org.tensio.engine.geometry;

import java.util.List;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

import org.junit.jupiter.api.Test;
import org.tensio.engine.verification.Generators;
import org.tensio.engine.verification.Verify;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Chord widths ({@link Chords#width}) and intervals ({@link Chords#intervals}).
 * <p>
 * The width of a region along the line n·p = c is minus the derivative of the clipped area A(c) = area of
 * {n·p ≥ c} (Cavalieri's principle; common practice, no source). Checked by a central difference with step
 * δ = 1e-5: for a polygon A(c) is piecewise quadratic with breaks only where the line meets a vertex, so the
 * central difference is exact (up to rounding ≈ 1e-16·A/δ ≈ 1e-11) whenever no vertex lies within δ of
 * the line — such cases are skipped with {@code Assume}. Curved boundaries make A(c) smooth but not
 * quadratic: the truncation error is δ²·|A'''|/6, bounded for discs cut at |d| ≤ 0.9r by about 1e-9·r here;
 * the allowed 1e-7 is deliberately loose.
 */
class ChordsPropertiesTest {

    private static final double DELTA = 1e-5;

    @Provide
    Arbitrary<List<Point2>> starVertices() {
        return Generators.starVertices();
    }

    @Provide
    Arbitrary<Double> directions() {
        return Arbitraries.doubles().between(0, 6.283185).ofScale(6);
    }

    @Provide
    Arbitrary<Double> offsets() {
        return Arbitraries.doubles().between(-1, 1).ofScale(6);
    }

    @Property(tries = 200)
    void polygonWidthIsTheDerivativeOfTheClippedArea(@ForAll("starVertices") List<Point2> v,
            @ForAll("directions") double t, @ForAll("offsets") double c, @ForAll boolean withHole) {
        double nx = Math.cos(t), ny = Math.sin(t);
        for (Point2 p : v) {
            Assume.that(Math.abs(nx * p.x() + ny * p.y() - c) > 3 * DELTA);
            Assume.that(!withHole || Math.abs(0.5 * (nx * p.x() + ny * p.y()) - c) > 3 * DELTA);
        }
        Region r = withHole ? Generators.withHalfScaleHole(v) : new Region(Contour.polygon(v));
        double below = new HalfPlane(nx, ny, c - DELTA).clippedMoments(r).area();
        double above = new HalfPlane(nx, ny, c + DELTA).clippedMoments(r).area();
        double width = Chords.width(r, new HalfPlane(nx, ny, c));
        Verify.closeAbs((below - above) / (2 * DELTA), width, 1e-8, "width = −dA/dc");
        // the intervals add up to the width
        double sum = 0;
        for (double[] in : Chords.intervals(r, new HalfPlane(nx, ny, c))) {
            sum += in[1] - in[0];
        }
        Verify.closeAbs(width, sum, 1e-12, "Σ intervals = width");
    }

    @Property(tries = 200)
    void discWidthIsTheChord(@ForAll("radii") double r, @ForAll("directions") double t, @ForAll("fractions") double f) {
        Point2 centre = new Point2(-0.4, 0.7);
        Region disc = new Region(Contour.circle(centre, r));
        double nx = Math.cos(t), ny = Math.sin(t), d = f * r;
        double c = nx * centre.x() + ny * centre.y() + d;
        double width = Chords.width(disc, new HalfPlane(nx, ny, c));
        Verify.closeAbs(2 * Math.sqrt(r * r - d * d), width, 1e-12 * r, "chord 2√(r² − d²)");
        double below = new HalfPlane(nx, ny, c - DELTA * r).clippedMoments(disc).area();
        double above = new HalfPlane(nx, ny, c + DELTA * r).clippedMoments(disc).area();
        Verify.closeAbs((below - above) / (2 * DELTA * r), width, 1e-7 * r, "width = −dA/dc for a disc");
    }

    @Provide
    Arbitrary<Double> radii() {
        return Arbitraries.doubles().between(0.05, 3).ofScale(6);
    }

    @Provide
    Arbitrary<Double> fractions() {
        return Arbitraries.doubles().between(-0.9, 0.9).ofScale(6);
    }

    @Test
    void annulusThroughItsCentreHasTwoIntervals() {
        // horizontal line y = 0 through a ring ro = 2, ri = 1.5 centred at the origin: [−2, −1.5] and [1.5, 2]
        Region ring = new Region(Contour.circle(new Point2(0, 0), 2), List.of(Contour.circle(new Point2(0, 0), 1.5)));
        List<double[]> in = Chords.intervals(ring, HalfPlane.above(0));
        assertEquals(2, in.size(), "two intervals");
        Verify.closeAbs(-2, in.get(0)[0], 1e-15, "first interval starts at −ro");
        Verify.closeAbs(-1.5, in.get(0)[1], 1e-15, "first interval ends at −ri");
        Verify.closeAbs(1.5, in.get(1)[0], 1e-15, "second interval starts at ri");
        Verify.closeAbs(2, in.get(1)[1], 1e-15, "second interval ends at ro");
        Verify.closeAbs(1.0, Chords.width(ring, HalfPlane.above(0)), 1e-15, "width 2(ro − ri)");
    }
}
