package org.tensio.ui.editor.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Collection;
import java.util.EventObject;
import java.util.List;
import java.util.function.Predicate;

import org.eclipse.core.filesystem.EFS;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.gef.DefaultEditDomain;
import org.eclipse.gef.GraphicalViewer;
import org.eclipse.gef.commands.Command;
import org.eclipse.gef.commands.CommandStack;
import org.eclipse.gef.commands.CommandStackListener;
import org.eclipse.gef.editparts.ZoomManager;
import org.eclipse.osgi.util.NLS;
import org.eclipse.swt.custom.StyledText;
import org.eclipse.ui.IEditorInput;
import org.eclipse.ui.IEditorSite;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.ide.FileStoreEditorInput;
import org.eclipse.ui.part.MultiPageEditorPart;
import org.eclipse.ui.views.properties.IPropertySheetPage;
import org.tensio.engine.project.Project;
import org.tensio.ui.editor.figures.OverlayFigure;
import org.tensio.ui.editor.model.ProjectModel;
import org.tensio.ui.editor.overlay.ContourResult;
import org.tensio.ui.editor.overlay.Quantity;
import org.tensio.ui.editor.pages.PageHost;
import org.tensio.ui.editor.pages.StationsPage;
import org.tensio.ui.editor.pages.TablePage;
import org.tensio.ui.editor.parts.Inks;
import org.tensio.ui.editor.validation.Problem;
import org.tensio.ui.selection.SectionPointerSource;
import org.tensio.ui.services.AnalysisServiceTracker;

/**
 * The Tensio project editor: pages for the section drawing (GEF), materials, stations, load cases, combinations
 * and the raw JSON, one command stack for all of them (undo/redo, dirty state), atomic save and save-as, reload
 * when the file changes outside, validation by the engine in the background with problem markers, and the
 * selection contract of {@code org.tensio.ui.selection}. It coordinates: the document ({@link ProjectDocument}),
 * the pages ({@link EditorPages}), the validation ({@link EditorValidation}), the external-change check
 * ({@link ExternalChangeWatcher}), writing ({@link ProjectFiles}) and the other parts' selection
 * ({@link OtherPartsSelection}) each live in a class of their own.
 */
public final class ProjectEditor extends MultiPageEditorPart implements CommandStackListener, PageHost {

    /** Editor id (plugin.xml). */
    public static final String ID = "org.tensio.ui.editor.projectEditor"; //$NON-NLS-1$
    /** Id of the drawing's context menu (contributions through org.eclipse.ui.menus: popup:ID). */
    public static final String CONTEXT_MENU_ID = ID + ".context"; //$NON-NLS-1$

    private final DefaultEditDomain editDomain = new DefaultEditDomain(this);
    private final EditorSelection selection = new EditorSelection();
    private final PointerSource pointer = new PointerSource();
    private final OtherPartsSelection othersSelection = new OtherPartsSelection(this);
    private final ProjectDocument document = new ProjectDocument(this::documentReplaced);
    private final ExternalChangeWatcher watcher = new ExternalChangeWatcher(() -> getSite().getShell(), this::isDirty);
    private Path path;
    private AnalysisServiceTracker services;
    private EditorValidation validation;
    private Inks inks;
    private EditorPages pages;
    /** the page shown before the current page change (getActivePage already names the new one) */
    private int shownPage;

    @Override
    public void init(IEditorSite site, IEditorInput input) throws PartInitException {
        Path file = EditorInputs.path(input);
        if (file == null) {
            throw new PartInitException(NLS.bind(Messages.ProjectEditor_noFile, input.getName()));
        }
        super.init(site, input);
        path = file;
        read();
        services = new AnalysisServiceTracker(ProjectEditor.class);
        validation = new EditorValidation(path, services, site.getShell().getDisplay(),
                (p, found) -> pages.validated(p, found));
        site.setSelectionProvider(selection);
        site.getWorkbenchWindow().getSelectionService().addPostSelectionListener(othersSelection);
        showFileName();
        getCommandStack().addCommandStackListener(this);
    }

    private void read() throws PartInitException {
        try {
            watcher.remember(document.read(path));
        } catch (IOException e) {
            throw new PartInitException(NLS.bind(Messages.ProjectEditor_cannotRead, path, e.getMessage()), e);
        }
    }

