package org.tensio.ui.views;

import java.nio.file.Path;
import java.time.Duration;
import java.util.concurrent.atomic.AtomicInteger;

import org.eclipse.core.runtime.ICoreRunnable;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.osgi.util.NLS;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchPartConstants;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.part.ViewPart;
import org.tensio.ui.services.AnalysisServiceTracker;

/**
 * The Sections view ({@code org.tensio.ui.views.sections}): one row of properties per section of a project
 * file, computed by the engine's {@code SectionAnalysisService}. A bad file shows a message, never an error
 * dialog or a dead view. Each time a load finishes the view fires {@link IWorkbenchPartConstants#PROP_INPUT}
 * (see {@link #input()}), so that other views can follow the project it shows.
 */
public final class SectionsView extends ViewPart {

    /** View id as declared in plugin.xml. */
    public static final String ID = "org.tensio.ui.views.sections"; //$NON-NLS-1$

    private static final Duration SERVICE_WAIT = Duration.ofSeconds(30);

    private final AtomicInteger request = new AtomicInteger();
    private AnalysisServiceTracker services;
    private Label status;
    private TableViewer viewer;

    /** Shows the Sections view in {@code page} and loads {@code file} into it. */
    public static SectionsView showIn(IWorkbenchPage page, Path file) throws PartInitException {
        SectionsView view = (SectionsView) page.showView(ID);
        view.showProject(file);
        return view;
    }

    @Override
    public void createPartControl(Composite parent) {
        GridLayoutFactory.fillDefaults().margins(4, 4).applyTo(parent);
        status = new Label(parent, SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(status);
        viewer = new TableViewer(parent, SWT.BORDER | SWT.FULL_SELECTION | SWT.MULTI | SWT.H_SCROLL | SWT.V_SCROLL);
        Table table = viewer.getTable();
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        GridDataFactory.fillDefaults().grab(true, true).applyTo(table);
        for (SectionColumn column : SectionColumn.values()) {
            TableViewerColumn c = new TableViewerColumn(viewer,
                    column == SectionColumn.SECTION ? SWT.LEFT : SWT.RIGHT);
            c.getColumn().setText(column.header());
            c.getColumn().setWidth(column.width());
        }
        viewer.setContentProvider(new SectionsContentProvider());
        viewer.setLabelProvider(new SectionsLabelProvider());
        Label caution = new Label(parent, SWT.WRAP);
        caution.setText(Messages.SectionsView_caution);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(caution);
        services = new AnalysisServiceTracker(getClass());
        show(SectionsInput.none());
    }

    /** Loads {@code file} in a background job; the table changes when the engine is done. Any thread. */
    public void showProject(Path file) {
        int id = request.incrementAndGet();
        viewer.getControl().getDisplay().asyncExec(() -> {
            if (!status.isDisposed()) {
                status.setText(NLS.bind(Messages.SectionsView_loading, file));
            }
        });
        Job.create(NLS.bind(Messages.SectionsView_job, file.getFileName()), (ICoreRunnable) monitor -> {
            SectionsInput input = load(file);
            viewer.getControl().getDisplay().asyncExec(() -> {
                if (id == request.get() && !viewer.getControl().isDisposed()) {
                    show(input);
                }
            });
        }).schedule();
    }

    private SectionsInput load(Path file) {
        try {
            return services.await(SERVICE_WAIT).map(s -> new SectionsLoader(s).load(file))
                    .orElseGet(() -> SectionsInput.failed(file, Messages.SectionsView_noService));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return SectionsInput.failed(file, Messages.SectionsView_noService);
        }
    }

    /** @return what the table shows now: the last project file whose loading has finished. UI thread. */
    public SectionsInput input() {
        return (SectionsInput) viewer.getInput();
    }

    private void show(SectionsInput input) {
        viewer.setInput(input);
        status.setText(input.message());
        if (!input.rows().isEmpty()) {
            TableColumn[] columns = viewer.getTable().getColumns();
            for (int i = 0; i < columns.length; i++) {
                columns[i].pack();
                columns[i].setWidth(Math.max(columns[i].getWidth(), SectionColumn.values()[i].width()));
            }
        }
        status.getParent().layout(true);
        // tells listeners (the result views) that input() changed
        firePropertyChange(IWorkbenchPartConstants.PROP_INPUT);
    }

    @Override
    public void setFocus() {
        viewer.getControl().setFocus();
    }

    @Override
    public void dispose() {
        if (services != null) {
            services.close();
        }
        super.dispose();
    }
}
