package org.tensio.ui.results.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.eclipse.core.commands.Command;
import org.eclipse.core.commands.ParameterizedCommand;
import org.eclipse.swt.SWT;
import org.eclipse.swt.dnd.Clipboard;
import org.eclipse.swt.dnd.TextTransfer;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Tree;
import org.eclipse.swt.widgets.TreeColumn;
import org.eclipse.swt.widgets.TreeItem;
import org.eclipse.ui.commands.ICommandService;
import org.eclipse.ui.handlers.IHandlerService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tensio.engine.checks.CheckResult;
import org.tensio.ui.results.model.ResultNode;
import org.tensio.ui.results.model.ResultsFilter;
import org.tensio.ui.results.views.ResultsView;
import org.tensio.ui.testsupport.Screenshots;
import org.tensio.ui.testsupport.UiConditions;
import org.tensio.ui.views.SectionsView;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;

/**
 * The results tree on the demo project, against the command line ({@code tensio check demo --format json|csv},
 * run in-process: the same code as ./tensio). The tree shows the engine's own numbers, so they must agree to the
 * last bit: both come from {@code CheckOp.check} on the same file and Gson writes the shortest decimal that reads
 * back to the same double. The tolerance 1e-12 relative admits nothing but a different summation order, of
 * which there is none.
 */
class ResultsViewTest {

    private static final double SAME_COMPUTATION = 1e-12;

    private WorkbenchFixture wb;

    @BeforeEach
    void open() throws Exception {
        wb = new WorkbenchFixture();
    }

    @Test
    void treeShowsTheDemoResultsAsTheCommandLine() throws Exception {
        Path demo = WorkbenchFixture.demo();
        ResultsView view = ResultsView.showIn(wb.page, demo);
        wb.waitForResults(view, demo);
        assertFalse(view.input().failed(), view.input().message());

        JsonObject cli = Cli.run("check", demo.toString(), "--format", "json").json();
        JsonArray expected = cli.getAsJsonArray("results");
        List<ResultNode> points = WorkbenchFixture.points(view.input().root());
        assertEquals(expected.size(), points.size(), "one point node per check result");
        // the tree groups station > case > criterion > material; the report lists material before criterion
        Map<String, ResultNode> byKey = new java.util.HashMap<>();
        for (ResultNode n : points) {
            byKey.put(n.stationId() + "|" + n.caseId() + "|" + n.criterion() + "|" + n.governing().material(), n);
        }
        assertEquals(points.size(), byKey.size(), "no two point nodes for the same check");
        for (int i = 0; i < expected.size(); i++) {
            JsonObject e = expected.get(i).getAsJsonObject();
            ResultNode n = byKey.get(e.get("station").getAsString() + "|" + e.get("case").getAsString() + "|"
                    + e.get("criterion").getAsString() + "|" + e.get("material").getAsString());
            String where = "result " + i + " " + e;
            assertTrue(n != null, "a node for " + where);
            CheckResult r = n.governing();
            assertEquals(e.get("station").getAsString(), n.stationId(), where);
            assertEquals(e.get("case").getAsString(), n.caseId(), where);
            assertEquals(e.get("criterion").getAsString(), n.criterion(), where);
            assertEquals(e.get("material").getAsString(), r.material(), where);
            close(e.get("utilisation").getAsDouble(), r.utilisation(), 1, where);
            close(e.get("demand").getAsDouble(), r.demand(), r.capacity(), where);
            close(e.get("capacity").getAsDouble(), r.capacity(), r.capacity(), where);
            close(e.getAsJsonObject("point").get("x").getAsDouble(), r.point().x(), 300, where);
            close(e.getAsJsonObject("point").get("y").getAsDouble(), r.point().y(), 300, where);
            assertEquals(e.get("passed").getAsBoolean(), n.passed(), where);
        }
        assertEquals(cli.get("passed").getAsBoolean(), view.input().root().passed());
        close(cli.get("maxUtilisation").getAsDouble(), view.input().root().utilisation(), 1, "max utilisation");

        // what the widget shows: the governing chain of the project, six significant digits
        view.expandAll();
        Tree tree = wb.tree(view);
        TreeItem root = tree.getItem(0);
        assertEquals("demo.tensio.json", root.getText(0));
        assertEquals(String.format(java.util.Locale.ROOT, "%.6g", cli.get("maxUtilisation").getAsDouble()),
                root.getText(1));
        assertEquals("ok", root.getText(2));
        assertEquals(stations(cli), root.getItemCount(), "one node per station");
        TreeItem beam = find(root.getItems(), "platform_beam_midspan");
        TreeItem uls = find(beam.getItems(), "ULS");
        TreeItem shear = find(uls.getItems(), "maxShear");
        assertEquals("S355", shear.getItem(0).getText(0));
        assertEquals("0.587860", shear.getItem(0).getText(1));
        assertEquals("18.7500", shear.getItem(0).getText(6));
        assertEquals("-150.000", shear.getItem(0).getText(7));
        assertFalse(caution().isEmpty(), "caution line in the results view");
        tree.setTopItem(root);
        UiConditions.flush(wb.display);
        Screenshots.save(wb.window.getShell(), "results-tree.png");
    }

