package org.tensio.ui.editor.ui;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;

import org.eclipse.draw2d.geometry.Dimension;
import org.eclipse.draw2d.geometry.Point;
import org.eclipse.draw2d.geometry.Rectangle;
import org.eclipse.gef.EditPart;
import org.eclipse.gef.GraphicalViewer;
import org.eclipse.gef.MouseWheelHandler;
import org.eclipse.gef.MouseWheelZoomHandler;
import org.eclipse.gef.SnapToGeometry;
import org.eclipse.gef.SnapToGrid;
import org.eclipse.gef.editparts.ScalableFreeformRootEditPart;
import org.eclipse.gef.editparts.ZoomManager;
import org.eclipse.gef.ui.parts.GraphicalViewerKeyHandler;
import org.eclipse.gef.ui.parts.ScrollingGraphicalViewer;
import org.eclipse.jface.action.MenuManager;
import org.eclipse.osgi.util.NLS;
import org.eclipse.swt.SWT;
import org.eclipse.swt.events.MouseEvent;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.tensio.engine.fatigue.FatigueStation;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.ui.editor.figures.OverlayFigure;
import org.tensio.ui.editor.figures.PartFigure;
import org.tensio.ui.editor.figures.ViewTransform;
import org.tensio.ui.editor.model.Part;
import org.tensio.ui.editor.model.SectionModel;
import org.tensio.ui.editor.overlay.ColourScale;
import org.tensio.ui.editor.overlay.ContourResult;
import org.tensio.ui.editor.overlay.Quantity;
import org.tensio.ui.editor.parts.Inks;
import org.tensio.ui.editor.parts.PartEditPart;
import org.tensio.ui.editor.parts.SectionEditPart;
import org.tensio.ui.editor.parts.SectionEditPartFactory;
import org.tensio.ui.editor.preferences.DisplayUnits;
import org.tensio.ui.editor.preferences.EditorPreferences;
import org.tensio.ui.editor.validation.ErrorPlace;
import org.tensio.ui.editor.validation.Problem;
import org.tensio.ui.selection.SectionPoint;

/**
 * The graphical page: choosers (section, station, case, quantity, overlays), the GEF viewer drawing the section
 * in the file's units with grid and vertex snap, zoom and fit, the legend, and a line for problems and the
 * pointer position. Contours come from {@link OverlayController}.
 */
final class SectionPage {

    private static final double[] ZOOMS = { 0.1, 0.2, 0.25, 0.5, 0.75, 1, 1.5, 2, 3, 4, 6, 8, 12, 16 };

    private final ProjectEditor editor;
    private final Inks inks;
    private Composite control;
    private Combo sectionCombo;
    private Combo stationCombo;
    private Combo caseCombo;
    private Label caseLabel;
    private Combo quantityCombo;
    private Button meshCheck;
    private Button axesCheck;
    private Button contourCheck;
    private ScrollingGraphicalViewer viewer;
    private LegendCanvas legend;
    private Label problemLine;
    private Label pointerLine;
    private OverlayController overlays;
    private List<String> stationIds = List.of();
    private List<String> caseIds = List.of();
    /** whether the case chooser lists the load histories of the station's fatigue check (fatigue quantity) */
    private boolean historiesListed;
    /** The quantity shown before another view's selection switched to the fatigue quantity, or null. */
    private Quantity staticQuantity;
    /** the choice of the other kind (case while histories are listed, history otherwise), restored on return */
    private String otherKindChoice;

    SectionPage(ProjectEditor editor, Inks inks) {
        this.editor = editor;
        this.inks = inks;
    }

    Control create(Composite parent) {
        control = new Composite(parent, SWT.NONE);
        control.setLayout(new GridLayout(2, false));
        createChoosers(control);
        viewer = new ScrollingGraphicalViewer();
        Control canvas = viewer.createControl(control);
        ((org.eclipse.draw2d.FigureCanvas) canvas).getLightweightSystem()
                .setUpdateManager(new org.tensio.ui.editor.figures.RedrawUpdateManager(canvas));
        canvas.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        canvas.setBackground(canvas.getDisplay().getSystemColor(SWT.COLOR_WHITE));
        legend = new LegendCanvas(control, inks);
        GridData ld = new GridData(SWT.FILL, SWT.FILL, false, true);
        ld.widthHint = 210;
        legend.setLayoutData(ld);
        problemLine = new Label(control, SWT.WRAP);
        problemLine.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        problemLine.setForeground(inks.get(Inks.ERROR));
        pointerLine = new Label(control, SWT.NONE);
        pointerLine.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        configureViewer();
        overlays = new OverlayController(editor, this);
        return control;
    }

