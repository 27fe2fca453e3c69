package org.tensio.engine.stress;

import org.junit.jupiter.api.Test;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.profile.CircleProfile;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.properties.SectionPropertiesOp;
import org.tensio.engine.section.Section;
import org.tensio.engine.verification.Shapes;
import org.tensio.engine.verification.Verify;

/**
 * The stress at a point of a round bar whose y is rounding noise off the diameter, e.g. the point at polar
 * angle π, (r·cos π, r·sin π) = (−r, 4.9e-15) scaled in to half the radius. Expected: Jourawski shear with the
 * circular segment beyond the cut, τ = V·(r² − y²)/(3I) (Gere &amp; Goodno, Mechanics of Materials, ch. 5 —
 * from memory), 1e-12 relative; the same value as exactly on the diameter.
 */
class CircleNearDiameterStressTest {

    private static final double R = 40, V = 10e3;

    private static double expectedTau(double y) {
        double i = Math.PI * Math.pow(R, 4) / 4;
        return V * (R * R - y * y) / (3 * i);
    }

    @Test
    void onTheDiameter() {
        Section s = Shapes.section(new CircleProfile(R));
        SectionProperties p = SectionPropertiesOp.compute(s);
        PointStress ps = PointStressOp.evaluate(s, p, new InternalForces(0, 0, V, 0, 0, 0), new Point2(10, 0), "st", "V");
        Verify.close(expectedTau(0), ps.total().tauZY(), 1e-12, "τ = V·r²/(3I) on the diameter");
    }
    @Test
    void roundingNoiseOffTheDiameter() {
        Section s = Shapes.section(new CircleProfile(R));
        SectionProperties p = SectionPropertiesOp.compute(s);
        InternalForces f = new InternalForces(0, 0, V, 0, 0, 0);
        for (Point2 q : new Point2[] {new Point2(20 * Math.cos(Math.PI), 20 * Math.sin(Math.PI)), new Point2(10, 1e-13)}) {
            PointStress ps = PointStressOp.evaluate(s, p, f, q, "st", "V");
            Verify.close(2 * R, ps.shearCuts().widthHorizontal(), 1e-12, "cut width = diameter at " + q);
            Verify.close(expectedTau(q.y()), ps.total().tauZY(), 1e-12, "τ = V(r² − y²)/(3I) at " + q);
        }
    }
}
