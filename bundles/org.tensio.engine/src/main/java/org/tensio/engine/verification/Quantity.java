package org.tensio.engine.verification;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.ToDoubleFunction;

import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Material;
import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.PrincipalStresses;
import org.tensio.engine.stress.ShearMethod;
import org.tensio.engine.stress.StressComponents;
import org.tensio.engine.units.UnitSystem;

/**
 * A quantity a fixture can check, computed through the public engine API exactly as a user gets it:
 * <ul>
 * <li>section properties ({@code A xc yc Ixx Iyy Ixy I1 I2 theta rx ry SxTop SxBottom SyRight SyLeft Zx Zy
 * plasticAxisX plasticAxisY J Cw shearCentreX shearCentreY}) from {@link SectionAnalysisService#properties};</li>
 * <li>finite-element results ({@code fe.JWarping fe.JStressFunction fe.JBracket fe.tauTPeak fe.Cw
 * fe.shearCentreX fe.shearCentreY fe.kx fe.ky}) from {@link SectionAnalysisService#solution(Section)} (default
 * mesh);</li>
 * <li>stresses at a point,
 * {@code stress.C(x=..,y=..[,N=..][,Vx=..][,Vy=..][,Mx=..][,My=..][,T=..][,shear=elementary|finiteElement])}
 * with C one of {@code sigmaZ tauZX tauZY tau sigma1 sigma2 sigma3 tauMax vonMises tresca}, from
 * {@link SectionAnalysisService#stressAt(Project, String, String, Point2, ShearMethod)} on a one-station project
 * (shear by the finite-element method unless the case says otherwise, as the command line's default);</li>
 * <li>fatigue quantities {@code fatigue.C(...)}, see {@link FatigueQuantities}.</li>
 * </ul>
 * Units: mm, N, MPa, degrees.
 */
final class Quantity {

    /** Evaluates quantities of one section; memoises the section's properties and solution. Not thread-safe. */
    static final class Context {
        private final SectionAnalysisService service;
        private final Section section;
        private SectionProperties properties;
        private FiniteElementSolution solution;

        Context(SectionAnalysisService service, Section section) {
            this.service = service;
            this.section = section;
        }

        SectionProperties properties() {
            if (properties == null) {
                properties = service.properties(section);
            }
            return properties;
        }

        SectionAnalysisService service() {
            return service;
        }

        Section section() {
            return section;
        }

        FiniteElementSolution solution() {
            if (solution == null) {
                solution = service.solution(section);
            }
            return solution;
        }

        PointStress stress(InternalForces forces, Point2 point, ShearMethod method) {
            Map<String, Material> materials = new LinkedHashMap<>();
            section.parts().forEach(p -> materials.put(p.material().name(), p.material()));
            Project project = new Project(UnitSystem.MM_N, materials, Map.of("section", section),
                    Map.of("station", new Station("station", "section", Map.of("case", forces))), Map.of());
            return service.stressAt(project, "station", "case", point, method);
        }
    }

    private record Def(String description, String unit, String call, ToDoubleFunction<Context> f) {
    }

    private static final Map<String, Def> NAMED = new LinkedHashMap<>();

