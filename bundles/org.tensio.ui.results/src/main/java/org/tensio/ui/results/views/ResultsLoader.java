package org.tensio.ui.results.views;

import java.io.IOException;
import java.nio.file.Path;
import java.util.LinkedHashSet;
import java.util.Set;

import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.OperationCanceledException;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.osgi.util.NLS;
import org.tensio.engine.checks.CheckOp;
import org.tensio.engine.checks.CheckReport;
import org.tensio.engine.io.ProjectFormatException;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.ui.results.model.ProjectCache;
import org.tensio.ui.results.model.ResultsTree;
import org.tensio.ui.results.model.ResultsTreeBuilder;

/**
 * Reads a project file and runs the engine's checks ({@link CheckOp#check}) on it. Never throws for a bad file:
 * every failure becomes a tree with a message, and is logged. No SWT; runs in a background job.
 * <p>
 * Progress: reading, one step per section (its finite-element solution, which the engine caches and the checks
 * then reuse), the checks. Cancellation is honoured between steps (one section's solve is not interruptible).
 */
final class ResultsLoader {

    private final SectionAnalysisService service;

    ResultsLoader(SectionAnalysisService service) {
        this.service = service;
    }

    /**
     * @throws OperationCanceledException when {@code monitor} is cancelled
     */
    ResultsTree load(Path file, IProgressMonitor monitor) {
        String name = String.valueOf(file.getFileName());
        SubMonitor sub = SubMonitor.convert(monitor, NLS.bind(Messages.ResultsView_job, name), 100);
        try {
            sub.subTask(NLS.bind(Messages.ResultsLoader_reading, name));
            Project project = ProjectCache.read(service, file);
            sub.worked(5);
            Set<Section> sections = new LinkedHashSet<>();
            for (Station st : project.stations().values()) {
                sections.add(project.section(st.sectionId()));
            }
            SubMonitor solve = sub.split(75).setWorkRemaining(Math.max(1, sections.size()));
            for (Section s : sections) {
                solve.subTask(NLS.bind(Messages.ResultsLoader_solving, s.name()));
                service.solution(s);
                solve.split(1);
            }
            sub.setWorkRemaining(20);
            sub.subTask(Messages.ResultsLoader_checking);
            CheckReport report = CheckOp.check(project, service);
            sub.split(20);
            String message = report.results().isEmpty() ? NLS.bind(Messages.ResultsView_nothingChecked, name)
                    : NLS.bind(report.passed() ? Messages.ResultsView_passed : Messages.ResultsView_failedChecks,
                            new Object[] { name, report.results().size(), report.failedCount(),
                                    org.tensio.ui.results.model.ResultsText.number(report.maxUtilisation()) });
            return ResultsTreeBuilder.build(file, name, project, report, message);
        } catch (ProjectFormatException e) {
            return fail(file, NLS.bind(Messages.ResultsView_badFile, name, e.getMessage()), e);
        } catch (IOException e) {
            return fail(file, NLS.bind(Messages.ResultsView_unreadable, file, e.getMessage()), e);
        } catch (OperationCanceledException e) {
            throw e;
        } catch (RuntimeException e) {
            return fail(file, NLS.bind(Messages.ResultsView_engineFailed, name, e.getMessage()), e);
        }
    }

    private ResultsTree fail(Path file, String message, Exception cause) {
        ILog.of(getClass()).warn(message, cause);
        return ResultsTree.failed(file, message);
    }
}
