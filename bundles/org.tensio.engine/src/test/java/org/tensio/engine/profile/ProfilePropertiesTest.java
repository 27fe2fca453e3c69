package org.tensio.engine.profile;

import static org.tensio.engine.profile.ProfileAssertions.assertCentredBounds;
import static org.tensio.engine.profile.ProfileAssertions.assertMoments;
import static org.tensio.engine.profile.ProfileAssertions.assertRel;

import java.util.LinkedHashMap;
import java.util.Map;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.tensio.engine.geometry.Moments;

/**
 * Property-based checks over the whole valid parameter domain: random dimensions, thicknesses as fractions
 * of their limits and radii as fractions (0 to 1 inclusive, so exact fits where roundings meet are drawn
 * too) of the room left for them. Each profile must build, sit centred on its bounding box and match the
 * hand-built composite (geometry, hand derivation in {@link Composite}); scaling every parameter by k must
 * scale A by k² and the second moments by k⁴ (dimensional analysis).
 */
class ProfilePropertiesTest {

    private static final String HAND = "geometry, hand derivation (Composite)";

    @Property(tries = 300)
    void iShape(@ForAll @DoubleRange(min = 10, max = 1000) double b, @ForAll @DoubleRange(min = 10, max = 1000) double h,
            @ForAll @DoubleRange(min = 0.01, max = 0.99) double fw, @ForAll @DoubleRange(min = 0.01, max = 0.99) double ff,
            @ForAll @DoubleRange(min = 0, max = 1) double fr, @ForAll @DoubleRange(min = 0, max = 1) double fe) {
        double tw = fw * b;
        double tf = ff * h / 2;
        double out = (b - tw) / 2;
        double re = fe * Math.min(tf, out);
        double r = fr * Math.min(out - re, (h - 2 * tf) / 2);
        IShapeProfile p = new IShapeProfile(b, h, tw, tf, r, re);
        double hx = b / 2;
        double hy = h / 2;
        double w = tw / 2;
        double yf = hy - tf;
        Composite c = new Composite().rect(-hx, -hy, hx, hy, 1)
                .rect(w, -yf, hx, yf, -1).rect(-hx, -yf, -w, yf, -1)
                .spandrel(w, yf, r, 1, -1, 1).spandrel(w, -yf, r, 1, 1, 1)
                .spandrel(-w, yf, r, -1, -1, 1).spandrel(-w, -yf, r, -1, 1, 1)
                .spandrel(hx, yf, re, -1, 1, -1).spandrel(hx, -yf, re, -1, -1, -1)
                .spandrel(-hx, yf, re, 1, 1, -1).spandrel(-hx, -yf, re, 1, -1, -1);
        assertMoments(c, p.region(), Math.max(b, h), HAND);
        assertCentredBounds(p.region(), b, h);
        assertScaling(p);
    }

    @Property(tries = 300)
    void uShape(@ForAll @DoubleRange(min = 10, max = 1000) double h, @ForAll @DoubleRange(min = 10, max = 1000) double bf,
            @ForAll @DoubleRange(min = 0.01, max = 0.99) double fw, @ForAll @DoubleRange(min = 0.01, max = 0.99) double ff,
            @ForAll @DoubleRange(min = 0, max = 1) double fr, @ForAll @DoubleRange(min = 0, max = 1) double fe) {
        double tw = fw * bf;
        double tf = ff * h / 2;
        double out = bf - tw;
        double re = fe * Math.min(tf, out);
        double r = fr * Math.min(out - re, (h - 2 * tf) / 2);
        UShapeProfile p = new UShapeProfile(h, bf, tw, tf, r, re);
        assertMoments(UShapeProfileTest.expected(h, bf, tw, tf, r, re), p.region(), Math.max(bf, h), HAND);
        assertCentredBounds(p.region(), bf, h);
        assertScaling(p);
    }

    @Property(tries = 300)
    void lShape(@ForAll @DoubleRange(min = 10, max = 1000) double d, @ForAll @DoubleRange(min = 10, max = 1000) double w,
            @ForAll @DoubleRange(min = 0.01, max = 0.99) double ft,
            @ForAll @DoubleRange(min = 0, max = 1) double fr, @ForAll @DoubleRange(min = 0, max = 1) double fe) {
        double t = ft * Math.min(d, w);
        double re = fe * Math.min(t, Math.min(d, w) - t);
        double r = fr * (Math.min(d, w) - t - re);
        LShapeProfile p = new LShapeProfile(d, w, t, r, re);
        assertMoments(LShapeProfileTest.expected(d, w, t, r, re), p.region(), Math.max(d, w), HAND);
        assertCentredBounds(p.region(), w, d);
        assertScaling(p);
    }

