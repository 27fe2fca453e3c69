package org.tensio.engine.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tensio.engine.profile.ProfileAssertions.EXACT;
import static org.tensio.engine.profile.ProfileAssertions.assertRejected;
import static org.tensio.engine.profile.ProfileAssertions.assertRel;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.tensio.engine.geometry.Bounds;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Region;

/** Arbitrary profiles keep their coordinates. */
class ArbitraryProfilesTest {

    private static Contour rect(double x0, double y0, double x1, double y1) {
        return Contour.polygon(List.of(new Point2(x0, y0), new Point2(x1, y0), new Point2(x1, y1), new Point2(x0, y1)));
    }

    @Test
    void closedProfileIsNotRecentred() {
        Contour outer = rect(10, 20, 40, 80).reversed(); // clockwise on input
        ArbitraryClosedProfile p = new ArbitraryClosedProfile(outer);
        Region region = p.region();
        Bounds b = region.bounds();
        assertEquals(10, b.minX(), 0, "coordinates kept as given");
        assertEquals(80, b.maxY(), 0, "coordinates kept as given");
        assertRel(30 * 60, region.moments().area(), EXACT, 0, "A = bh, positive after orientation; closed form");
        // ∫x dA = A · x̄ with x̄ = 25 (not re-centred)
        assertRel(30 * 60 * 25, region.moments().sx(), EXACT, 0, "∫x dA = A x̄; closed form");
        assertTrue(p.parameters().isEmpty(), "no parameters");
        assertEquals("ArbitraryClosedProfile", p.type());
    }

    @Test
    void voidsSubtract() {
        Contour outer = rect(0, 0, 100, 50);
        Contour hole1 = rect(10, 10, 30, 40);
        Contour hole2 = Contour.circle(new Point2(70, 25), 10);
        ArbitraryProfileWithVoids p = new ArbitraryProfileWithVoids(outer, List.of(hole1, hole2));
        Region region = p.region();
        assertRel(100 * 50 - 20 * 30 - Math.PI * 100, region.moments().area(), EXACT, 0,
                "A = bh − b1h1 − πr²; closed form");
        assertEquals(2, region.holes().size());
        assertEquals("ArbitraryProfileWithVoids", p.type());
        assertTrue(p.parameters().isEmpty(), "no parameters");
    }

    @Test
    void voidListIsCopied() {
        List<Contour> voids = new ArrayList<>(List.of(rect(1, 1, 2, 2)));
        ArbitraryProfileWithVoids p = new ArbitraryProfileWithVoids(rect(0, 0, 3, 3), voids);
        voids.clear();
        assertEquals(1, p.voids().size(), "defensive copy");
        assertThrows(UnsupportedOperationException.class, () -> p.voids().clear());
    }

    @Test
    void rejectsNulls() {
        assertRejected("outer", "null", () -> new ArbitraryClosedProfile(null));
        assertRejected("outer", "null", () -> new ArbitraryProfileWithVoids(null, List.of()));
        assertRejected("voids", "null", () -> new ArbitraryProfileWithVoids(rect(0, 0, 1, 1), null));
        List<Contour> withNull = new ArrayList<>();
        withNull.add(null);
        assertRejected("voids", "element 0 is null", () -> new ArbitraryProfileWithVoids(rect(0, 0, 1, 1), withNull));
    }
}
