package org.tensio.ui.editor.validation;

import java.nio.file.Path;
import java.util.List;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.IWorkspaceRoot;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IPath;

/**
 * The editor's validation problems as markers of type {@value #TYPE} (a problem marker, shown in the
 * Problems view). A file inside the workspace gets them on its {@link IFile}; a file opened from the file system
 * has no resource, so its markers go on the workspace root with the attribute {@value #FILE_ATTRIBUTE} holding
 * the file's absolute path (and the file name at the start of the message), so the Problems view still lists
 * them and each editor removes only its own. Markers are not persistent: they are recomputed when the file is
 * opened.
 */
public final class ProblemMarkers {

    /** Marker type declared in plugin.xml. */
    public static final String TYPE = "org.tensio.ui.editor.problem"; //$NON-NLS-1$
    /** Marker attribute: absolute path of the project file. */
    public static final String FILE_ATTRIBUTE = "org.tensio.file"; //$NON-NLS-1$

    private final Path file;

    /** Markers of {@code file} (absolute). */
    public ProblemMarkers(Path file) {
        this.file = file.toAbsolutePath().normalize();
    }

    /** @return the resource the markers live on: the file in the workspace, else the workspace root */
    public IResource resource() {
        IWorkspaceRoot root = ResourcesPlugin.getWorkspace().getRoot();
        IFile f = root.getFileForLocation(IPath.fromOSString(file.toString()));
        return f != null && f.exists() ? f : root;
    }

    /** Replaces this file's markers by {@code problems}. */
    public void set(List<Problem> problems) throws CoreException {
        IResource r = resource();
        ResourcesPlugin.getWorkspace().run(monitor -> {
            clear(r);
            for (Problem p : problems) {
                IMarker m = r.createMarker(TYPE);
                m.setAttribute(IMarker.SEVERITY, IMarker.SEVERITY_ERROR);
                m.setAttribute(IMarker.MESSAGE, r.getType() == IResource.ROOT ? file.getFileName() + ": " + p.message() //$NON-NLS-1$
                        : p.message());
                m.setAttribute(IMarker.LOCATION, p.path());
                m.setAttribute(FILE_ATTRIBUTE, file.toString());
            }
        }, null);
    }

    /** Removes this file's markers. */
    public void clear() throws CoreException {
        IResource r = resource();
        ResourcesPlugin.getWorkspace().run(monitor -> clear(r), null);
    }

    private void clear(IResource r) throws CoreException {
        for (IMarker m : find(r)) {
            m.delete();
        }
    }

    /** @return this file's markers */
    public List<IMarker> find() throws CoreException {
        return find(resource());
    }

    private List<IMarker> find(IResource r) throws CoreException {
        List<IMarker> mine = new java.util.ArrayList<>();
        for (IMarker m : r.findMarkers(TYPE, false, IResource.DEPTH_ZERO)) {
            if (file.toString().equals(m.getAttribute(FILE_ATTRIBUTE, ""))) { //$NON-NLS-1$
                mine.add(m);
            }
        }
        return mine;
    }
}