    private void createChoosers(Composite parent) {
        Composite bar = new Composite(parent, SWT.NONE);
        bar.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        org.eclipse.swt.layout.RowLayout row = new org.eclipse.swt.layout.RowLayout(SWT.HORIZONTAL);
        row.wrap = true;
        row.center = true;
        bar.setLayout(row);
        new Label(bar, SWT.NONE).setText(Messages.SectionPage_section);
        sectionCombo = new Combo(bar, SWT.READ_ONLY);
        sectionCombo.addListener(SWT.Selection, e -> showSection(sectionCombo.getText()));
        new Label(bar, SWT.NONE).setText(Messages.SectionPage_station);
        stationCombo = new Combo(bar, SWT.READ_ONLY);
        stationCombo.addListener(SWT.Selection, e -> refreshCasesAndContour());
        caseLabel = new Label(bar, SWT.NONE);
        caseLabel.setText(Messages.SectionPage_case);
        caseCombo = new Combo(bar, SWT.READ_ONLY);
        caseCombo.addListener(SWT.Selection, e -> overlays.recompute());
        new Label(bar, SWT.NONE).setText(Messages.SectionPage_quantity);
        quantityCombo = new Combo(bar, SWT.READ_ONLY);
        for (Quantity q : Quantity.values()) {
            quantityCombo.add(Labels.quantity(q));
        }
        quantityCombo.select(EditorPreferences.quantity().ordinal());
        quantityCombo.addListener(SWT.Selection, e -> refreshCasesAndContour());
        contourCheck = check(bar, Messages.SectionPage_contour, true);
        meshCheck = check(bar, Messages.SectionPage_mesh, false);
        axesCheck = check(bar, Messages.SectionPage_axes, true);
        Button fit = new Button(bar, SWT.PUSH);
        fit.setText(Messages.SectionPage_fit);
        fit.addListener(SWT.Selection, e -> fit());
    }

    private Button check(Composite bar, String text, boolean on) {
        Button b = new Button(bar, SWT.CHECK);
        b.setText(text);
        b.setSelection(on);
        b.addListener(SWT.Selection, e -> overlays.redraw());
        return b;
    }

    private void configureViewer() {
        ScalableFreeformRootEditPart root = new ScalableFreeformRootEditPart();
        viewer.setRootEditPart(root);
        viewer.setEditPartFactory(new SectionEditPartFactory());
        viewer.setProperty(Inks.PROPERTY, inks);
        viewer.setProperty(SnapToGrid.PROPERTY_GRID_ENABLED, Boolean.TRUE);
        viewer.setProperty(SnapToGrid.PROPERTY_GRID_VISIBLE, Boolean.TRUE);
        viewer.setProperty(SnapToGeometry.PROPERTY_SNAP_ENABLED, Boolean.TRUE);
        viewer.setProperty(MouseWheelHandler.KeyGenerator.getKey(SWT.MOD1), MouseWheelZoomHandler.SINGLETON);
        viewer.setKeyHandler(new GraphicalViewerKeyHandler(viewer));
        ZoomManager zoom = root.getZoomManager();
        zoom.setZoomLevels(ZOOMS);
        editor.editDomain().addViewer(viewer);
        viewer.addSelectionChangedListener(e -> editor.selection().partsSelected(e.getSelection()));
        MenuManager menu = new MenuManager();
        viewer.setContextMenu(menu);
        editor.getSite().registerContextMenu(ProjectEditor.CONTEXT_MENU_ID, menu, viewer);
        Control canvas = viewer.getControl();
        canvas.addListener(SWT.MouseDown, e -> {
            if (e.button == 1) {
                clicked(e.x, e.y);
            }
        });
        canvas.addMouseMoveListener(this::pointerMoved);
        canvas.addListener(SWT.MouseExit, e -> editor.pointer().moved(null));
    }

