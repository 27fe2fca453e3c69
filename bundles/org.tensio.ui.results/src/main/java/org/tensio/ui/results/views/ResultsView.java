package org.tensio.ui.results.views;

import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.atomic.AtomicInteger;

import org.eclipse.core.resources.IResourceChangeEvent;
import org.eclipse.core.resources.IResourceChangeListener;
import org.eclipse.core.resources.IResourceDelta;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.OperationCanceledException;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.IJobChangeEvent;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.core.runtime.jobs.JobChangeAdapter;
import org.eclipse.core.runtime.preferences.IEclipsePreferences.IPreferenceChangeListener;
import org.eclipse.jface.action.MenuManager;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.jface.viewers.TreeViewerColumn;
import org.eclipse.osgi.util.NLS;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Tree;
import org.eclipse.swt.widgets.TreeColumn;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.part.ViewPart;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.ui.results.markers.CheckMarkers;
import org.tensio.ui.results.model.ResultNode;
import org.tensio.ui.results.model.ResultsFilter;
import org.tensio.ui.results.model.ResultsText;
import org.tensio.ui.results.model.ResultsTree;
import org.tensio.ui.results.preferences.ResultsPreferences;
import org.tensio.ui.services.AnalysisServiceTracker;

/**
 * The results tree ({@value #ID}): project → station → case or combination → criterion → governing point,
 * with utilisation and pass/fail on every node, from the engine's checks run in a background job (the UI thread
 * never waits on the engine). Follows the project of the active Tensio editor, of a part publishing a
 * {@code SectionPoint}/{@code StationRef}, or of the Sections view ({@link ProjectFollower}); publishes
 * {@code StationRef}/{@code SectionPoint} for the selected node ({@link ResultsSelectionProvider}). Every
 * finished check also updates the Problems markers of the file ({@link CheckMarkers}).
 */
public final class ResultsView extends ViewPart {

    /** View id as declared in plugin.xml. */
    public static final String ID = "org.tensio.ui.results.views.results"; //$NON-NLS-1$

    /** Job family of the checks this view runs. */
    public static final Object JOB_FAMILY = ResultsView.class;

    private static final Duration SERVICE_WAIT = Duration.ofSeconds(30);

    private final AtomicInteger request = new AtomicInteger();
    private AnalysisServiceTracker services;
    private Label status;
    private Label warnings;
    private Button onlyFailing;
    private Button onlyGoverning;
    private TreeViewer viewer;
    private final ResultsComparator comparator = new ResultsComparator();
    private final ResultsViewerFilter filter = new ResultsViewerFilter();
    private ProjectFollower follower;
    private Job job;
    private Path requested;
    private final IResourceChangeListener resourceListener = this::resourceChanged;
    private final IPreferenceChangeListener preferenceListener = e -> Display.getDefault().asyncExec(this::refreshStyle);

    /** Shows the results view in {@code page} and checks {@code file} in it. */
    public static ResultsView showIn(IWorkbenchPage page, Path file) throws PartInitException {
        ResultsView view = (ResultsView) page.showView(ID);
        view.showProject(file);
        return view;
    }

