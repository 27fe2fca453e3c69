package org.tensio.engine.robustness;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;

import org.tensio.engine.checks.CheckOp;
import org.tensio.engine.checks.CheckReport;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.io.AtomicFiles;
import org.tensio.engine.io.ProjectFormatException;
import org.tensio.engine.io.ProjectReader;
import org.tensio.engine.project.Project;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.stress.PointStress;

/**
 * Ill-conditioned placements and scales give the results of the well-conditioned equivalent: an unequal angle with
 * root and toe radii (asymmetric: Ixy, shear centre off the centroid, all six forces) far from the origin (10⁶ mm),
 * and in other unit systems (m and kN, in and kip, and sections scaled by 10⁻⁶ and 10⁶ in mm and N); a thin strip
 * (t/b = 10⁻³) against the closed form. Compared: area, centroid, Ixx, Iyy, Ixy, plastic moduli (exact
 * integration), J, shear centre and Cw (finite elements), the stress state at a point for a case with every force
 * (finite-element shear and torsion), and the check's largest utilisation.
 * <p>
 * Tolerances: exact quantities 1e-9 relative — the translation of 10⁶ rounds every coordinate by up to
 * 10⁶ · 2⁻⁵³ ≈ 1e-10 mm on a 10 mm leg (1e-11 relative), and unit conversion rounds each input once (1e-16); the
 * margin covers the cancellation in I = ∫y² − A·ȳ² about the box centre. Finite-element quantities 1e-6 relative
 * (of the largest value of their kind): the mesher works on coordinates relative to the box centre divided by a
 * power of two, so the meshes are the same up to those rounded coordinates, and the solution moves by the
 * conditioning of the factorisation times that rounding; a mesh that changed its topology would differ by the
 * discretisation error (about 1e-3) and fail. The thin strip: J within 1 % of b t³/3 (1 − 0.630 t/b) (Roark's
 * Formulas for Stress and Strain, 7th ed., Table 10.7 case 4 — from memory; the series is accurate far beyond 1 %
 * at t/b = 10⁻³), A and I exact to 1e-12.
 * Measured worst deviations are written to {@code target/robustness/numerical.txt}.
 */
class NumericalRobustnessTest {

    private static final SectionAnalysisService ENGINE = SectionAnalysisService.create();
    private static final Map<String, Double> WORST = new LinkedHashMap<>();
    private static final List<String> FAILURES = new ArrayList<>();
    private static final double EXACT = 1e-9;
    private static final double FE = 1e-6;

    /** One unit system: length factor from mm, force factor from N, stress factor from MPa. */
    private record Units(String name, String length, String force, double l, double f) {
        double stress() {
            return f / (l * l);
        }
    }

    private static final Units MM_N = new Units("mm/N", "mm", "N", 1, 1);

    private static String project(Units u, double dx, double dy, double dimScale) {
        double l = u.l() * dimScale;
        String profile = String.format(Locale.ROOT, "{\"type\": \"LShapeProfile\", \"depth\": %.17g, \"width\": %.17g, "
                + "\"thickness\": %.17g, \"filletRadius\": %.17g, \"edgeRadius\": %.17g}", 100 * l, 65 * l, 10 * l,
                10 * l, 5 * l);
        double fl = u.f() * u.l() * dimScale * dimScale * dimScale; // moments scale as force × length; keep stresses
        double ff = u.f() * dimScale * dimScale; // forces scale with area so that stresses stay the same
        double s = u.stress();
        return String.format(Locale.ROOT, "{\"tensio\": 1, \"units\": {\"length\": \"%s\", \"force\": \"%s\"},"
                + " \"materials\": {\"S355\": {\"E\": %.17g, \"nu\": 0.3, \"fy\": %.17g}},"
                + " \"sections\": {\"L\": {\"material\": \"S355\", \"profile\": %s, \"offset\": [%.17g, %.17g]}},"
                + " \"stations\": {\"A\": {\"section\": \"L\", \"forces\": {\"LC\": {\"N\": %.17g, \"Vx\": %.17g,"
                + " \"Vy\": %.17g, \"Mx\": %.17g, \"My\": %.17g, \"T\": %.17g}}}}}",
                u.length(), u.force(), 210000 * s, 355 * s, profile, dx * u.l(), dy * u.l(), 5e4 * ff, 3e3 * ff,
                -8e3 * ff, 2e6 * fl, -1.2e6 * fl, 4e5 * fl);
    }

    private record Result(SectionProperties p, PointStress s, double utilisation) {
    }

    private static Result solve(String json, Point2 at) throws ProjectFormatException {
        Project p = ProjectReader.parse(json, "numerical");
        SectionProperties props = ENGINE.properties(p.section("L"));
        PointStress s = ENGINE.stressAt(p, "A", "LC", at);
        CheckReport r = CheckOp.check(p, ENGINE);
        return new Result(props, s, r.maxUtilisation());
    }

    /** A point inside the angle's vertical leg, mm, before offset: the leg is on −x, bbox centre at the origin. */
    private static final Point2 IN_LEG = new Point2(-32.5 + 5, 10);

    @Test
    void farFromTheOrigin() throws ProjectFormatException {
        Result ref = solve(project(MM_N, 0, 0, 1), IN_LEG);
        double d = 1e6;
        Result far = solve(project(MM_N, d, -d, 1), new Point2(IN_LEG.x() + d, IN_LEG.y() - d));
        compare("offset 1e6 mm", ref, far, 1, 1, d, -d);
        verdict();
    }

