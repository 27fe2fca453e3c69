package org.tensio.cli;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Map;

import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.mesh.Singularity;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.PrincipalStresses;
import org.tensio.engine.stress.StressComponents;
import org.tensio.engine.units.UnitSystem;

/** Human-readable views of engine results: aligned label/value lines, six significant digits. */
final class Text {

    private Text() {
    }

    /** @return v to 6 significant digits, plain for moderate magnitudes, scientific otherwise */
    static String num(double v) {
        if (v == 0) {
            return "0";
        }
        BigDecimal b = new BigDecimal(v).round(new MathContext(6));
        double a = Math.abs(v);
        String s = (a >= 1e-4 && a < 1e9) ? b.stripTrailingZeros().toPlainString() : String.format("%.5e", v);
        return s;
    }

    static String num(Double v) {
        return v == null ? "not computed" : num(v.doubleValue());
    }

    private static void line(StringBuilder sb, String label, String value, String unit) {
        sb.append(String.format("  %-28s %16s %s%n", label, value, unit == null ? "" : unit));
    }

    static String properties(SectionProperties p, TorsionReport t, UnitSystem u) {
        StringBuilder sb = new StringBuilder(properties(p, u));
        String l = u.length();
        if (t.solution() == null) {
            sb.append("  finite-element solution failed: ").append(t.error()).append(System.lineSeparator());
            return sb.toString();
        }
        FiniteElementSolution f = t.solution();
        line(sb, "J warping / stress function", num(f.jWarping()) + " / " + num(f.jPrandtl()), l + "⁴ (bracket "
                + String.format("%.2e", f.jBracket()) + ")");
        line(sb, "FE shear centre", "(" + num(f.shearCentre().x()) + ", " + num(f.shearCentre().y()) + ")", l);
        var k = t.shearCoefficients();
        if (k != null) {
            line(sb, "shear coefficients kx, ky", num(k.get(0)) + ", " + num(k.get(1)), "(energy method)");
        }
        line(sb, "peak torsion stress / T", num(f.peakUnitTorsionStress()), "1/" + l + "³ at (" + num(f.peakUnitTorsionAt().x())
                + ", " + num(f.peakUnitTorsionAt().y()) + ")");
        line(sb, "mesh", f.mesh().elementCount() + " el.", "6-node triangles, min angle "
                + String.format("%.1f", f.mesh().minAngleDeg()) + "°");
        for (Singularity s : f.mesh().singularities()) {
            sb.append(String.format("  note: sharp re-entrant corner at (%s, %s), %.1f°: shear stress singular there;"
                    + " model the fillet%n", num(s.x()), num(s.y()), s.interiorAngleDeg()));
        }
        if (t.refined() != null) {
            FiniteElementSolution r = t.refined();
            line(sb, "refined mesh: J, peak / T", num(r.jWarping()) + ", " + num(r.peakUnitTorsionStress()),
                    r.mesh().elementCount() + " el. (J change " + String.format("%.1e", (r.jWarping() - f.jWarping()) / r.jWarping())
                            + ", peak change " + String.format("%.1e", (r.peakUnitTorsionStress() - f.peakUnitTorsionStress())
                                    / r.peakUnitTorsionStress()) + ")");
        }
        return sb.toString();
    }