    @Override
    protected void createPages() {
        inks = new Inks(getContainer().getDisplay());
        pages = new EditorPages(this, inks, getContainer(), (control, label) -> {
            int index = addPage(control);
            setPageText(index, label);
            return index;
        });
        if (pages.showRead(document)) {
            validate();
        } else {
            setActivePage(pages.jsonIndex());
            validation.unreadable(document.unreadable());
        }
    }

    private void documentReplaced() {
        if (pages != null) {
            pages.documentReplaced();
        }
    }

    @Override
    protected void pageChange(int newPageIndex) {
        int old = shownPage;
        shownPage = newPageIndex;
        if (!pages.mayLeave(old, newPageIndex)) {
            setActivePage(pages.jsonIndex());
            return;
        }
        super.pageChange(newPageIndex);
        pages.shown(newPageIndex);
    }

    @Override
    public void commandStackChanged(EventObject event) {
        dirtyChanged();
        if (pages != null) {
            pages.refreshTables();
            validate();
        }
    }

    /** Fires a dirty-state change (the command stack or the JSON text changed). */
    void dirtyChanged() {
        firePropertyChange(PROP_DIRTY);
    }

    /** Validates the model's text with the engine in the background. */
    void validate() {
        validation.request(document.model(), path);
    }

    @Override
    public void doSave(IProgressMonitor monitor) {
        if (!pages.json().apply()) {
            setActivePage(pages.jsonIndex());
            monitor.setCanceled(true);
            return;
        }
        if (!writeTo(path)) {
            monitor.setCanceled(true);
        }
    }

    private boolean writeTo(Path target) {
        String text = document.model().toText();
        if (!ProjectFiles.write(getSite().getShell(), target, text)) {
            return false;
        }
        watcher.remember(text);
        getCommandStack().markSaveLocation();
        ProjectFiles.refreshWorkspace(target);
        dirtyChanged();
        return true;
    }

    @Override
    public void doSaveAs() {
        Path chosen = ProjectFiles.askSaveAs(getSite().getShell(), path);
        if (chosen != null) {
            saveAs(chosen);
        }
    }

    /** Saves to {@code target} and continues editing it. */
    public boolean saveAs(Path target) {
        if (!pages.json().apply()) {
            return false;
        }
        Path absolute = target.toAbsolutePath().normalize();
        if (!writeTo(absolute)) {
            return false;
        }
        validation.moveTo(absolute);
        path = absolute;
        setInputWithNotify(new FileStoreEditorInput(EFS.getLocalFileSystem().getStore(absolute.toUri())));
        showFileName();
        validate();
        return true;
    }

    private void showFileName() {
        setPartName(path.getFileName().toString());
        setTitleToolTip(path.toString());
    }

    @Override
    public boolean isDirty() {
        return getCommandStack().isDirty() || pages != null && pages.json().pending();
    }

    @Override
    public boolean isSaveAsAllowed() {
        return true;
    }

    @Override
    public void setFocus() {
        super.setFocus();
        checkExternalChange();
    }

    /**
     * When the file on disk differs from what the editor last read or wrote, asks whether to reload it
     * (dropping the editor's changes and undo history).
     *
     * @return true when the file had changed
     */
    public boolean checkExternalChange() {
        return watcher.check(path, this::reload);
    }

    /**
     * Replaces the question asked when the file changed outside the editor (a dialog by default): the predicate
     * gets the file and answers whether to reload it.
     */
    public void setExternalChangePrompt(Predicate<Path> prompt) {
        watcher.setPrompt(prompt);
    }

    /** Reads the file again, dropping the undo history. */
    public void reload() {
        try {
            read();
        } catch (PartInitException e) {
            ILog.of(getClass()).log(e.getStatus());
            return;
        }
        getCommandStack().flush();
        getCommandStack().markSaveLocation();
        pages.showRead(document);
        dirtyChanged();
        validate();
    }

    @Override
    public void execute(Command command) {
        getCommandStack().execute(command);
    }

    @Override
    public ProjectModel model() {
        return document.model();
    }