    @Override
    public void createPartControl(Composite parent) {
        GridLayoutFactory.fillDefaults().margins(4, 4).numColumns(2).applyTo(parent);
        status = new Label(parent, SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).span(2, 1).applyTo(status);
        onlyFailing = check(parent, Messages.ResultsView_onlyFailing);
        onlyGoverning = check(parent, Messages.ResultsView_onlyGoverning);
        viewer = new TreeViewer(parent, SWT.BORDER | SWT.FULL_SELECTION | SWT.MULTI | SWT.H_SCROLL | SWT.V_SCROLL);
        Tree tree = viewer.getTree();
        tree.setHeaderVisible(true);
        tree.setLinesVisible(true);
        GridDataFactory.fillDefaults().grab(true, true).span(2, 1).applyTo(tree);
        for (ResultsColumn column : ResultsColumn.values()) {
            TreeViewerColumn c = new TreeViewerColumn(viewer, column.numeric() ? SWT.RIGHT : SWT.LEFT);
            c.getColumn().setText(column.header());
            c.getColumn().setWidth(column.width());
            c.getColumn().setMoveable(column != ResultsColumn.NAME);
            c.getColumn().addListener(SWT.Selection, e -> sortBy(column, c.getColumn()));
        }
        viewer.setContentProvider(new ResultsContentProvider());
        viewer.setLabelProvider(new ResultsLabelProvider(ResultsPreferences::warningThreshold));
        viewer.setComparator(comparator);
        viewer.addFilter(filter);
        viewer.setUseHashlookup(true);
        warnings = new Label(parent, SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).span(2, 1).hint(200, SWT.DEFAULT).applyTo(warnings);
        Label caution = new Label(parent, SWT.WRAP);
        caution.setText(Messages.ResultsView_caution);
        GridDataFactory.fillDefaults().grab(true, false).span(2, 1).hint(200, SWT.DEFAULT).applyTo(caution);

        ResultsSelectionProvider selection = new ResultsSelectionProvider(viewer);
        getSite().setSelectionProvider(selection);
        MenuManager menu = new MenuManager();
        tree.setMenu(menu.createContextMenu(tree));
        getSite().registerContextMenu(menu, selection);

        services = new AnalysisServiceTracker(getClass());
        show(ResultsTree.none(Messages.ResultsView_noFile));
        ResourcesPlugin.getWorkspace().addResourceChangeListener(resourceListener, IResourceChangeEvent.POST_CHANGE);
        ResultsPreferences.addListener(preferenceListener);
        follower = new ProjectFollower(getSite().getPage(), this, this::follow);
        follower.start().ifPresent(this::follow);
    }

    private Button check(Composite parent, String text) {
        Button b = new Button(parent, SWT.CHECK);
        b.setText(text);
        b.addListener(SWT.Selection, e -> applyFilter());
        return b;
    }

    /** Checks {@code file} in a background job, cancelling a check still running; the tree changes when done. */
    public void showProject(Path file) {
        Path f = file.toAbsolutePath().normalize();
        int id = request.incrementAndGet();
        Display display = viewer.getControl().getDisplay();
        display.asyncExec(() -> {
            if (!status.isDisposed() && id == request.get()) {
                status.setText(NLS.bind(Messages.ResultsView_loading, f.getFileName()));
            }
        });
        synchronized (this) {
            requested = f;
            if (job != null) {
                job.cancel();
            }
            job = new Job(NLS.bind(Messages.ResultsView_job, f.getFileName())) {
                @Override
                protected IStatus run(IProgressMonitor monitor) {
                    ResultsTree tree;
                    try {
                        tree = load(f, monitor);
                    } catch (OperationCanceledException e) {
                        return Status.CANCEL_STATUS;
                    }
                    display.asyncExec(() -> {
                        if (id == request.get() && !viewer.getControl().isDisposed()) {
                            show(tree);
                            CheckMarkers.update(tree);
                        }
                    });
                    return Status.OK_STATUS;
                }

                @Override
                public boolean belongsTo(Object family) {
                    return family == JOB_FAMILY;
                }
            };
            job.setPriority(Job.LONG);
            // cancelled while waiting or while running (the Progress view's stop button): say so
            job.addJobChangeListener(new JobChangeAdapter() {
                @Override
                public void done(IJobChangeEvent event) {
                    if (event.getResult() != null && event.getResult().getSeverity() == IStatus.CANCEL) {
                        display.asyncExec(() -> {
                            if (id == request.get() && !status.isDisposed()) {
                                status.setText(NLS.bind(Messages.ResultsView_cancelled, f.getFileName()));
                            }
                        });
                    }
                }
            });
            job.schedule();
        }
    }

    /** Follows a project chosen elsewhere: a new check only when the file differs from the one requested last. */
    private void follow(Path file) {
        Path f = file.toAbsolutePath().normalize();
        synchronized (this) {
            if (f.equals(requested)) {
                return;
            }
        }
        showProject(f);
    }

    private ResultsTree load(Path file, IProgressMonitor monitor) {
        try {
            SectionAnalysisService s = services.await(SERVICE_WAIT).orElse(null);
            if (s == null) {
                return ResultsTree.failed(file, Messages.ResultsView_noService);
            }
            if (monitor.isCanceled()) {
                throw new OperationCanceledException();
            }
            return new ResultsLoader(s).load(file, monitor);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return ResultsTree.failed(file, Messages.ResultsView_noService);
        }
    }

    /** @return the status line (what is shown, what is being checked, or what went wrong). UI thread. */
    public String statusText() {
        return status.getText();
    }

