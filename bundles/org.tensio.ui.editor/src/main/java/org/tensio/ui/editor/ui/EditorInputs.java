package org.tensio.ui.editor.ui;

import java.net.URI;
import java.nio.file.Path;

import org.eclipse.core.runtime.IPath;
import org.eclipse.ui.IEditorInput;
import org.eclipse.ui.IPathEditorInput;
import org.eclipse.ui.IURIEditorInput;

/** The project file behind an editor input: workspace files, file-store inputs and path inputs. */
final class EditorInputs {

    private EditorInputs() {
    }

    /** @return the absolute, normalised path of the input's file, or null when it has none */
    static Path path(IEditorInput input) {
        if (input instanceof IPathEditorInput p) {
            IPath path = p.getPath();
            if (path != null) {
                return Path.of(path.toOSString()).toAbsolutePath().normalize();
            }
        }
        if (input instanceof IURIEditorInput u) {
            URI uri = u.getURI();
            if (uri != null && "file".equals(uri.getScheme())) { //$NON-NLS-1$
                return Path.of(uri).toAbsolutePath().normalize();
            }
        }
        IPathEditorInput adapted = input.getAdapter(IPathEditorInput.class);
        return adapted == null || adapted == input ? null : path(adapted);
    }
}
