package org.tensio.ui.editor.ui;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.draw2d.geometry.Point;
import org.eclipse.draw2d.geometry.Rectangle;
import org.eclipse.osgi.util.NLS;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.widgets.Display;
import org.tensio.engine.project.Project;
import org.tensio.ui.editor.figures.OverlayFigure;
import org.tensio.ui.editor.figures.ViewTransform;
import org.tensio.ui.editor.model.Part;
import org.tensio.ui.editor.overlay.ColourScale;
import org.tensio.ui.editor.overlay.ContourJob;
import org.tensio.ui.editor.overlay.ContourRequest;
import org.tensio.ui.editor.overlay.ContourResult;
import org.tensio.ui.editor.overlay.Quantity;
import org.tensio.ui.editor.parts.Inks;
import org.tensio.ui.editor.parts.Outlines;
import org.tensio.ui.editor.parts.SectionEditPart;
import org.tensio.ui.editor.preferences.DisplayUnits;
import org.tensio.ui.editor.preferences.EditorPreferences;

/**
 * Runs contour jobs for the page's current choice (one at a time: a new choice cancels the running job) and
 * draws their results: flat-coloured sub-triangles of each 6-node element, the mesh, centroid, principal axes,
 * shear centre, dimensions and the legend.
 */
final class OverlayController {

    private static final long DELAY_MS = 150;

    private final ProjectEditor editor;
    private final SectionPage page;
    private ContourJob running;
    private ContourResult shown;
    private String failure;

    OverlayController(ProjectEditor editor, SectionPage page) {
        this.editor = editor;
        this.page = page;
    }

    /** Starts a job for the current choice (after a short delay, cancelling the previous one). */
    void recompute() {
        drawDimensions();
        Project project = editor.project();
        String section = page.sectionId();
        if (running != null) {
            running.cancel();
            running = null;
        }
        if (project == null || section == null || !project.sections().containsKey(section)) {
            return;
        }
        String station = page.stationId();
        String caseId = station == null ? null : page.caseId();
        ContourRequest request = new ContourRequest(project, section, station, caseId, page.quantity(),
                EditorPreferences.meshDensity());
        Display display = page.control().getDisplay();
        ContourJob job = new ContourJob(request, editor.services(), result -> display.asyncExec(() -> arrived(result)),
                message -> display.asyncExec(() -> failed(request, message)));
        running = job;
        page.legend().showMessage(Messages.Legend_computing);
        job.schedule(DELAY_MS);
    }

    /** The project became invalid: keep the drawing, say so in the legend. */
    void invalid() {
        if (running != null) {
            running.cancel();
            running = null;
        }
        page.legend().showMessage(Messages.Legend_invalid);
    }

    private void arrived(ContourResult result) {
        if (page.control().isDisposed() || running == null || running.request() != result.request()) {
            return;
        }
        running = null;
        shown = result;
        failure = null;
        redraw();
    }

    private void failed(ContourRequest request, String message) {
        if (page.control().isDisposed() || running == null || running.request() != request) {
            return;
        }
        running = null;
        shown = null;
        failure = message;
        page.legend().showMessage(NLS.bind(Messages.Legend_failed, message));
        redraw();
    }

    /** @return true while a contour job runs for the current choice */
    boolean busy() {
        return running != null;
    }

    /** @return the result drawn, or null */
    ContourResult shown() {
        return shown;
    }

    /** @return the last failure message, or null */
    String failure() {
        return failure;
    }