    static String properties(SectionProperties p, UnitSystem u) {
        String l = u.length();
        StringBuilder sb = new StringBuilder();
        sb.append("Section '").append(p.section()).append("'");
        if (p.composite()) {
            sb.append(" (composite, transformed to material '").append(p.referenceMaterial()).append("')");
        }
        sb.append(System.lineSeparator());
        line(sb, "area A", num(p.area()), l + "²");
        line(sb, "centroid x", num(p.centroid().x()), l);
        line(sb, "centroid y", num(p.centroid().y()), l);
        line(sb, "Ixx (about centroidal x)", num(p.ixx()), l + "⁴");
        line(sb, "Iyy (about centroidal y)", num(p.iyy()), l + "⁴");
        line(sb, "Ixy", num(p.ixy()), l + "⁴");
        line(sb, "I1 (major principal)", num(p.i1()), l + "⁴");
        line(sb, "I2 (minor principal)", num(p.i2()), l + "⁴");
        line(sb, "angle of I1 axis from x", num(p.principalAngleDeg()), "deg, counter-clockwise");
        line(sb, "rx", num(p.rx()), l);
        line(sb, "ry", num(p.ry()), l);
        line(sb, "Sx top / bottom", num(p.sxTop()) + " / " + num(p.sxBottom()), l + "³");
        line(sb, "Sy right / left", num(p.syRight()) + " / " + num(p.syLeft()), l + "³");
        line(sb, "Zx (plastic), axis at y", num(p.zx()) + " @ " + num(p.plasticAxisY()), l + "³ @ " + l);
        line(sb, "Zy (plastic), axis at x", num(p.zy()) + " @ " + num(p.plasticAxisX()), l + "³ @ " + l);
        line(sb, "J (torsion constant)", num(p.j()), p.j() == null ? "" : l + "⁴ (" + p.torsionSource() + ")");
        line(sb, "shear centre", p.shearCentre() == null ? "not computed"
                : "(" + num(p.shearCentre().x()) + ", " + num(p.shearCentre().y()) + ")", p.shearCentre() == null ? "" : l);
        line(sb, "Cw (warping constant)", num(p.cw()), p.cw() == null ? "" : l + "⁶");
        return sb.toString();
    }

    static String stress(PointStress s, String sectionId, UnitSystem u) {
        String st = u.stressUnit();
        StringBuilder sb = new StringBuilder();
        sb.append(String.format("Station '%s', case '%s', section '%s', material '%s', point (%s, %s) %s%n",
                s.station(), s.caseId(), sectionId, s.material(), num(s.point().x()), num(s.point().y()), u.length()));
        sb.append("  forces:");
        for (ForceComponent c : ForceComponent.values()) {
            sb.append(' ').append(c.key()).append('=').append(num(s.forces().get(c)));
        }
        sb.append(String.format("  (%s, %s)%n", u.force(), u.momentUnit()));
        sb.append(String.format("  %-6s %14s %14s %14s%n", "from", "sigmaZ", "tauZX", "tauZY"));
        for (Map.Entry<ForceComponent, StressComponents> e : s.contributions().entrySet()) {
            StressComponents c = e.getValue();
            sb.append(String.format("  %-6s %14s %14s %14s%n", e.getKey().key(), num(c.sigmaZ()), num(c.tauZX()), num(c.tauZY())));
        }
        StressComponents t = s.total();
        sb.append(String.format("  %-6s %14s %14s %14s  %s%n", "total", num(s.sigmaZ()),
                t == null ? "n/a" : num(t.tauZX()), t == null ? "n/a" : num(t.tauZY()), st));
        PrincipalStresses p = s.principal();
        if (p != null) {
            line(sb, "sigma1 / sigma2 / sigma3", num(p.sigma1()) + " / " + num(p.sigma2()) + " / " + num(p.sigma3()), st);
            line(sb, "tauMax", num(p.tauMax()), st);
            line(sb, "von Mises", num(p.vonMises()), st);
            line(sb, "Tresca", num(p.tresca()), st);
            line(sb, "sigma1 direction (x,y,z)", vec(p.dir1()), "");
        }
        line(sb, "shear method", s.shearMethod(), "");
        line(sb, "torsion method", s.torsionMethod(), "");
        if (s.shearCuts() != null) {
            line(sb, "cut || x: Qx, width", num(s.shearCuts().qxHorizontal()) + ", " + num(s.shearCuts().widthHorizontal()),
                    u.length() + "³, " + u.length());
            line(sb, "cut || y: Qy, width", num(s.shearCuts().qyVertical()) + ", " + num(s.shearCuts().widthVertical()),
                    u.length() + "³, " + u.length());
        }
        for (String w : s.warnings()) {
            sb.append("  warning: ").append(w).append(System.lineSeparator());
        }
        return sb.toString();
    }

    private static String vec(double[] v) {
        return "(" + String.format("%.4f", v[0]) + ", " + String.format("%.4f", v[1]) + ", " + String.format("%.4f", v[2]) + ")";
    }
}
