package org.tensio.engine.service;

import java.nio.file.Path;

import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.linalg.ProgressMonitor;
import org.tensio.engine.mesh.MeshOptions;
import org.tensio.engine.io.ProjectFormatException;
import org.tensio.engine.project.Project;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.spi.Extensions;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.ShearMethod;

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

    /**
     * Parses a project from its JSON text, reading its load tables ({@code loadTables}) from {@code baseDir} (the
     * folder their file names are relative to, normally the project file's folder), e.g. for an editor that
     * validates unsaved text of a file.
     *
     * @param baseDir the folder of the load tables; null: a project with load tables is rejected
     * @since 0.1
     */
    Project parseProject(String json, String sourceName, Path baseDir) throws ProjectFormatException;

    /**
     * @return the exact properties of {@code section}; J, shear centre and Cw from the closed forms for circles
     *         and tubes, from the finite-element solution on the default mesh for every other section ({@code null}
     *         with {@code torsionSource} {@code "finiteElementFailed"} if that solution failed)
     */
    SectionProperties properties(Section section);

    /**
     * The finite-element torsion and shear solution of {@code section} on the default mesh, computed once per
     * section instance and kept in a small cache.
     */
    FiniteElementSolution solution(Section section);

    /**
     * The finite-element solution on a mesh of the given options (not cached).
     *
     * @param monitor progress and cancellation, may be null
     * @throws java.util.concurrent.CancellationException when the monitor cancels
     */
    FiniteElementSolution solution(Section section, MeshOptions options, ProgressMonitor monitor);

    /**
     * The stress state at a point of the section at a station, for a load case or a combination.
     *
     * @param point in the section frame, length unit; boundary points count as inside
     * @throws IllegalArgumentException naming station, case or point when one is unknown or the point lies
     *                                  outside the section
     */
    PointStress stressAt(Project project, String stationId, String caseId, Point2 point);

    /**
     * As {@link #stressAt(Project, String, String, Point2)} with the shear stresses from Vx, Vy by the given
     * method (the finite-element shear functions are the default; torsion always uses the finite-element
     * warping function for non-circular sections).
     */
    PointStress stressAt(Project project, String stationId, String caseId, Point2 point, ShearMethod shearMethod);

    /**
     * The contributed criteria and profile types this engine accepts besides the built-in ones; the project
     * reader and the checks use them.
     *
     * @return the extensions (none by default)
     * @since 0.1
     */
    default Extensions extensions() {
        return Extensions.none();
    }

    /** @return a new instance for use outside OSGi, without contributions */
    static SectionAnalysisService create() {
        return new org.tensio.engine.internal.SectionAnalysisServiceImpl();
    }

    /**
     * @param extensions contributions found outside OSGi, e.g. by {@link Extensions#discover(ClassLoader)}
     * @return a new instance for use outside OSGi that reads and checks with {@code extensions}
     * @since 0.1
     */
    static SectionAnalysisService create(Extensions extensions) {
        return new org.tensio.engine.internal.SectionAnalysisServiceImpl(extensions);
    }
}
