package org.tensio.engine.checks;

import java.util.ArrayList;
import java.util.List;

import org.tensio.engine.fatigue.FatigueMaterial;
import org.tensio.engine.fatigue.FatigueStation;
import org.tensio.engine.fatigue.NotchFactors;
import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.mesh.Mesh;
import org.tensio.engine.project.Project;
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
 * {@link #sampleUtilisation} gives the utilisation of one station and history at every sample instead of the
 * governing one (for contours): the same sample loop, so its largest value is the governing result's utilisation.
 * <p>
 * {@link #results} and {@link #sampleUtilisation} compute on every call (the unit stress fields of the default mesh
 * are kept between calls). Not thread-safe.
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
     * The fatigue utilisation at every sample of a station's unit stress field for one load history: what
     * {@link #results} evaluates before it keeps the governing sample of each criterion.
     *
     * @param station     the station id (one with a fatigue check)
     * @param history     the load-history id
     * @param field       the unit stress field whose samples (mesh nodes, see {@link UnitStressField}) were
     *                    evaluated; sample i of {@code field} is entry i of {@link #utilisation()}
     * @param utilisation per sample: the largest utilisation = demand / capacity = 1/n over the station's fatigue
     *                    criteria ({@link org.tensio.engine.fatigue.FatigueCriterion}), dimensionless, with the
     *                    notch factors of the notches that cover the sample applied (surface notches at the mesh's
     *                    boundary nodes, located notches within their distance); NaN at a sample of a material
     *                    without fatigue data (not checked for fatigue)
     * @param notes       why samples are not evaluated (materials without fatigue data), empty when all are
     * @since 0.1
     */
    public record SampleUtilisation(String station, String history, UnitStressField field, double[] utilisation,
            List<String> notes) {

        /**
         * Copies the array and the notes (null: none).
         *
         * @throws IllegalArgumentException when the field is null or the array has not one entry per sample
         */
        public SampleUtilisation {
            if (field == null || utilisation == null || utilisation.length != field.size()) {
                throw new IllegalArgumentException("utilisation: one value per sample of the field needed, got "
                        + (utilisation == null ? null : utilisation.length) + " for "
                        + (field == null ? null : field.size()) + " samples");
            }
            utilisation = utilisation.clone();
            notes = notes == null ? List.of() : List.copyOf(notes);
        }

        /** @return a copy of the per-sample utilisations (dimensionless, NaN where not evaluated) */
        @Override
        public double[] utilisation() {
            return utilisation.clone();
        }

        /** @return the utilisation at sample {@code i} of {@link #field()}, dimensionless, NaN where not evaluated */
        public double at(int i) {
            return utilisation[i];
        }

        /**
         * @return the largest utilisation over the evaluated samples (equal to the largest utilisation of this
         *         station and history among {@link FatigueCheckOp#results} when the field is the default mesh's),
         *         NaN when no sample is evaluated
         */
        public double max() {
            double m = Double.NaN;
            for (double u : utilisation) {
                if (u > m || Double.isNaN(m) && !Double.isNaN(u)) {
                    m = u;
                }
            }
            return m;
        }
    }

    /**
     * @param warnings receives notes (materials without fatigue data), may be null
     * @return the fatigue results in project order: stations in file order, histories in file order, materials in
     *         part order, criteria as listed
     */
    public List<CheckResult> results(List<String> warnings) {
        List<CheckResult> out = new ArrayList<>();
        for (FatigueStation fs : project.fatigue().stations().values()) {
            Section section = project.section(project.station(fs.station()).sectionId());
            SectionProperties props = engine.properties(section);
            UnitStressField f = fields.of(section);
            boolean[] surface = surfaceSamples(f, engine.solution(section).mesh());
            for (String historyId : fs.histories().keySet()) {
                for (FatigueRules rules : rules(fs, section, props, historyId, warnings)) {
                    governing(rules, f, surface, out);
                }
            }
        }
        return out;
    }

    /**
     * The fatigue utilisation at every sample of the station's section on the default mesh (the samples
     * {@link #results} evaluates, so that the largest equals the governing utilisation of that station and history).
     *
     * @param stationId a station with a fatigue check ({@link Project#fatigue()})
     * @param historyId one of its load histories
     * @return the per-sample utilisations, dimensionless
     * @throws IllegalArgumentException naming the station or history when the station is unknown, has no fatigue
     *                                  check, or has no such history
     * @since 0.1
     */
    public SampleUtilisation sampleUtilisation(String stationId, String historyId) {
        return sampleUtilisation(stationId, historyId, null);
    }

    /**
     * As {@link #sampleUtilisation(String, String)} on the nodes of a given finite-element solution of the
     * station's section (e.g. a mesh denser or coarser than the default; its nodes are the samples and its boundary
     * nodes the surface). On another mesh than the default the values are those of that mesh, not the check's.
     *
     * @param fe the section's solution ({@code SectionAnalysisService.solution(section, options, monitor)}), or
     *           null for the default mesh's
     * @since 0.1
     */
    public SampleUtilisation sampleUtilisation(String stationId, String historyId, FiniteElementSolution fe) {
        FatigueStation fs = project.fatigue().station(stationId);
        if (fs == null) {
            throw new IllegalArgumentException("stationId: station '" + stationId + "' has no fatigue check (have "
                    + project.fatigue().stations().keySet() + ")");
        }
        if (!fs.histories().containsKey(historyId)) {
            throw new IllegalArgumentException("historyId: station '" + stationId + "' has no load history '"
                    + historyId + "' (have " + fs.histories().keySet() + ")");
        }
        Section section = project.section(project.station(stationId).sectionId());
        SectionProperties props = engine.properties(section);
        UnitStressField f = fe == null ? fields.of(section) : UnitStressField.of(section, props, fe);
        boolean[] surface = surfaceSamples(f, (fe == null ? engine.solution(section) : fe).mesh());
        double[] u = new double[f.size()];
        java.util.Arrays.fill(u, Double.NaN);
        List<String> notes = new ArrayList<>();
        for (FatigueRules rules : rules(fs, section, props, historyId, notes)) {
            sweep(rules, f, surface, (i, uj, a, sm, smax, d) -> {
                double m = Double.NEGATIVE_INFINITY;
                for (double v : uj) {
                    if (v > m) {
                        m = v;
                    }
                }
                u[i] = m == Double.NEGATIVE_INFINITY ? Double.NaN : m;
            });
        }
        return new SampleUtilisation(stationId, historyId, f, u, notes);
    }

    /**
     * @return the rules of each material of {@code section} (part order) with fatigue data; a note per material
     *         without to {@code warnings} (may be null)
     */
    private List<FatigueRules> rules(FatigueStation fs, Section section, SectionProperties props, String historyId,
            List<String> warnings) {
        List<String> mats = new ArrayList<>();
        section.parts().forEach(p -> {
            if (!mats.contains(p.material().name())) {
                mats.add(p.material().name());
            }
        });
        List<FatigueRules> out = new ArrayList<>();
        for (String m : mats) {
            FatigueMaterial fm = project.fatigue().materials().get(m);
            if (fm == null) {
                if (warnings != null) {
                    warnings.add("station '" + fs.station() + "': material '" + m + "' has no fatigue data: its"
                            + " points are not checked for fatigue");
                }
                continue;
            }
            out.add(new FatigueRules(project, fs, section, props, historyId, fm));
        }
        return out;
    }

    /** Receives the evaluation of every criterion at one sample (arrays indexed by criterion, reused). */
    @FunctionalInterface
    private interface SampleSink {
        /**
         * @param i    the sample
         * @param u    utilisation = demand / capacity per criterion
         * @param a    the alternating stress each criterion uses
         * @param sm   σm'
         * @param smax σmax' (first-cycle yield) or NaN
         * @param d    the demand per criterion
         */
        void accept(int i, double[] u, double[] a, double[] sm, double[] smax, double[] d);
    }

    /** Evaluates {@code rules} at every sample of its material, in node order, handing each to {@code sink}. */
    private static void sweep(FatigueRules rules, UnitStressField f, boolean[] surface, SampleSink sink) {
        int k = rules.criteria().size();
        double[] a = new double[k], sm = new double[k], smax = new double[k], d = new double[k], cap = new double[k],
                u = new double[k];
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
                u[j] = d[j] / cap[j];
            }
            sink.accept(i, u, a, sm, smax, d);
        }
    }

    /** The governing sample of each criterion of {@code rules} among the samples of its material. */
    private static void governing(FatigueRules rules, UnitStressField f, boolean[] surface, List<CheckResult> out) {
        int k = rules.criteria().size();
        int[] best = new int[k];
        double[] bestU = new double[k], bestA = new double[k], bestM = new double[k], bestMax = new double[k],
                bestD = new double[k];
        java.util.Arrays.fill(best, -1);
        java.util.Arrays.fill(bestU, Double.NEGATIVE_INFINITY);
        sweep(rules, f, surface, (i, u, a, sm, smax, d) -> {
            for (int j = 0; j < k; j++) {
                if (u[j] > bestU[j]) {
                    bestU[j] = u[j];
                    best[j] = i;
                    bestA[j] = a[j];
                    bestM[j] = sm[j];
                    bestMax[j] = smax[j];
                    bestD[j] = d[j];
                }
            }
        });
        Sample at = new Sample(f);
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

    /** @return per sample: true when its mesh node lies on the boundary ({@link Mesh#boundaryEdges()}) */
    static boolean[] surfaceSamples(UnitStressField f, Mesh mesh) {
        boolean[] boundary = new boolean[mesh.nodeCount()];
        for (int node : mesh.boundaryEdges()) {
            boundary[node] = true;
        }
        boolean[] out = new boolean[f.size()];
        for (int i = 0; i < f.size(); i++) {
            out[i] = boundary[f.node(i)];
        }
        return out;
    }
}
