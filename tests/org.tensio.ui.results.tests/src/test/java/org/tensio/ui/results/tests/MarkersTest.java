package org.tensio.ui.results.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Arrays;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.preferences.InstanceScope;
import org.eclipse.swt.widgets.Tree;
import org.eclipse.swt.widgets.TreeItem;
import org.eclipse.ui.PartInitException;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tensio.ui.results.markers.CheckMarkers;
import org.tensio.ui.results.markers.ExternalFiles;
import org.tensio.ui.results.preferences.ResultsPreferences;
import org.tensio.ui.results.views.ResultsView;
import org.tensio.ui.testsupport.Screenshots;
import org.tensio.ui.testsupport.UiConditions;

/**
 * Problems markers of the checks appear and clear as results change. Hand numbers (exact beam theory,
 * σ = M·c/I of a rectangle; common practice, no source): a 60 wide × 20 deep steel bar, I = 60·20³/12 = 40 000
 * mm⁴, c = 10 mm, fy = 355: Mx = 4e5 N·mm gives 100 MPa (utilisation 0.28169), the combination 1.25·(4e5 + 4e5)
 * gives 250 MPa (0.70423), Mx = 2e6 gives 500 MPa (1.40845).
 */
class MarkersTest {

    private static final String BAR = """
            {"tensio": 1, "units": {"length": "mm", "force": "N"},
             "materials": {"S355": {"E": 210000, "nu": 0.3, "fy": 355}},
             "sections": {"bar": {"material": "S355", "profile": {"type": "RectangleProfile", "xDim": 60, "yDim": 20}}},
             "stations": {"A": {"section": "bar", "forces": {"G": {"Mx": 4e5}, "Q": {"Mx": 4e5}}},
                          "B": {"section": "bar", "forces": {"G": {"Mx": %s}}}},
             "combinations": {"ULS": {"G": 1.25, "Q": 1.25}}}
            """;

    private WorkbenchFixture wb;
    private IProject project;

    @BeforeEach
    void open() throws Exception {
        wb = new WorkbenchFixture();
        project = ResourcesPlugin.getWorkspace().getRoot().getProject("checks");
        if (!project.exists()) {
            project.create(null);
        }
        project.open(null);
    }

    @AfterEach
    void reset() throws Exception {
        InstanceScope.INSTANCE.getNode(ResultsPreferences.NODE).remove(ResultsPreferences.WARNING_THRESHOLD);
        project.delete(true, true, null);
    }

    @Test
    void markersAppearAndClearWhenResultsChange() throws Exception {
        IFile file = project.getFile("bar.tensio.json");
        file.create(new ByteArrayInputStream(BAR.formatted("2e6").getBytes(StandardCharsets.UTF_8)), true, null);
        Path path = file.getLocation().toPath().toAbsolutePath().normalize();
        assertEquals(1, Cli.run("check", path.toString()).exit(), "the command line fails it too");

        ResultsView view = ResultsView.showIn(wb.page, path);
        waitForMarkers(path, 1, 0);
        IMarker error = CheckMarkers.markers(path)[0];
        assertEquals(IMarker.SEVERITY_ERROR, error.getAttribute(IMarker.SEVERITY, -1));
        assertEquals("B", error.getAttribute(CheckMarkers.STATION, ""));
        assertEquals("G", error.getAttribute(CheckMarkers.CASE, ""));
        assertEquals(500 / 355.0, Double.parseDouble(error.getAttribute(CheckMarkers.UTILISATION, "")), 1e-12,
                "500 MPa / 355 MPa");
        assertEquals(file, error.getResource(), "on the workspace file itself");
        assertTrue(error.getAttribute(IMarker.MESSAGE, "").contains("1.40845"), error.getAttribute(IMarker.MESSAGE, ""));
        showProblems("Errors (1 item)");
        Screenshots.save(wb.window.getShell(), "markers-error.png");

        // a lower warning threshold: A's combination (0.70423) becomes a warning
        ResultsPreferences.setWarningThreshold(0.5);
        waitForMarkers(path, 1, 1);

        // the file changes in the workspace: checked again, the error clears
        file.setContents(new ByteArrayInputStream(BAR.formatted("1e6").getBytes(StandardCharsets.UTF_8)), true,
                false, null);
        waitForMarkers(path, 0, 2);
        wb.waitForResults(view, path);
        assertTrue(view.input().root().passed());
        showProblems("Warnings (2 items)");
        Screenshots.save(wb.window.getShell(), "markers-warnings.png");

        // back to the default threshold 0.9: nothing left
        InstanceScope.INSTANCE.getNode(ResultsPreferences.NODE).remove(ResultsPreferences.WARNING_THRESHOLD);
        waitForMarkers(path, 0, 0);
    }