    /** @return what the tree shows now: the last project whose check has finished. UI thread. */
    public ResultsTree input() {
        return (ResultsTree) viewer.getInput();
    }

    /** @return the filter in force */
    public ResultsFilter filter() {
        return filter.filter();
    }

    /** Sets the filter (and the check boxes). UI thread. */
    public void setFilter(ResultsFilter f) {
        onlyFailing.setSelection(f.onlyFailing());
        onlyGoverning.setSelection(f.onlyGoverning());
        applyFilter();
    }

    /** @return the selected tree nodes, in tree order of selection. UI thread. */
    public List<ResultNode> selectedNodes() {
        List<ResultNode> out = new ArrayList<>();
        for (Object o : viewer.getStructuredSelection()) {
            if (o instanceof ResultNode n) {
                out.add(n);
            }
        }
        return out;
    }

    /**
     * @param csv true for CSV, false for the text outline
     * @return the selected nodes (or the whole tree when none is selected) as the filter shows them
     */
    public String clipboardText(boolean csv) {
        ResultsTree tree = input();
        if (tree == null || tree.root() == null) {
            return ""; //$NON-NLS-1$
        }
        ResultsText text = new ResultsText(tree, filter.filter(), Messages.ResultsView_caution);
        return csv ? text.csv(selectedNodes()) : text.text(selectedNodes());
    }

    /** Expands every node of the tree. UI thread. */
    public void expandAll() {
        viewer.expandAll();
    }

    private void applyFilter() {
        filter.set(new ResultsFilter(onlyFailing.getSelection(), onlyGoverning.getSelection()));
        viewer.refresh();
        viewer.expandToLevel(3);
    }

    private void sortBy(ResultsColumn column, TreeColumn treeColumn) {
        comparator.click(column);
        Tree tree = viewer.getTree();
        tree.setSortColumn(comparator.column() == null ? null : treeColumn);
        tree.setSortDirection(comparator.column() == null ? SWT.NONE : comparator.descending() ? SWT.DOWN : SWT.UP);
        viewer.refresh();
    }

    private void show(ResultsTree tree) {
        viewer.setInput(tree);
        viewer.expandToLevel(3);
        status.setText(tree.message());
        warnings.setText(tree.warnings().isEmpty() ? "" //$NON-NLS-1$
                : NLS.bind(Messages.ResultsView_warnings, String.join("; ", tree.warnings()))); //$NON-NLS-1$
        setContentDescription(tree.file().map(p -> String.valueOf(p.getFileName())).orElse("")); //$NON-NLS-1$
        status.getParent().layout(true);
    }

    private void refreshStyle() {
        if (viewer.getControl().isDisposed()) {
            return;
        }
        viewer.refresh(true);
        ResultsTree tree = input();
        if (tree != null) {
            CheckMarkers.update(tree);
        }
    }

    /** Checks the file again when its content changes in the workspace. */
    private void resourceChanged(IResourceChangeEvent event) {
        Path current;
        synchronized (this) {
            current = requested;
        }
        IResourceDelta delta = event.getDelta();
        if (current == null || delta == null) {
            return;
        }
        boolean[] changed = { false };
        try {
            delta.accept(d -> {
                if (d.getResource().getType() == org.eclipse.core.resources.IResource.FILE
                        && d.getResource().getLocation() != null
                        && Objects.equals(d.getResource().getLocation().toPath().toAbsolutePath().normalize(), current)
                        && (d.getKind() == IResourceDelta.ADDED
                                || (d.getFlags() & (IResourceDelta.CONTENT | IResourceDelta.REPLACED)) != 0)) {
                    changed[0] = true;
                }
                return !changed[0];
            });
        } catch (CoreException e) {
            ILog.of(getClass()).warn("Cannot read a workspace change", e); //$NON-NLS-1$
        }
        if (changed[0]) {
            showProject(current);
        }
    }

    @Override
    public void setFocus() {
        viewer.getControl().setFocus();
    }

    @Override
    public void dispose() {
        ResourcesPlugin.getWorkspace().removeResourceChangeListener(resourceListener);
        ResultsPreferences.removeListener(preferenceListener);
        if (follower != null) {
            follower.stop();
        }
        synchronized (this) {
            if (job != null) {
                job.cancel();
            }
        }
        if (services != null) {
            services.close();
        }
        super.dispose();
    }
}
