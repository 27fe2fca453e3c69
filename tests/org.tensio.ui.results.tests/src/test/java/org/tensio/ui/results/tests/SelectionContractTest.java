package org.tensio.ui.results.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Tree;
import org.eclipse.swt.widgets.TreeItem;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tensio.ui.results.views.ResultsView;
import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.selection.StationRef;
import org.tensio.ui.testsupport.PointerSourceView;

/**
 * The selection contract of {@code org.tensio.ui.selection} as the results tree uses it: a part that publishes a
 * {@link StationRef} makes the tree show that project; a station node of the tree publishes a {@link StationRef},
 * a point node a {@link SectionPoint} (what the section editor listens to).
 */
class SelectionContractTest {

    private static final String BAR = """
            {"tensio": 1, "units": {"length": "mm", "force": "N"},
             "materials": {"S355": {"E": 210000, "nu": 0.3, "fy": 355}},
             "sections": {"bar": {"material": "S355", "profile": {"type": "RectangleProfile", "xDim": 60, "yDim": 20}}},
             "stations": {"A": {"section": "bar", "forces": {"G": {"Mx": 4e5}}}}, "combinations": {}}
            """;

    private WorkbenchFixture wb;

    @BeforeEach
    void open() throws Exception {
        wb = new WorkbenchFixture();
    }

    @Test
    void followsAPublishedStationRefAndPublishesTheContractValues(@TempDir Path dir) throws Exception {
        Path bar = dir.resolve("bar.tensio.json").toAbsolutePath().normalize();
        Files.writeString(bar, BAR, StandardCharsets.UTF_8);
        ResultsView view = ResultsView.showIn(wb.page, bar);
        wb.waitForResults(view, bar);

        // another part (the editor's stand-in) publishes a station of the demo: the tree follows
        Path demo = WorkbenchFixture.demo();
        PointerSourceView source = (PointerSourceView) wb.page.showView(WorkbenchFixture.POINTER_SOURCE_VIEW_ID);
        wb.page.activate(source);
        source.select(new StationRef(demo, "bracket_root", null));
        wb.waitForResults(view, demo);

        // a station node publishes a StationRef, a point node a SectionPoint at its governing point
        wb.page.activate(view);
        view.expandAll();
        Tree tree = wb.tree(view);
        TreeItem station = ResultsViewTest.find(tree.getItem(0).getItems(), "idler_axle_midspan");
        click(tree, station);
        Object first = first(wb.page.getSelection());
        assertEquals(new StationRef(demo, "idler_axle_midspan", null), first);

        TreeItem point = station.getItem(0).getItem(0).getItem(0); // case G, first criterion, its material
        click(tree, point);
        assertTrue(first(wb.page.getSelection()) instanceof SectionPoint, "a SectionPoint for a point node");
        SectionPoint p = (SectionPoint) first(wb.page.getSelection());
        assertEquals(demo, p.project());
        assertEquals("idler_axle_midspan", p.stationId());
        assertEquals("idler_axle", p.sectionId());
        assertEquals("G", p.caseId());
        assertEquals(30.0, Math.hypot(p.x(), p.y()), 1e-9, "on the outer circle of the 60 x 5 tube (r = 30)");
        assertEquals(null, p.historyId(), "a static result has no load history");

        // fatigue results: the tree's "case" is a load history, published as historyId (the case stays null)
        TreeItem sprocket = ResultsViewTest.find(tree.getItem(0).getItems(), "drive_shaft_sprocket");
        TreeItem running = ResultsViewTest.find(sprocket.getItems(), "running");
        click(tree, running);
        assertEquals(new StationRef(demo, "drive_shaft_sprocket", null, "running"), first(wb.page.getSelection()));
        click(tree, ResultsViewTest.find(running.getItems(), "fatigueGoodman"));
        SectionPoint f = (SectionPoint) first(wb.page.getSelection());
        assertEquals("running", f.historyId());
        assertEquals(null, f.caseId());
        assertEquals("drive_shaft", f.sectionId());
        // a static case node of the same station keeps historyId null
        click(tree, ResultsViewTest.find(sprocket.getItems(), "ULS"));
        assertEquals(new StationRef(demo, "drive_shaft_sprocket", "ULS"), first(wb.page.getSelection()));
        wb.page.hideView(source);
    }

    private static void click(Tree tree, TreeItem item) {
        tree.setSelection(item);
        Event e = new Event();
        e.item = item;
        tree.notifyListeners(SWT.Selection, e);
    }

    private static Object first(ISelection s) {
        return s instanceof IStructuredSelection ss ? ss.getFirstElement() : null;
    }
}
