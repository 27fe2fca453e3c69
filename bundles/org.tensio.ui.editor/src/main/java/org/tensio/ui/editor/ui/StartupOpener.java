package org.tensio.ui.editor.ui;

import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.Platform;
import org.eclipse.ui.IStartup;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.PlatformUI;

/**
 * Opens the start-up project file ({@code -tensio.project <path>} or the system property {@code tensio.project},
 * as {@code ./tensio workbench} passes it) in the project editor once the workbench is up.
 */
public final class StartupOpener implements IStartup {

    private static final String OPTION = "-tensio.project"; //$NON-NLS-1$
    private static final String PROPERTY = "tensio.project"; //$NON-NLS-1$

    @Override
    public void earlyStartup() {
        Path file = projectFile(Platform.getApplicationArgs(), System.getProperty(PROPERTY));
        if (file == null || !Files.isRegularFile(file)) {
            return;
        }
        IWorkbench workbench = PlatformUI.getWorkbench();
        workbench.getDisplay().asyncExec(() -> {
            IWorkbenchWindow window = workbench.getActiveWorkbenchWindow();
            if (window == null && workbench.getWorkbenchWindowCount() > 0) {
                window = workbench.getWorkbenchWindows()[0];
            }
            if (window == null || window.getActivePage() == null) {
                return;
            }
            try {
                ProjectEditors.open(window.getActivePage(), file);
            } catch (PartInitException e) {
                ILog.of(StartupOpener.class).error("Cannot open " + file + " in the project editor", e); //$NON-NLS-1$ //$NON-NLS-2$
            }
        });
    }

    static Path projectFile(String[] args, String property) {
        if (args != null) {
            for (int i = 0; i < args.length - 1; i++) {
                if (OPTION.equals(args[i]) && !args[i + 1].isBlank()) {
                    return Path.of(args[i + 1]).toAbsolutePath().normalize();
                }
            }
        }
        return property == null || property.isBlank() ? null : Path.of(property).toAbsolutePath().normalize();
    }
}
