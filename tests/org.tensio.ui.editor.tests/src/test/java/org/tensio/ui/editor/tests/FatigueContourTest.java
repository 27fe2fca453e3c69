package org.tensio.ui.editor.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tensio.ui.editor.tests.EditorFixture.TIMEOUT;
import static org.tensio.ui.testsupport.UiConditions.waitUntil;

import java.nio.file.Path;
import java.util.List;

import org.eclipse.swt.graphics.RGB;
import org.eclipse.ui.IWorkbenchPage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.osgi.framework.FrameworkUtil;
import org.osgi.util.tracker.ServiceTracker;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.checks.FatigueCheckOp;
import org.tensio.engine.mesh.MeshOptions;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.ui.editor.overlay.ColourScale;
import org.tensio.ui.editor.overlay.ContourResult;
import org.tensio.ui.editor.overlay.Quantity;
import org.tensio.ui.editor.preferences.EditorPreferences;
import org.tensio.ui.editor.ui.ProjectEditor;
import org.tensio.ui.testsupport.Screenshots;
import org.tensio.ui.testsupport.UiConditions;

/**
 * The fatigue-utilisation contour of the demo's drive shaft at the sprocket (a shoulder fillet on the surface, a
 * keyseat near (0, 30)): the case chooser offers the station's load histories, the contour's maximum is the
 * engine's governing fatigue utilisation of the history ({@link FatigueCheckOp}, the same per-sample numbers:
 * 1e-12 relative), the screen shows the keyseat's notch factor, and a station without a fatigue check says so.
 */
class FatigueContourTest {

    private static final String STATION = "drive_shaft_sprocket";

    private IWorkbenchPage page;

    @BeforeEach
    void openPerspective() throws Exception {
        EditorPreferences.node().clear(); // the default mesh: the one the check uses
        page = EditorFixture.page();
    }

    @AfterEach
    void closeEditors() {
        page.closeAllEditors(false);
    }

    @Test
    void fatigueUtilisationOfTheStartUpHistory(@TempDir Path dir) throws Exception {
        ProjectEditor editor = EditorFixture.open(page, EditorFixture.demoCopy(dir));
        editor.showSection("drive_shaft");
        editor.showStation(STATION, "SLS");
        editor.showQuantity(Quantity.FATIGUE_UTILISATION);
        assertEquals(List.of("running", "start_up"), editor.caseChoices(), "the load histories of the station");
        editor.showStation(STATION, "start_up");
        var display = EditorFixture.display(editor);
        waitUntil(display, TIMEOUT, "the fatigue contour of start_up", () -> {
            ContourResult r = editor.contour();
            return r != null && !editor.contourBusy() && r.request().quantity() == Quantity.FATIGUE_UTILISATION
                    && "start_up".equals(r.request().caseId());
        });
        ContourResult r = editor.contour();
        assertEquals(MeshOptions.DEFAULT_ELEMENTS, r.request().targetElements());

        List<CheckResult> check = new FatigueCheckOp(editor.project(), service()).results(null);
        double governing = governing(check, "start_up");
        assertEquals(governing, r.max(), 1e-12 * governing, "the contour's max is the check's governing utilisation");
        assertTrue(governing > governing(check, "running"), "the fluctuating torque of the start-up governs");
        assertTrue(r.min() >= 0 && r.min() < 0.05 * r.max(), "near zero at the centre: " + r.min());

        List<String> legend = editor.legendTexts();
        assertTrue(legend.get(0).startsWith("Fatigue utilisation") && legend.get(0).endsWith("[–]"), legend.get(0));
        assertTrue(legend.get(1).contains(STATION) && legend.get(1).contains("load history start_up"), legend.get(1));
        assertTrue(legend.contains("Fatigue results are sensitive to the surface, notch and load-spectrum "
                + "assumptions; the governing design rules decide."), legend.toString());
        assertTrue(legend.get(legend.size() - 1).startsWith("Results support, not replace"), legend.toString());

        // the screen: 4 inside the outer fibre the keyseat (within 9 of (0, 30)) raises the band over the
        // opposite side, where no notch acts (same radius, so the same stresses without Kf)
        UiConditions.flush(display);
        waitUntil(display, TIMEOUT, "the screen to show a band colour opposite the keyseat",
                () -> bandAt(editor, 3, -26) >= 0);
        int keyseat = bandAt(editor, 3, 26);
        int opposite = bandAt(editor, 3, -26);
        assertTrue(keyseat > opposite, "band near the keyseat " + keyseat + ", opposite " + opposite);
        assertEquals(0, bandAt(editor, 4, 4), "the lowest band near the centre");
        Screenshots.save(page.getWorkbenchWindow().getShell(), "editor-fatigue-contour.png",
                EditorFixture::paintFigures);

        // back to a stress: the cases return, the chosen one kept
        editor.showQuantity(Quantity.SIGMA_Z);
        assertTrue(editor.caseChoices().contains("SLS") && editor.caseChoices().contains("ULS"),
                editor.caseChoices().toString());
        waitUntil(display, TIMEOUT, "the σz contour of SLS", () -> editor.contour() != null && !editor.contourBusy()
                && editor.contour().request().quantity() == Quantity.SIGMA_Z
                && "SLS".equals(editor.contour().request().caseId()));
    }

