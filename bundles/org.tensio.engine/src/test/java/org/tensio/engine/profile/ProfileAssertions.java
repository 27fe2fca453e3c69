package org.tensio.engine.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.function.Executable;
import org.tensio.engine.geometry.ArcSegment;
import org.tensio.engine.geometry.Bounds;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Moments;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.geometry.Segment;

/** Shared assertions with explicit tolerances. */
final class ProfileAssertions {

    /** Relative tolerance for exact geometry (rounding only: the contour moments are exact). */
    static final double EXACT = 1e-12;

    private ProfileAssertions() {
    }

    /** |actual − expected| ≤ rel · |expected| (or ≤ rel · scale when expected is 0). */
    static void assertRel(double expected, double actual, double rel, double scale, String what) {
        double tol = rel * Math.max(Math.abs(expected), scale);
        assertEquals(expected, actual, tol, what);
    }

    /**
     * All six moments about the origin equal the hand-built composite: each within {@link #EXACT} of its
     * own value, or of the natural scale (A·L², A·L for first moments) when it vanishes by symmetry.
     *
     * @param size a length scale of the profile (largest dimension)
     */
    static void assertMoments(Composite expected, Region region, double size, String source) {
        Moments m = region.moments();
        double a = Math.abs(expected.area);
        assertRel(expected.area, m.area(), EXACT, 0, "area; " + source);
        assertRel(expected.sx, m.sx(), EXACT, a * size, "∫x dA; " + source);
        assertRel(expected.sy, m.sy(), EXACT, a * size, "∫y dA; " + source);
        assertRel(expected.sxx, m.sxx(), EXACT, a * size * size, "∫x² dA; " + source);
        assertRel(expected.syy, m.syy(), EXACT, a * size * size, "∫y² dA; " + source);
        assertRel(expected.sxy, m.sxy(), EXACT, a * size * size, "∫xy dA; " + source);
    }

    /** The bounding box is [−width/2, width/2] × [−height/2, height/2] within {@link #EXACT} of the size. */
    static void assertCentredBounds(Region region, double width, double height) {
        Bounds b = region.bounds();
        double tol = EXACT * Math.max(width, height);
        assertEquals(-width / 2, b.minX(), tol, "minX; IFC4 placement: bounding-box centre at the origin");
        assertEquals(width / 2, b.maxX(), tol, "maxX; IFC4 placement: bounding-box centre at the origin");
        assertEquals(-height / 2, b.minY(), tol, "minY; IFC4 placement: bounding-box centre at the origin");
        assertEquals(height / 2, b.maxY(), tol, "maxY; IFC4 placement: bounding-box centre at the origin");
    }

    /** @return the number of circular arcs of radius r (exactly, within 1e-12 relative) in the contour */
    static int arcsOfRadius(Contour c, double r) {
        int n = 0;
        for (Segment s : c.segments()) {
            if (s instanceof ArcSegment arc) {
                assertTrue(arc.isCircular(), "fillets are circular arcs: " + arc);
                if (Math.abs(arc.a() - r) <= 1e-12 * r) {
                    n++;
                }
            }
        }
        return n;
    }

    /** @return the number of arcs in the contour */
    static int arcs(Contour c) {
        int n = 0;
        for (Segment s : c.segments()) {
            if (s instanceof ArcSegment) {
                n++;
            }
        }
        return n;
    }

    /** The call throws IllegalArgumentException whose message starts with "field: " and contains fragment. */
    static IllegalArgumentException assertRejected(String field, String fragment, Executable call) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, call);
        assertTrue(e.getMessage().startsWith(field + ": "), () -> "message should name " + field + ": " + e.getMessage());
        assertTrue(e.getMessage().contains(fragment), () -> "message should contain '" + fragment + "': " + e.getMessage());
        return e;
    }
}
