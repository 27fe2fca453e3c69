package org.tensio.ui.editor.ui;

import java.io.IOException;
import java.nio.file.Path;

import org.eclipse.core.resources.IResource;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.ILog;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.osgi.util.NLS;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Shell;
import org.tensio.engine.io.AtomicFiles;
import org.tensio.ui.editor.validation.ProblemMarkers;

/**
 * How the editor writes its file: through the engine's {@link AtomicFiles} (a complete file or the old one,
 * never a torn one), a failure reported in a dialog and the error log, then the workspace's copy refreshed when
 * the file is in the workspace; and the file dialog of Save As. Stateless.
 */
final class ProjectFiles {

    private ProjectFiles() {
    }

    /**
     * Writes {@code text} (UTF-8) to {@code target} atomically.
     *
     * @return false when it failed (the user was told; the file is unchanged)
     */
    static boolean write(Shell shell, Path target, String text) {
        try {
            AtomicFiles.writeString(target, text);
            return true;
        } catch (IOException e) {
            ILog.of(ProjectFiles.class).error("Cannot save " + target, e); //$NON-NLS-1$
            MessageDialog.openError(shell, Messages.ProjectEditor_saveFailedTitle,
                    NLS.bind(Messages.ProjectEditor_saveFailed, target, e.getMessage()));
            return false;
        }
    }

    /** Tells the workspace that {@code target} changed, when it is a workspace file (no effect otherwise). */
    static void refreshWorkspace(Path target) {
        IResource r = new ProblemMarkers(target).resource();
        if (r.getType() == IResource.FILE) {
            try {
                r.refreshLocal(IResource.DEPTH_ZERO, null);
            } catch (CoreException e) {
                ILog.of(ProjectFiles.class).log(e.getStatus());
            }
        }
    }

    /** @return the file chosen in a Save As dialog that starts at {@code current}, or null when cancelled */
    static Path askSaveAs(Shell shell, Path current) {
        FileDialog dialog = new FileDialog(shell, SWT.SAVE);
        dialog.setFilterExtensions(new String[] { "*.tensio.json", "*.json" }); //$NON-NLS-1$ //$NON-NLS-2$
        dialog.setFilterPath(current.getParent().toString());
        dialog.setFileName(current.getFileName().toString());
        dialog.setOverwrite(true);
        String chosen = dialog.open();
        return chosen == null ? null : Path.of(chosen);
    }
}
