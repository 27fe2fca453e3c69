package org.tensio.ui.editor.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tensio.ui.editor.tests.EditorFixture.TIMEOUT;
import static org.tensio.ui.testsupport.UiConditions.waitUntil;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.core.resources.IMarker;
import org.eclipse.core.runtime.NullProgressMonitor;
import org.eclipse.gef.editparts.ZoomManager;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Event;
import org.eclipse.ui.IWorkbenchPage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tensio.ui.editor.model.Part;
import org.tensio.ui.editor.model.Vertex;
import org.tensio.ui.editor.overlay.ColourScale;
import org.tensio.ui.editor.overlay.ContourResult;
import org.tensio.ui.editor.overlay.Quantity;
import org.tensio.ui.editor.ui.ProjectEditor;
import org.tensio.ui.editor.validation.ProblemMarkers;
import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.testsupport.Screenshots;
import org.tensio.ui.testsupport.UiConditions;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

/** The section editor on the demo project, driven in the running workbench (UI thread). */
class ProjectEditorTest {

    private IWorkbenchPage page;

    @BeforeEach
    void openPerspective() throws Exception {
        page = EditorFixture.page();
    }

    @AfterEach
    void closeEditors() {
        page.closeAllEditors(false);
    }

    @Test
    void moveUndoRedoSaveReopen(@TempDir Path dir) throws Exception {
        Path file = EditorFixture.demoCopy(dir);
        JsonObject before = JsonParser.parseString(Files.readString(file)).getAsJsonObject();
        ProjectEditor editor = EditorFixture.open(page, file);
        editor.showSection("bracket");
        editor.getAdapter(ZoomManager.class).setZoom(1);
        Part part = editor.model().section("bracket").parts().get(0);
        Vertex corner = part.profile().outer().vertices().get(0);
        assertEquals(0, corner.x());
        assertEquals(0, corner.y());

        EditorFixture.drag(editor, EditorFixture.handle(editor, corner), -5, 0);
        assertEquals(-5, corner.x(), 0, "5 mm left: 10 figure units at scale 2, exact");
        assertEquals(0, corner.y(), 0);
        assertTrue(editor.isDirty());
        UiConditions.flush(EditorFixture.display(editor));
        editor.fit();
        waitUntil(EditorFixture.display(editor), TIMEOUT, "validation of the move",
                () -> editor.project() != null && editor.problems().isEmpty());
        Screenshots.save(page.getWorkbenchWindow().getShell(), "editor-vertex-moved.png", EditorFixture::paintFigures);

        editor.getCommandStack().undo();
        assertEquals(0, corner.x(), 0);
        assertFalse(editor.isDirty(), "undo back to the saved state");
        editor.getCommandStack().redo();
        assertEquals(-5, corner.x(), 0);
        assertTrue(editor.isDirty());

        editor.doSave(new NullProgressMonitor());
        assertFalse(editor.isDirty());
        JsonObject saved = JsonParser.parseString(Files.readString(file, StandardCharsets.UTF_8)).getAsJsonObject();
        JsonArray outer = before.getAsJsonObject("sections").getAsJsonObject("bracket").getAsJsonObject("profile")
                .getAsJsonArray("outer");
        JsonArray moved = new JsonArray();
        moved.add(-5);
        moved.add(0);
        outer.set(0, moved);
        assertEquals(before, saved, "the saved file is the original with only that vertex changed");
        try (var leftovers = Files.list(dir)) {
            assertEquals(List.of(file), leftovers.toList(), "no temporary file left beside the project");
        }

        page.closeEditor(editor, false);
        ProjectEditor reopened = EditorFixture.open(page, file);
        Vertex again = reopened.model().section("bracket").parts().get(0).profile().outer().vertices().get(0);
        assertEquals(-5, again.x(), 0);
        assertFalse(reopened.isDirty());
        assertTrue(reopened.problems().isEmpty(), "the saved file is valid: " + reopened.problems());
    }

