package org.tensio.ui.editor.ui;

import java.nio.file.Path;
import java.util.List;
import java.util.function.BiConsumer;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.ILog;
import org.eclipse.swt.widgets.Display;
import org.tensio.engine.project.Project;
import org.tensio.ui.editor.model.ProjectModel;
import org.tensio.ui.editor.validation.Problem;
import org.tensio.ui.editor.validation.ProblemMarkers;
import org.tensio.ui.editor.validation.ValidationJob;
import org.tensio.ui.services.AnalysisServiceTracker;

/**
 * The editor's validation by the engine: each request schedules a {@link ValidationJob} after
 * {@value #DELAY_MS} ms, cancelling the one before (a burst of edits is validated once); the job replaces the
 * file's problem markers, and its result, unless a later request superseded it, becomes {@link #project()} and
 * {@link #problems()} and is handed to a listener on the UI thread. Owns the file's {@link ProblemMarkers}:
 * they follow the file on Save As and are removed on {@link #dispose()}.
 */
final class EditorValidation {

    /** Delay before a validation starts, in milliseconds. */
    static final long DELAY_MS = 100;

    private final AnalysisServiceTracker services;
    private final Display display;
    private final BiConsumer<Project, List<Problem>> validated;
    private ProblemMarkers markers;
    private ValidationJob job;
    private int requests;
    private Project project;
    private List<Problem> problems = List.of();

    /**
     * @param file      the edited file (absolute)
     * @param services  the engine
     * @param display   the display whose UI thread gets the results
     * @param validated called on the UI thread with each current result: the project (null when invalid) and
     *                  the problems
     */
    EditorValidation(Path file, AnalysisServiceTracker services, Display display,
            BiConsumer<Project, List<Problem>> validated) {
        this.services = services;
        this.display = display;
        this.validated = validated;
        this.markers = new ProblemMarkers(file);
    }

    /** Validates the model's text (its load tables relative to {@code file}'s folder) in the background. */
    void request(ProjectModel model, Path file) {
        if (job != null) {
            job.cancel();
        }
        requests++;
        int request = requests;
        job = new ValidationJob(model.toText(), model.toJson().has("loadTables") ? file : null, //$NON-NLS-1$
                file.getFileName().toString(), services, markers,
                (p, found) -> display.asyncExec(() -> arrived(request, p, found)));
        job.schedule(DELAY_MS);
    }

    private void arrived(int request, Project p, List<Problem> found) {
        if (request != requests) {
            return;
        }
        project = p;
        problems = found;
        validated.accept(p, found);
    }

    /** The file is not JSON: that is the only problem until the next validation (no markers are set). */
    void unreadable(String why) {
        problems = List.of(new Problem("$", why)); //$NON-NLS-1$
    }

    /** The editor now edits {@code file} (Save As): the old file's markers are removed. */
    void moveTo(Path file) {
        clearMarkers();
        markers = new ProblemMarkers(file);
    }

    /** Cancels a pending validation and removes the file's markers. */
    void dispose() {
        if (job != null) {
            job.cancel();
        }
        clearMarkers();
    }

    private void clearMarkers() {
        try {
            markers.clear();
        } catch (CoreException e) {
            ILog.of(getClass()).log(e.getStatus());
        }
    }

    /** @return the project as the engine last validated it, or null when invalid or not yet validated */
    Project project() {
        return project;
    }

    /** @return the problems of the last validation */
    List<Problem> problems() {
        return problems;
    }
}