    /** Shows the sections of the model and the first (or the one shown before). */
    void refreshSections() {
        String current = sectionId();
        sectionCombo.removeAll();
        for (SectionModel s : editor.model().sections()) {
            sectionCombo.add(s.id());
        }
        int index = current == null ? 0 : Math.max(0, sectionCombo.indexOf(current));
        if (sectionCombo.getItemCount() > 0) {
            sectionCombo.select(index);
            showSection(sectionCombo.getItem(index));
        } else {
            viewer.setContents(null);
        }
    }

    /** Shows section {@code id} (no effect when unknown). */
    void showSection(String id) {
        SectionModel s = editor.model().section(id);
        if (s == null) {
            return;
        }
        sectionCombo.select(sectionCombo.indexOf(id));
        viewer.setContents(s);
        configureGrid();
        refreshStations();
        overlays.recompute();
        fit();
    }

    private void configureGrid() {
        SectionEditPart part = sectionPart();
        if (part == null) {
            return;
        }
        double step = gridStep(part);
        int px = (int) Math.max(2, Math.round(step * part.transform().scale()));
        viewer.setProperty(SnapToGrid.PROPERTY_GRID_SPACING, new Dimension(px, px));
        viewer.setProperty(SnapToGrid.PROPERTY_GRID_ORIGIN, new Point(0, 0));
    }

    /** Grid step in the file's length unit: a 1-2-5 number at most a fifteenth of the section. */
    double gridStep(SectionEditPart part) {
        double raw = ViewTransform.TARGET_EXTENT / part.transform().scale() / 15;
        double decade = Math.pow(10, Math.floor(Math.log10(raw)));
        double m = raw / decade;
        return (m >= 5 ? 5 : m >= 2 ? 2 : 1) * decade;
    }

    private void refreshStations() {
        String keep = stationId();
        stationCombo.removeAll();
        List<String> ids = new ArrayList<>();
        stationCombo.add(Messages.SectionPage_noStation);
        ids.add(null);
        Project project = editor.project();
        for (var st : editor.model().stations()) {
            if (sectionId() != null && sectionId().equals(st.section())) {
                stationCombo.add(st.id());
                ids.add(st.id());
            }
        }
        stationIds = ids;
        int index = keep != null && ids.contains(keep) ? ids.indexOf(keep) : ids.size() > 1 ? 1 : 0;
        stationCombo.select(index);
        stationCombo.getParent().layout(true, true);
        refreshCases(project);
    }

    private void refreshCasesAndContour() {
        refreshCases(editor.project());
        overlays.recompute();
    }

    /**
     * Lists the station's load cases and combinations, or for the fatigue quantity the load histories of its
     * fatigue check (none when it has no fatigue check: the legend says so), keeping the choice of each kind.
     */
    private void refreshCases(Project project) {
        boolean histories = quantity().fatigue();
        String keep = caseId();
        if (histories != historiesListed) {
            String other = otherKindChoice;
            otherKindChoice = keep;
            keep = other;
            historiesListed = histories;
            caseLabel.setText(histories ? Messages.SectionPage_history : Messages.SectionPage_case);
        }
        caseCombo.removeAll();
        List<String> ids = new ArrayList<>();
        String station = stationId();
        if (station != null && project != null && project.stations().containsKey(station)) {
            if (histories) {
                FatigueStation fs = project.fatigue().station(station);
                if (fs != null) {
                    ids.addAll(fs.histories().keySet());
                }
            } else {
                Station st = project.stations().get(station);
                ids.addAll(st.cases().keySet());
                ids.addAll(project.combinations().keySet());
            }
        }
        ids.forEach(caseCombo::add);
        caseIds = ids;
        if (!ids.isEmpty()) {
            caseCombo.select(keep != null && ids.contains(keep) ? ids.indexOf(keep) : 0);
        }
        caseCombo.getParent().layout(true, true);
    }

    /** The engine's validation result arrived (UI thread). */
    void validated(Project project, List<Problem> problems) {
        List<Part> errorParts = new ArrayList<>();
        StringBuilder text = new StringBuilder();
        for (Problem p : problems) {
            text.append(text.length() == 0 ? "" : "\n").append(p.message()); //$NON-NLS-1$ //$NON-NLS-2$
            ErrorPlace place = ErrorPlace.of(p.path());
            SectionModel s = place.sectionId() == null ? null : editor.model().section(place.sectionId());
            if (s != null && !s.parts().isEmpty()) {
                int i = place.partIndex() < 0 ? 0 : Math.min(place.partIndex(), s.parts().size() - 1);
                errorParts.add(s.parts().get(i));
            }
        }
        problemLine.setText(text.toString());
        control.layout(true, true);
        viewer.setProperty(PartEditPart.ERROR_PARTS, errorParts);
        if (project != null) {
            String keepStation = stationId();
            refreshStations();
            if (keepStation != null && stationIds.contains(keepStation)) {
                stationCombo.select(stationIds.indexOf(keepStation));
            }
            overlays.recompute();
        } else {
            overlays.invalid();
        }
    }

