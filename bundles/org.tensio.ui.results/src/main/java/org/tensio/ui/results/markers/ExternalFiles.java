package org.tensio.ui.results.markers;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Optional;

import org.eclipse.core.resources.IContainer;
import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IFolder;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.IWorkspaceRoot;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IPath;
import org.eclipse.core.runtime.IProgressMonitor;

/**
 * Where the markers of a project file go. A file inside the workspace (any {@link IFile} whose location is the
 * file) carries its own markers. A file outside the workspace is <b>linked</b> into the hidden workspace project
 * {@value #PROJECT} as {@code <first 12 hex digits of SHA-256 of the absolute path>/<file name>}: a linked
 * resource, so the file itself is neither copied nor changed; the link exists only to hold markers, so the
 * Problems view lists failing checks of any file the workbench checks. Links are created only when there is a
 * marker to show.
 */
public final class ExternalFiles {

    /** The hidden project that holds links to project files outside the workspace. */
    public static final String PROJECT = ".tensio-external"; //$NON-NLS-1$

    private ExternalFiles() {
    }

    /** @return the workspace file at {@code file}'s location: an own file first, else an existing link */
    public static Optional<IFile> find(Path file) {
        IWorkspaceRoot root = ResourcesPlugin.getWorkspace().getRoot();
        // hidden resources (the links) are found only when asked for
        IFile[] found = root.findFilesForLocationURI(file.toUri(), IContainer.INCLUDE_HIDDEN);
        IFile link = null;
        for (IFile f : found) {
            if (!f.getProject().getName().equals(PROJECT)) {
                return Optional.of(f);
            }
            link = f;
        }
        return Optional.ofNullable(link);
    }

    /** @return the workspace file for {@code file}, linking it into {@value #PROJECT} when needed */
    static IFile findOrLink(Path file, IProgressMonitor monitor) throws CoreException {
        Optional<IFile> f = find(file);
        if (f.isPresent()) {
            return f.get();
        }
        IProject project = ResourcesPlugin.getWorkspace().getRoot().getProject(PROJECT);
        if (!project.exists()) {
            project.create(null, IResource.HIDDEN, monitor);
        }
        if (!project.isOpen()) {
            project.open(monitor);
        }
        IFolder folder = project.getFolder(key(file));
        if (!folder.exists()) {
            folder.create(IResource.NONE, true, monitor);
        }
        IFile link = folder.getFile(String.valueOf(file.getFileName()));
        if (!link.exists()) {
            link.createLink(IPath.fromPath(file), IResource.ALLOW_MISSING_LOCAL | IResource.REPLACE, monitor);
        }
        return link;
    }

    static String key(Path file) {
        try {
            byte[] d = MessageDigest.getInstance("SHA-256") //$NON-NLS-1$
                    .digest(file.toAbsolutePath().normalize().toString().getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(d, 0, 6);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java runtime", e); //$NON-NLS-1$
        }
    }
}