    @Test
    void otherUnitSystemsAndScales() throws ProjectFormatException {
        Result ref = solve(project(MM_N, 0, 0, 1), IN_LEG);
        List<Units> systems = new ArrayList<>();
        systems.add(new Units("m/kN", "m", "kN", 1e-3, 1e-3));
        systems.add(new Units("in/kip", "in", "kip", 1 / 25.4, 1 / 4448.2216152605));
        systems.add(new Units("m/MN", "m", "MN", 1e-3, 1e-6));
        for (Units u : systems) {
            Result r = solve(project(u, 0, 0, 1), new Point2(IN_LEG.x() * u.l(), IN_LEG.y() * u.l()));
            compare(u.name(), ref, r, u.l(), u.stress(), 0, 0);
        }
        for (double k : new double[] {1e-6, 1e6}) {
            Result r = solve(project(MM_N, 0, 0, k), new Point2(IN_LEG.x() * k, IN_LEG.y() * k));
            compare("mm/N scaled " + k, ref, r, k, 1, 0, 0);
        }
        verdict();
    }

    @Test
    void aThinStripMatchesTheClosedForm() throws ProjectFormatException {
        double b = 1000, t = 1;
        String json = Bases.project("{\"material\": \"S355\", \"profile\": {\"type\": \"RectangleProfile\", \"xDim\": "
                + b + ", \"yDim\": " + t + "}}");
        Project p = ProjectReader.parse(json, "thin");
        SectionProperties props = ENGINE.properties(p.section("s"));
        record("thin t/b=1e-3 A", rel(b * t, props.area()), 1e-12);
        record("thin t/b=1e-3 Ixx", rel(b * t * t * t / 12, props.ixx()), 1e-12);
        record("thin t/b=1e-3 Iyy", rel(t * b * b * b / 12, props.iyy()), 1e-12);
        double j = b * t * t * t / 3 * (1 - 0.630 * t / b);
        record("thin t/b=1e-3 J vs closed form", rel(j, props.j()), 0.01);
        CheckReport r = CheckOp.check(p, ENGINE);
        assertTrue(Double.isFinite(r.maxUtilisation()) && r.maxUtilisation() > 0, "utilisation " + r.maxUtilisation());
        verdict();
    }

    private static void compare(String what, Result ref, Result r, double l, double stress, double dx, double dy) {
        SectionProperties a = ref.p(), b = r.p();
        double l2 = l * l, l3 = l2 * l, l4 = l2 * l2, l6 = l3 * l3;
        double size = 120 * l;
        record(what + " area", rel(a.area() * l2, b.area()), EXACT);
        record(what + " centroid", (Math.abs(a.centroid().x() * l + dx * l - b.centroid().x())
                + Math.abs(a.centroid().y() * l + dy * l - b.centroid().y())) / size, EXACT);
        double iScale = Math.max(a.ixx(), a.iyy()) * l4;
        record(what + " Ixx", Math.abs(a.ixx() * l4 - b.ixx()) / iScale, EXACT);
        record(what + " Iyy", Math.abs(a.iyy() * l4 - b.iyy()) / iScale, EXACT);
        record(what + " Ixy", Math.abs(a.ixy() * l4 - b.ixy()) / iScale, EXACT);
        record(what + " Zx", rel(a.zx() * l3, b.zx()), EXACT);
        record(what + " Zy", rel(a.zy() * l3, b.zy()), EXACT);
        record(what + " J", rel(a.j() * l4, b.j()), FE);
        record(what + " shear centre", (Math.abs(a.shearCentre().x() * l + dx * l - b.shearCentre().x())
                + Math.abs(a.shearCentre().y() * l + dy * l - b.shearCentre().y())) / size, FE);
        record(what + " Cw", Math.abs(a.cw() * l6 - b.cw()) / Math.max(Math.abs(a.cw() * l6), 1e-300), FE);
        double sRef = Math.max(Math.abs(ref.s().sigmaZ()), Math.hypot(ref.s().total().tauZX(), ref.s().total().tauZY()));
        record(what + " sigmaZ", Math.abs(ref.s().sigmaZ() * stress - r.s().sigmaZ()) / (sRef * stress), FE);
        record(what + " tau", (Math.abs(ref.s().total().tauZX() * stress - r.s().total().tauZX())
                + Math.abs(ref.s().total().tauZY() * stress - r.s().total().tauZY())) / (sRef * stress), FE);
        record(what + " von Mises", Math.abs(ref.s().principal().vonMises() * stress - r.s().principal().vonMises())
                / (sRef * stress), FE);
        record(what + " utilisation", rel(ref.utilisation(), r.utilisation()), FE);
    }

    private static double rel(double expected, double actual) {
        return Math.abs(actual - expected) / Math.abs(expected);
    }

    private static void record(String what, double deviation, double tolerance) {
        synchronized (WORST) {
            WORST.put(what, deviation);
        }
        if (!(deviation <= tolerance)) {
            FAILURES.add(what + ": deviation " + deviation + " above the tolerance " + tolerance);
        }
    }

    /** Fails with every deviation above its tolerance (all are measured first, so the report is complete). */
    private static void verdict() {
        List<String> f = new ArrayList<>(FAILURES);
        FAILURES.clear();
        assertTrue(f.isEmpty(), () -> String.join("\n", f));
    }

    @AfterAll
    static void writeDeviations() throws IOException {
        StringBuilder sb = new StringBuilder("# numerical robustness: relative deviation from the well-conditioned "
                + "equivalent (tolerances in NumericalRobustnessTest's Javadoc)\n");
        synchronized (WORST) {
            for (Map.Entry<String, Double> e : WORST.entrySet()) {
                sb.append(String.format(Locale.ROOT, "%-40s %.3e%n", e.getKey(), e.getValue()));
            }
        }
        Path dir = Files.createDirectories(Path.of("target", "robustness"));
        AtomicFiles.writeString(dir.resolve("numerical.txt"), sb);
    }
}
