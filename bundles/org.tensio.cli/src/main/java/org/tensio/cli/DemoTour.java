package org.tensio.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.tensio.engine.geometry.Chords;
import org.tensio.engine.geometry.HalfPlane;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * Chooses the demo's stress points: for every station, the first combination (or the first case), at the top
 * fibre of the vertical line through the centroid and at the centroid itself when it is material.
 */
final class DemoTour {

    private DemoTour() {
    }

    static Path defaultDemoFile() {
        String home = System.getProperty("tensio.home", ".");
        return Path.of(home, "docs", "examples", "demo.tensio.json");
    }

    static List<String[]> stops(Path demo) throws Exception {
        SectionAnalysisService engine = SectionAnalysisService.create();
        Project project = engine.readProject(demo);
        List<String[]> out = new ArrayList<>();
        for (Station st : project.stations().values()) {
            String caseId = !project.combinations().isEmpty() ? project.combinations().keySet().iterator().next()
                    : st.cases().keySet().iterator().next();
            Section s = project.section(st.sectionId());
            SectionProperties p = engine.properties(s);
            double xc = p.centroid().x();
            double top = Double.NEGATIVE_INFINITY;
            boolean centroidInside = false;
            for (SectionPart part : s.parts()) {
                for (double[] iv : Chords.intervals(part.region(), HalfPlane.leftOf(xc))) {
                    top = Math.max(top, iv[1]);
                    centroidInside |= iv[0] <= p.centroid().y() && p.centroid().y() <= iv[1];
                }
            }
            try {
                project.forces(st.id(), caseId);
            } catch (IllegalArgumentException e) {
                caseId = st.cases().keySet().iterator().next();
            }
            if (top > Double.NEGATIVE_INFINITY) {
                out.add(new String[] {st.id(), caseId, Text.num(xc) + "," + Text.num(top)});
            }
            if (centroidInside) {
                out.add(new String[] {st.id(), caseId, Text.num(xc) + "," + Text.num(p.centroid().y())});
            }
        }
        return out;
    }
}
