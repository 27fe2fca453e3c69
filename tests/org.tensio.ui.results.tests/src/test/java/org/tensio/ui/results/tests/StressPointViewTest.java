package org.tensio.ui.results.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;

import org.eclipse.core.commands.Command;
import org.eclipse.core.commands.State;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.Tree;
import org.eclipse.swt.widgets.TreeItem;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchPartReference;
import org.eclipse.ui.commands.ICommandService;
import org.eclipse.ui.handlers.IHandlerService;
import org.eclipse.ui.handlers.RegistryToggleState;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.StressComponents;
import org.tensio.ui.results.stress.PointReport;
import org.tensio.ui.results.stress.StressPointView;
import org.tensio.ui.results.views.ResultsView;
import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.testsupport.PointerSourceView;
import org.tensio.ui.testsupport.Screenshots;
import org.tensio.ui.testsupport.UiConditions;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;

/**
 * The stress-point view against the command line ({@code tensio stress demo --station ... --case ... --at x,y
 * --format json}, in-process). Both evaluate {@code PointStressOp} with the finite-element shear on the same
 * section and default mesh, so the numbers agree to round-off: tolerance 1e-12 × the largest stress at the point.
 * The table shows six significant digits: its cells agree with the command line to half a unit of the sixth
 * digit (5e-6 relative, with 1e-9 × the largest stress absolute for values near zero).
 */
class StressPointViewTest {

    private static final String STATION = "platform_beam_midspan";
    private static final String CASE = "ULS";

    private WorkbenchFixture wb;

    @BeforeEach
    void open() throws Exception {
        wb = new WorkbenchFixture();
    }

    @Test
    void governingPointSelectedInTheTreeShowsTheCommandLineNumbers() throws Exception {
        Path demo = WorkbenchFixture.demo();
        ResultsView results = ResultsView.showIn(wb.page, demo);
        StressPointView stress = wb.resultsWithStressView(results, demo);
        // click the governing point of the project: platform beam, ULS, maxShear, S355
        TreeItem point = wb.click(results, STATION, CASE, "maxShear", "S355");
        Tree tree = point.getParent();

        UiConditions.waitUntil(wb.display, WorkbenchFixture.TIMEOUT, "the stress-point view to show the point",
                () -> stress.report() != null && STATION.equals(stress.report().stress().station())
                        && CASE.equals(stress.report().stress().caseId()));
        PointReport r = stress.report();
        PointStress s = r.stress();
        JsonObject check = Cli.run("check", demo.toString(), "--format", "json").json().getAsJsonArray("results")
                .asList().stream().map(e -> e.getAsJsonObject())
                .filter(e -> e.get("station").getAsString().equals(STATION) && e.get("case").getAsString().equals(CASE)
                        && e.get("criterion").getAsString().equals("maxShear"))
                .findFirst().orElseThrow();
        double x = check.getAsJsonObject("point").get("x").getAsDouble();
        double y = check.getAsJsonObject("point").get("y").getAsDouble();
        assertEquals(x, s.point().x(), 0.0, "the tree's governing point, unchanged");
        assertEquals(y, s.point().y(), 0.0);

        Cli.Run run = Cli.run("stress", demo.toString(), "--station", STATION, "--case", CASE, "--at",
                Double.toString(x) + "," + Double.toString(y), "--format", "json");
        assertEquals(0, run.exit(), run.err());
        JsonObject cli = run.json();
        double scale = Math.max(Math.abs(cli.get("sigmaZ").getAsDouble()), cli.get("tresca").getAsDouble());
        double tol = 1e-12 * scale;
        assertEquals(cli.get("material").getAsString(), s.material());
        assertEquals(cli.get("sigmaZ").getAsDouble(), s.sigmaZ(), tol, "sigmaZ");
        assertEquals(cli.get("tauZX").getAsDouble(), s.total().tauZX(), tol, "tauZX");
        assertEquals(cli.get("tauZY").getAsDouble(), s.total().tauZY(), tol, "tauZY");
        assertEquals(cli.get("sigma1").getAsDouble(), s.principal().sigma1(), tol, "sigma1");
        assertEquals(cli.get("sigma2").getAsDouble(), s.principal().sigma2(), tol, "sigma2");
        assertEquals(cli.get("sigma3").getAsDouble(), s.principal().sigma3(), tol, "sigma3");
        assertEquals(cli.get("tauMax").getAsDouble(), s.principal().tauMax(), tol, "tauMax");
        assertEquals(cli.get("vonMises").getAsDouble(), s.principal().vonMises(), tol, "vonMises");
        assertEquals(cli.get("tresca").getAsDouble(), s.principal().tresca(), tol, "tresca");
        assertEquals(cli.get("shearMethod").getAsString(), s.shearMethod());
        assertEquals(cli.get("torsionMethod").getAsString(), s.torsionMethod());
        JsonObject contributions = cli.getAsJsonObject("contributions");
        for (ForceComponent f : ForceComponent.values()) {
            JsonObject c = contributions.getAsJsonObject(f.key());
            StressComponents mine = s.contributions().get(f);
            assertEquals(c.get("sigmaZ").getAsDouble(), mine.sigmaZ(), tol, f + " sigmaZ");
            assertEquals(c.get("tauZX").getAsDouble(), mine.tauZX(), tol, f + " tauZX");
            assertEquals(c.get("tauZY").getAsDouble(), mine.tauZY(), tol, f + " tauZY");
        }
        JsonArray d1 = cli.getAsJsonObject("principalDirections").getAsJsonArray("sigma1");
        for (int k = 0; k < 3; k++) {
            assertEquals(d1.get(k).getAsDouble(), s.principal().dir1()[k], 1e-12, "sigma1 direction " + k);
        }
        // utilisation and governing criterion at the point: the check's, to the round-off between the check's
        // unit-field superposition and the point evaluation (UnitStressField Javadoc: equal to round-off)
        assertEquals("maxShear", r.governing());
        assertEquals(check.get("utilisation").getAsDouble(), r.utilisation(), 1e-9, "utilisation");

        // the table, as the user reads it
        Table values = stress.valuesTable();
        Map<Integer, String> rows = Map.of(2, "sigmaZ", 3, "tauZX", 4, "tauZY", 6, "sigma1", 7, "sigma2", 8, "sigma3",
                12, "tauMax", 13, "vonMises", 14, "tresca");
        for (Map.Entry<Integer, String> e : rows.entrySet()) {
            double shown = Double.parseDouble(values.getItem(e.getKey()).getText(1));
            double want = cli.get(e.getValue()).getAsDouble();
            assertEquals(want, shown, 5e-6 * Math.abs(want) + 1e-9 * scale, e.getValue() + " as shown");
            assertEquals("MPa", values.getItem(e.getKey()).getText(2));
        }
        assertEquals(x, Double.parseDouble(values.getItem(0).getText(1)), 5e-6 * Math.abs(x));
        assertEquals("maxShear", values.getItem(16).getText(1));
        Table contributionsTable = stress.contributionsTable();
        assertEquals(7, contributionsTable.getItemCount(), "N, Vx, Vy, Mx, My, T and the total");
        assertEquals("Mx", contributionsTable.getItem(3).getText(0));
        assertEquals(contributions.getAsJsonObject("Mx").get("sigmaZ").getAsDouble(),
                Double.parseDouble(contributionsTable.getItem(3).getText(1)), 5e-6 * scale);
        tree.showItem(point);
        UiConditions.flush(wb.display);
        Screenshots.save(wb.window.getShell(), "stress-point-governing.png");
        IWorkbenchPartReference ref = wb.page.getReference(stress);
        wb.page.setPartState(ref, IWorkbenchPage.STATE_MAXIMIZED);
        UiConditions.flush(wb.display);
        Screenshots.save(wb.window.getShell(), "stress-point-maximized.png");
        wb.page.setPartState(ref, IWorkbenchPage.STATE_RESTORED);
    }

