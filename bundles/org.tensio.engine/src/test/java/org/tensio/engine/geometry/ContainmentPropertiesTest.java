package org.tensio.engine.geometry;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

import org.tensio.engine.verification.Shapes;

/**
 * Point containment ({@link Region#locate}) against the analytic answer for a rectangle with a rectangular
 * hole and for a rectangle with a circular hole (arcs): inside ⇔ inside the outer box and not inside the
 * hole (common practice, no source). Points closer than 1e-6 to any boundary are skipped; the locate
 * tolerance is 1e-9, so the analytic answer is unambiguous for every point tested. Points placed exactly on a
 * boundary must come back as {@code BOUNDARY}.
 */
class ContainmentPropertiesTest {

    private static final double TOL = 1e-9;
    private static final double SKIP = 1e-6;

    /** 100 × 60 plate centred at the origin with a 30 × 20 rectangular hole centred at (15, 5). */
    private static final Region PLATE_WITH_SLOT = new Region(Shapes.box(-50, -30, 50, 30),
            List.of(Shapes.box(0, -5, 30, 15)));
    /** The same plate with a circular hole of radius 18 centred at (−12, 4). */
    private static final Region PLATE_WITH_HOLE = new Region(Shapes.box(-50, -30, 50, 30),
            List.of(Contour.circle(new Point2(-12, 4), 18)));

    @Provide
    Arbitrary<Double> xs() {
        return Arbitraries.doubles().between(-60, 60).ofScale(4);
    }

    @Provide
    Arbitrary<Double> ys() {
        return Arbitraries.doubles().between(-40, 40).ofScale(4);
    }

    private static double boxDistance(double x, double y, double x0, double y0, double x1, double y1) {
        // distance to the boundary of the box (inside or outside)
        double dx = Math.max(x0 - x, x - x1), dy = Math.max(y0 - y, y - y1);
        if (dx <= 0 && dy <= 0) {
            return Math.min(-dx, -dy);
        }
        return Math.hypot(Math.max(dx, 0), Math.max(dy, 0));
    }

    @Property(tries = 300)
    void plateWithRectangularHole(@ForAll("xs") double x, @ForAll("ys") double y) {
        Assume.that(boxDistance(x, y, -50, -30, 50, 30) > SKIP && boxDistance(x, y, 0, -5, 30, 15) > SKIP);
        boolean inOuter = Math.abs(x) < 50 && Math.abs(y) < 30;
        boolean inHole = x > 0 && x < 30 && y > -5 && y < 15;
        Region.Location expected = inOuter && !inHole ? Region.Location.INSIDE : Region.Location.OUTSIDE;
        assertEquals(expected, PLATE_WITH_SLOT.locate(new Point2(x, y), TOL), "(" + x + ", " + y + ")");
    }

    @Property(tries = 300)
    void plateWithCircularHole(@ForAll("xs") double x, @ForAll("ys") double y) {
        double dHole = Math.abs(Math.hypot(x + 12, y - 4) - 18);
        Assume.that(boxDistance(x, y, -50, -30, 50, 30) > SKIP && dHole > SKIP);
        boolean inOuter = Math.abs(x) < 50 && Math.abs(y) < 30;
        boolean inHole = Math.hypot(x + 12, y - 4) < 18;
        Region.Location expected = inOuter && !inHole ? Region.Location.INSIDE : Region.Location.OUTSIDE;
        assertEquals(expected, PLATE_WITH_HOLE.locate(new Point2(x, y), TOL), "(" + x + ", " + y + ")");
    }

    @Property(tries = 200)
    void pointsLevelWithVerticesAndTangents(@ForAll("xs") double x, @ForAll("levels") double y) {
        // the containment ray through the point is horizontal: at these heights it runs through hole corners
        // (y = −5, 15) or touches the circular hole tangentially (y = 4 ± 18), the degenerate cases of a
        // crossing count
        Assume.that(boxDistance(x, y, -50, -30, 50, 30) > SKIP && boxDistance(x, y, 0, -5, 30, 15) > SKIP);
        boolean inOuter = Math.abs(x) < 50 && Math.abs(y) < 30;
        boolean inSlot = x > 0 && x < 30 && y > -5 && y < 15;
        assertEquals(inOuter && !inSlot ? Region.Location.INSIDE : Region.Location.OUTSIDE,
                PLATE_WITH_SLOT.locate(new Point2(x, y), TOL), "slot plate at (" + x + ", " + y + ")");
        double dHole = Math.abs(Math.hypot(x + 12, y - 4) - 18);
        Assume.that(dHole > SKIP);
        boolean inHole = Math.hypot(x + 12, y - 4) < 18;
        assertEquals(inOuter && !inHole ? Region.Location.INSIDE : Region.Location.OUTSIDE,
                PLATE_WITH_HOLE.locate(new Point2(x, y), TOL), "holed plate at (" + x + ", " + y + ")");
    }

    @Provide
    Arbitrary<Double> levels() {
        return Arbitraries.of(-5.0, 15.0, 22.0, -14.0, 4.0);
    }

    @Property(tries = 100)
    void pointsOnTheHoleBoundaryAreBoundary(@ForAll("angles") double t) {
        Point2 onCircle = new Point2(-12 + 18 * Math.cos(t), 4 + 18 * Math.sin(t));
        assertEquals(Region.Location.BOUNDARY, PLATE_WITH_HOLE.locate(onCircle, TOL), "on the circular hole");
        Point2 onSlot = new Point2(30 * (t / 6.283185), 15);
        assertEquals(Region.Location.BOUNDARY, PLATE_WITH_SLOT.locate(onSlot, TOL), "on the slot's top edge");
    }

    @Provide
    Arbitrary<Double> angles() {
        return Arbitraries.doubles().between(0, 6.283185).ofScale(6);
    }
}
