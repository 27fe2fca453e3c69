package org.tensio.engine.checks;

import java.util.ArrayList;
import java.util.List;

import org.tensio.engine.fatigue.FatigueData;
import org.tensio.engine.fatigue.FatigueMaterial;
import org.tensio.engine.fatigue.FatigueStation;
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
            for (String historyId : fs.histories().keySet()) {
                for (String m : mats) {
                    FatigueMaterial fm = fd.materials().get(m);
                    if (fm == null) {
                        if (warnings != null) {
                            warnings.add("station '" + st.id() + "': material '" + m + "' has no fatigue data: its"
                                    + " points are not checked for fatigue");
                        }
                        continue;
                    }
                    evaluate(new FatigueRules(project, fs, section, props, historyId, fm), f, surface, out);
                }
            }
        }
        return out;
    }

    /** The governing sample of each criterion of {@code rules} among the samples of its material. */
    private static void evaluate(FatigueRules rules, UnitStressField f, boolean[] surface, List<CheckResult> out) {
        int k = rules.criteria().size();
        int[] best = new int[k];
        double[] bestU = new double[k], bestA = new double[k], bestM = new double[k], bestMax = new double[k],
                bestD = new double[k];
        java.util.Arrays.fill(best, -1);
        java.util.Arrays.fill(bestU, Double.NEGATIVE_INFINITY);
        double[] a = new double[k], sm = new double[k], smax = new double[k], d = new double[k], cap = new double[k];
        for (int j = 0; j < k; j++) {
            cap[j] = rules.capacity(j);
        }
        Sample at = new Sample(f);
        for (int i = 0; i < f.size(); i++) {
            if (!f.material(i).equals(rules.material())) {
                continue;
            }
            at.i = i;
            rules.evaluate(at, rules.notchAt(f.x(i), f.y(i), surface[i]), Double.NaN, a, sm, smax, d);
            for (int j = 0; j < k; j++) {
                double u = d[j] / cap[j];
                if (u > bestU[j]) {
                    bestU[j] = u;
                    best[j] = i;
                    bestA[j] = a[j];
                    bestM[j] = sm[j];
                    bestMax[j] = smax[j];
                    bestD[j] = d[j];
                }
            }
        }
        for (int j = 0; j < k; j++) {
            int i = best[j];
            if (i < 0) {
                continue;
            }
            at.i = i;
            double[] peak = rules.peak(at, rules.notchAt(f.x(i), f.y(i), surface[i]));
            out.add(rules.result(j, f.point(i), surface[i], f.singular(i), bestA[j], bestM[j], bestMax[j], bestD[j],
                    peak));
        }
    }

    /** The unit stresses of one sample of a {@link UnitStressField}. */
    private static final class Sample implements FatigueRules.UnitStresses {
        final UnitStressField f;
        int i;

        Sample(UnitStressField f) {
            this.f = f;
        }

        @Override
        public double sigmaZ(InternalForces forces) {
            return f.sigmaZ(i, forces);
        }

        @Override
        public double tauZX(InternalForces forces) {
            return f.tauZX(i, forces);
        }

        @Override
        public double tauZY(InternalForces forces) {
            return f.tauZY(i, forces);
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