    /**
     * Shows a station's section and case, or — for a load history of its fatigue check — the fatigue quantity for
     * that history (from another view's selection). A case while the fatigue quantity is shown brings back the
     * quantity shown before it (utilisation when none).
     */
    void showStation(String station, String caseId, String historyId) {
        Project project = editor.project();
        FatigueStation fs = project == null ? null : project.fatigue().station(station);
        if (historyId != null && fs != null && fs.histories().containsKey(historyId)) {
            if (!quantity().fatigue()) {
                staticQuantity = quantity();
                quantityCombo.select(Quantity.FATIGUE_UTILISATION.ordinal());
            }
            showStation(station, historyId);
            return;
        }
        if (historyId == null && caseId != null && quantity().fatigue()) {
            quantityCombo.select((staticQuantity != null ? staticQuantity : Quantity.UTILISATION).ordinal());
        }
        showStation(station, caseId);
    }

    /** Shows a station's section and case (from another view's selection). */
    void showStation(String station, String caseId) {
        var st = editor.model().stations().stream().filter(s -> s.id().equals(station)).findFirst().orElse(null);
        if (st == null || st.section() == null) {
            return;
        }
        if (!st.section().equals(sectionId())) {
            showSection(st.section());
        }
        if (stationIds.contains(station)) {
            stationCombo.select(stationIds.indexOf(station));
            refreshCases(editor.project());
        }
        if (caseId != null && caseIds.contains(caseId)) {
            caseCombo.select(caseIds.indexOf(caseId));
        }
        overlays.recompute();
    }

    /** Marks a point of the shown section (section frame, length unit); null removes the mark. */
    void mark(double[] xy) {
        SectionEditPart part = sectionPart();
        if (part == null) {
            return;
        }
        ViewTransform t = part.transform();
        part.overlay().setMark(xy == null ? null : new Point(t.fx(xy[0]), t.fy(xy[1])));
        overlays.updateOverlayBounds();
    }

    /** Zooms so that the whole section is visible. */
    void fit() {
        ZoomManager zoom = zoomManager();
        if (zoom != null && viewer.getControl() != null) {
            viewer.getControl().getDisplay().asyncExec(() -> {
                if (viewer.getControl() != null && !viewer.getControl().isDisposed()) {
                    zoom.setZoomAsText(ZoomManager.FIT_ALL);
                }
            });
        }
    }

    ZoomManager zoomManager() {
        return viewer == null ? null : ((ScalableFreeformRootEditPart) viewer.getRootEditPart()).getZoomManager();
    }

    private void clicked(int x, int y) {
        double[] p = sectionPoint(x, y);
        if (p == null) {
            return;
        }
        editor.selection().pointSelected(inside(x, y)
                ? new SectionPoint(editor.path(), stationId(), sectionId(), pointCaseId(), p[0], p[1],
                        pointHistoryId()) : null);
    }

    private void pointerMoved(MouseEvent e) {
        double[] p = sectionPoint(e.x, e.y);
        if (p == null) {
            return;
        }
        DisplayUnits units = EditorPreferences.displayUnits();
        String unit = units.lengthSymbol(editor.model().lengthUnit());
        double f = units.length(editor.model().lengthUnit());
        pointerLine.setText(NLS.bind(Messages.SectionPage_pointer,
                new Object[] { Format.number(p[0] * f), Format.number(p[1] * f), unit }));
        editor.pointer().moved(inside(e.x, e.y)
                ? new SectionPoint(editor.path(), stationId(), sectionId(), pointCaseId(), p[0], p[1],
                        pointHistoryId()) : null);
    }

