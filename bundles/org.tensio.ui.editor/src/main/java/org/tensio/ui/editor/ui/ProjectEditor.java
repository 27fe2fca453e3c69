package org.tensio.ui.editor.ui;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EventObject;
import java.util.List;

import org.eclipse.core.filesystem.EFS;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.gef.DefaultEditDomain;
import org.eclipse.gef.GraphicalViewer;
import org.eclipse.gef.commands.Command;
import org.eclipse.gef.commands.CommandStack;
import org.eclipse.gef.commands.CommandStackListener;
import org.eclipse.gef.editparts.ZoomManager;
import org.eclipse.gef.ui.properties.UndoablePropertySheetEntry;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.osgi.util.NLS;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.ui.IEditorInput;
import org.eclipse.ui.IEditorSite;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.ide.FileStoreEditorInput;
import org.eclipse.ui.part.MultiPageEditorPart;
import org.eclipse.ui.views.properties.IPropertySheetPage;
import org.eclipse.ui.views.properties.PropertySheetPage;
import org.tensio.engine.project.Project;
import org.tensio.engine.io.AtomicFiles;
import org.tensio.ui.editor.model.ProjectModel;
import org.tensio.ui.editor.pages.PageHost;
import org.tensio.ui.editor.pages.TablePage;
import org.tensio.ui.editor.pages.Tables;
import org.tensio.ui.editor.parts.Inks;
import org.tensio.ui.editor.validation.Problem;
import org.tensio.ui.editor.validation.ProblemMarkers;
import org.tensio.ui.editor.validation.ValidationJob;
import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.selection.SectionPointerSource;
import org.tensio.ui.selection.StationRef;
import org.tensio.ui.services.AnalysisServiceTracker;

/**
 * The Tensio project editor: pages for the section drawing (GEF), materials, load cases, combinations and the
 * raw JSON, one command stack for all of them (undo/redo, dirty state), atomic save and save-as, reload when
 * the file changes outside, validation by the engine in the background with problem markers, and the selection
 * contract of {@code org.tensio.ui.selection}.
 */
public final class ProjectEditor extends MultiPageEditorPart implements CommandStackListener, PageHost {

    /** Editor id (plugin.xml). */
    public static final String ID = "org.tensio.ui.editor.projectEditor"; //$NON-NLS-1$
    /** Id of the drawing's context menu (contributions through org.eclipse.ui.menus: popup:ID). */
    public static final String CONTEXT_MENU_ID = ID + ".context"; //$NON-NLS-1$

    private static final long VALIDATION_DELAY_MS = 100;

