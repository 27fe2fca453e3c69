package org.tensio.ui.views;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.runtime.ILog;
import org.eclipse.osgi.util.NLS;
import org.tensio.engine.io.ProjectFormatException;
import org.tensio.engine.project.Project;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * Reads a project file through the engine service and turns it into a {@link SectionsInput}. Never throws for a
 * bad file: every failure becomes an input with a message, and is logged. No SWT; safe off the UI thread.
 */
final class SectionsLoader {

    private final SectionAnalysisService service;

    SectionsLoader(SectionAnalysisService service) {
        this.service = service;
    }

    SectionsInput load(Path file) {
        String name = String.valueOf(file.getFileName());
        try {
            Project project = service.readProject(file);
            List<SectionProperties> rows = new ArrayList<>();
            for (Section section : project.sections().values()) {
                rows.add(service.properties(section));
            }
            String message = rows.isEmpty() ? NLS.bind(Messages.SectionsView_noSections, name)
                    : NLS.bind(Messages.SectionsView_loaded, new Object[] { name, rows.size(),
                            project.units().length(), project.units().force() });
            return SectionsInput.loaded(file, rows, message);
        } catch (ProjectFormatException e) {
            return fail(file, NLS.bind(Messages.SectionsView_badFile, name, e.getMessage()), e);
        } catch (IOException e) {
            return fail(file, NLS.bind(Messages.SectionsView_unreadable, file, e.getMessage()), e);
        } catch (RuntimeException e) {
            return fail(file, NLS.bind(Messages.SectionsView_engineFailed, name, e.getMessage()), e);
        }
    }

    private SectionsInput fail(Path file, String message, Exception cause) {
        ILog.of(getClass()).warn(message, cause);
        return SectionsInput.failed(file, message);
    }
}