    /** @return the section-frame point under canvas point (x, y), or null when no section is shown */
    double[] sectionPoint(int x, int y) {
        SectionEditPart part = sectionPart();
        if (part == null) {
            return null;
        }
        Point p = new Point(x, y);
        part.getContentPane().translateToRelative(p);
        return new double[] { part.transform().x(p.x), part.transform().y(p.y) };
    }

    private boolean inside(int x, int y) {
        SectionEditPart part = sectionPart();
        Point p = new Point(x, y);
        part.getContentPane().translateToRelative(p);
        for (Object child : part.getChildren()) {
            if (child instanceof PartEditPart pe && ((PartFigure) pe.getFigure()).containsPoint(p.x, p.y)) {
                return true;
            }
        }
        return false;
    }

    /** @return the edit part of the shown section, or null */
    SectionEditPart sectionPart() {
        EditPart contents = viewer == null ? null : viewer.getContents();
        return contents instanceof SectionEditPart s ? s : null;
    }

    GraphicalViewer viewer() {
        return viewer;
    }

    LegendCanvas legend() {
        return legend;
    }

    Control control() {
        return control;
    }

    String sectionId() {
        return sectionCombo == null || sectionCombo.getSelectionIndex() < 0 ? null : sectionCombo.getText();
    }

    String stationId() {
        int i = stationCombo == null ? -1 : stationCombo.getSelectionIndex();
        return i < 0 || i >= stationIds.size() ? null : stationIds.get(i);
    }

    String caseId() {
        int i = caseCombo == null ? -1 : caseCombo.getSelectionIndex();
        return i < 0 || i >= caseIds.size() ? null : caseIds.get(i);
    }

    /**
     * @return the case of a published point: the chosen case or combination; null ("the governing one") while the
     *         chooser lists load histories, which are not load cases
     */
    private String pointCaseId() {
        return historiesListed ? null : caseId();
    }

    /** @return the load history of a published point: the chosen one while the fatigue quantity is shown */
    private String pointHistoryId() {
        return historiesListed ? caseId() : null;
    }

    /** Chooses a case or combination (a load history for the fatigue quantity) by id (no effect when not offered). */
    void selectCase(String id) {
        if (caseIds.contains(id)) {
            caseCombo.select(caseIds.indexOf(id));
            overlays.recompute();
        }
    }

    /** @return the ids the case chooser offers (cases and combinations, or load histories), in its order */
    List<String> caseChoices() {
        return caseIds;
    }

    /** Chooses a quantity (the case chooser follows: load histories for the fatigue quantity). */
    void selectQuantity(Quantity q) {
        quantityCombo.select(q.ordinal());
        refreshCasesAndContour();
    }

    Quantity quantity() {
        return Quantity.values()[Math.max(0, quantityCombo.getSelectionIndex())];
    }

    boolean contourOn() {
        return contourCheck.getSelection();
    }

    void setMesh(boolean on) {
        meshCheck.setSelection(on);
        overlays.redraw();
    }

    boolean meshOn() {
        return meshCheck.getSelection();
    }

    boolean axesOn() {
        return axesCheck.getSelection();
    }

    OverlayController overlays() {
        return overlays;
    }

    /** Band colours of the current colour scale for a quantity (index BANDS_COUNT: over the limit). */
    static List<RGB> bandColours(ColourScale scale, Quantity q) {
        List<RGB> colours = new ArrayList<>();
        for (int i = 0; i < ColourScale.BANDS_COUNT; i++) {
            int[] c = scale.band(i, q.signed());
            colours.add(new RGB(c[0], c[1], c[2]));
        }
        return colours;
    }

    /** @return the parts marked as the place of an error */
    Collection<?> errorParts() {
        Object o = viewer.getProperty(PartEditPart.ERROR_PARTS);
        return o instanceof Collection<?> c ? c : List.of();
    }

    /** Overlay figure of the shown section, or null. */
    OverlayFigure overlay() {
        SectionEditPart part = sectionPart();
        return part == null ? null : part.overlay();
    }

    /** Sets the overlay figure's bounds to cover {@code r} (figure coordinates). */
    void overlayBounds(Rectangle r) {
        SectionEditPart part = sectionPart();
        if (part != null) {
            part.setOverlayBounds(r);
        }
    }

    /** Result of a contour job for the current choice (UI thread). */
    void showing(ContourResult result) {
        viewer.setProperty(PartEditPart.CONTOUR_SHOWN, result != null && result.values() != null && contourOn());
    }
}