    @Test
    void invalidEditMakesAMarkerAndFixingItRemovesIt(@TempDir Path dir) throws Exception {
        Path file = EditorFixture.demoCopy(dir);
        ProjectEditor editor = EditorFixture.open(page, file);
        editor.showSection("bracket");
        ProblemMarkers markers = new ProblemMarkers(file);
        assertTrue(markers.find().isEmpty(), "the demo is valid");
        Part part = editor.model().section("bracket").parts().get(0);
        // vertex [0, 50] dragged to the far side crosses the bottom edge: the outer boundary intersects itself
        Vertex v = part.profile().outer().vertices().get(4);
        assertEquals(50, v.y());
        editor.getAdapter(ZoomManager.class).setZoom(1);
        EditorFixture.drag(editor, EditorFixture.handle(editor, v), 60, -80);

        var display = EditorFixture.display(editor);
        waitUntil(display, TIMEOUT, "a problem marker", () -> !find(markers).isEmpty());
        IMarker marker = find(markers).get(0);
        String message = marker.getAttribute(IMarker.MESSAGE, "");
        assertTrue(message.contains("bracket"), message);
        assertEquals(IMarker.SEVERITY_ERROR, marker.getAttribute(IMarker.SEVERITY, -1));
        waitUntil(display, TIMEOUT, "the part to be marked in the drawing", () -> editor.errorParts().contains(part));
        page.showView("org.eclipse.ui.views.ProblemView");
        page.activate(editor);
        UiConditions.flush(display);
        Screenshots.save(page.getWorkbenchWindow().getShell(), "editor-invalid-marker.png",
                EditorFixture::paintFigures);

        editor.getCommandStack().undo();
        waitUntil(display, TIMEOUT, "the marker to go", () -> find(markers).isEmpty());
        waitUntil(display, TIMEOUT, "the drawing's mark to go", () -> editor.errorParts().isEmpty());
    }

    @Test
    void contourOfAChosenCombination(@TempDir Path dir) throws Exception {
        Path file = EditorFixture.demoCopy(dir);
        ProjectEditor editor = EditorFixture.open(page, file);
        editor.showSection("platform_beam");
        editor.showStation("platform_beam_midspan", "ULS");
        editor.showQuantity(Quantity.SIGMA_Z);
        var display = EditorFixture.display(editor);
        waitUntil(display, TIMEOUT, "the σz contour of ULS", () -> {
            ContourResult r = editor.contour();
            return r != null && !editor.contourBusy() && "ULS".equals(r.request().caseId())
                    && r.request().quantity() == Quantity.SIGMA_Z;
        });
        ContourResult r = editor.contour();
        var overlay = editor.overlayFigure();
        assertTrue(overlay.contourTriangleCount() > 1000, "4 sub-triangles per element: " + overlay.contourTriangleCount());
        // ULS: Mx = 1.35 (−25e6) + 1.5 (−55e6) = −116.25e6 N mm, N = 0: σ = Mx y / Ixx, top fibres (y = 150)
        // compressed. IPE 300: Ixx = 8356 cm⁴ (producers' section tables, from memory); 1 % for the rounding of
        // the tabulated value.
        double expectedTop = -116.25e6 * 150 / 8356e4;
        assertEquals(expectedTop, r.min(), 0.01 * Math.abs(expectedTop), "σz at the top fibre");
        assertEquals(-expectedTop, r.max(), 0.01 * Math.abs(expectedTop), "σz at the bottom fibre");
        // the figure: triangles near the top flange are in the compression half of the scale, near the bottom
        // in the tension half (diverging scale symmetric about 0)
        int[] extremes = topAndBottomBands(editor);
        assertTrue(extremes[0] < ColourScale.BANDS_COUNT / 2, "top band " + extremes[0]);
        assertTrue(extremes[1] >= ColourScale.BANDS_COUNT / 2, "bottom band " + extremes[1]);
        assertEquals(0, extremes[0], "the top fibre is in the lowest band");
        assertEquals(ColourScale.BANDS_COUNT - 1, extremes[1], "the bottom fibre is in the highest band");
        UiConditions.flush(display);
        // pixels: inside the bottom flange (y = −145) the screen shows the highest band's colour, inside the
        // top flange (y = +145) the lowest band's
        waitUntil(display, TIMEOUT, "the screen to show the highest band in the bottom flange",
                () -> band(ColourScale.BANDS_COUNT - 1).equals(screenAt(editor, 40, -145)));
        assertEquals(band(0), screenAt(editor, -40, 145), "top flange colour");
        Screenshots.save(page.getWorkbenchWindow().getShell(), "editor-contour-sigma-uls.png",
                EditorFixture::paintFigures);

        editor.showQuantity(Quantity.UTILISATION);
        waitUntil(display, TIMEOUT, "the utilisation contour", () -> editor.contour() != null
                && !editor.contourBusy() && editor.contour().request().quantity() == Quantity.UTILISATION);
        assertTrue(editor.contour().max() > 0);
        UiConditions.flush(display);
        Screenshots.save(page.getWorkbenchWindow().getShell(), "editor-contour-utilisation-uls.png",
                EditorFixture::paintFigures);
    }

