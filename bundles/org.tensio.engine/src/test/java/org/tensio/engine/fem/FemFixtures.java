package org.tensio.engine.fem;

import java.util.List;

import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.profile.ArbitraryClosedProfile;
import org.tensio.engine.profile.ProfileDef;
import org.tensio.engine.section.Material;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;

/** Sections for the finite-element tests. */
final class FemFixtures {

    static final Material STEEL = new Material("steel", 210000, 0.3, 355.0);
    static final Material NU0 = new Material("nu0", 200000, 0.0, null);

    private FemFixtures() {
    }

    static Section of(ProfileDef p, Material m) {
        return new Section("s", List.of(SectionPart.of(p, 0, 0, m)));
    }

    static Section polygon(Material m, double... xy) {
        Point2[] pts = new Point2[xy.length / 2];
        for (int i = 0; i < pts.length; i++) {
            pts[i] = new Point2(xy[2 * i], xy[2 * i + 1]);
        }
        return of(new ArbitraryClosedProfile(Contour.polygon(List.of(pts))), m);
    }

    /** Σ_{n odd} f(n) until the terms are below 1e-17 of the sum. */
    static double oddSeries(java.util.function.IntToDoubleFunction f) {
        double s = 0;
        for (int n = 1; n < 2001; n += 2) {
            double t = f.applyAsDouble(n);
            s += t;
            if (Math.abs(t) < 1e-17 * Math.abs(s)) {
                break;
            }
        }
        return s;
    }

    /** Exact J of a w × t rectangle, w ≥ t (Timoshenko &amp; Goodier, Theory of Elasticity, 3rd ed., §109 — from memory). */
    static double rectangleJ(double w, double t) {
        double s = oddSeries(n -> Math.tanh(n * Math.PI * w / (2 * t)) / Math.pow(n, 5));
        return w * t * t * t / 3 * (1 - 192 * t / (Math.pow(Math.PI, 5) * w) * s);
    }

    /** Exact τmax per unit torque of a w × t rectangle (mid-point of the long side; same source). */
    static double rectangleTauMaxPerT(double w, double t) {
        double s = oddSeries(n -> 1 / (n * n * Math.cosh(n * Math.PI * w / (2 * t))));
        return t * (1 - 8 / (Math.PI * Math.PI) * s) / rectangleJ(w, t);
    }
}
