package org.tensio.engine.verification;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.ToDoubleFunction;

import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.checks.FatigueCheckOp;
import org.tensio.engine.checks.FatiguePointOp;
import org.tensio.engine.fatigue.FatigueConditions;
import org.tensio.engine.fatigue.FatigueCriterion;
import org.tensio.engine.fatigue.FatigueData;
import org.tensio.engine.fatigue.FatigueMaterial;
import org.tensio.engine.fatigue.FatigueStation;
import org.tensio.engine.fatigue.LoadHistory;
import org.tensio.engine.fatigue.MarinFactors;
import org.tensio.engine.fatigue.MinimumDiameter;
import org.tensio.engine.fatigue.Notch;
import org.tensio.engine.fatigue.NotchFactors;
import org.tensio.engine.fatigue.NotchLocation;
import org.tensio.engine.fatigue.NotchSensitivity;
import org.tensio.engine.fatigue.NotchType;
import org.tensio.engine.fatigue.SurfaceFinish;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.section.Material;
import org.tensio.engine.units.UnitSystem;

/**
 * The fatigue quantities a verification fixture can check (mm, N, MPa; names and arguments as written in the
 * fixture, {@code key=value} separated by commas, values expressions unless named below):
 * <ul>
 * <li>{@code fatigue.ka(finish=machined|ground|hotRolled|asForged, sut=..)}, {@code fatigue.kb(d=..)},
 * {@code fatigue.kd(T=..)} (°C), {@code fatigue.ke(R=..)}: the Marin factors ({@link MarinFactors});</li>
 * <li>{@code fatigue.kf(kt=.., r=.., sut=..[, torsion=1])}: Kf (or Kfs) by the Neuber form ({@link NotchFactors});</li>
 * <li>{@code fatigue.dmin(criterion=NAME, n=.., kf=.., kfs=.., Ma=.., Mm=.., Ta=.., Tm=.., se=.., sut=..[, sy=..])}:
 * {@link MinimumDiameter#closedForm};</li>
 * <li>{@code fatigue.n(criterion=NAME, sut=.., sy=.., [se=..] | estimate, surface=.., [reliability=..],
 * [kt=.., kts=.., q=.., qs=..] | [kf=.., kfs=..], N=.., Mx=.., My=.., T=..[, at=y])}: the factor of safety of a
 * shaft of the case's section rotating under those forces, computed by {@link FatigueCheckOp} on a one-station
 * project (the general path: unit stress fields at every mesh node); a notch, when given, acts on the whole surface.
 * With {@code at}, the factor of safety at the point (0, at) by {@link FatiguePointOp} (surface tolerance 0)
 * instead of the governing sample's.</li>
 * </ul>
 */
final class FatigueQuantities {

    private FatigueQuantities() {
    }

    static Quantity parse(String spec, Map<String, Double> vars) {
        int open = spec.indexOf('(');
        String what = spec.substring("fatigue.".length(), open);
        Map<String, String> raw = new LinkedHashMap<>();
        for (String arg : Expr.splitTopLevel(spec.substring(open + 1, spec.length() - 1), ',')) {
            int eq = arg.indexOf('=');
            if (eq < 0) {
                raw.put(arg.strip(), "1");
            } else {
                raw.put(arg.substring(0, eq).strip(), arg.substring(eq + 1).strip());
            }
        }
        Args a = new Args(spec, raw, vars);
        return switch (what) {
            case "ka" -> {
                SurfaceFinish f = SurfaceFinish.valueOf(a.text("finish"));
                double sut = a.num("sut");
                yield q("surface factor ka, " + f + ", Sut = " + Numbers.shortest(sut, 6) + " MPa", "1",
                        "MarinFactors.surface(" + f + ", " + Numbers.shortest(sut, 6) + ").value()",
                        c -> MarinFactors.surface(f, sut).value());
            }
            case "kb" -> {
                double d = a.num("d");
                yield q("size factor kb, d = " + Numbers.shortest(d, 6) + " mm", "1", "MarinFactors.size(d).value()",
                        c -> MarinFactors.size(d, "given").value());
            }
            case "kd" -> {
                double t = a.num("T");
                yield q("temperature factor kd at " + Numbers.shortest(t, 6) + " °C", "1",
                        "MarinFactors.temperature(T).value()", c -> MarinFactors.temperature(t).value());
            }
            case "ke" -> {
                double r = a.num("R");
                yield q("reliability factor ke at R = " + Numbers.shortest(r, 6), "1", "MarinFactors.reliability(R).value()",
                        c -> MarinFactors.reliability(r).value());
            }
            case "kf" -> {
                double kt = a.num("kt"), r = a.num("r"), sut = a.num("sut");
                boolean torsion = a.has("torsion") && a.num("torsion") != 0;
                Notch n = torsion ? new Notch(NotchType.shoulderFillet, 1.0, kt, null, r, null, null, null, null, null,
                        new NotchLocation.Surface())
                        : new Notch(NotchType.shoulderFillet, kt, 1.0, null, r, null, null, null, null, null,
                                new NotchLocation.Surface());
                yield q((torsion ? "Kfs" : "Kf") + " by the Neuber form, Kt = " + Numbers.shortest(kt, 6) + ", r = "
                        + Numbers.shortest(r, 6) + " mm, Sut = " + Numbers.shortest(sut, 6) + " MPa", "1",
                        "NotchFactors.of(notch, Sut, 1, NotchSensitivity.neuber)." + (torsion ? "kfs()" : "kf()"),
                        c -> {
                            NotchFactors f = NotchFactors.of(n, sut, 1, NotchSensitivity.neuber);
                            return torsion ? f.kfs() : f.kf();
                        });
            }
            case "dmin" -> {
                FatigueCriterion cr = FatigueCriterion.valueOf(a.text("criterion"));
                double n = a.num("n"), kf = a.num("kf"), kfs = a.num("kfs"), ma = a.num("Ma"), mm = a.num("Mm"),
                        ta = a.num("Ta"), tm = a.num("Tm"), se = a.num("se"), sut = a.num("sut");
                double sy = a.has("sy") ? a.num("sy") : Double.NaN;
                yield q("minimum solid-shaft diameter by DE-" + cr.label() + " for n = " + Numbers.shortest(n, 6), "mm",
                        "MinimumDiameter.closedForm(" + cr + ", ...)",
                        c -> MinimumDiameter.closedForm(cr, n, kf, kfs, ma, mm, ta, tm, se, sut, sy));
            }
            case "n" -> nOf(a);
            default -> throw new IllegalArgumentException("quantity '" + spec + "': unknown fatigue quantity '" + what
                    + "' (use ka, kb, kd, ke, kf, dmin, n)");
        };
    }

