package org.tensio.ui.editor.validation;

import java.time.Duration;
import java.util.List;
import java.util.Optional;
import java.util.function.BiConsumer;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.tensio.engine.io.ProjectFormatException;
import org.tensio.engine.project.Project;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.ui.services.AnalysisServiceTracker;

/**
 * Validates the editor's text with the engine ({@code SectionAnalysisService.parseProject}) off the UI thread,
 * replaces the file's problem markers and hands the result (the project, or null, and the problems) to a
 * callback, which the editor runs on the UI thread.
 */
public final class ValidationJob extends Job {

    /** Job family of the editor's validation jobs. */
    public static final Object FAMILY = ValidationJob.class;
    private static final Duration SERVICE_TIMEOUT = Duration.ofSeconds(30);

    private final String text;
    private final String sourceName;
    private final AnalysisServiceTracker services;
    private final ProblemMarkers markers;
    private final BiConsumer<Project, List<Problem>> done;
    private final java.nio.file.Path file;

    /**
     * @param done called (from the job's thread) with the parsed project (null when invalid) and the problems
     */
    public ValidationJob(String text, String sourceName, AnalysisServiceTracker services, ProblemMarkers markers,
            BiConsumer<Project, List<Problem>> done) {
        this(text, null, sourceName, services, markers, done);
    }

    /**
     * @param file the project file when the text has load tables (their CSV paths are relative to its folder),
     *             else null; the text is parsed with that folder, nothing is written
     */
    public ValidationJob(String text, java.nio.file.Path file, String sourceName, AnalysisServiceTracker services,
            ProblemMarkers markers, BiConsumer<Project, List<Problem>> done) {
        super(Messages.ValidationJob_name);
        this.file = file;
        this.text = text;
        this.sourceName = sourceName;
        this.services = services;
        this.markers = markers;
        this.done = done;
        setSystem(true);
    }

    @Override
    public boolean belongsTo(Object family) {
        return family == FAMILY;
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        Optional<SectionAnalysisService> service;
        try {
            service = services.await(SERVICE_TIMEOUT);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return Status.CANCEL_STATUS;
        }
        if (service.isEmpty()) {
            return Status.error(Messages.ValidationJob_noService);
        }
        Project project = null;
        List<Problem> problems;
        try {
            project = service.get().parseProject(text, sourceName,
                    file == null ? null : file.toAbsolutePath().getParent());
            problems = List.of();
        } catch (ProjectFormatException e) {
            problems = List.of(new Problem(e.path(), e.getMessage()));
        } catch (IllegalArgumentException e) {
            problems = List.of(new Problem("$", e.getMessage())); //$NON-NLS-1$
        }
        if (monitor.isCanceled()) {
            return Status.CANCEL_STATUS;
        }
        try {
            markers.set(problems);
        } catch (CoreException e) {
            ILog.of(getClass()).log(e.getStatus());
        }
        done.accept(project, problems);
        return Status.OK_STATUS;
    }
}
