package org.tensio.engine.checks;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.stress.PointStressOp;

/**
 * Static strength checks of a whole project: for every station, every load case and every combination
 * ({@link LoadCases#at}), every material of the station's section that has {@link Project#limits() limits}
 * and every criterion of that material, the governing sample point — the one with the largest
 * demand / capacity among the samples of that material ({@link UnitStressField}: every mesh node) — gives one
 * {@link CheckResult}. Demands are {@link MaterialLimits#demand}, capacities {@link MaterialLimits#capacity};
 * utilisation = demand / capacity, exactly that quotient. A tie keeps the first sample in node order.
 * <p>
 * Results come in project order: stations in file order; within a station its load cases then the
 * combinations; within a case the section's materials in part order; within a material its criteria as
 * listed. A section with several materials therefore gives one result per material and criterion: each
 * material is checked against its own allowables.
 * <p>
 * Fatigue checks ({@link Project#fatigue()}, {@link FatigueCheckOp}) follow the static ones, as extra results
 * whose criterion is a {@link org.tensio.engine.fatigue.FatigueCriterion} name and whose case is the load-history
 * id; {@code passed} and {@code maxUtilisation} cover them too.
 * <p>
 * Warnings: a material without limits (not checked), a combination a station cannot evaluate (skipped), a
 * composite section's elementary shear, governing points at sharp re-entrant corners (mesh-dependent shear).
 * <p>
 * JTS style: {@link #check(Project, SectionAnalysisService)} for the common use, or a single-use
 * {@code new CheckOp(project, engine).report()}; the report is computed on the first call and kept.
 * Accuracy is that of the fields: σz exact; shear from the finite-element solution on the default mesh (see
 * the README's accuracy notes), sampled at the nodes only.
 *
 * @since 0.1
 */
public final class CheckOp {

    private final Project project;
    private final SectionAnalysisService engine;
    private final FieldCache fields;
    private CheckReport report;

    /**
     * @param project the project (limits from {@link Project#limits()})
     * @param engine  the engine providing properties and the finite-element solution of each section
     * @throws IllegalArgumentException when an argument is null
     */
    public CheckOp(Project project, SectionAnalysisService engine) {
        if (project == null) {
            throw new IllegalArgumentException("project must not be null");
        }
        this.project = project;
        this.engine = engine;
        this.fields = new FieldCache(engine);
    }

    /** @return the checks of {@code project} (see the class comment) */
    public static CheckReport check(Project project, SectionAnalysisService engine) {
        return new CheckOp(project, engine).report();
    }

    /** @return the report, computed on the first call */
    public CheckReport report() {
        if (report == null) {
            report = compute();
        }
        return report;
    }

    private CheckReport compute() {
        List<CheckResult> results = new ArrayList<>();
        Set<String> warnings = new LinkedHashSet<>();
        List<String> caseWarnings = new ArrayList<>();
        for (Station st : project.stations().values()) {
            Section section = project.section(st.sectionId());
            List<String> mats = new ArrayList<>();
            for (SectionPart p : section.parts()) {
                String m = p.material().name();
                if (!mats.contains(m)) {
                    mats.add(m);
                }
            }
            Map<String, MaterialLimits> checked = new LinkedHashMap<>();
            for (String m : mats) {
                MaterialLimits l = project.limits().get(m);
                if (l == null) {
                    warnings.add("material '" + m + "' has no limits (fy or allowables): not checked");
                } else {
                    checked.put(m, l);
                }
            }
            caseWarnings.clear();
            List<String> cases = LoadCases.at(project, st, caseWarnings);
            warnings.addAll(caseWarnings);
            if (checked.isEmpty() || cases.isEmpty()) {
                continue;
            }
            UnitStressField f = fields.of(section);
            int n = f.size();
            int[] mat = new int[n];
            List<String> keys = new ArrayList<>(checked.keySet());
            for (int i = 0; i < n; i++) {
                mat[i] = keys.indexOf(f.material(i));
            }
            double[] s = new double[n], tx = new double[n], ty = new double[n];
            List<List<MaterialCriteria.Rule>> byMaterial = new ArrayList<>();
            for (String m : keys) {
                byMaterial.add(MaterialCriteria.of(checked.get(m), engine.extensions()));
            }
            Set<String> singularAt = new LinkedHashSet<>();
            int singularCount = 0;
            for (String caseId : cases) {
                InternalForces forces = project.forces(st.id(), caseId);
                f.evaluate(forces, s, tx, ty);
                boolean shear = forces.t() != 0 || forces.vx() != 0 || forces.vy() != 0;
                if (forces.vx() != 0 || forces.vy() != 0) {
                    warnings.addAll(f.warnings()); // the method notes concern the shear from Vx, Vy
                }
                for (int k = 0; k < keys.size(); k++) {
                    for (MaterialCriteria.Rule rule : byMaterial.get(k)) {
                        MaterialCriteria.Demand demand = rule.demand();
                        double capacity = rule.capacity();
                        int best = -1;
                        double bestD = Double.NEGATIVE_INFINITY;
                        for (int i = 0; i < n; i++) {
                            if (mat[i] != k) {
                                continue;
                            }
                            double d = demand.at(s[i], tx[i], ty[i]);
                            if (!Double.isFinite(d / capacity)) {
                                throw new IllegalArgumentException("station '" + st.id() + "', case '" + caseId
                                        + "': the " + rule.name() + " utilisation of material '" + keys.get(k)
                                        + "' at (" + f.x(i) + ", " + f.y(i) + ") is not a finite number (demand " + d
                                        + ", capacity " + capacity + "): forces, dimensions, moduli and strengths are "
                                        + "too far apart in magnitude for double arithmetic; check their values and units");
                            }
                            if (d > bestD) {
                                bestD = d;
                                best = i;
                            }
                        }
                        if (best < 0) {
                            continue; // material listed but no mesh node carries it: cannot happen for a meshed part
                        }
                        if (!Double.isFinite(bestD) || bestD < 0) {
                            throw new IllegalStateException("criterion " + rule.name() + " gave the demand " + bestD
                                    + " at (" + f.x(best) + ", " + f.y(best) + "), station '" + st.id() + "', case '"
                                    + caseId + "'; a demand must be finite and >= 0");
                        }
                        results.add(new CheckResult(st.id(), caseId, rule.name(), keys.get(k), bestD / capacity,
                                bestD, capacity, f.point(best), s[best], tx[best], ty[best], f.singular(best)));
                        if (f.singular(best) && shear) {
                            singularCount++;
                            singularAt.add(String.format(Locale.ROOT, "(%.6g, %.6g)", f.x(best), f.y(best)));
                        }
                    }
                }
            }
            if (singularCount > 0) {
                warnings.add(String.format(Locale.ROOT, "station '%s': %d governing point(s) lie within %.3g of a sharp"
                        + " re-entrant corner, at %s: the elastic shear stress there is singular and grows with mesh"
                        + " refinement; model the fillet instead of trusting those utilisations", st.id(), singularCount,
                        PointStressOp.SINGULAR_RADIUS * section.bounds().diagonal(), String.join(", ", singularAt)));
            }
        }
        if (!project.fatigue().isEmpty()) {
            List<String> fatigueWarnings = new ArrayList<>();
            results.addAll(new FatigueCheckOp(project, engine, fields).results(fatigueWarnings));
            warnings.addAll(fatigueWarnings);
        }
        double max = 0;
        boolean passed = true;
        for (CheckResult r : results) {
            max = Math.max(max, r.utilisation());
            passed &= r.passed();
        }
        return new CheckReport(passed, max, results, new ArrayList<>(warnings));
    }
}