    @Property(tries = 300)
    void tShape(@ForAll @DoubleRange(min = 10, max = 1000) double d, @ForAll @DoubleRange(min = 10, max = 1000) double bf,
            @ForAll @DoubleRange(min = 0.01, max = 0.99) double fw, @ForAll @DoubleRange(min = 0.01, max = 0.99) double ff,
            @ForAll @DoubleRange(min = 0, max = 1) double fr, @ForAll @DoubleRange(min = 0, max = 1) double fe,
            @ForAll @DoubleRange(min = 0, max = 1) double fwe) {
        double tw = fw * bf;
        double tf = ff * d;
        double out = (bf - tw) / 2;
        double web = d - tf;
        double rwe = fwe * Math.min(tw / 2, web);
        double rfe = fe * Math.min(tf, out);
        double r = fr * Math.min(out - rfe, web - rwe);
        TShapeProfile p = new TShapeProfile(d, bf, tw, tf, r, rfe, rwe);
        assertMoments(TShapeProfileTest.expected(d, bf, tw, tf, r, rfe, rwe), p.region(), Math.max(bf, d), HAND);
        assertCentredBounds(p.region(), bf, d);
        assertScaling(p);
    }

    @Property(tries = 300)
    void zShape(@ForAll @DoubleRange(min = 10, max = 1000) double d, @ForAll @DoubleRange(min = 10, max = 1000) double bf,
            @ForAll @DoubleRange(min = 0.01, max = 0.99) double fw, @ForAll @DoubleRange(min = 0.01, max = 0.99) double ff,
            @ForAll @DoubleRange(min = 0, max = 1) double fr, @ForAll @DoubleRange(min = 0, max = 1) double fe) {
        double tw = fw * bf;
        double tf = ff * d / 2;
        double out = bf - tw;
        double re = fe * Math.min(tf, out);
        double r = fr * Math.min(out - re, d - tf);
        ZShapeProfile p = new ZShapeProfile(d, bf, tw, tf, r, re);
        assertMoments(ZShapeProfileTest.expected(d, bf, tw, tf, r, re), p.region(), Math.max(2 * bf, d), HAND);
        assertCentredBounds(p.region(), 2 * bf - tw, d);
        assertScaling(p);
    }

    @Property(tries = 300)
    void rectangleHollow(@ForAll @DoubleRange(min = 10, max = 1000) double b, @ForAll @DoubleRange(min = 10, max = 1000) double h,
            @ForAll @DoubleRange(min = 0.01, max = 0.99) double ft,
            @ForAll @DoubleRange(min = 0, max = 1) double fi, @ForAll @DoubleRange(min = 0, max = 1) double fo) {
        double t = ft * Math.min(b, h) / 2;
        double ri = fi * (Math.min(b, h) / 2 - t);
        // the outer radius is limited by the corners and by the wall at the corners (strict)
        double ro = fo * Math.min(Math.min(b, h) / 2, 0.999 * ((2 + Math.sqrt(2)) * t + ri));
        RectangleHollowProfile p = new RectangleHollowProfile(b, h, t, ri, ro);
        Composite c = new Composite().roundedRect(b / 2, h / 2, ro, 1).roundedRect(b / 2 - t, h / 2 - t, ri, -1);
        assertMoments(c, p.region(), Math.max(b, h), HAND);
        assertCentredBounds(p.region(), b, h);
        assertScaling(p);
    }

    /** A(k·p) = k² A(p), ∫x² dA(k·p) = k⁴ ∫x² dA(p); dimensional analysis. */
    private static void assertScaling(ProfileDef p) {
        double k = 2.5;
        Map<String, Double> scaled = new LinkedHashMap<>();
        p.parameters().forEach((name, v) -> scaled.put(name, k * v));
        Moments m = p.region().moments();
        Moments s = ProfileTypes.create(p.type(), scaled).region().moments();
        assertRel(k * k * m.area(), s.area(), 1e-12, 0, "A scales with k²; dimensional analysis");
        assertRel(Math.pow(k, 4) * m.sxx(), s.sxx(), 1e-12, 0, "∫x² dA scales with k⁴; dimensional analysis");
        assertRel(Math.pow(k, 4) * m.syy(), s.syy(), 1e-12, 0, "∫y² dA scales with k⁴; dimensional analysis");
    }
}
