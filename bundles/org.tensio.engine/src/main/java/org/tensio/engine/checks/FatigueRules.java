package org.tensio.engine.checks;

import java.util.ArrayList;
import java.util.List;

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
import org.tensio.engine.project.Project;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;

/**
 * The fatigue rules of one station, load history and material, resolved once: the load cycle, the corrected
 * endurance limit Se, the notch factors of the station's notches, the criteria. {@link #evaluate} then gives,
 * at any point whose unit stresses are known ({@link UnitStresses}), σa', σm', σmax' and each criterion's demand;
 * {@link #result} turns one criterion at one point into a {@link CheckResult} with its {@link FatigueDetail}.
 * Shared by the check over every sample ({@link FatigueCheckOp}) and the evaluation at one chosen point
 * ({@link FatiguePointOp}), so that both give the same numbers at the same point.
 * <p>
 * The stress parts (see {@link FatigueCheckOp} for the method and its sources): at each phase of the cycle the
 * axial part of σz (from N), the rest of σz (from Mx, My) and the shear (from T, Vx, Vy), multiplied by
 * Kf,axial, Kf and Kfs of the notches that cover the point; the axial alternating part divided by
 * {@link FatigueCheckOp#AXIAL_LOAD_FACTOR} for the fatigue lines only.
 * Stresses in the project's stress unit. Not thread-safe (scratch arrays).
 */
final class FatigueRules {

    /** The unit stresses at one point: σz, τzx, τzy of the point for given internal forces, stress unit. */
    interface UnitStresses {
        double sigmaZ(InternalForces f);

        double tauZX(InternalForces f);

        double tauZY(InternalForces f);
    }

    private final Project project;
    private final FatigueStation station;
    private final Section section;
    private final String historyId;
    private final LoadHistory history;
    private final CycleLoads loads;
    private final FatigueMaterial material;
    private final FatigueConditions conditions;
    private final EnduranceLimit endurance;
    private final double se;
    private final double sut;
    private final double sy;
    private final List<NotchFactors> notches = new ArrayList<>();
    private final List<FatigueCriterion> criteria;
    private final boolean yieldPeak;
    private final boolean yieldSum;
    private final Phase mean;
    private final Phase cos;
    private final Phase sin;
    private final Point2 centroid;
    private final String[] minimumText;
    private final double[] minimumDiameter;
    // scratch
    private final double[] m = new double[3];
    private final double[] c = new double[3];
    private final double[] s = new double[3];
    private final double[] cy = new double[3];
    private final double[] sy3 = new double[3];

    /**
     * @param project   the project (units, forces, fatigue data)
     * @param station   the fatigue station
     * @param section   its section
     * @param props     the section's properties
     * @param historyId the load-history id
     * @param material  the fatigue data of the material checked
     */
    FatigueRules(Project project, FatigueStation station, Section section, SectionProperties props, String historyId,
            FatigueMaterial material) {
        this.project = project;
        this.station = station;
        this.section = section;
        this.historyId = historyId;
        this.history = station.histories().get(historyId);
        this.material = material;
        FatigueData fd = project.fatigue();
        this.loads = history.cycle(k -> project.forces(station.station(), k));
        Factor kb = EquivalentDiameter.sizeFactor(section, props, loads, station.equivalentDiameter(),
                fd.mmPerLengthUnit());
        this.conditions = station.conditions().over(material.conditions());
        this.endurance = EnduranceLimit.of(material, conditions, kb, fd.mpaPerStressUnit());
        this.se = endurance.value();
        this.sut = material.sut();
        this.sy = material.sy() == null ? Double.NaN : material.sy();
        for (Notch n : station.notches()) {
            notches.add(NotchFactors.of(n, sut * fd.mpaPerStressUnit(), fd.mmPerLengthUnit(), material.sensitivity()));
        }
        this.criteria = station.criteria();
        this.yieldPeak = criteria.contains(FatigueCriterion.firstCycleYield);
        this.yieldSum = criteria.contains(FatigueCriterion.langer);
        this.mean = new Phase(loads.mean());
        this.cos = new Phase(loads.cosine());
        this.sin = new Phase(loads.sine());
        this.centroid = props.centroid();
        this.minimumText = new String[criteria.size()];
        this.minimumDiameter = new double[criteria.size()];
    }

    /** @return the criteria, in the station's order */
    List<FatigueCriterion> criteria() {
        return criteria;
    }

    /** @return the material id */
    String material() {
        return material.material();
    }

