package org.tensio.engine.internal;

import java.io.IOException;
import java.nio.file.Path;

import org.osgi.service.component.annotations.Component;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.io.ProjectFormatException;
import org.tensio.engine.io.ProjectReader;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.properties.SectionPropertiesOp;
import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.PointStressOp;

/** The engine service: stateless, thread-safe. */
@Component(service = SectionAnalysisService.class)
public final class SectionAnalysisServiceImpl implements SectionAnalysisService {

    @Override
    public Project readProject(Path file) throws ProjectFormatException, IOException {
        return ProjectReader.read(file);
    }

    @Override
    public Project parseProject(String json, String sourceName) throws ProjectFormatException {
        return ProjectReader.parse(json, sourceName);
    }

    @Override
    public SectionProperties properties(Section section) {
        return SectionPropertiesOp.compute(section);
    }

    @Override
    public PointStress stressAt(Project project, String stationId, String caseId, Point2 point) {
        Station st = project.station(stationId);
        InternalForces f = project.forces(stationId, caseId);
        Section s = project.section(st.sectionId());
        return PointStressOp.evaluate(s, properties(s), f, point, stationId, caseId);
    }
}
