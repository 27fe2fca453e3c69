package org.tensio.engine.geometry;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tensio.engine.verification.Verify;

/**
 * Regression tests for chord crossings of a line that passes within rounding noise of the joint of two arcs
 * (for a full circle, the joints of its two half arcs lie on the horizontal diameter). Such lines are common:
 * a point at angle π on a circle of radius r has y = r·sin(π) ≈ 1.2e-16·r, not 0.
 * <p>
 * Expected values: the chord of a circle through (nearly) its centre is the diameter 2r; a ring's is 2(ro − ri)
 * (elementary geometry, no source needed). Tolerance 1e-12 relative.
 */
class ChordsNearArcJointTest {

    private static final Region DISC = new Region(Contour.circle(new Point2(0, 0), 40));

    @Test
    void exactlyThroughTheJointsIsFine() {
        Verify.close(80, Chords.width(DISC, HalfPlane.above(0)), 1e-12, "width on the diameter");
        assertEquals(Region.Location.INSIDE, DISC.locate(new Point2(10, 0), 1e-9));
    }

    @Test
    void wellAwayFromTheJointsIsFine() {
        double y = 1e-11;
        Verify.close(2 * Math.sqrt(1600 - y * y), Chords.width(DISC, HalfPlane.above(y)), 1e-12, "width at y = 1e-11");
    }
    @Test
    void lineJustAboveTheDiameterOfADisc() {
        for (double y : new double[] {1e-16, 40 * Math.sin(Math.PI), 1e-13, -1e-13}) {
            Verify.close(80, Chords.width(DISC, HalfPlane.above(y)), 1e-12, "disc width at y = " + y);
            List<double[]> in = Chords.intervals(DISC, HalfPlane.above(y));
            assertEquals(1, in.size(), "one interval at y = " + y);
            Verify.close(-40, in.get(0)[0], 1e-12, "interval starts at −r, y = " + y);
            Verify.close(40, in.get(0)[1], 1e-12, "interval ends at +r, y = " + y);
        }
        Region ring = new Region(Contour.circle(new Point2(0, 0), 40), List.of(Contour.circle(new Point2(0, 0), 30)));
        Verify.close(20, Chords.width(ring, HalfPlane.above(1e-13)), 1e-12, "ring width 2(ro − ri)");
    }
    @Test
    void pointJustAboveTheDiameterIsInside() {
        for (double y : new double[] {1e-16, 40 * Math.sin(Math.PI), 1e-13, -1e-13}) {
            assertEquals(Region.Location.INSIDE, DISC.locate(new Point2(10, y), 1e-9), "(10, " + y + ")");
            assertEquals(Region.Location.INSIDE, DISC.locate(new Point2(-10, y), 1e-9), "(−10, " + y + ")");
        }
    }
}
