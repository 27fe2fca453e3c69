package org.tensio.ui.editor.ui;

import java.nio.file.Path;

import org.eclipse.core.filesystem.EFS;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.ide.FileStoreEditorInput;

/** Opens project files from the file system in the project editor. */
public final class ProjectEditors {

    private ProjectEditors() {
    }

    /** Opens (or activates) the project editor on {@code file}. */
    public static ProjectEditor open(IWorkbenchPage page, Path file) throws PartInitException {
        Path absolute = file.toAbsolutePath().normalize();
        IEditorPart part = page.openEditor(new FileStoreEditorInput(EFS.getLocalFileSystem().getStore(absolute.toUri())),
                ProjectEditor.ID, true);
        if (part instanceof ProjectEditor editor) {
            return editor;
        }
        throw new PartInitException("editor for " + absolute + " is not a Tensio project editor"); //$NON-NLS-1$ //$NON-NLS-2$
    }
}