    /** Redraws the overlay from the last result with the current check boxes. */
    void redraw() {
        SectionEditPart part = page.sectionPart();
        if (part == null) {
            return;
        }
        OverlayFigure overlay = part.overlay();
        Inks inks = (Inks) page.viewer().getProperty(Inks.PROPERTY);
        overlay.setInks(inks.get(Inks.OUTLINE), inks.get(Inks.MESH), inks.get(Inks.AXES), inks.get(Inks.MARK));
        ContourResult r = shown != null && shown.request().sectionId().equals(page.sectionId()) ? shown : null;
        ViewTransform t = part.transform();
        drawContour(overlay, r, t, inks);
        overlay.setMesh(r != null && page.meshOn() ? meshEdges(r, t) : new int[0]);
        if (r != null && page.axesOn()) {
            overlay.setCentroid(new Point(t.fx(r.centroid().x()), t.fy(r.centroid().y())),
                    Math.toRadians(r.principalAngleDeg()), (int) (0.6 * ViewTransform.TARGET_EXTENT));
            overlay.setShearCentre(r.shearCentre() == null ? null
                    : new Point(t.fx(r.shearCentre().x()), t.fy(r.shearCentre().y())));
        } else {
            overlay.setCentroid(null, 0, 0);
            overlay.setShearCentre(null);
        }
        page.showing(r);
        drawDimensions();
    }

    private void drawContour(OverlayFigure overlay, ContourResult r, ViewTransform t, Inks inks) {
        if (r == null || r.values() == null || !page.contourOn() || !Double.isFinite(r.max())) {
            overlay.setContour(new int[0], new int[0], new Color[0]);
            if (r != null && failure == null) {
                if (r.values() == null) {
                    page.legend().showMessage(noContour(r.request()));
                } else if (!Double.isFinite(r.max())) {
                    page.legend().showMessage(Messages.Legend_noValues);
                }
            }
            return;
        }
        Quantity q = r.request().quantity();
        ColourScale scale = EditorPreferences.colourScale();
        double[] edges = ColourScale.edges(q, r.min(), r.max());
        List<RGB> rgbs = SectionPage.bandColours(scale, q);
        Color[] colours = new Color[ColourScale.BANDS_COUNT + 1];
        for (int i = 0; i < ColourScale.BANDS_COUNT; i++) {
            colours[i] = inks.get(rgbs.get(i));
        }
        int[] over = ColourScale.OVER_LIMIT;
        RGB overRgb = new RGB(over[0], over[1], over[2]);
        colours[ColourScale.BANDS_COUNT] = inks.get(overRgb);
        int n = r.elementCount();
        int[] tri = new int[n * 4 * 6];
        int[] bands = new int[n * 4];
        int count = 0;
        // sub-triangles of a 6-node triangle: corners 0,1,2; mid-sides 3 (0-1), 4 (1-2), 5 (2-0)
        int[][] subs = { { 0, 3, 5 }, { 3, 1, 4 }, { 5, 4, 2 }, { 3, 4, 5 } };
        for (int e = 0; e < n; e++) {
            for (int[] s : subs) {
                double v = 0;
                boolean ok = true;
                for (int k = 0; k < 3; k++) {
                    double nv = r.values()[6 * e + s[k]];
                    ok &= Double.isFinite(nv);
                    v += nv / 3;
                }
                if (!ok) {
                    continue;
                }
                for (int k = 0; k < 3; k++) {
                    int node = r.elements()[6 * e + s[k]];
                    tri[6 * count + 2 * k] = t.fx(r.x()[node]);
                    tri[6 * count + 2 * k + 1] = t.fy(r.y()[node]);
                }
                bands[count++] = ColourScale.bandOf(q, v, edges);
            }
        }
        overlay.setContour(java.util.Arrays.copyOf(tri, 6 * count), java.util.Arrays.copyOf(bands, count), colours);
        DisplayUnits units = EditorPreferences.displayUnits();
        double f = q.isUtilisation() ? 1 : units.stress(editor.model().lengthUnit(), editor.model().forceUnit());
        double[] shownEdges = edges.clone();
        for (int i = 0; i < shownEdges.length; i++) {
            shownEdges[i] *= f;
        }
        String unit = q.isUtilisation() ? "–" : units.stressSymbol(r.stressUnit()); //$NON-NLS-1$
        String title = NLS.bind(Messages.Legend_title, Labels.quantity(q), unit);
        String caseLabel = NLS.bind(q.fatigue() ? Messages.Legend_history : Messages.Legend_case,
                r.request().stationId(), r.request().caseId());
        String minMax = NLS.bind(Messages.Legend_minMax, Format.number(r.min() * f), Format.number(r.max() * f));
        page.legend().show(new LegendCanvas.Legend(title, caseLabel, shownEdges, rgbs,
                q.isUtilisation() && r.max() > 1 ? overRgb : null, minMax, q.fatigue() ? Messages.FatigueCaution : null));
    }

