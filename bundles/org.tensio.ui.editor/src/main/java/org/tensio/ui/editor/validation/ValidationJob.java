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
     *             else null
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

    /**
     * The service parses text without a folder, where load tables cannot be found; a project with load tables is
     * checked from a transient copy beside the file (deleted at once), messages naming the file itself.
     */
    private Project readBesideFile(SectionAnalysisService service) throws ProjectFormatException, java.io.IOException {
        java.nio.file.Path copy = java.nio.file.Files.createTempFile(file.toAbsolutePath().getParent(),
                "." + file.getFileName(), ".check.json"); //$NON-NLS-1$ //$NON-NLS-2$
        try {
            java.nio.file.Files.writeString(copy, text, java.nio.charset.StandardCharsets.UTF_8);
            return service.readProject(copy);
        } catch (ProjectFormatException e) {
            String prefix = e.path() + ": "; //$NON-NLS-1$
            String message = e.getMessage().startsWith(prefix) ? e.getMessage().substring(prefix.length())
                    : e.getMessage();
            throw new ProjectFormatException(e.path(),
                    message.replace(copy.getFileName().toString(), file.getFileName().toString()));
        } finally {
            java.nio.file.Files.deleteIfExists(copy);
        }
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
            project = file == null ? service.get().parseProject(text, sourceName) : readBesideFile(service.get());
            problems = List.of();
        } catch (ProjectFormatException e) {
            problems = List.of(new Problem(e.path(), e.getMessage()));
        } catch (java.io.IOException e) {
            problems = List.of(new Problem("$", e.getMessage())); //$NON-NLS-1$
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