    static {
        prop("A", "area A", "mm²", "area()", p -> p.area());
        prop("xc", "centroid x", "mm", "centroid().x()", p -> p.centroid().x());
        prop("yc", "centroid y", "mm", "centroid().y()", p -> p.centroid().y());
        prop("Ixx", "second moment about the centroidal x axis", "mm⁴", "ixx()", p -> p.ixx());
        prop("Iyy", "second moment about the centroidal y axis", "mm⁴", "iyy()", p -> p.iyy());
        prop("Ixy", "product moment about the centroidal axes", "mm⁴", "ixy()", p -> p.ixy());
        prop("I1", "major principal moment", "mm⁴", "i1()", p -> p.i1());
        prop("I2", "minor principal moment", "mm⁴", "i2()", p -> p.i2());
        prop("theta", "angle of the I1 axis from +x, counter-clockwise", "°", "principalAngleDeg()",
                p -> p.principalAngleDeg());
        prop("rx", "radius of gyration √(Ixx/A)", "mm", "rx()", p -> p.rx());
        prop("ry", "radius of gyration √(Iyy/A)", "mm", "ry()", p -> p.ry());
        prop("SxTop", "elastic modulus Ixx/(ymax − yc)", "mm³", "sxTop()", p -> p.sxTop());
        prop("SxBottom", "elastic modulus Ixx/(yc − ymin)", "mm³", "sxBottom()", p -> p.sxBottom());
        prop("SyRight", "elastic modulus Iyy/(xmax − xc)", "mm³", "syRight()", p -> p.syRight());
        prop("SyLeft", "elastic modulus Iyy/(xc − xmin)", "mm³", "syLeft()", p -> p.syLeft());
        prop("Zx", "plastic modulus for bending about x", "mm³", "zx()", p -> p.zx());
        prop("Zy", "plastic modulus for bending about y", "mm³", "zy()", p -> p.zy());
        prop("plasticAxisY", "y of the plastic neutral axis (bending about x)", "mm", "plasticAxisY()",
                p -> p.plasticAxisY());
        prop("plasticAxisX", "x of the plastic neutral axis (bending about y)", "mm", "plasticAxisX()",
                p -> p.plasticAxisX());
        prop("J", "St. Venant torsion constant as the properties report it", "mm⁴", "j()",
                p -> required(p.j(), "J", p));
        prop("Cw", "warping constant about the shear centre as the properties report it", "mm⁶", "cw()",
                p -> required(p.cw(), "Cw", p));
        prop("shearCentreX", "shear centre x as the properties report it", "mm", "shearCentre().x()",
                p -> required(p.shearCentre(), "shear centre", p).x());
        prop("shearCentreY", "shear centre y as the properties report it", "mm", "shearCentre().y()",
                p -> required(p.shearCentre(), "shear centre", p).y());
        fe("fe.JWarping", "J from the warping function (upper bound)", "mm⁴", "jWarping()", f -> f.jWarping());
        fe("fe.JStressFunction", "J from the Prandtl stress function (lower bound)", "mm⁴", "jPrandtl()",
                f -> f.jPrandtl());
        fe("fe.JBracket", "(J_warping − J_stress function)/J_warping", "1", "jBracket()", f -> f.jBracket());
        fe("fe.tauTPeak", "largest torsion shear stress per unit torque (smoothed nodal values)", "MPa/(N·mm)",
                "peakUnitTorsionStress()", f -> f.peakUnitTorsionStress());
        fe("fe.Cw", "warping constant about the shear centre", "mm⁶", "cw()", f -> f.cw());
        fe("fe.shearCentreX", "shear centre x (Trefftz)", "mm", "shearCentre().x()", f -> f.shearCentre().x());
        fe("fe.shearCentreY", "shear centre y (Trefftz)", "mm", "shearCentre().y()", f -> f.shearCentre().y());
        NAMED.put("fe.kx", new Def("energy shear coefficient Asx/A", "1",
                "SectionAnalysisService.solution(section).shearAreas()[0] / properties(section).area()",
                c -> shearArea(c, 0) / c.properties().area()));
        NAMED.put("fe.ky", new Def("energy shear coefficient Asy/A", "1",
                "SectionAnalysisService.solution(section).shearAreas()[1] / properties(section).area()",
                c -> shearArea(c, 1) / c.properties().area()));
    }

    private static final Map<String, String> STRESS = new LinkedHashMap<>();

    static {
        STRESS.put("sigmaZ", "σz");
        STRESS.put("tauZX", "τzx");
        STRESS.put("tauZY", "τzy");
        STRESS.put("tau", "shear resultant √(τzx² + τzy²)");
        STRESS.put("sigma1", "σ1");
        STRESS.put("sigma2", "σ2");
        STRESS.put("sigma3", "σ3");
        STRESS.put("tauMax", "τmax (Mohr radius)");
        STRESS.put("vonMises", "von Mises equivalent stress");
        STRESS.put("tresca", "Tresca equivalent stress");
    }

    private static final List<String> FORCE_KEYS = List.of("N", "Vx", "Vy", "Mx", "My", "T");

    final String description;
    final String unit;
    final String computedBy;
    private final ToDoubleFunction<Context> f;

    Quantity(String description, String unit, String computedBy, ToDoubleFunction<Context> f) {
        this.description = description;
        this.unit = unit;
        this.computedBy = computedBy;
        this.f = f;
    }

    double evaluate(Context c) {
        return f.applyAsDouble(c);
    }

    /**
     * @param spec as the fixture writes it
     * @param vars the fixture's names, for the arguments of a stress quantity
     * @throws IllegalArgumentException naming the quantity or argument when unknown or malformed
     */
    static Quantity parse(String spec, Map<String, Double> vars) {
        Def d = NAMED.get(spec);
        if (d != null) {
            return new Quantity(d.description, d.unit, d.call, d.f);
        }
        if (spec.startsWith("fatigue.") && spec.endsWith(")") && spec.indexOf('(') > 0) {
            return FatigueQuantities.parse(spec, vars);
        }
        if (spec.startsWith("stress.") && spec.endsWith(")") && spec.indexOf('(') > 0) {
            return stress(spec, vars);
        }
        throw new IllegalArgumentException("unknown quantity '" + spec + "' (use one of " + NAMED.keySet()
                + " or stress.C(x=..,y=..,N=..,Vx=..,Vy=..,Mx=..,My=..,T=..,shear=..) with C one of "
                + STRESS.keySet() + ")");
    }

