package org.tensio.engine.checks;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.profile.ProfileDef;
import org.tensio.engine.project.Combination;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.section.Criterion;
import org.tensio.engine.section.Material;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.units.UnitSystem;

/** Sections, materials and small projects for the check tests (invented scenarios; mm, N, MPa). */
final class CheckFixtures {

    /**
     * A composite of a steel flat (with fatigue data) and a plastic strip on top (without), alternating bending:
     * the fatigue tests' section with a material that is not checked for fatigue.
     */
    static final String FATIGUE_COMPOSITE = """
            {"tensio": 1, "materials": {"st": {"E": 210000, "nu": 0.3, "fy": 355, "fu": 510},
                                        "pl": {"E": 3000, "nu": 0.4, "fy": 40, "fu": 60}},
             "sections": {"c": {"parts": [
               {"material": "st", "profile": {"type": "RectangleProfile", "xDim": 40, "yDim": 10}},
               {"material": "pl", "profile": {"type": "RectangleProfile", "xDim": 40, "yDim": 6}, "offset": [0, 8]}]}},
             "stations": {"A": {"section": "c", "forces": {"run": {"Mx": 1e5}}}},
             "fatigue": {"materials": {"st": {"estimate": "steel", "surface": "machined"}},
               "stations": {"A": {"histories": {"h": {"alternating": {"Mx": 1e5}}}, "criteria": ["fatigueGoodman"]}}}}
            """;


    /** One engine for all tests: its cache keeps each section's solution. */
    static final SectionAnalysisService ENGINE = SectionAnalysisService.create();

    static final Material STEEL = new Material("steel", 210000, 0.3, 355.0);
    static final Material ALU = new Material("alu", 70000, 0.33, 160.0);
    static final Material NU0 = new Material("nu0", 200000, 0.0, 300.0);

    private CheckFixtures() {
    }

    static Section single(String name, ProfileDef p, Material m) {
        return new Section(name, List.of(SectionPart.of(p, 0, 0, m)));
    }

    /** von Mises on fy with γ = 1. */
    static MaterialLimits vonMises(Material m) {
        return new MaterialLimits(m.name(), List.of(Criterion.vonMises), 1.0, m.fy(), null, null, null, null);
    }

    static InternalForces f(double n, double vx, double vy, double mx, double my, double t) {
        return new InternalForces(n, vx, vy, mx, my, t);
    }

    /** Builds a project piece by piece. */
    static final class ProjectBuilder {
        final Map<String, Material> materials = new LinkedHashMap<>();
        final Map<String, Section> sections = new LinkedHashMap<>();
        final Map<String, Station> stations = new LinkedHashMap<>();
        final Map<String, Combination> combinations = new LinkedHashMap<>();
        final Map<String, MaterialLimits> limits = new LinkedHashMap<>();

        ProjectBuilder section(Section s) {
            sections.put(s.name(), s);
            for (SectionPart p : s.parts()) {
                materials.put(p.material().name(), p.material());
            }
            return this;
        }

        ProjectBuilder limits(MaterialLimits l) {
            limits.put(l.material(), l);
            return this;
        }

        /** @param casesAndForces alternating case id (String) and {@link InternalForces} */
        ProjectBuilder station(String id, String section, Object... casesAndForces) {
            Map<String, InternalForces> cases = new LinkedHashMap<>();
            for (int i = 0; i < casesAndForces.length; i += 2) {
                cases.put((String) casesAndForces[i], (InternalForces) casesAndForces[i + 1]);
            }
            stations.put(id, new Station(id, section, cases));
            return this;
        }

        /** @param casesAndFactors alternating case id and factor */
        ProjectBuilder combination(String id, Object... casesAndFactors) {
            Map<String, Double> factors = new LinkedHashMap<>();
            for (int i = 0; i < casesAndFactors.length; i += 2) {
                factors.put((String) casesAndFactors[i], ((Number) casesAndFactors[i + 1]).doubleValue());
            }
            combinations.put(id, new Combination(id, factors));
            return this;
        }

        Project build() {
            return new Project(UnitSystem.MM_N, materials, sections, stations, combinations, limits);
        }
    }

    static List<CheckResult> select(CheckReport r, String station, String caseId) {
        List<CheckResult> out = new ArrayList<>();
        for (CheckResult c : r.results()) {
            if (c.station().equals(station) && c.caseId().equals(caseId)) {
                out.add(c);
            }
        }
        return out;
    }
}
