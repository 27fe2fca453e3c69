package org.tensio.engine.geometry;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;

import org.junit.jupiter.api.Test;
import org.tensio.engine.verification.Shapes;
import org.tensio.engine.verification.Verify;

/**
 * Moving a region with arcs far from the origin must not fail, whatever the arc's radius: a translation is
 * exact in the mathematics and only rounds each coordinate once (common practice, no source).
 */
class ArcTranslationTest {

    @Test
    void filletedSectionMovedByAMetreInMillimetres() {
        Region r = Shapes.iSection(300, 150, 7.1, 10.7, 15);
        Region moved = assertDoesNotThrow(() -> r.translated(1000, -2500));
        Verify.close(r.moments().area(), moved.moments().area(), 1e-12, "area unchanged by the move");
    }
    @Test
    void tinyFilletFarFromTheOrigin() {
        Region r = Shapes.iSection(1, 0.6, 0.05, 0.05, 1.5e-7);
        assertDoesNotThrow(() -> r.translated(127.995506, 0));
        assertDoesNotThrow(() -> r.translated(322.583299, 1e-6));
    }
}
