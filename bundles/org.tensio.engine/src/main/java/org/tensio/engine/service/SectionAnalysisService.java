package org.tensio.engine.service;

import java.nio.file.Path;

import org.tensio.engine.geometry.Point2;
import org.tensio.engine.io.ProjectFormatException;
import org.tensio.engine.project.Project;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.stress.PointStress;

/**
 * The engine's entry point for user interfaces and tools, registered as an OSGi DS service and also
 * instantiable outside OSGi ({@link #create()}). Implementations are thread-safe and stateless.
 *
 * @since 0.1
 */
public interface SectionAnalysisService {

    /**
     * Reads and validates a project file.
     *
     * @throws ProjectFormatException naming the JSON path and the value when the file is malformed or invalid
     * @throws java.io.IOException    when the file cannot be read
     */
    Project readProject(Path file) throws ProjectFormatException, java.io.IOException;

    /**
     * Parses and validates a project from JSON text.
     *
     * @param json       the file's content
     * @param sourceName a name for messages (e.g. the file name)
     */
    Project parseProject(String json, String sourceName) throws ProjectFormatException;

    /** @return the exact properties of {@code section} */
    SectionProperties properties(Section section);

    /**
     * The stress state at a point of the section at a station, for a load case or a combination.
     *
     * @param point in the section frame, length unit; boundary points count as inside
     * @throws IllegalArgumentException naming station, case or point when one is unknown or the point lies
     *                                  outside the section
     */
    PointStress stressAt(Project project, String stationId, String caseId, Point2 point);

    /** @return a new instance for use outside OSGi */
    static SectionAnalysisService create() {
        return new org.tensio.engine.internal.SectionAnalysisServiceImpl();
    }
}