    @Test
    void followsThePointerUnlessPinned() throws Exception {
        Path demo = WorkbenchFixture.demo();
        StressPointView stress = (StressPointView) wb.page.showView(StressPointView.ID);
        stress.setPinned(false);
        PointerSourceView source = (PointerSourceView) wb.page.showView(WorkbenchFixture.POINTER_SOURCE_VIEW_ID);
        wb.page.activate(source);
        UiConditions.flush(wb.display);
        assertEquals(1, source.listenerCount(), "the stress-point view listens to the active part's pointer");

        // the drive shaft (r = 30), no case given: the view picks the case with the largest utilisation there
        SectionPoint a = new SectionPoint(demo, "drive_shaft_bearing", "drive_shaft", null, 0, -29);
        source.move(a);
        UiConditions.waitUntil(wb.display, WorkbenchFixture.TIMEOUT, "the pointer's point",
                () -> stress.report() != null && stress.report().stress().point().y() == -29);
        assertTrue(stress.report().caseChosen());
        assertEquals("ULS", stress.report().stress().caseId(), "ULS = 1.35 G + 1.5 Q governs");
        Cli.Run run = Cli.run("stress", demo.toString(), "--station", "drive_shaft_bearing", "--case", "ULS", "--at",
                "0,-29", "--format", "json");
        assertEquals(run.json().get("vonMises").getAsDouble(), stress.report().stress().principal().vonMises(),
                1e-12 * run.json().get("vonMises").getAsDouble());
        UiConditions.flush(wb.display);
        Screenshots.save(wb.window.getShell(), "stress-point-pointer.png");

        // pin through the toggle command: the point stays
        wb.page.activate(stress);
        ICommandService commands = wb.window.getService(ICommandService.class);
        wb.window.getService(IHandlerService.class).executeCommand(StressPointView.PIN_COMMAND, null);
        assertTrue(stress.pinned());
        Command pin = commands.getCommand(StressPointView.PIN_COMMAND);
        State state = pin.getState(RegistryToggleState.STATE_ID);
        assertEquals(Boolean.TRUE, state.getValue(), "the toggle state follows");
        PointReport before = stress.report();
        source.move(new SectionPoint(demo, "drive_shaft_bearing", "drive_shaft", "G", 10, 10));
        UiConditions.flush(wb.display);
        assertSame(before, stress.report(), "pinned: pointer moves are ignored");
        Screenshots.save(wb.window.getShell(), "stress-point-pinned.png");

        wb.window.getService(IHandlerService.class).executeCommand(StressPointView.PIN_COMMAND, null);
        assertFalse(stress.pinned());
        wb.page.activate(source);
        source.move(new SectionPoint(demo, "drive_shaft_bearing", "drive_shaft", "G", 10, 10));
        UiConditions.waitUntil(wb.display, WorkbenchFixture.TIMEOUT, "the new point",
                () -> stress.report() != null && stress.report().stress().point().x() == 10);
        assertEquals("G", stress.report().stress().caseId());

        // a point outside the section: a message, the view lives
        source.move(new SectionPoint(demo, "drive_shaft_bearing", "drive_shaft", "G", 100, 100));
        UiConditions.flush(wb.display);
        assertEquals(null, stress.report());
        source.move(a);
        UiConditions.waitUntil(wb.display, WorkbenchFixture.TIMEOUT, "recovery", () -> stress.report() != null);
        assertNotNull(stress.report().stress().principal());
        wb.page.hideView(source);
    }
}