    private static Quantity stress(String spec, Map<String, Double> vars) {
        int open = spec.indexOf('(');
        String component = spec.substring("stress.".length(), open);
        String what = STRESS.get(component);
        if (what == null) {
            throw new IllegalArgumentException("quantity '" + spec + "': unknown stress component '" + component
                    + "' (use one of " + STRESS.keySet() + ")");
        }
        Map<String, Double> f = new LinkedHashMap<>();
        Double x = null, y = null;
        ShearMethod method = ShearMethod.finiteElement;
        for (String arg : Expr.splitTopLevel(spec.substring(open + 1, spec.length() - 1), ',')) {
            int eq = arg.indexOf('=');
            if (eq < 0) {
                throw new IllegalArgumentException("quantity '" + spec + "': argument '" + arg + "' is not key=value");
            }
            String k = arg.substring(0, eq).strip(), v = arg.substring(eq + 1).strip();
            if (k.equals("shear")) {
                try {
                    method = ShearMethod.valueOf(v);
                } catch (IllegalArgumentException e) {
                    throw new IllegalArgumentException("quantity '" + spec
                            + "': shear must be elementary or finiteElement, got '" + v + "'", e);
                }
            } else if (k.equals("x")) {
                x = Expr.eval(v, vars);
            } else if (k.equals("y")) {
                y = Expr.eval(v, vars);
            } else if (FORCE_KEYS.contains(k)) {
                f.put(k, Expr.eval(v, vars));
            } else {
                throw new IllegalArgumentException("quantity '" + spec + "': unknown argument '" + k + "' (use x, y, "
                        + String.join(", ", FORCE_KEYS) + ", shear)");
            }
        }
        if (x == null || y == null) {
            throw new IllegalArgumentException("quantity '" + spec + "': needs x= and y=");
        }
        InternalForces forces = new InternalForces(f.getOrDefault("N", 0.0), f.getOrDefault("Vx", 0.0),
                f.getOrDefault("Vy", 0.0), f.getOrDefault("Mx", 0.0), f.getOrDefault("My", 0.0),
                f.getOrDefault("T", 0.0));
        Point2 point = new Point2(x, y);
        StringBuilder loads = new StringBuilder();
        for (Map.Entry<String, Double> e : f.entrySet()) {
            if (e.getValue() != 0) {
                String unit = e.getKey().startsWith("M") || e.getKey().equals("T") ? " N·mm" : " N";
                loads.append(loads.length() == 0 ? "" : ", ").append(e.getKey()).append(" = ")
                        .append(Numbers.shortest(e.getValue(), 6)).append(unit);
            }
        }
        boolean shear = forces.vx() != 0 || forces.vy() != 0;
        String description = what + " at (" + Numbers.shortest(x, 8) + ", " + Numbers.shortest(y, 8) + ") under "
                + (loads.length() == 0 ? "no load" : loads) + (shear ? "; shear by the " + name(method) + " method" : "");
        String accessor = switch (component) {
            case "sigmaZ" -> "sigmaZ()";
            case "tauZX", "tauZY" -> "total()." + component + "()";
            case "tau" -> "total().tauResultant()";
            default -> "principal()." + component + "()";
        };
        String call = String.format(Locale.ROOT, "SectionAnalysisService.stressAt(project, station, case, (%s, %s),"
                + " ShearMethod.%s).%s", Numbers.shortest(x, 8), Numbers.shortest(y, 8), method, accessor);
        ShearMethod m = method;
        ToDoubleFunction<Context> eval = c -> {
            PointStress ps = c.stress(forces, point, m);
            return switch (component) {
                case "sigmaZ" -> ps.sigmaZ();
                case "tauZX" -> total(ps).tauZX();
                case "tauZY" -> total(ps).tauZY();
                case "tau" -> total(ps).tauResultant();
                case "sigma1" -> principal(ps).sigma1();
                case "sigma2" -> principal(ps).sigma2();
                case "sigma3" -> principal(ps).sigma3();
                case "tauMax" -> principal(ps).tauMax();
                case "vonMises" -> principal(ps).vonMises();
                default -> principal(ps).tresca();
            };
        };
        return new Quantity(description, "MPa", call, eval);
    }

    private static String name(ShearMethod m) {
        return m == ShearMethod.elementary ? "elementary (V·Q/(I·t))" : "finite-element (shear functions)";
    }

    private static StressComponents total(PointStress ps) {
        if (ps.total() == null) {
            throw new IllegalStateException("no total shear stress at " + ps.point() + ": " + ps.warnings());
        }
        return ps.total();
    }

    private static PrincipalStresses principal(PointStress ps) {
        if (ps.principal() == null) {
            throw new IllegalStateException("no principal stresses at " + ps.point() + ": " + ps.warnings());
        }
        return ps.principal();
    }

    private static double shearArea(Context c, int i) {
        double[] a = c.solution().shearAreas();
        if (a == null) {
            throw new IllegalStateException("no shear areas (composite section)");
        }
        return a[i];
    }

    private static <T> T required(T v, String what, SectionProperties p) {
        if (v == null) {
            throw new IllegalStateException(what + " not computed (torsionSource " + p.torsionSource() + ")");
        }
        return v;
    }

    private static void prop(String name, String description, String unit, String accessor,
            ToDoubleFunction<SectionProperties> g) {
        NAMED.put(name, new Def(description, unit, "SectionAnalysisService.properties(section)." + accessor,
                c -> g.applyAsDouble(c.properties())));
    }

    private static void fe(String name, String description, String unit, String accessor,
            ToDoubleFunction<FiniteElementSolution> g) {
        NAMED.put(name, new Def(description, unit, "SectionAnalysisService.solution(section)." + accessor,
                c -> g.applyAsDouble(c.solution())));
    }
}