    /** @return the factors at a point: the largest of each over the covering notches, NONE when none covers it */
    NotchFactors notchAt(double x, double y, boolean onSurface) {
        return FatigueCheckOp.at(notches, x, y, onSurface, centroid);
    }

    /**
     * Evaluates every criterion at one point.
     *
     * @param at     the point's unit stresses
     * @param nf     the notch factors at the point ({@link #notchAt})
     * @param peak   σmax' at the point when already known ({@link #peak}), else NaN (computed when a criterion
     *               needs it)
     * @param a      receives per criterion the alternating stress it uses (σa' with the axial load factor for the
     *               fatigue lines, of the actual stresses for the yield checks)
     * @param sm     receives σm' (the same for every criterion)
     * @param smax   receives σmax' for the first-cycle yield check, NaN for the others
     * @param demand receives each criterion's demand
     */
    void evaluate(UnitStresses at, NotchFactors nf, double peak, double[] a, double[] sm, double[] smax,
            double[] demand) {
        mean.fill(at, nf, 1, m);
        cos.fill(at, nf, FatigueCheckOp.AXIAL_LOAD_FACTOR, c);
        sin.fill(at, nf, FatigueCheckOp.AXIAL_LOAD_FACTOR, s);
        double sa = CycleStress.alternating(c, s), mn = CycleStress.mean(m), saY = sa;
        if (yieldPeak || yieldSum) {
            // the yield checks take the actual stresses: no axial load factor
            cos.fill(at, nf, 1, cy);
            sin.fill(at, nf, 1, sy3);
            saY = CycleStress.alternating(cy, sy3);
            if (yieldPeak && Double.isNaN(peak)) {
                peak = CycleStress.peak(m, cy, sy3)[0];
            }
        }
        for (int j = 0; j < criteria.size(); j++) {
            FatigueCriterion cr = criteria.get(j);
            a[j] = cr.isFatigueLine() ? sa : saY;
            sm[j] = mn;
            smax[j] = cr == FatigueCriterion.firstCycleYield ? peak : Double.NaN;
            demand[j] = cr.demand(a[j], mn, peak, se, sut, sy);
        }
    }

    /** @return the capacity of criterion j (stress unit) */
    double capacity(int j) {
        return criteria.get(j).capacity(se, sy);
    }

    /**
     * The peak of the cycle at a point, of the actual stresses (no axial load factor) with the notch factors: the
     * same for every criterion of this history at the point, so computed once per point.
     *
     * @param at the point's unit stresses
     * @param nf the notch factors at the point ({@link #notchAt})
     * @return {σmax', σ, τzx, τzy at the peak}, stress unit
     */
    double[] peak(UnitStresses at, NotchFactors nf) {
        mean.fill(at, nf, 1, m);
        cos.fill(at, nf, 1, cy);
        sin.fill(at, nf, 1, sy3);
        double[] pk = CycleStress.peak(m, cy, sy3);
        double[] state = CycleStress.state(m, cy, sy3, pk[1]);
        return new double[] {pk[0], state[0], state[1], state[2]};
    }

    /**
     * @param j         the criterion's index
     * @param point     the point, section frame
     * @param onSurface whether the point lies on the section's boundary
     * @param singular  whether it lies near a sharp re-entrant corner
     * @param a         the criterion's alternating stress at the point ({@link #evaluate})
     * @param sm        σm' at the point
     * @param smax      σmax' from {@link #evaluate}, or NaN (then the peak of the actual stresses is reported)
     * @param demand    the criterion's demand at the point
     * @param peak      {@link #peak} at the point
     * @return the result: utilisation demand / capacity, the stress state at the cycle's peak, the fatigue detail
     */
    CheckResult result(int j, Point2 point, boolean onSurface, boolean singular, double a, double sm, double smax,
            double demand, double[] peak) {
        FatigueCriterion cr = criteria.get(j);
        NotchFactors nf = notchAt(point.x(), point.y(), onSurface);
        double peakValue = Double.isNaN(smax) ? peak[0] : smax;
        double capacity = capacity(j);
        if (minimumText[j] == null) {
            double[] d = {Double.NaN};
            minimumText[j] = minimum(cr, d);
            minimumDiameter[j] = d[0];
        }
        FatigueDetail detail = new FatigueDetail(historyId, history.describe(), cr, criteria, a, sm, peakValue,
                capacity / demand, endurance, sut, sy, nf, notchText(nf, point.x(), point.y(), onSurface),
                minimumDiameter[j], minimumText[j]);
        return new CheckResult(station.station(), historyId, cr.name(), material.material(), demand / capacity, demand,
                capacity, point, peak[1], peak[2], peak[3], singular, detail);
    }

