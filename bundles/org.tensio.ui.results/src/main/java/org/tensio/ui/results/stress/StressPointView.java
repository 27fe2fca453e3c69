package org.tensio.ui.results.stress;

import java.nio.file.Path;
import java.time.Duration;
import java.util.Objects;
import java.util.function.Consumer;

import org.eclipse.core.commands.Command;
import org.eclipse.core.commands.State;
import org.eclipse.core.runtime.Adapters;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.osgi.util.NLS;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.ui.IPartListener2;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.IWorkbenchPartReference;
import org.eclipse.ui.commands.ICommandService;
import org.eclipse.ui.handlers.RegistryToggleState;
import org.eclipse.ui.part.ViewPart;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.stress.PointStress;
import org.tensio.ui.results.model.ResultsText;
import org.tensio.ui.results.views.ResultsView;
import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.selection.SectionPointerSource;
import org.tensio.ui.services.AnalysisServiceTracker;

/**
 * The stress-point view ({@value #ID}): the full stress state at one point of a station's section — coordinates,
 * σz, τzx, τzy, principal stresses and directions, τmax, von Mises, Tresca, utilisation and governing criterion
 * (built-in and contributed criteria), the contribution of each internal force, the stress element and Mohr's
 * circles, and — at a station with a fatigue check — the fatigue results at the point for each load history and
 * fatigue criterion ({@link FatigueTable}).
 * <p>
 * It follows the pointer of the active part that offers a {@link SectionPointerSource} (the section editor) and
 * {@link SectionPoint} selections of any part (the results tree, the editor); pinned
 * ({@code org.tensio.ui.results.commands.togglePin}) it keeps its point. A pointer move costs an evaluation
 * on the section's cached finite-element solution ({@link PointEvaluator}, UI thread); the first point of a
 * section prepares it (read, properties, solve) in a background job, after which the latest point is shown.
 */
public final class StressPointView extends ViewPart {

    /** View id as declared in plugin.xml. */
    public static final String ID = "org.tensio.ui.results.views.stressPoint"; //$NON-NLS-1$
    /** Command id of the pin toggle. */
    public static final String PIN_COMMAND = "org.tensio.ui.results.commands.togglePin"; //$NON-NLS-1$

    private static final Duration SERVICE_WAIT = Duration.ofSeconds(30);

    private final PreparedSections sections = new PreparedSections();
    private final Consumer<SectionPoint> pointerListener = p -> {
        if (p != null) {
            show(p);
        }
    };
    private final ISelectionListener selectionListener = this::selectionChanged;
    private final IPartListener2 partListener = new IPartListener2() {
        @Override
        public void partActivated(IWorkbenchPartReference ref) {
            IWorkbenchPart part = ref.getPart(false);
            if (part != null && part != StressPointView.this) {
                follow(part);
            }
        }

        @Override
        public void partClosed(IWorkbenchPartReference ref) {
            if (ref.getPart(false) == sourcePart) {
                detach();
            }
        }
    };

    private AnalysisServiceTracker services;
    private Label header;
    private StressTables tables;
    private Canvas drawing;
    private Palette palette;
    private FatigueTable fatigue;
    private Label warnings;
    private IWorkbenchPart sourcePart;
    private SectionPointerSource source;
    private boolean pinned;
    private SectionPoint current;
    /** The fatigue result clicked in the results tree ({history, criterion}), or null: its row is selected. */
    private FatigueRow picked;
    /** The point {@link #picked} was clicked for (it applies to that point only). */
    private SectionPoint pickedFor;
    private PointReport report;
    private Job preparing;