    @Test
    void aStationWithoutFatigueCheckSaysSo(@TempDir Path dir) throws Exception {
        ProjectEditor editor = EditorFixture.open(page, EditorFixture.demoCopy(dir));
        editor.showSection("drive_shaft");
        editor.showStation("drive_shaft_bearing", null);
        editor.showQuantity(Quantity.FATIGUE_UTILISATION);
        assertEquals(List.of(), editor.caseChoices(), "no load history to offer");
        var display = EditorFixture.display(editor);
        waitUntil(display, TIMEOUT, "the legend's message", () -> editor.contour() != null && !editor.contourBusy()
                && editor.contour().request().quantity() == Quantity.FATIGUE_UTILISATION
                && "drive_shaft_bearing".equals(editor.contour().request().stationId()));
        assertNull(editor.contour().values(), "no contour");
        assertEquals(0, editor.overlayFigure().contourTriangleCount());
        String message = editor.legendTexts().get(0);
        assertTrue(message.contains("drive_shaft_bearing has no fatigue check") && message.contains(STATION), message);
    }

    /** @return the largest fatigue utilisation of the station for {@code history} among the check's results */
    private static double governing(List<CheckResult> check, String history) {
        return check.stream().filter(c -> c.station().equals(STATION) && c.caseId().equals(history))
                .mapToDouble(CheckResult::utilisation).max().orElseThrow();
    }

    private SectionAnalysisService service() throws InterruptedException {
        var context = FrameworkUtil.getBundle(getClass()).getBundleContext();
        ServiceTracker<SectionAnalysisService, SectionAnalysisService> tracker = new ServiceTracker<>(context,
                SectionAnalysisService.class, null);
        tracker.open();
        try {
            SectionAnalysisService s = tracker.waitForService(TIMEOUT.toMillis());
            assertNotNull(s, "the engine's DS service");
            return s;
        } finally {
            tracker.close();
        }
    }

    /** @return the band of the sequential scale the screen shows at section point (x, y), −1 for another colour */
    private static int bandAt(ProjectEditor editor, double x, double y) {
        var t = EditorFixture.section(editor).transform();
        org.eclipse.draw2d.geometry.Point p = new org.eclipse.draw2d.geometry.Point(t.fx(x), t.fy(y));
        EditorFixture.section(editor).getContentPane().translateToAbsolute(p);
        RGB rgb = Screenshots.pixel(editor.graphicalViewer().getControl(), p.x, p.y, EditorFixture::paintFigures);
        for (int i = 0; i < ColourScale.BANDS_COUNT; i++) {
            int[] c = ColourScale.BANDS.band(i, false);
            if (rgb.equals(new RGB(c[0], c[1], c[2]))) {
                return i;
            }
        }
        int[] o = ColourScale.OVER_LIMIT;
        return rgb.equals(new RGB(o[0], o[1], o[2])) ? ColourScale.BANDS_COUNT : -1;
    }
}