    /** The forces of one phase split into N only and the rest. */
    private static final class Phase {
        final InternalForces axial;
        final InternalForces rest;
        final boolean zero;

        Phase(InternalForces p) {
            axial = new InternalForces(p.n(), 0, 0, 0, 0, 0);
            rest = new InternalForces(0, p.vx(), p.vy(), p.mx(), p.my(), p.t());
            zero = p.n() == 0 && p.vx() == 0 && p.vy() == 0 && p.mx() == 0 && p.my() == 0 && p.t() == 0;
        }

        /** {σ, τzx, τzy} at the point, Kf-amplified, the axial part divided by {@code axialFactor}. */
        void fill(UnitStresses at, NotchFactors nf, double axialFactor, double[] out) {
            if (zero) {
                out[0] = out[1] = out[2] = 0;
                return;
            }
            out[0] = nf.kf() * at.sigmaZ(rest) + nf.kfAxial() * at.sigmaZ(axial) / axialFactor;
            out[1] = nf.kfs() * at.tauZX(rest);
            out[2] = nf.kfs() * at.tauZY(rest);
        }
    }

    private String notchText(NotchFactors nf, double x, double y, boolean onSurface) {
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
    private String minimum(FatigueCriterion cr, double[] d) {
        if (station.requiredFactor() == null || !cr.isFatigueLine()) {
            return "";
        }
        double[] round = EquivalentDiameter.roundRadii(section);
        if (round == null || round[1] > 0) {
            return "minimum diameter: only for a solid round shaft";
        }
        if (cr.needsYield() && material.sy() == null) {
            return "minimum diameter: needs fy";
        }
        FatigueData fd = project.fatigue();
        double mpa = fd.mpaPerStressUnit(), mm = fd.mmPerLengthUnit(), d0 = 2 * round[0];
        double ma = loads.bendingAmplitude(), mmean = loads.meanBending();
        double ta = loads.torqueAmplitude(), tm = Math.abs(loads.mean().t());
        if (ma == 0 && mmean == 0 && ta == 0 && tm == 0) {
            return "minimum diameter: no bending moment or torque";
        }
        java.util.function.DoubleUnaryOperator seAt = dd -> EnduranceLimit.of(material, conditions,
                station.equivalentDiameter() != null ? MarinFactors.size(station.equivalentDiameter() * mm, "given")
                        : MarinFactors.size(dd * mm, "iterated"),
                mpa).value();
        java.util.function.DoubleUnaryOperator kf = dd -> worst(dd / d0, false);
        java.util.function.DoubleUnaryOperator kfs = dd -> worst(dd / d0, true);
        try {
            MinimumDiameter.Result r = MinimumDiameter.solve(cr, station.requiredFactor(), ma, mmean, ta, tm, sut, sy,
                    seAt, kf, kfs, d0);
            d[0] = r.diameter();
            return "minimum diameter for n = " + fmt(station.requiredFactor()) + " by DE-" + cr.label() + ": "
                    + fmt(r.diameter()) + " " + project.units().length() + " (Se = " + fmt(r.se()) + " "
                    + project.units().stressUnit() + ", Kf = " + fmt(r.kf()) + ", Kfs = " + fmt(r.kfs())
                    + " at that diameter, notch radii scaled with it; " + r.iterations()
                    + " iterations; Shigley's Mechanical Engineering Design, 9th/10th ed., sec. 7-4, from memory)"
                    + (loads.axialAmplitude() != 0 || loads.mean().n() != 0
                            ? "; the axial force is not part of this closed form" : "");
        } catch (RuntimeException e) {
            return "minimum diameter: " + e.getMessage();
        }
    }

    /** The largest Kf (or Kfs) of the station's notches with their radii scaled by {@code scale}. */
    private double worst(double scale, boolean torsion) {
        double w = 1;
        FatigueData fd = project.fatigue();
        for (Notch n : station.notches()) {
            Notch scaled = new Notch(n.type(), n.kt(), n.kts(), n.ktAxial(), n.radius() == null ? null : n.radius() * scale,
                    n.q(), n.qs(), n.kf(), n.kfs(), n.kfAxial(), n.location());
            NotchFactors nf = NotchFactors.of(scaled, sut * fd.mpaPerStressUnit(), fd.mmPerLengthUnit(),
                    material.sensitivity());
            w = Math.max(w, torsion ? nf.kfs() : nf.kf());
        }
        return w;
    }

    private static String fmt(double v) {
        return String.format(java.util.Locale.ROOT, "%.4g", v);
    }
}