    private final DefaultEditDomain editDomain = new DefaultEditDomain(this);
    private final EditorSelection selection = new EditorSelection();
    private final PointerSource pointer = new PointerSource();
    private final ISelectionListener othersSelection = this::otherPartSelected;
    private ProjectModel model;
    private Path path;
    private FileStamp stamp;
    private String unreadable;
    private String rawText;
    private Project project;
    private List<Problem> problems = List.of();
    private AnalysisServiceTracker services;
    private ProblemMarkers markers;
    private Inks inks;
    private SectionPage sectionPage;
    private JsonPage jsonPage;
    private TablePage materialsPage;
    private TablePage casesPage;
    private org.tensio.ui.editor.pages.StationsPage stationsPage;
    private TablePage combinationsPage;
    private int jsonPageIndex;
    /** the page shown before the current page change (getActivePage already names the new one) */
    private int shownPage;
    private ValidationJob validation;
    private int validations;
    private boolean checkingExternal;
    private java.util.function.Predicate<Path> externalChangePrompt = this::askReload;

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
        markers = new ProblemMarkers(path);
        site.setSelectionProvider(selection);
        site.getWorkbenchWindow().getSelectionService().addPostSelectionListener(othersSelection);
        setPartName(path.getFileName().toString());
        setTitleToolTip(path.toString());
        getCommandStack().addCommandStackListener(this);
    }

    private void read() throws PartInitException {
        String text;
        try {
            text = Files.readString(path, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new PartInitException(NLS.bind(Messages.ProjectEditor_cannotRead, path, e.getMessage()), e);
        }
        stamp = FileStamp.of(text);
        load(text);
    }

    private void load(String text) {
        rawText = text;
        try {
            ProjectModel read = ProjectModel.parse(text.startsWith("\uFEFF") ? text.substring(1) : text); //$NON-NLS-1$
            if (model == null) {
                model = read;
                model.addPropertyChangeListener(e -> {
                    if (ProjectModel.DOCUMENT.equals(e.getPropertyName())) {
                        documentReplaced();
                    }
                });
            } else {
                model.replace(read.toJson());
            }
            unreadable = null;
        } catch (IllegalArgumentException e) {
            if (model == null) {
                model = ProjectModel.parse("{}"); //$NON-NLS-1$
            }
            unreadable = e.getMessage();
        }
    }

    @Override
    protected void createPages() {
        inks = new Inks(getContainer().getDisplay());
        sectionPage = new SectionPage(this, inks);
        setPageText(addPage(sectionPage.create(getContainer())), Messages.ProjectEditor_pageSection);
        materialsPage = new TablePage(this, () -> Tables.materials(model), () -> Tables.MATERIAL_KEYS,
                Messages.ProjectEditor_columnMaterial);
        setPageText(addPage(materialsPage.create(getContainer())), Messages.ProjectEditor_pageMaterials);
        stationsPage = new org.tensio.ui.editor.pages.StationsPage(this, Messages.ProjectEditor_columnStation,
                Messages.ProjectEditor_columnSection, Messages.ProjectEditor_columnCases);
        setPageText(addPage(stationsPage.create(getContainer())), Messages.ProjectEditor_pageStations);
        casesPage = new TablePage(this, () -> Tables.cases(model), () -> Tables.FORCE_KEYS,
                Messages.ProjectEditor_columnCase);
        setPageText(addPage(casesPage.create(getContainer())), Messages.ProjectEditor_pageCases);
        combinationsPage = new TablePage(this, () -> Tables.combinations(model), () -> Tables.caseIds(model),
                Messages.ProjectEditor_columnCombination);
        setPageText(addPage(combinationsPage.create(getContainer())), Messages.ProjectEditor_pageCombinations);
        jsonPage = new JsonPage(this);
        jsonPageIndex = addPage(jsonPage.create(getContainer()));
        setPageText(jsonPageIndex, Messages.ProjectEditor_pageJson);
        sectionPage.refreshSections();
        if (unreadable != null) {
            jsonPage.showRaw(rawText, unreadable);
            setActivePage(jsonPageIndex);
            problems = List.of(new Problem("$", unreadable)); //$NON-NLS-1$
        } else {
            jsonPage.refresh();
            validate();
        }
    }

    private void documentReplaced() {
        if (sectionPage != null) {
            sectionPage.refreshSections();
            refreshTables();
        }
    }

    private void refreshTables() {
        materialsPage.refresh();
        stationsPage.refresh();
        casesPage.refresh();
        combinationsPage.refresh();
    }

    @Override
    protected void pageChange(int newPageIndex) {
        int old = shownPage;
        shownPage = newPageIndex;
        if (old == jsonPageIndex && newPageIndex != jsonPageIndex && !jsonPage.apply()) {
            setActivePage(jsonPageIndex);
            return;
        }
        super.pageChange(newPageIndex);
        if (newPageIndex == jsonPageIndex && !jsonPage.pending()) {
            jsonPage.refresh();
        }
    }

    @Override
    public void commandStackChanged(EventObject event) {
        dirtyChanged();
        if (sectionPage != null) {
            refreshTables();
            validate();
        }
    }

    /** Fires a dirty-state change (the command stack or the JSON text changed). */
    void dirtyChanged() {
        firePropertyChange(PROP_DIRTY);
    }

    /** Validates the model's text with the engine in the background. */
    void validate() {
        if (validation != null) {
            validation.cancel();
        }
        validations++;
        int generation = validations;
        var display = getContainer().getDisplay();
        validation = new ValidationJob(model.toText(), model.toJson().has("loadTables") ? path : null, //$NON-NLS-1$
                path.getFileName().toString(), services, markers,
                (p, found) -> display.asyncExec(() -> validated(generation, p, found)));
        validation.schedule(VALIDATION_DELAY_MS);
    }

    private void validated(int generation, Project p, List<Problem> found) {
        if (generation != validations || sectionPage.control().isDisposed()) {
            return;
        }
        project = p;
        problems = found;
        sectionPage.validated(p, found);
        String text = String.join("\n", found.stream().map(Problem::message).toList()); //$NON-NLS-1$
        materialsPage.showProblems(text);
        casesPage.showProblems(text);
        combinationsPage.showProblems(text);
    }

    @Override
    public void doSave(IProgressMonitor monitor) {
        if (!jsonPage.apply()) {
            setActivePage(jsonPageIndex);
            monitor.setCanceled(true);
            return;
        }
        if (!writeTo(path)) {
            monitor.setCanceled(true);
        }
    }

    private boolean writeTo(Path target) {
        String text = model.toText();
        try {
            AtomicFiles.writeString(target, text);
        } catch (IOException e) {
            ILog.of(getClass()).error("Cannot save " + target, e); //$NON-NLS-1$
            MessageDialog.openError(getSite().getShell(), Messages.ProjectEditor_saveFailedTitle,
                    NLS.bind(Messages.ProjectEditor_saveFailed, target, e.getMessage()));
            return false;
        }
        stamp = FileStamp.of(text);
        getCommandStack().markSaveLocation();
        refreshWorkspace(target);
        dirtyChanged();
        return true;
    }

    private void refreshWorkspace(Path target) {
        IResource r = new ProblemMarkers(target).resource();
        if (r.getType() == IResource.FILE) {
            try {
                r.refreshLocal(IResource.DEPTH_ZERO, null);
            } catch (CoreException e) {
                ILog.of(getClass()).log(e.getStatus());
            }
        }
    }

    @Override
    public void doSaveAs() {
        FileDialog dialog = new FileDialog(getSite().getShell(), SWT.SAVE);
        dialog.setFilterExtensions(new String[] { "*.tensio.json", "*.json" }); //$NON-NLS-1$ //$NON-NLS-2$
        dialog.setFilterPath(path.getParent().toString());
        dialog.setFileName(path.getFileName().toString());
        dialog.setOverwrite(true);
        String chosen = dialog.open();
        if (chosen != null) {
            saveAs(Path.of(chosen));
        }
    }

    /** Saves to {@code target} and continues editing it. */
    public boolean saveAs(Path target) {
        if (!jsonPage.apply()) {
            return false;
        }
        Path absolute = target.toAbsolutePath().normalize();
        if (!writeTo(absolute)) {
            return false;
        }
        try {
            markers.clear();
        } catch (CoreException e) {
            ILog.of(getClass()).log(e.getStatus());
        }
        path = absolute;
        markers = new ProblemMarkers(path);
        setInputWithNotify(new FileStoreEditorInput(EFS.getLocalFileSystem().getStore(absolute.toUri())));
        setPartName(path.getFileName().toString());
        setTitleToolTip(path.toString());
        validate();
        return true;
    }

    @Override
    public boolean isDirty() {
        return getCommandStack().isDirty() || jsonPage != null && jsonPage.pending();
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
        if (checkingExternal) {
            return false;
        }
        FileStamp now = FileStamp.read(path);
        if (now.sameAs(stamp)) {
            return false;
        }
        checkingExternal = true;
        try {
            stamp = now;
            if (externalChangePrompt.test(path)) {
                reload();
            }
        } finally {
            checkingExternal = false;
        }
        return true;
    }

    private boolean askReload(Path file) {
        return MessageDialog.openQuestion(getSite().getShell(), Messages.ProjectEditor_changedTitle,
                NLS.bind(isDirty() ? Messages.ProjectEditor_changedDirty : Messages.ProjectEditor_changed,
                        file.getFileName()));
    }

    /**
     * Replaces the question asked when the file changed outside the editor (a dialog by default): the predicate
     * gets the file and answers whether to reload it.
     */
    public void setExternalChangePrompt(java.util.function.Predicate<Path> prompt) {
        externalChangePrompt = prompt == null ? this::askReload : prompt;
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
        if (unreadable != null) {
            jsonPage.showRaw(rawText, unreadable);
        } else {
            jsonPage.refresh();
        }
        dirtyChanged();
        validate();
    }

    private void otherPartSelected(IWorkbenchPart part, ISelection s) {
        if (part == this || !(s instanceof IStructuredSelection structured) || sectionPage == null) {
            return;
        }
        for (Object element : structured.toList()) {
            if (element instanceof StationRef ref && path.equals(ref.project())) {
                sectionPage.showStation(ref.stationId(), ref.caseId());
                sectionPage.mark(null);
            } else if (element instanceof SectionPoint p && path.equals(p.project())) {
                if (p.stationId() != null) {
                    sectionPage.showStation(p.stationId(), p.caseId());
                } else {
                    sectionPage.showSection(p.sectionId());
                }
                sectionPage.mark(new double[] { p.x(), p.y() });
            }
        }
    }

    @Override
    public void execute(Command command) {
        getCommandStack().execute(command);
    }

    @Override
    public ProjectModel model() {
        return model;
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

    /** @return the project as the engine last validated it, or null when invalid or not yet validated */
    public Project project() {
        return project;
    }

    /** @return the problems of the last validation */
    public List<Problem> problems() {
        return problems;
    }

    /** @return the edited file (absolute, normalised) */
    public Path path() {
        return path;
    }

    /** @return the graphical page's viewer */
    public GraphicalViewer graphicalViewer() {
        return sectionPage.viewer();
    }

    /** Shows section {@code id} on the graphical page. */
    public void showSection(String id) {
        sectionPage.showSection(id);
    }

    /** @return the section shown on the graphical page, or null */
    public String shownSection() {
        return sectionPage.sectionId();
    }

    /** Chooses the station and case (or combination) whose contour is shown. */
    public void showStation(String stationId, String caseId) {
        sectionPage.showStation(stationId, caseId);
    }

    /** Chooses the contour quantity. */
    public void showQuantity(org.tensio.ui.editor.overlay.Quantity q) {
        sectionPage.selectQuantity(q);
    }

    /** @return the contour currently drawn, or null */
    public org.tensio.ui.editor.overlay.ContourResult contour() {
        return sectionPage.overlays().shown();
    }

    /** @return true while a contour is being computed for the current choice */
    public boolean contourBusy() {
        return sectionPage.overlays().busy();
    }

    /** @return the overlay figure of the shown section, or null */
    public org.tensio.ui.editor.figures.OverlayFigure overlayFigure() {
        return sectionPage.overlay();
    }

    /** @return the parts marked in the drawing as the place of an error */
    public java.util.Collection<?> errorParts() {
        return sectionPage.errorParts();
    }

    /** @return the page's table of materials, load cases or combinations (0, 1, 2) */
    public TablePage table(int index) {
        return switch (index) {
        case 0 -> materialsPage;
        case 1 -> casesPage;
        default -> combinationsPage;
        };
    }

    /** @return the JSON page's text widget */
    public org.eclipse.swt.custom.StyledText jsonText() {
        return jsonPage.text();
    }

    /** @return the stations page */
    public org.tensio.ui.editor.pages.StationsPage stationsPage() {
        return stationsPage;
    }

    /** Shows page {@code index} (0 section, 1 materials, 2 stations, 3 cases, 4 combinations, 5 JSON). */
    public void showPage(int index) {
        setActivePage(index);
    }

    /** Shows or hides the mesh overlay (the page's Mesh check box). */
    public void showMesh(boolean on) {
        sectionPage.setMesh(on);
    }

    /** Fits the drawing into the window. */
    public void fit() {
        sectionPage.fit();
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
            return (T) sectionPage.zoomManager();
        }
        if (type == IPropertySheetPage.class) {
            return (T) propertySheetPage();
        }
        return super.getAdapter(type);
    }

    private IPropertySheetPage propertySheetPage() {
        PropertySheetPage page = new PropertySheetPage() {
            @Override
            public void selectionChanged(IWorkbenchPart part, ISelection s) {
                // the section point is for the result views; the sheet shows the selected parts
                if (s instanceof IStructuredSelection structured) {
                    s = new StructuredSelection(
                            structured.toList().stream().filter(o -> !(o instanceof SectionPoint)).toList());
                }
                super.selectionChanged(part, s);
            }
        };
        page.setRootEntry(new UndoablePropertySheetEntry(getCommandStack()));
        return page;
    }

    @Override
    public void dispose() {
        getCommandStack().removeCommandStackListener(this);
        getSite().getWorkbenchWindow().getSelectionService().removePostSelectionListener(othersSelection);
        if (validation != null) {
            validation.cancel();
        }
        if (markers != null) {
            try {
                markers.clear();
            } catch (CoreException e) {
                ILog.of(getClass()).log(e.getStatus());
            }
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