    @Override
    public void createPartControl(Composite parent) {
        // header across; values on the left; the superposition above the drawings on the right
        GridLayoutFactory.fillDefaults().margins(4, 4).numColumns(2).applyTo(parent);
        header = new Label(parent, SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).span(2, 1).hint(300, SWT.DEFAULT).applyTo(header);
        tables = new StressTables(parent);
        GridDataFactory.fillDefaults().grab(false, true).span(1, 2).hint(370, 200).applyTo(tables.values());
        int rowHeight = tables.contributions().getItemHeight();
        GridDataFactory.fillDefaults().grab(true, false)
                .hint(360, tables.contributions().getHeaderHeight() + 7 * rowHeight + 6).applyTo(tables.contributions());
        drawing = new Canvas(parent, SWT.DOUBLE_BUFFERED | SWT.BORDER);
        drawing.setBackground(parent.getDisplay().getSystemColor(SWT.COLOR_WHITE));
        GridDataFactory.fillDefaults().grab(true, true).hint(420, 220).applyTo(drawing);
        palette = new Palette(drawing);
        drawing.addPaintListener(e -> {
            Rectangle a = drawing.getClientArea();
            PointStress s = report == null ? null : report.stress();
            if (s == null) {
                return;
            }
            String unit = report.units().stressUnit();
            int half = a.width / 2;
            StressElementPainter.paint(e.gc, new Rectangle(a.x, a.y, half, a.height), s.total(), unit, palette);
            MohrCirclePainter.paint(e.gc, new Rectangle(a.x + half, a.y, a.width - half, a.height), s.total(),
                    s.principal(), unit, palette);
        });
        fatigue = new FatigueTable(parent);
        GridDataFactory.fillDefaults().grab(true, false).span(2, 1).hint(300, SWT.DEFAULT).applyTo(fatigue.summary());
        GridDataFactory.fillDefaults().grab(true, false).span(2, 1)
                .hint(700, fatigue.table().getHeaderHeight() + 6 * rowHeight + 6).applyTo(fatigue.table());
        showFatigue(false);
        warnings = new Label(parent, SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).span(2, 1).hint(300, SWT.DEFAULT).applyTo(warnings);
        Label caution = new Label(parent, SWT.WRAP);
        caution.setText(Messages.StressPointView_caution);
        GridDataFactory.fillDefaults().grab(true, false).span(2, 1).hint(300, SWT.DEFAULT).applyTo(caution);
        header.setText(Messages.StressPointView_noPoint);

        services = new AnalysisServiceTracker(getClass());
        setPinnedState(false);
        getSite().getPage().addPartListener(partListener);
        getSite().getPage().addSelectionListener(selectionListener);
        IWorkbenchPart active = getSite().getPage().getActivePart();
        if (active != null && active != this) {
            follow(active);
        }
    }

    /**
     * Shows {@code point} (unless pinned): at once when its section is prepared, else after preparing it in the
     * background. UI thread.
     */
    public void show(SectionPoint point) {
        if (pinned || header.isDisposed()) {
            return;
        }
        current = point;
        PreparedSection p = sections.get(point.project(), point.sectionId());
        if (p != null) {
            evaluate(p, point);
        } else {
            prepare(point);
        }
    }

    /** @return what the view shows now, or null. UI thread. */
    public PointReport report() {
        return report;
    }

    /** @return the point last asked for (shown, or being prepared), or null */
    public SectionPoint point() {
        return current;
    }

    /** @return true when pinned */
    public boolean pinned() {
        return pinned;
    }

    /** Pins the view to its point or releases it (the toggle command's state follows). UI thread. */
    public void setPinned(boolean pin) {
        pinned = pin;
        setPinnedState(pin);
        updateHeader();
    }

    /** @return the prepared sections (each evaluated without a solve) */
    public PreparedSections sections() {
        return sections;
    }

    /** @return the values table (quantity, value, unit) */
    public Table valuesTable() {
        return tables.values();
    }

    /**
     * @return the fatigue table (history, criterion, σa′, σm′, σmax′, Se, n, utilisation), empty and hidden when
     *         the station has no fatigue check
     */
    public Table fatigueTable() {
        return fatigue.table();
    }

    /** @return the fatigue summary line (surface, Kf, Kfs, notches, Se and its factors), empty when none */
    public String fatigueSummary() {
        return fatigue.summary().getText();
    }

    /** Lays the fatigue widgets out only when they show something. */
    private void showFatigue(boolean visible) {
        for (org.eclipse.swt.widgets.Control c : new org.eclipse.swt.widgets.Control[] { fatigue.summary(),
                fatigue.table() }) {
            if (c.getVisible() != visible) {
                ((org.eclipse.swt.layout.GridData) c.getLayoutData()).exclude = !visible;
                c.setVisible(visible);
                c.getParent().layout(true);
            }
        }
    }

    /** @return the contributions table (force, σz, τzx, τzy) */
    public Table contributionsTable() {
        return tables.contributions();
    }

    private void evaluate(PreparedSection p, SectionPoint point) {
        try {
            PointReport r = PointEvaluator.evaluate(p, point);
            if (r == null) {
                report = null;
                tables.clear();
                showFatigue(fatigue.show(null, null));
                header.setText(NLS.bind(Messages.StressPointView_noStation, point.sectionId()));
            } else {
                report = r;
                tables.show(r);
                FatigueRow pick = point.equals(pickedFor) ? picked : null;
                if (pick == null && point.historyId() != null) {
                    pick = new FatigueRow(point.historyId(), null); // the point's load history: its governing row
                } else if (pick == null && point.caseId() != null && point.stationId() != null
                        && PointEvaluator.isHistoryOnly(p, p.project().station(point.stationId()), point.caseId())) {
                    pick = new FatigueRow(point.caseId(), null); // a history given as the case
                }
                showFatigue(fatigue.show(r, pick));
                updateHeader();
                warnings.setText(String.join("; ", r.warnings())); //$NON-NLS-1$
            }
        } catch (IllegalArgumentException e) {
            report = null;
            tables.clear();
            showFatigue(fatigue.show(null, null));
            header.setText(NLS.bind(Messages.StressPointView_outside, e.getMessage()));
            warnings.setText(""); //$NON-NLS-1$
        }
        drawing.redraw();
    }