    private static Quantity nOf(Args a) {
        FatigueCriterion cr = FatigueCriterion.valueOf(a.text("criterion"));
        double sut = a.num("sut");
        Double sy = a.has("sy") ? a.num("sy") : null;
        Double se = a.has("se") ? a.num("se") : null;
        FatigueConditions cond = new FatigueConditions(SurfaceFinish.valueOf(a.text("surface")),
                a.has("reliability") ? a.num("reliability") : null, null, null);
        FatigueMaterial.Basis basis = se == null ? FatigueMaterial.Basis.steelEstimate : FatigueMaterial.Basis.given;
        InternalForces forces = new InternalForces(a.opt("N"), 0, 0, a.opt("Mx"), a.opt("My"), a.opt("T"));
        List<Notch> notches = List.of();
        if (a.has("kt") || a.has("kf")) {
            notches = List.of(new Notch(NotchType.shoulderFillet, a.maybe("kt"), a.maybe("kts"), null, null, a.maybe("q"),
                    a.maybe("qs"), a.maybe("kf"), a.maybe("kfs"), null, new NotchLocation.Surface()));
        }
        List<Notch> nl = notches;
        Double at = a.has("at") ? a.num("at") : null;
        String desc = "factor of safety n by " + cr.label() + ", shaft rotating under Mx = " + Numbers.shortest(forces.mx(),
                6) + " N·mm, My = " + Numbers.shortest(forces.my(), 6) + " N·mm, T = " + Numbers.shortest(forces.t(), 6)
                + " N·mm (steady), through the general path";
        ToDoubleFunction<Quantity.Context> eval = c -> {
            Material m = c.section().parts().get(0).material();
            FatigueMaterial fm = new FatigueMaterial(m.name(), sut, sy, basis, se, null, cond, NotchSensitivity.neuber);
            FatigueStation st = new FatigueStation("station", Map.of("h", new LoadHistory("case", null, null, null, null)),
                    nl, List.of(cr), FatigueConditions.NONE, null, null);
            String sid = c.section().name();
            Project p = new Project(UnitSystem.MM_N, Map.of(m.name(), m), Map.of(sid, c.section()),
                    Map.of("station", new Station("station", sid, Map.of("case", forces))), Map.of(), Map.of(),
                    new FatigueData(1, 1, Map.of(m.name(), fm), Map.of("station", st)));
            if (at != null) { // at one chosen point (0, at) instead of the governing sample
                FatiguePointOp op = new FatiguePointOp(p, c.section(), c.service().properties(c.section()),
                        c.service().solution(c.section()));
                return op.evaluate("station", new Point2(0, at), 0).results().get(0).fatigue().factorOfSafety();
            }
            List<CheckResult> r = new FatigueCheckOp(p, c.service()).results(null);
            return r.get(0).fatigue().factorOfSafety();
        };
        if (at != null) {
            return q(desc + ", at the point (0, " + Numbers.shortest(at, 6) + ")", "1",
                    "new FatiguePointOp(project, section, props, fe).evaluate(\"station\", (0, at), 0).results().get(0)"
                            + ".fatigue().factorOfSafety()", eval);
        }
        return q(desc, "1", "FatigueCheckOp(project, service).results(null).get(0).fatigue().factorOfSafety()", eval);
    }

    private static Quantity q(String description, String unit, String call, ToDoubleFunction<Quantity.Context> f) {
        return new Quantity(description, unit, call, f);
    }

    /** The arguments of one quantity. */
    private record Args(String spec, Map<String, String> raw, Map<String, Double> vars) {
        boolean has(String k) {
            return raw.containsKey(k);
        }

        String text(String k) {
            String v = raw.get(k);
            if (v == null) {
                throw new IllegalArgumentException("quantity '" + spec + "': needs " + k + "=");
            }
            return v;
        }

        double num(String k) {
            return Expr.eval(text(k), vars);
        }

        double opt(String k) {
            return has(k) ? num(k) : 0;
        }

        Double maybe(String k) {
            return has(k) ? num(k) : null;
        }
    }
}