    @Test
    void filtersSortingAndCopyAsCsv() throws Exception {
        Path demo = WorkbenchFixture.demo();
        ResultsView view = ResultsView.showIn(wb.page, demo);
        wb.waitForResults(view, demo);
        Tree tree = wb.tree(view);

        view.setFilter(new ResultsFilter(false, true));
        view.expandAll();
        TreeItem root = tree.getItem(0);
        JsonObject cli0 = Cli.run("check", demo.toString(), "--format", "json").json();
        assertEquals(stations(cli0), root.getItemCount(), "only governing keeps every station");
        for (TreeItem station : root.getItems()) {
            assertEquals(1, station.getItemCount(), "one governing case at " + station.getText(0));
            TreeItem c = station.getItem(0);
            assertEquals(1, c.getItemCount(), "one governing criterion");
            assertEquals(1, c.getItem(0).getItemCount(), "one governing point");
            assertEquals(station.getText(1), c.getItem(0).getItem(0).getText(1), "the chain carries the station's value");
        }
        tree.setTopItem(root);
        UiConditions.flush(wb.display);
        Screenshots.save(wb.window.getShell(), "results-only-governing.png");

        view.setFilter(new ResultsFilter(true, false));
        view.expandAll();
        assertEquals(0, tree.getItem(0).getItemCount(), "the demo passes: nothing fails");
        view.setFilter(ResultsFilter.ALL);

        // sort by utilisation: first click, largest first
        TreeColumn utilisation = tree.getColumn(1);
        utilisation.notifyListeners(SWT.Selection, new org.eclipse.swt.widgets.Event());
        view.expandAll();
        assertEquals(governingStation(cli0), tree.getItem(0).getItem(0).getText(0), "largest utilisation first");
        assertEquals(SWT.DOWN, tree.getSortDirection());
        List<Double> values = new ArrayList<>();
        for (TreeItem s : tree.getItem(0).getItems()) {
            values.add(Double.parseDouble(s.getText(1)));
        }
        for (int i = 1; i < values.size(); i++) {
            assertTrue(values.get(i - 1) >= values.get(i), "descending: " + values);
        }
        utilisation.notifyListeners(SWT.Selection, new org.eclipse.swt.widgets.Event());
        assertEquals(SWT.UP, tree.getSortDirection());
        utilisation.notifyListeners(SWT.Selection, new org.eclipse.swt.widgets.Event());
        view.expandAll();
        assertEquals("drive_shaft_bearing", tree.getItem(0).getItem(0).getText(0), "third click: project order");

        // select the guide rail station and copy it as CSV through the command
        TreeItem rail = find(tree.getItem(0).getItems(), "guide_rail_support");
        tree.setSelection(rail);
        org.eclipse.swt.widgets.Event click = new org.eclipse.swt.widgets.Event();
        click.item = rail;
        tree.notifyListeners(SWT.Selection, click);
        wb.page.activate(view);
        String csv = execute("csv");
        String[] lines = csv.split("\r\n");
        assertEquals("station,case,criterion,material,utilisation,demand,capacity,x,y,sigmaZ,tauZX,tauZY,passed",
                lines[0]);
        List<String> mine = new ArrayList<>();
        for (String l : lines) {
            if (l.startsWith("guide_rail_support,")) {
                mine.add(l.substring(0, nthComma(l, 9)));
            }
        }
        List<String> cli = new ArrayList<>();
        for (String l : Cli.run("check", demo.toString(), "--format", "csv").out().split("\r\n")) {
            if (l.startsWith("guide_rail_support,")) {
                cli.add(l);
            }
        }
        assertEquals(16, cli.size(), "4 cases x 2 criteria x 2 materials at the guide rail");
        // same rows; the tree orders criterion before material, the command line material before criterion
        assertEquals(new java.util.TreeSet<>(cli), new java.util.TreeSet<>(mine), "the command line's nine columns");
        assertEquals(cli.size(), mine.size());
        assertTrue(lines[lines.length - 1].startsWith("# Results support, not replace"), "caution last");
        String text = execute("text");
        assertTrue(text.startsWith("guide_rail_support  0.383947  ok"), text);
    }