    private void prepare(SectionPoint point) {
        Path file = point.project();
        String sectionId = point.sectionId();
        header.setText(NLS.bind(Messages.StressPointView_preparing, sectionId, file.getFileName()));
        if (preparing != null) {
            preparing.cancel();
        }
        Display display = header.getDisplay();
        preparing = Job.create(NLS.bind(Messages.StressPointView_job, sectionId), monitor -> {
            IStatus status = Status.OK_STATUS;
            String failure = null;
            try {
                SectionAnalysisService s = services.await(SERVICE_WAIT).orElse(null);
                if (s == null) {
                    failure = Messages.StressPointView_noService;
                } else {
                    sections.prepare(s, file, sectionId);
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                failure = Messages.StressPointView_noService;
            } catch (Exception e) { // bad file, unknown section, engine failure: a message, never a dead view
                failure = NLS.bind(Messages.StressPointView_failed, sectionId, e.getMessage());
                ILog.of(getClass()).warn(failure, e);
            }
            String message = failure;
            display.asyncExec(() -> {
                if (header.isDisposed() || current == null || !current.project().equals(file)
                        || !current.sectionId().equals(sectionId)) {
                    return;
                }
                if (message != null) {
                    report = null;
                    tables.clear();
                    showFatigue(fatigue.show(null, null));
                    header.setText(message);
                    drawing.redraw();
                } else {
                    show(current);
                }
            });
            return status;
        });
        preparing.setPriority(Job.SHORT);
        preparing.schedule();
    }

    private void updateHeader() {
        if (report == null) {
            return;
        }
        PointStress s = report.stress();
        String text = NLS.bind(report.caseChosen() ? Messages.StressPointView_headerChosen : Messages.StressPointView_header,
                new Object[] { s.station(), s.caseId(), report.sectionId(), s.material(),
                        ResultsText.number(s.point().x()), ResultsText.number(s.point().y()), report.units().length() });
        header.setText(pinned ? NLS.bind(Messages.StressPointView_pinned, text) : text);
    }

    private void selectionChanged(IWorkbenchPart part, ISelection selection) {
        if (part == this || !(selection instanceof IStructuredSelection s) || s.size() != 1) {
            return;
        }
        if (s.getFirstElement() instanceof SectionPoint p) {
            if (!pinned) {
                picked = pickedFatigue(part);
                pickedFor = p;
            }
            show(p);
        }
    }

    /**
     * @return the history and criterion of the fatigue result selected in {@code part} when it is the results view
     *         (the selection contract carries the history but not the criterion), else null
     */
    private static FatigueRow pickedFatigue(IWorkbenchPart part) {
        if (part instanceof ResultsView results && results.selectedNodes().size() == 1) {
            CheckResult r = results.selectedNodes().get(0).governing();
            if (r != null && r.isFatigue()) {
                return new FatigueRow(r.caseId(), r.criterion());
            }
        }
        return null;
    }

    /** Listens to the pointer of {@code part} when it offers one (the last such part stays followed). */
    private void follow(IWorkbenchPart part) {
        SectionPointerSource s = Adapters.adapt(part, SectionPointerSource.class);
        if (s == null || Objects.equals(s, source)) {
            return;
        }
        detach();
        sourcePart = part;
        source = s;
        source.addPointerListener(pointerListener);
    }

    private void detach() {
        if (source != null) {
            source.removePointerListener(pointerListener);
        }
        source = null;
        sourcePart = null;
    }

    private void setPinnedState(boolean value) {
        ICommandService commands = getSite().getService(ICommandService.class);
        Command command = commands == null ? null : commands.getCommand(PIN_COMMAND);
        State state = command == null ? null : command.getState(RegistryToggleState.STATE_ID);
        if (state != null && !Objects.equals(state.getValue(), value)) {
            state.setValue(value);
            commands.refreshElements(PIN_COMMAND, null);
        }
    }

    @Override
    public void setFocus() {
        tables.values().setFocus();
    }

    @Override
    public void dispose() {
        getSite().getPage().removePartListener(partListener);
        getSite().getPage().removeSelectionListener(selectionListener);
        detach();
        if (preparing != null) {
            preparing.cancel();
        }
        if (services != null) {
            services.close();
        }
        super.dispose();
    }
}