    /** @return why a request without a case shows no contour */
    private static String noContour(ContourRequest request) {
        if (!request.quantity().fatigue()) {
            return Messages.Legend_noCase;
        }
        Project project = request.project();
        String station = request.stationId();
        if (station == null || !project.stations().containsKey(station)
                || project.fatigue().stations().containsKey(station)) {
            return Messages.Legend_noHistory;
        }
        List<String> withFatigue = new ArrayList<>();
        for (String id : project.fatigue().stations().keySet()) {
            if (project.stations().containsKey(id)
                    && project.stations().get(id).sectionId().equals(request.sectionId())) {
                withFatigue.add(id);
            }
        }
        return withFatigue.isEmpty() ? NLS.bind(Messages.Legend_noFatigueHere, station)
                : NLS.bind(Messages.Legend_noFatigue, station, String.join(", ", withFatigue)); //$NON-NLS-1$
    }

    private static int[] meshEdges(ContourResult r, ViewTransform t) {
        int n = r.elementCount();
        int[] edges = new int[n * 3 * 4];
        for (int e = 0; e < n; e++) {
            for (int k = 0; k < 3; k++) {
                int a = r.elements()[6 * e + k];
                int b = r.elements()[6 * e + (k + 1) % 3];
                int o = 12 * e + 4 * k;
                edges[o] = t.fx(r.x()[a]);
                edges[o + 1] = t.fy(r.y()[a]);
                edges[o + 2] = t.fx(r.x()[b]);
                edges[o + 3] = t.fy(r.y()[b]);
            }
        }
        return edges;
    }

    private static Rectangle sectionBox(SectionEditPart part) {
        List<double[]> loops = new ArrayList<>();
        for (Part p : part.section().parts()) {
            loops.addAll(Outlines.of(p));
        }
        double[] b = Outlines.bounds(loops);
        if (b == null) {
            return null;
        }
        ViewTransform t = part.transform();
        return new Rectangle(new Point(t.fx(b[0]), t.fy(b[3])), new Point(t.fx(b[2]), t.fy(b[1])));
    }

    /** Dimensions of the shown section from the model's outlines (no engine). */
    void drawDimensions() {
        SectionEditPart part = page.sectionPart();
        if (part == null) {
            return;
        }
        List<double[]> loops = new ArrayList<>();
        for (Part p : part.section().parts()) {
            loops.addAll(Outlines.of(p));
        }
        double[] b = Outlines.bounds(loops);
        if (b == null) {
            part.overlay().setDimensions(null, "", ""); //$NON-NLS-1$ //$NON-NLS-2$
            return;
        }
        ViewTransform t = part.transform();
        Rectangle box = new Rectangle(new Point(t.fx(b[0]), t.fy(b[3])), new Point(t.fx(b[2]), t.fy(b[1])));
        DisplayUnits units = EditorPreferences.displayUnits();
        String unit = units.lengthSymbol(editor.model().lengthUnit());
        double f = units.length(editor.model().lengthUnit());
        part.overlay().setDimensions(box, Format.number((b[2] - b[0]) * f) + " " + unit, //$NON-NLS-1$
                Format.number((b[3] - b[1]) * f) + " " + unit); //$NON-NLS-1$
        updateOverlayBounds();
    }

    /** Makes the overlay figure cover the section, its axes and its dimension labels. */
    void updateOverlayBounds() {
        SectionEditPart part = page.sectionPart();
        if (part == null) {
            return;
        }
        Rectangle r = sectionBox(part);
        if (r == null) {
            return;
        }
        int axis = (int) (0.6 * ViewTransform.TARGET_EXTENT);
        Point c = part.overlay().centroid();
        if (c != null) {
            r.union(new Rectangle(c.x - axis, c.y - axis, 2 * axis, 2 * axis));
        }
        part.setOverlayBounds(r.expand(140, 60));
    }
}
