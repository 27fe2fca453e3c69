package org.tensio.ui;

import java.nio.file.Path;
import java.util.Optional;

import org.eclipse.core.runtime.ILog;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.application.IWorkbenchConfigurer;
import org.eclipse.ui.application.IWorkbenchWindowConfigurer;
import org.eclipse.ui.application.WorkbenchAdvisor;
import org.eclipse.ui.application.WorkbenchWindowAdvisor;
import org.tensio.ui.views.SectionsView;

/** Workbench advisor: Tensio perspective first, and the start-up project file (if any) opened after start-up. */
final class TensioWorkbenchAdvisor extends WorkbenchAdvisor {

    private final Optional<Path> startupProject;

    TensioWorkbenchAdvisor(Optional<Path> startupProject) {
        this.startupProject = startupProject;
    }

    @Override
    public void initialize(IWorkbenchConfigurer configurer) {
        super.initialize(configurer);
        configurer.setSaveAndRestore(false);
    }

    @Override
    public String getInitialWindowPerspectiveId() {
        return Perspective.ID;
    }

    @Override
    public WorkbenchWindowAdvisor createWorkbenchWindowAdvisor(IWorkbenchWindowConfigurer configurer) {
        return new TensioWindowAdvisor(configurer);
    }

    @Override
    public void postStartup() {
        IWorkbenchWindow window = getWorkbenchConfigurer().getWorkbench().getActiveWorkbenchWindow();
        if (window == null || startupProject.isEmpty()) {
            return;
        }
        try {
            SectionsView.showIn(window.getActivePage(), startupProject.get());
        } catch (PartInitException e) {
            ILog.of(getClass()).error("Cannot open the Sections view for " + startupProject.get(), e); //$NON-NLS-1$
        }
    }
}
