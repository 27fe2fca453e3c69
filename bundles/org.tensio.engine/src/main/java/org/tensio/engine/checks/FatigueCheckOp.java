package org.tensio.engine.checks;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.tensio.engine.fatigue.CycleLoads;
import org.tensio.engine.fatigue.CycleStress;
import org.tensio.engine.fatigue.EnduranceLimit;
import org.tensio.engine.fatigue.EquivalentDiameter;
import org.tensio.engine.fatigue.Factor;
import org.tensio.engine.fatigue.FatigueConditions;
import org.tensio.engine.fatigue.FatigueCriterion;
import org.tensio.engine.fatigue.FatigueData;
import org.tensio.engine.fatigue.FatigueDetail;
import org.tensio.engine.fatigue.FatigueMaterial;
import org.tensio.engine.fatigue.FatigueStation;
import org.tensio.engine.fatigue.LoadHistory;
import org.tensio.engine.fatigue.MarinFactors;
import org.tensio.engine.fatigue.MinimumDiameter;
import org.tensio.engine.fatigue.Notch;
import org.tensio.engine.fatigue.NotchFactors;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.mesh.Mesh;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * Fatigue checks of a project ({@link Project#fatigue()}): for every fatigue station, load history, material of
 * the station's section with fatigue data, and criterion, the governing sample point — the largest
 * utilisation = 1/n among the {@link UnitStressField} samples of that material — gives one {@link CheckResult}
 * with its {@link FatigueDetail}.
 * <p>
 * At each sample the load cycle ({@link LoadHistory#cycle}) gives the mean, cosine and sine parts of the stress
 * from the unit fields, split into the axial part (from N) and the bending part (from Mx, My) of σz and the
 * shear (from T, Vx, Vy): non-round sections therefore use the finite-element torsion and shear fields like the
 * static checks. Each part is multiplied by the fatigue factor of the notches that cover the sample (Kf for
 * bending, Kf,axial for N, Kfs for shear; the largest of each when several notches cover it; 1 where none does).
 * The axial alternating stress is divided by 0.85 for the fatigue criteria (kc = 1 otherwise; Shigley's
 * Mechanical Engineering Design, 9th/10th ed., sec. 6-14, from memory), not for the yield checks (their σa' is
 * that of the actual stresses). Then
 * σa', σm' and σmax' by {@link CycleStress} and the criterion's demand and capacity by
 * {@link FatigueCriterion}. Se per material by {@link EnduranceLimit} with the size factor of
 * {@link EquivalentDiameter}. A tie keeps the first sample in node order.
 * <p>
 * For a station with a required factor of safety whose section is a solid round bar, each fatigue line's result
 * also carries the minimum diameter ({@link MinimumDiameter#solve}, bending moment and torque amplitudes and
 * means of the cycle, the largest notch factors of the station, the notch radius scaled with the diameter).
 * <p>
 * Single use; {@link #results} computes. Not thread-safe.
 *
 * @since 0.1
 */
public final class FatigueCheckOp {

    /** Axial loading's load factor in the combined-loading method (Shigley sec. 6-14). */
    static final double AXIAL_LOAD_FACTOR = 0.85;

    private final Project project;
    private final SectionAnalysisService engine;
    private final FieldCache fields;

    /**
     * @param project the project
     * @param engine  the engine (properties, finite-element solutions)
     */
    public FatigueCheckOp(Project project, SectionAnalysisService engine) {
        this(project, engine, new FieldCache(engine));
    }

    FatigueCheckOp(Project project, SectionAnalysisService engine, FieldCache fields) {
        if (project == null || engine == null) {
            throw new IllegalArgumentException("project and engine must not be null");
        }
        this.project = project;
        this.engine = engine;
        this.fields = fields;
    }

    /**
     * @param warnings receives notes (materials without fatigue data), may be null
     * @return the fatigue results in project order: stations in file order, histories in file order, materials in
     *         part order, criteria as listed
     */
    public List<CheckResult> results(List<String> warnings) {
        List<CheckResult> out = new ArrayList<>();
        FatigueData fd = project.fatigue();
        for (FatigueStation fs : fd.stations().values()) {
            Station st = project.station(fs.station());
            Section section = project.section(st.sectionId());
            SectionProperties props = engine.properties(section);
            Mesh mesh = engine.solution(section).mesh();
            UnitStressField f = fields.of(section);
            boolean[] surface = surfaceSamples(f, mesh);
            List<String> mats = new ArrayList<>();
            section.parts().forEach(p -> {
                if (!mats.contains(p.material().name())) {
                    mats.add(p.material().name());
                }
            });
            for (Map.Entry<String, LoadHistory> h : fs.histories().entrySet()) {
                CycleLoads loads = h.getValue().cycle(c -> project.forces(st.id(), c));
                Factor kb = EquivalentDiameter.sizeFactor(section, props, loads, fs.equivalentDiameter(),
                        fd.mmPerLengthUnit());
                for (String m : mats) {
                    FatigueMaterial fm = fd.materials().get(m);
                    if (fm == null) {
                        if (warnings != null) {
                            warnings.add("station '" + st.id() + "': material '" + m + "' has no fatigue data: its"
                                    + " points are not checked for fatigue");
                        }
                        continue;
                    }
                    evaluate(fs, st, section, props, f, surface, h.getKey(), h.getValue(), loads, kb, fm, out);
                }
            }
        }
        return out;
    }

    private void evaluate(FatigueStation fs, Station st, Section section, SectionProperties props, UnitStressField f,
            boolean[] surface, String historyId, LoadHistory history, CycleLoads loads, Factor kb, FatigueMaterial fm,
            List<CheckResult> out) {
        FatigueData fd = project.fatigue();
        double mpa = fd.mpaPerStressUnit();
        FatigueConditions cond = fs.conditions().over(fm.conditions());
        EnduranceLimit endurance = EnduranceLimit.of(fm, cond, kb, mpa);
        double se = endurance.value(), sut = fm.sut(), sy = fm.sy() == null ? Double.NaN : fm.sy();
        List<NotchFactors> notches = new ArrayList<>();
        for (Notch n : fs.notches()) {
            notches.add(NotchFactors.of(n, sut * mpa, fd.mmPerLengthUnit(), fm.sensitivity()));
        }
        List<FatigueCriterion> crit = fs.criteria();
        boolean yieldPeak = crit.contains(FatigueCriterion.firstCycleYield);
        boolean yieldSum = crit.contains(FatigueCriterion.langer);
        Phase mean = new Phase(loads.mean()), cos = new Phase(loads.cosine()), sin = new Phase(loads.sine());
        int k = crit.size();
        int[] best = new int[k];
        double[] bestU = new double[k], bestD = new double[k];
        double[][] bestS = new double[k][];
        java.util.Arrays.fill(best, -1);
        java.util.Arrays.fill(bestU, Double.NEGATIVE_INFINITY);
        Point2 centroid = props.centroid();
        double[] m = new double[3], c = new double[3], s = new double[3], cy = new double[3], sy3 = new double[3];
        for (int i = 0; i < f.size(); i++) {
            if (!f.material(i).equals(fm.material())) {
                continue;
            }
            NotchFactors nf = at(notches, f.x(i), f.y(i), surface[i], centroid);
            mean.fill(f, i, nf, 1, m);
            cos.fill(f, i, nf, AXIAL_LOAD_FACTOR, c);
            sin.fill(f, i, nf, AXIAL_LOAD_FACTOR, s);
            double sa = CycleStress.alternating(c, s), sm = CycleStress.mean(m), smax = Double.NaN, saY = sa;
            if (yieldPeak || yieldSum) {
                // the yield checks take the actual stresses: no axial load factor
                cos.fill(f, i, nf, 1, cy);
                sin.fill(f, i, nf, 1, sy3);
                saY = CycleStress.alternating(cy, sy3);
                if (yieldPeak) {
                    smax = CycleStress.peak(m, cy, sy3)[0];
                }
            }
            for (int j = 0; j < k; j++) {
                FatigueCriterion cr = crit.get(j);
                double a = cr.isFatigueLine() ? sa : saY;
                double d = cr.demand(a, sm, smax, se, sut, sy);
                double u = d / cr.capacity(se, sy);
                if (u > bestU[j]) {
                    bestU[j] = u;
                    bestD[j] = d;
                    best[j] = i;
                    bestS[j] = new double[] {a, sm, smax};
                }
            }
        }
        for (int j = 0; j < k; j++) {
            int i = best[j];
            if (i < 0) {
                continue;
            }
            FatigueCriterion cr = crit.get(j);
            NotchFactors nf = at(notches, f.x(i), f.y(i), surface[i], centroid);
            mean.fill(f, i, nf, 1, m);
            cos.fill(f, i, nf, 1, cy);
            sin.fill(f, i, nf, 1, sy3);
            double[] pk = CycleStress.peak(m, cy, sy3);
            double[] state = CycleStress.state(m, cy, sy3, pk[1]);
            double smax = Double.isNaN(bestS[j][2]) ? pk[0] : bestS[j][2];
            double capacity = cr.capacity(se, sy);
            double[] minimum = {Double.NaN};
            String minimumText = minimum(fs, section, loads, fm, cond, cr, minimum);
            FatigueDetail detail = new FatigueDetail(historyId, history.describe(), cr, crit, bestS[j][0], bestS[j][1],
                    smax, capacity / bestD[j], endurance, sut, sy, nf, notchText(nf, notches, f.x(i), f.y(i),
                            surface[i], centroid), minimum[0], minimumText);
            out.add(new CheckResult(st.id(), historyId, cr.name(), fm.material(), bestD[j] / capacity, bestD[j], capacity,
                    f.point(i), state[0], state[1], state[2], f.singular(i), detail));
        }
    }

    /** The forces of one phase split into N only and the rest. */
    private static final class Phase {
        final InternalForces axial;
        final InternalForces rest;
        final boolean zero;

        Phase(InternalForces p) {
            axial = new InternalForces(p.n(), 0, 0, 0, 0, 0);
            rest = new InternalForces(0, p.vx(), p.vy(), p.mx(), p.my(), p.t());
            zero = p.equals(InternalForces.ZERO) || (p.n() == 0 && p.vx() == 0 && p.vy() == 0 && p.mx() == 0
                    && p.my() == 0 && p.t() == 0);
        }

        /** {σ, τzx, τzy} at sample i, Kf-amplified, the axial part divided by {@code axialFactor}. */
        void fill(UnitStressField f, int i, NotchFactors nf, double axialFactor, double[] out) {
            if (zero) {
                out[0] = out[1] = out[2] = 0;
                return;
            }
            out[0] = nf.kf() * f.sigmaZ(i, rest) + nf.kfAxial() * f.sigmaZ(i, axial) / axialFactor;
            out[1] = nf.kfs() * f.tauZX(i, rest);
            out[2] = nf.kfs() * f.tauZY(i, rest);
        }
    }

    /** @return the factors at a sample: the largest of each over the covering notches, NONE when none covers it */
    static NotchFactors at(List<NotchFactors> notches, double x, double y, boolean onSurface, Point2 centroid) {
        NotchFactors acc = null;
        for (NotchFactors n : notches) {
            if (!n.notch().location().covers(x, y, onSurface, centroid)) {
                continue;
            }
            if (acc == null) {
                acc = n;
            } else {
                acc = new NotchFactors(null, Math.max(acc.kt(), n.kt()), Math.max(acc.ktAxial(), n.ktAxial()),
                        Math.max(acc.kts(), n.kts()), Math.max(acc.q(), n.q()), Math.max(acc.qs(), n.qs()),
                        Math.max(acc.kf(), n.kf()), Math.max(acc.kfAxial(), n.kfAxial()), Math.max(acc.kfs(), n.kfs()),
                        acc.ktSource() + " | " + n.ktSource(), acc.qSource() + " | " + n.qSource());
            }
        }
        return acc == null ? NotchFactors.NONE : acc;
    }

    private static String notchText(NotchFactors nf, List<NotchFactors> notches, double x, double y, boolean onSurface,
            Point2 centroid) {
        StringBuilder sb = new StringBuilder();
        for (NotchFactors n : notches) {
            if (n.notch().location().covers(x, y, onSurface, centroid)) {
                sb.append(sb.length() == 0 ? "" : " and ").append(n.notch().type().description()).append(" (")
                        .append(n.notch().location().describe()).append(')');
            }
        }
        if (sb.length() == 0) {
            return "no notch acts at this point (Kf = Kfs = 1)";
        }
        return sb + (nf.notch() == null ? ": the largest factor of each kind" : "");
    }

    /** @return the text of the minimum-diameter result; stores the diameter in {@code d[0]} when found */
    private String minimum(FatigueStation fs, Section section, CycleLoads loads, FatigueMaterial fm,
            FatigueConditions cond, FatigueCriterion cr, double[] d) {
        if (fs.requiredFactor() == null || !cr.isFatigueLine()) {
            return "";
        }
        double[] round = EquivalentDiameter.roundRadii(section);
        if (round == null || round[1] > 0) {
            return "minimum diameter: only for a solid round shaft";
        }
        if (cr.needsYield() && fm.sy() == null) {
            return "minimum diameter: needs fy";
        }
        FatigueData fd = project.fatigue();
        double mpa = fd.mpaPerStressUnit(), mm = fd.mmPerLengthUnit(), d0 = 2 * round[0];
        double ma = loads.bendingAmplitude(), mmean = loads.meanBending();
        double ta = loads.torqueAmplitude(), tm = Math.abs(loads.mean().t());
        if (ma == 0 && mmean == 0 && ta == 0 && tm == 0) {
            return "minimum diameter: no bending moment or torque";
        }
        java.util.function.DoubleUnaryOperator se = dd -> EnduranceLimit.of(fm, cond, fs.equivalentDiameter() != null
                ? MarinFactors.size(fs.equivalentDiameter() * mm, "given") : MarinFactors.size(dd * mm, "iterated"),
                mpa).value();
        java.util.function.DoubleUnaryOperator kf = dd -> worst(fs, fm, dd / d0, false);
        java.util.function.DoubleUnaryOperator kfs = dd -> worst(fs, fm, dd / d0, true);
        double sy = fm.sy() == null ? Double.NaN : fm.sy();
        try {
            MinimumDiameter.Result r = MinimumDiameter.solve(cr, fs.requiredFactor(), ma, mmean, ta, tm, fm.sut(), sy, se,
                    kf, kfs, d0);
            d[0] = r.diameter();
            return "minimum diameter for n = " + fmt(fs.requiredFactor()) + " by DE-" + cr.label() + ": " + fmt(r.diameter()) + " "
                    + project.units().length() + " (Se = " + fmt(r.se()) + " " + project.units().stressUnit() + ", Kf = " + fmt(r.kf()) + ", Kfs = " + fmt(r.kfs()) + " at that diameter, notch radii"
                    + " scaled with it; " + r.iterations() + " iterations; Shigley's Mechanical Engineering Design,"
                    + " 9th/10th ed., sec. 7-4, from memory)" + (loads.axialAmplitude() != 0 || loads.mean().n() != 0
                            ? "; the axial force is not part of this closed form" : "");
        } catch (RuntimeException e) {
            return "minimum diameter: " + e.getMessage();
        }
    }

    /** The largest Kf (or Kfs) of the station's notches with their radii scaled by {@code scale}. */
    private double worst(FatigueStation fs, FatigueMaterial fm, double scale, boolean torsion) {
        double w = 1;
        FatigueData fd = project.fatigue();
        for (Notch n : fs.notches()) {
            Notch scaled = new Notch(n.type(), n.kt(), n.kts(), n.ktAxial(), n.radius() == null ? null : n.radius() * scale,
                    n.q(), n.qs(), n.kf(), n.kfs(), n.kfAxial(), n.location());
            NotchFactors nf = NotchFactors.of(scaled, fm.sut() * fd.mpaPerStressUnit(), fd.mmPerLengthUnit(),
                    fm.sensitivity());
            w = Math.max(w, torsion ? nf.kfs() : nf.kf());
        }
        return w;
    }

    private static String fmt(double v) {
        return String.format(java.util.Locale.ROOT, "%.4g", v);
    }

    /** @return per sample: true when its mesh node lies on the boundary (an edge used by one element only) */
    static boolean[] surfaceSamples(UnitStressField f, Mesh mesh) {
        int nn = mesh.nodeCount();
        int[] uses = new int[nn];
        for (int e = 0; e < mesh.elementCount(); e++) {
            for (int k = 3; k < 6; k++) {
                uses[mesh.node(e, k)]++;
            }
        }
        boolean[] boundary = new boolean[nn];
        for (int e = 0; e < mesh.elementCount(); e++) {
            for (int k = 3; k < 6; k++) {
                int mid = mesh.node(e, k);
                if (uses[mid] == 1) {
                    boundary[mid] = true;
                    boundary[mesh.node(e, k - 3)] = true;
                    boundary[mesh.node(e, (k - 2) % 3)] = true;
                }
            }
        }
        boolean[] out = new boolean[f.size()];
        for (int i = 0; i < f.size(); i++) {
            out[i] = boundary[f.node(i)];
        }
        return out;
    }
}
