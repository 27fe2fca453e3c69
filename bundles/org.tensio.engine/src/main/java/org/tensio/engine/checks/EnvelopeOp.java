package org.tensio.engine.checks;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * The envelope of a station: over its load cases and every combination it can evaluate ({@link LoadCases#at}),
 * per sample point of its section ({@link UnitStressField}) the largest and smallest σz, τzx, τzy and the
 * largest von Mises and τmax, each with the case that gives it; and per force component the largest and
 * smallest internal force. Every case is the linear combination of the section's unit fields with its forces
 * (combinations through {@link Project#forces}); no field is copied per case.
 * <p>
 * JTS style: {@link #envelope(Project, String, SectionAnalysisService)} or a single-use
 * {@code new EnvelopeOp(project, stationId, engine).envelope()}.
 *
 * @since 0.1
 */
public final class EnvelopeOp {

    private final Project project;
    private final Station station;
    private final FieldCache fields;
    private StationEnvelope result;

    /**
     * @throws IllegalArgumentException naming the station when it is unknown, or when an argument is null
     */
    public EnvelopeOp(Project project, String stationId, SectionAnalysisService engine) {
        if (project == null) {
            throw new IllegalArgumentException("project must not be null");
        }
        this.project = project;
        this.station = project.station(stationId);
        this.fields = new FieldCache(engine);
    }

    /**
     * @return the envelope of station {@code stationId}
     * @throws IllegalArgumentException naming the station when it is unknown or has no load case
     */
    public static StationEnvelope envelope(Project project, String stationId, SectionAnalysisService engine) {
        return new EnvelopeOp(project, stationId, engine).envelope();
    }

    /** @return the envelope, computed on the first call */
    public StationEnvelope envelope() {
        if (result == null) {
            result = compute();
        }
        return result;
    }

    private StationEnvelope compute() {
        List<String> warn = new ArrayList<>();
        List<String> cases = LoadCases.at(project, station, warn);
        if (cases.isEmpty()) {
            throw new IllegalArgumentException("station: station '" + station.id() + "' has no load case to envelope");
        }
        Section section = project.section(station.sectionId());
        UnitStressField f = fields.of(section);
        Set<String> warnings = new LinkedHashSet<>(warn);
        int n = f.size();
        // running extremes and the index of the case giving each: σz, τzx, τzy max/min; von Mises, τmax max
        double[][] hi = new double[3][n], lo = new double[3][n];
        int[][] hiCase = new int[3][n], loCase = new int[3][n];
        double[] vm = new double[n], tm = new double[n];
        int[] vmCase = new int[n], tmCase = new int[n];
        double[][] cur = new double[3][n];
        ForceComponent[] comps = ForceComponent.values();
        double[] fHi = new double[comps.length], fLo = new double[comps.length];
        int[] fHiCase = new int[comps.length], fLoCase = new int[comps.length];
        for (int k = 0; k < cases.size(); k++) {
            InternalForces forces = project.forces(station.id(), cases.get(k));
            if (forces.vx() != 0 || forces.vy() != 0) {
                warnings.addAll(f.warnings()); // the method notes concern the shear from Vx, Vy
            }
            for (int c = 0; c < comps.length; c++) {
                double v = forces.get(comps[c]);
                if (k == 0 || v > fHi[c]) {
                    fHi[c] = v;
                    fHiCase[c] = k;
                }
                if (k == 0 || v < fLo[c]) {
                    fLo[c] = v;
                    fLoCase[c] = k;
                }
            }
            f.evaluate(forces, cur[0], cur[1], cur[2]);
            for (int i = 0; i < n; i++) {
                for (int q = 0; q < 3; q++) {
                    double v = cur[q][i];
                    if (k == 0 || v > hi[q][i]) {
                        hi[q][i] = v;
                        hiCase[q][i] = k;
                    }
                    if (k == 0 || v < lo[q][i]) {
                        lo[q][i] = v;
                        loCase[q][i] = k;
                    }
                }
                double s = cur[0][i], t2 = cur[1][i] * cur[1][i] + cur[2][i] * cur[2][i];
                double v = Math.sqrt(s * s + 3 * t2);
                double t = Math.sqrt(0.25 * s * s + t2);
                if (k == 0 || v > vm[i]) {
                    vm[i] = v;
                    vmCase[i] = k;
                }
                if (k == 0 || t > tm[i]) {
                    tm[i] = t;
                    tmCase[i] = k;
                }
            }
        }
        Map<ForceComponent, Range> fr = new EnumMap<>(ForceComponent.class);
        for (int c = 0; c < comps.length; c++) {
            fr.put(comps[c], new Range(fHi[c], cases.get(fHiCase[c]), fLo[c], cases.get(fLoCase[c])));
        }
        List<PointEnvelope> points = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            Range[] r = new Range[3];
            for (int q = 0; q < 3; q++) {
                r[q] = new Range(hi[q][i], cases.get(hiCase[q][i]), lo[q][i], cases.get(loCase[q][i]));
            }
            points.add(new PointEnvelope(f.point(i), f.part(i), f.material(i), f.singular(i), r[0], r[1], r[2],
                    new Peak(vm[i], cases.get(vmCase[i])), new Peak(tm[i], cases.get(tmCase[i]))));
        }
        return new StationEnvelope(station.id(), section.name(), cases, fr, points, new ArrayList<>(warnings));
    }
}