    @Test
    void aFileOutsideTheWorkspaceGetsItsMarkersOnAHiddenLink() throws Exception {
        Path demo = WorkbenchFixture.demo();
        // the expected markers from the command line's results: errors above 1, warnings above the threshold
        var results = Cli.run("check", demo.toString(), "--format", "json").json().getAsJsonArray("results").asList();
        int errors = (int) results.stream().filter(r -> r.getAsJsonObject().get("utilisation").getAsDouble() > 1)
                .count();
        int above = (int) results.stream()
                .filter(r -> r.getAsJsonObject().get("utilisation").getAsDouble() > 0.5).count();
        int aboveDefault = (int) results.stream()
                .filter(r -> r.getAsJsonObject().get("utilisation").getAsDouble() > 0.9).count();
        assertTrue(above > aboveDefault, "the demo has checks between 0.5 and 0.9");

        ResultsPreferences.setWarningThreshold(0.5);
        ResultsView.showIn(wb.page, demo);
        waitForMarkers(demo, errors, above - errors);
        IResource link = CheckMarkers.markers(demo)[0].getResource();
        assertEquals(ExternalFiles.PROJECT, link.getProject().getName());
        assertTrue(link.isLinked(), "a link, the file is not copied");
        assertTrue(link.getProject().isHidden(), "the holder project is hidden");
        assertEquals(demo, link.getLocation().toPath());
        InstanceScope.INSTANCE.getNode(ResultsPreferences.NODE).remove(ResultsPreferences.WARNING_THRESHOLD);
        waitForMarkers(demo, errors, aboveDefault - errors);
    }

    @Test
    void aBadFileIsOneErrorMarkerAndTheViewLives() throws Exception {
        IFile file = project.getFile("bad.tensio.json");
        file.create(new ByteArrayInputStream("{\"tensio\": 1, \"sections\": [oops".getBytes(StandardCharsets.UTF_8)),
                true, null);
        Path path = file.getLocation().toPath().toAbsolutePath().normalize();
        ResultsView view = ResultsView.showIn(wb.page, path);
        wb.waitForResults(view, path);
        assertTrue(view.input().failed());
        assertTrue(view.input().message().contains("bad.tensio.json"), view.input().message());
        waitForMarkers(path, 1, 0);
        assertEquals(2, Cli.run("check", path.toString()).exit(), "exit 2 on the command line");
    }

    private void waitForMarkers(Path file, int errors, int warnings) {
        UiConditions.waitUntil(wb.display, WorkbenchFixture.TIMEOUT, errors + " error and " + warnings
                + " warning markers on " + file, () -> count(file, IMarker.SEVERITY_ERROR) == errors
                        && count(file, IMarker.SEVERITY_WARNING) == warnings);
    }

    private static long count(Path file, int severity) {
        try {
            return Arrays.stream(CheckMarkers.markers(file))
                    .filter(m -> m.getAttribute(IMarker.SEVERITY, -1) == severity).count();
        } catch (CoreException e) {
            throw new AssertionError(e);
        }
    }

    /**
     * Shows the Problems view (from org.eclipse.ui.ide, present in the test runtime, not in the Tensio product)
     * and waits until it lists {@code group} (e.g. "Errors (1 item)"), with every group expanded.
     */
    private void showProblems(String group) throws PartInitException {
        wb.page.showView("org.eclipse.ui.views.ProblemView");
        UiConditions.waitUntil(wb.display, WorkbenchFixture.TIMEOUT, "the Problems view to list " + group,
                () -> !UiConditions.find(wb.window.getShell(), Tree.class, t -> {
                    for (TreeItem i : t.getItems()) {
                        org.eclipse.swt.widgets.Event expand = new org.eclipse.swt.widgets.Event();
                        expand.item = i;
                        t.notifyListeners(org.eclipse.swt.SWT.Expand, expand); // the viewer creates the children
                        i.setExpanded(true);
                        if (i.getText(0).equals(group)) {
                            return true;
                        }
                    }
                    return false;
                }).isEmpty());
        UiConditions.flush(wb.display);
    }
}
