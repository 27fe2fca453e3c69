package org.tensio.ui.results.views;

import java.net.URI;
import java.nio.file.Path;
import java.util.Optional;
import java.util.function.Consumer;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.runtime.Adapters;
import org.eclipse.core.runtime.IPath;
import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.ui.IEditorInput;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.IPartListener2;
import org.eclipse.ui.IPathEditorInput;
import org.eclipse.ui.IPropertyListener;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.IWorkbenchPartConstants;
import org.eclipse.ui.IWorkbenchPartReference;
import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.selection.StationRef;
import org.tensio.ui.views.SectionsView;

/**
 * Decides which project file the result views show, and says so whenever it changes:
 * <ol>
 * <li>the active Tensio editor ({@value #EDITOR_ID}): its input's file, through {@link IFile},
 * {@link IPathEditorInput} or {@code IURIEditorInput} (a file outside the workspace);</li>
 * <li>any other part that publishes a {@link SectionPoint} or {@link StationRef}: its project file;</li>
 * <li>the Sections view ({@link SectionsView}) when it has loaded a file (Open Project File).</li>
 * </ol>
 * The last of these events wins. Works without the editor bundle: nothing then matches rule 1. UI thread only.
 */
final class ProjectFollower implements IPartListener2, ISelectionListener {

    /** The section editor's id (bundle org.tensio.ui.editor). */
    static final String EDITOR_ID = "org.tensio.ui.editor"; //$NON-NLS-1$

    private final IWorkbenchPage page;
    private final IWorkbenchPart self;
    private final Consumer<Path> onProject;
    private final IPropertyListener sectionsListener;
    private SectionsView sections;

    ProjectFollower(IWorkbenchPage page, IWorkbenchPart self, Consumer<Path> onProject) {
        this.page = page;
        this.self = self;
        this.onProject = onProject;
        this.sectionsListener = (source, id) -> {
            if (id == IWorkbenchPartConstants.PROP_INPUT && source instanceof SectionsView v) {
                fromSectionsView(v).ifPresent(onProject);
            }
        };
    }

    /** Starts listening and returns the file the workbench shows now, if any. */
    Optional<Path> start() {
        page.addPartListener(this);
        page.addSelectionListener(this);
        Optional<Path> now = Optional.empty();
        IWorkbenchPart part = page.findView(SectionsView.ID);
        if (part instanceof SectionsView v) {
            watch(v);
            now = fromSectionsView(v);
        }
        IEditorPart editor = page.getActiveEditor();
        if (editor != null && EDITOR_ID.equals(editor.getSite().getId())) {
            Optional<Path> f = fileOf(editor.getEditorInput());
            if (f.isPresent()) {
                now = f;
            }
        }
        return now;
    }

    /** Stops listening. */
    void stop() {
        page.removePartListener(this);
        page.removeSelectionListener(this);
        if (sections != null) {
            sections.removePropertyListener(sectionsListener);
            sections = null;
        }
    }

    @Override
    public void partActivated(IWorkbenchPartReference ref) {
        IWorkbenchPart part = ref.getPart(false);
        if (part instanceof IEditorPart editor && EDITOR_ID.equals(ref.getId())) {
            fileOf(editor.getEditorInput()).ifPresent(onProject);
        }
    }

    @Override
    public void partOpened(IWorkbenchPartReference ref) {
        if (ref.getPart(false) instanceof SectionsView v) {
            watch(v);
        }
    }

    @Override
    public void partClosed(IWorkbenchPartReference ref) {
        if (ref.getPart(false) == sections && sections != null) {
            sections.removePropertyListener(sectionsListener);
            sections = null;
        }
    }

    @Override
    public void selectionChanged(IWorkbenchPart part, ISelection selection) {
        if (part == self || !(selection instanceof IStructuredSelection s) || s.isEmpty()) {
            return;
        }
        Object first = s.getFirstElement();
        if (first instanceof SectionPoint p) {
            onProject.accept(p.project());
        } else if (first instanceof StationRef r) {
            onProject.accept(r.project());
        }
    }

    private void watch(SectionsView v) {
        if (sections != v) {
            if (sections != null) {
                sections.removePropertyListener(sectionsListener);
            }
            sections = v;
            v.addPropertyListener(sectionsListener);
        }
    }

    private static Optional<Path> fromSectionsView(SectionsView v) {
        return v.input() == null || v.input().failed() ? Optional.empty() : v.input().file();
    }

    /** @return the local file of an editor input, if it has one */
    static Optional<Path> fileOf(IEditorInput input) {
        if (input == null) {
            return Optional.empty();
        }
        IFile file = Adapters.adapt(input, IFile.class);
        if (file != null && file.getLocation() != null) {
            return Optional.of(file.getLocation().toPath().toAbsolutePath().normalize());
        }
        if (input instanceof IPathEditorInput p) {
            IPath path = p.getPath();
            return path == null ? Optional.empty() : Optional.of(path.toPath().toAbsolutePath().normalize());
        }
        // IURIEditorInput (e.g. FileStoreEditorInput, a file outside the workspace) lives in org.eclipse.ui.ide, which
        // the Tensio product does not ship: read its getURI() reflectively instead of requiring that bundle
        try {
            java.lang.reflect.Method getUri = input.getClass().getMethod("getURI"); //$NON-NLS-1$
            if (getUri.getReturnType() == URI.class && getUri.invoke(input) instanceof URI uri
                    && "file".equals(uri.getScheme())) { //$NON-NLS-1$
                return Optional.of(Path.of(uri).toAbsolutePath().normalize());
            }
        } catch (ReflectiveOperationException | RuntimeException e) {
            // no getURI(), or not a file: not a local file
        }
        return Optional.empty();
    }
}