    @Test
    void clickPublishesASectionPoint(@TempDir Path dir) throws Exception {
        Path file = EditorFixture.demoCopy(dir);
        ProjectEditor editor = EditorFixture.open(page, file);
        editor.showSection("drive_shaft");
        var display = EditorFixture.display(editor);
        UiConditions.flush(display);
        var canvas = editor.graphicalViewer().getControl();
        var centre = editor.graphicalViewer().getContents().getViewer().getControl().getSize();
        // the figure origin (section origin, the shaft's centre) in canvas coordinates
        org.eclipse.draw2d.geometry.Point origin = new org.eclipse.draw2d.geometry.Point(0, 0);
        EditorFixture.section(editor).getContentPane().translateToAbsolute(origin);
        assertTrue(origin.x > 0 && origin.x < centre.x, "origin visible: " + origin);
        Event down = new Event();
        down.button = 1;
        down.x = origin.x;
        down.y = origin.y;
        canvas.notifyListeners(SWT.MouseDown, down);
        Object last = ((IStructuredSelection) editor.getSite().getSelectionProvider().getSelection()).toList().stream()
                .filter(SectionPoint.class::isInstance).findFirst().orElse(null);
        assertNotNull(last, "a SectionPoint in the editor's selection");
        SectionPoint p = (SectionPoint) last;
        assertEquals(file.toAbsolutePath().normalize(), p.project());
        assertEquals("drive_shaft", p.sectionId());
        assertEquals("drive_shaft_bearing", p.stationId());
        double pixel = 1 / (EditorFixture.section(editor).transform().scale()
                * editor.getAdapter(ZoomManager.class).getZoom());
        assertEquals(0, p.x(), pixel, "within one pixel of the centre");
        assertEquals(0, p.y(), pixel);
    }

    private static org.eclipse.swt.graphics.RGB band(int i) {
        int[] c = ColourScale.BANDS.band(i, true);
        return new org.eclipse.swt.graphics.RGB(c[0], c[1], c[2]);
    }

    /** @return the screen colour at section point (x, y) */
    private static org.eclipse.swt.graphics.RGB screenAt(ProjectEditor editor, double x, double y) {
        var t = EditorFixture.section(editor).transform();
        org.eclipse.draw2d.geometry.Point p = new org.eclipse.draw2d.geometry.Point(t.fx(x), t.fy(y));
        EditorFixture.section(editor).getContentPane().translateToAbsolute(p);
        return Screenshots.pixel(editor.graphicalViewer().getControl(), p.x, p.y, EditorFixture::paintFigures);
    }

    private static List<IMarker> find(ProblemMarkers markers) {
        try {
            return markers.find();
        } catch (org.eclipse.core.runtime.CoreException e) {
            throw new AssertionError(e);
        }
    }

    /** @return bands of the contour triangles with the smallest and the largest figure y (top, bottom) */
    private static int[] topAndBottomBands(ProjectEditor editor) {
        var overlay = editor.overlayFigure();
        int top = -1;
        int bottom = -1;
        int minY = Integer.MAX_VALUE;
        int maxY = Integer.MIN_VALUE;
        for (int t = 0; t < overlay.contourTriangleCount(); t++) {
            int[] c = overlay.triangle(t);
            int y = (c[1] + c[3] + c[5]) / 3;
            if (y < minY) {
                minY = y;
                top = t;
            }
            if (y > maxY) {
                maxY = y;
                bottom = t;
            }
        }
        return new int[] { overlay.band(top), overlay.band(bottom) };
    }
}
