package org.tensio.ui;

import java.nio.file.Path;
import java.util.Optional;

import org.eclipse.equinox.app.IApplication;
import org.eclipse.equinox.app.IApplicationContext;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.PlatformUI;

/**
 * The Tensio RCP application ({@code org.tensio.ui.application}): creates the display and runs the workbench.
 * A project file given by {@code -tensio.project <path>} (or the system property {@code tensio.project}) is
 * opened in the Sections view once the workbench is up.
 */
public final class Application implements IApplication {

    @Override
    public Object start(IApplicationContext context) {
        String[] args = (String[]) context.getArguments().get(IApplicationContext.APPLICATION_ARGS);
        Optional<Path> project = StartupOptions.projectFile(args, System.getProperty(StartupOptions.PROJECT_PROPERTY));
        Display display = PlatformUI.createDisplay();
        try {
            int code = PlatformUI.createAndRunWorkbench(display, new TensioWorkbenchAdvisor(project));
            return code == PlatformUI.RETURN_RESTART ? IApplication.EXIT_RESTART : IApplication.EXIT_OK;
        } finally {
            display.dispose();
        }
    }

    @Override
    public void stop() {
        if (!PlatformUI.isWorkbenchRunning()) {
            return;
        }
        IWorkbench workbench = PlatformUI.getWorkbench();
        Display display = workbench.getDisplay();
        display.syncExec(() -> {
            if (!display.isDisposed()) {
                workbench.close();
            }
        });
    }
}
