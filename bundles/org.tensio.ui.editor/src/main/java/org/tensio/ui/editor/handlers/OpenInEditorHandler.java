package org.tensio.ui.editor.handlers;

import java.nio.file.Path;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tensio.ui.editor.ui.ProjectEditors;

/** Opens a project file chosen in a file dialog in the project editor. */
public final class OpenInEditorHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        FileDialog dialog = new FileDialog(HandlerUtil.getActiveShellChecked(event), SWT.OPEN);
        dialog.setText(Messages.OpenFile_title);
        dialog.setFilterExtensions(new String[] { "*.tensio.json", "*.json", "*" }); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
        String chosen = dialog.open();
        if (chosen != null) {
            try {
                ProjectEditors.open(HandlerUtil.getActiveWorkbenchWindowChecked(event).getActivePage(), Path.of(chosen));
            } catch (PartInitException e) {
                throw new ExecutionException(e.getMessage(), e);
            }
        }
        return null;
    }
}