    /** @return the editor's command stack */
    public CommandStack getCommandStack() {
        return editDomain.getCommandStack();
    }

    DefaultEditDomain editDomain() {
        return editDomain;
    }

    EditorSelection selection() {
        return selection;
    }

    PointerSource pointer() {
        return pointer;
    }

    AnalysisServiceTracker services() {
        return services;
    }

    /** @return the section page, or null before the pages are created */
    SectionPage sectionPage() {
        return pages == null ? null : pages.section();
    }

    /** @return the project as the engine last validated it, or null when invalid or not yet validated */
    public Project project() {
        return validation.project();
    }

    /** @return the problems of the last validation */
    public List<Problem> problems() {
        return validation.problems();
    }

    /** @return the edited file (absolute, normalised) */
    public Path path() {
        return path;
    }

    /** @return the graphical page's viewer */
    public GraphicalViewer graphicalViewer() {
        return pages.section().viewer();
    }

    /** Shows section {@code id} on the graphical page. */
    public void showSection(String id) {
        pages.section().showSection(id);
    }

    /** @return the section shown on the graphical page, or null */
    public String shownSection() {
        return pages.section().sectionId();
    }

    /** Chooses the station and case (or combination) whose contour is shown. */
    public void showStation(String stationId, String caseId) {
        pages.section().showStation(stationId, caseId);
    }

    /** Chooses the contour quantity. */
    public void showQuantity(Quantity q) {
        pages.section().selectQuantity(q);
    }

    /**
     * @return what the case chooser of the graphical page offers: the station's load cases and combinations, or for
     *         the fatigue quantity the load histories of its fatigue check (none when it has none)
     */
    public List<String> caseChoices() {
        return List.copyOf(pages.section().caseChoices());
    }

    /** @return the texts the contour legend shows (title, case line, extreme values, cautions; or its message) */
    public List<String> legendTexts() {
        return pages.section().legend().texts();
    }

    /** @return the contour currently drawn, or null */
    public ContourResult contour() {
        return pages.section().overlays().shown();
    }

    /** @return true while a contour is being computed for the current choice */
    public boolean contourBusy() {
        return pages.section().overlays().busy();
    }

    /** @return the overlay figure of the shown section, or null */
    public OverlayFigure overlayFigure() {
        return pages.section().overlay();
    }

    /** @return the parts marked in the drawing as the place of an error */
    public Collection<?> errorParts() {
        return pages.section().errorParts();
    }

    /** @return the page's table of materials, load cases or combinations (0, 1, 2) */
    public TablePage table(int index) {
        return pages.table(index);
    }

    /** @return the JSON page's text widget */
    public StyledText jsonText() {
        return pages.json().text();
    }

    /** @return the stations page */
    public StationsPage stationsPage() {
        return pages.stations();
    }

    /** Shows page {@code index} (0 section, 1 materials, 2 stations, 3 cases, 4 combinations, 5 JSON). */
    public void showPage(int index) {
        setActivePage(index);
    }

    /** Shows or hides the mesh overlay (the page's Mesh check box). */
    public void showMesh(boolean on) {
        pages.section().setMesh(on);
    }

    /** Fits the drawing into the window. */
    public void fit() {
        pages.section().fit();
    }

    @Override
    @SuppressWarnings("unchecked")
    public <T> T getAdapter(Class<T> type) {
        if (type == CommandStack.class) {
            return (T) getCommandStack();
        }
        if (type == SectionPointerSource.class) {
            return (T) pointer;
        }
        if (type == GraphicalViewer.class) {
            return (T) graphicalViewer();
        }
        if (type == ZoomManager.class) {
            return (T) pages.section().zoomManager();
        }
        if (type == IPropertySheetPage.class) {
            return (T) new PartsPropertySheetPage(getCommandStack());
        }
        return super.getAdapter(type);
    }

    @Override
    public void dispose() {
        getCommandStack().removeCommandStackListener(this);
        getSite().getWorkbenchWindow().getSelectionService().removePostSelectionListener(othersSelection);
        if (validation != null) {
            validation.dispose();
        }
        if (services != null) {
            services.close();
        }
        super.dispose();
        if (inks != null) {
            inks.dispose();
        }
    }
}
