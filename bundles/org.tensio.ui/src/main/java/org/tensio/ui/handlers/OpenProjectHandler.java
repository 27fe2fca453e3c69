package org.tensio.ui.handlers;

import java.nio.file.Path;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tensio.ui.views.SectionsView;

/** {@code org.tensio.ui.commands.openProject}: choose a project file and show it in the Sections view. */
public final class OpenProjectHandler extends AbstractHandler {

    private static final String[] FILTER_EXTENSIONS = { "*.tensio.json", "*.json", "*" }; //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        IWorkbenchWindow window = HandlerUtil.getActiveWorkbenchWindowChecked(event);
        FileDialog dialog = new FileDialog(window.getShell(), SWT.OPEN);
        dialog.setText(Messages.OpenProjectHandler_title);
        dialog.setFilterExtensions(FILTER_EXTENSIONS);
        dialog.setFilterNames(new String[] { Messages.OpenProjectHandler_filterProjects,
                Messages.OpenProjectHandler_filterJson, Messages.OpenProjectHandler_filterAll });
        String chosen = dialog.open();
        if (chosen == null) {
            return null;
        }
        try {
            SectionsView.showIn(window.getActivePage(), Path.of(chosen));
        } catch (PartInitException e) {
            throw new ExecutionException(Messages.OpenProjectHandler_noView, e);
        }
        return null;
    }
}