    @Test
    void followsTheProjectOfTheSectionsView() throws Exception {
        Path demo = WorkbenchFixture.demo();
        ResultsView view = (ResultsView) wb.page.showView(ResultsView.ID);
        SectionsView.showIn(wb.page, demo);
        wb.waitForResults(view, demo);
        assertEquals(results(demo), WorkbenchFixture.points(view.input().root()).size());
    }

    @Test
    void aCancelledCheckSaysSoAndTheNextOneRuns(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        // a copy of the demo: a new file, so its sections are not solved yet and the check takes a while
        Path copy = dir.resolve("copy.tensio.json");
        java.nio.file.Files.copy(WorkbenchFixture.demo(), copy);
        ResultsView view = (ResultsView) wb.page.showView(ResultsView.ID);
        view.showProject(copy);
        org.eclipse.core.runtime.jobs.Job.getJobManager().cancel(ResultsView.JOB_FAMILY);
        UiConditions.waitUntil(wb.display, WorkbenchFixture.TIMEOUT, "the cancelled check to end",
                () -> org.eclipse.core.runtime.jobs.Job.getJobManager().find(ResultsView.JOB_FAMILY).length == 0
                        && view.statusText().contains("cancelled"));
        assertTrue(view.input() == null || !view.input().file().map(copy::equals).orElse(false),
                "no results of the cancelled check");

        view.showProject(copy);
        wb.waitForResults(view, copy);
        assertEquals(results(copy), WorkbenchFixture.points(view.input().root()).size());
    }

    /** @return the number of stations in the command line's check results */
    static int stations(JsonObject cli) {
        return (int) cli.getAsJsonArray("results").asList().stream()
                .map(e -> e.getAsJsonObject().get("station").getAsString()).distinct().count();
    }

    /** @return the station of the command line's first result with the largest utilisation */
    static String governingStation(JsonObject cli) {
        JsonObject best = null;
        for (var e : cli.getAsJsonArray("results")) {
            JsonObject o = e.getAsJsonObject();
            if (best == null || o.get("utilisation").getAsDouble() > best.get("utilisation").getAsDouble()) {
                best = o;
            }
        }
        return best.get("station").getAsString();
    }

    /** @return the number of check results the command line gives for {@code file} */
    static int results(Path file) {
        return Cli.run("check", file.toString(), "--format", "json").json().getAsJsonArray("results").size();
    }

    private String execute(String format) throws Exception {
        ICommandService commands = wb.window.getService(ICommandService.class);
        IHandlerService handlers = wb.window.getService(IHandlerService.class);
        Command copy = commands.getCommand("org.tensio.ui.results.commands.copyResults");
        ParameterizedCommand pc = ParameterizedCommand.generateCommand(copy,
                Map.of("org.tensio.ui.results.commands.copyResults.format", format));
        handlers.executeCommand(pc, null);
        Clipboard clipboard = new Clipboard(wb.display);
        try {
            return (String) clipboard.getContents(TextTransfer.getInstance());
        } finally {
            clipboard.dispose();
        }
    }

    private static int nthComma(String s, int n) {
        int at = -1;
        for (int i = 0; i < n; i++) {
            at = s.indexOf(',', at + 1);
        }
        return at;
    }

    static TreeItem find(TreeItem[] items, String name) {
        for (TreeItem i : items) {
            if (i.getText(0).equals(name)) {
                return i;
            }
        }
        throw new AssertionError("no tree item '" + name + "'");
    }

    private List<Label> caution() {
        return UiConditions.find(wb.window.getShell(), Label.class,
                l -> l.getText().startsWith("Results support, not replace") && l.isVisible());
    }

    /** |expected − actual| ≤ 1e-12 × scale. */
    static void close(double expected, double actual, double scale, String what) {
        assertEquals(expected, actual, SAME_COMPUTATION * Math.abs(scale), what);
    }
}
