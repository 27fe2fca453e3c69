package org.tensio.ui.results.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableItem;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.fatigue.FatigueDetail;
import org.tensio.ui.results.stress.PointReport;
import org.tensio.ui.results.stress.StressPointView;
import org.tensio.ui.results.views.ResultsView;
import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.testsupport.Screenshots;
import org.tensio.ui.testsupport.UiConditions;

import com.google.gson.JsonObject;

/**
 * The stress-point view at a station with a fatigue check (the demo's drive-shaft keyseat station): selecting the
 * fatigue result in the results tree shows, for that point, every load history and fatigue criterion with σa′,
 * σm′, σmax′, Se, Kf, Kfs, n and the utilisation, equal to {@code tensio check --format json} (same rules, same
 * point: {@code FatiguePointOp} against {@code FatigueCheckOp}, equal to round-off — tolerance 1e-9 relative);
 * the table shows them to six significant digits (half a unit of the sixth digit). A point inside the shaft,
 * away from the keyseat, has Kf = Kfs = 1 and a smaller σa′ in proportion to its distance from the bending axis.
 */
class StressPointFatigueTest {

    private static final String STATION = "drive_shaft_sprocket";
    private static final double SAME = 1e-9;

    private WorkbenchFixture wb;

    @BeforeEach
    void open() throws Exception {
        wb = new WorkbenchFixture();
    }

    private static JsonObject checkResult(Path demo, String history, String criterion) {
        return Cli.run("check", demo.toString(), "--format", "json").json().getAsJsonArray("results").asList().stream()
                .map(e -> e.getAsJsonObject())
                .filter(e -> e.get("station").getAsString().equals(STATION) && e.get("case").getAsString().equals(history)
                        && e.get("criterion").getAsString().equals(criterion))
                .findFirst().orElseThrow(() -> new AssertionError("no " + history + "/" + criterion + " result"));
    }

    private static void rel(double expected, double actual, double tol, String what) {
        assertEquals(expected, actual, tol * Math.max(Math.abs(expected), 1e-300), what);
    }

    @Test
    void fatigueResultSelectedInTheTreeShowsTheCheckNumbers() throws Exception {
        Path demo = WorkbenchFixture.demo();
        ResultsView results = ResultsView.showIn(wb.page, demo);
        StressPointView stress = wb.resultsWithStressView(results, demo);
        wb.click(results, STATION, "running", "fatigueGoodman", "C45_QT");

        JsonObject check = checkResult(demo, "running", "fatigueGoodman");
        double x = check.getAsJsonObject("point").get("x").getAsDouble();
        double y = check.getAsJsonObject("point").get("y").getAsDouble();
        UiConditions.waitUntil(wb.display, WorkbenchFixture.TIMEOUT, "the stress-point view to show the fatigue point",
                () -> stress.report() != null && stress.report().fatigue() != null
                        && stress.report().stress().point().x() == x && stress.report().stress().point().y() == y);
        PointReport r = stress.report();
        assertEquals(STATION, r.stress().station());
        assertTrue(r.fatigue().onSurface(), "the check's governing point lies on the surface");

        // every history and criterion of the station, each equal to the check's result at this point where the
        // check's governing point is this one (the Goodman point; others may govern elsewhere)
        List<CheckResult> rows = r.fatigue().results();
        assertFalse(rows.isEmpty());
        CheckResult goodman = rows.stream().filter(c -> c.caseId().equals("running")
                && c.criterion().equals("fatigueGoodman")).findFirst().orElseThrow();
        JsonObject f = check.getAsJsonObject("fatigue"), factors = f.getAsJsonObject("factors");
        FatigueDetail d = goodman.fatigue();
        rel(check.get("utilisation").getAsDouble(), goodman.utilisation(), SAME, "utilisation");
        rel(f.get("n").getAsDouble(), d.factorOfSafety(), SAME, "n");
        rel(f.get("sigmaA").getAsDouble(), d.sigmaA(), SAME, "σa'");
        rel(f.get("sigmaM").getAsDouble(), d.sigmaM(), SAME, "σm'");
        rel(f.get("sigmaMax").getAsDouble(), d.sigmaMax(), SAME, "σmax'");
        rel(factors.get("Se").getAsDouble(), d.se(), SAME, "Se");
        rel(factors.get("Kf").getAsDouble(), d.notch().kf(), SAME, "Kf");
        rel(factors.get("Kfs").getAsDouble(), d.notch().kfs(), SAME, "Kfs");
        assertTrue(d.notch().kf() > 1, "the keyseat acts at the governing point");

        // the table as the user reads it: one row per history and criterion, the governing one selected
        Table table = stress.fatigueTable();
        assertTrue(table.isVisible());
        assertEquals(rows.size(), table.getItemCount());
        int at = rows.indexOf(goodman);
        TableItem item = table.getItem(at);
        assertEquals("running", item.getText(0));
        assertEquals("fatigueGoodman", item.getText(1));
        rel(d.sigmaA(), Double.parseDouble(item.getText(2)), 5e-6, "σa' cell");
        rel(d.sigmaM(), Double.parseDouble(item.getText(3)), 5e-6, "σm' cell");
        rel(d.se(), Double.parseDouble(item.getText(5)), 5e-6, "Se cell");
        rel(d.factorOfSafety(), Double.parseDouble(item.getText(6)), 1e-4 / d.factorOfSafety(), "n cell (4 decimals)");
        CheckResult governing = r.fatigue().governing();
        assertEquals(at, table.getSelectionIndex(), "the row of the result clicked in the tree is selected");
        assertTrue(governing.utilisation() >= goodman.utilisation(), "the governing one is the largest");
        String summary = stress.fatigueSummary();
        assertTrue(summary.contains("on the surface"), summary);
        assertTrue(summary.contains(String.format(java.util.Locale.ROOT, "Kf = %.4f", d.notch().kf())), summary);
        assertTrue(summary.contains("keyseat"), summary);
        assertTrue(summary.contains("load-spectrum"), "the fatigue caution: " + summary);
        // the values table carries the largest fatigue utilisation at the point
        boolean row = false;
        for (TableItem v : stress.valuesTable().getItems()) {
            if (v.getText(0).startsWith("fatigue utilisation")) {
                rel(governing.utilisation(), Double.parseDouble(v.getText(1)), 5e-6, "fatigue utilisation row");
                row = true;
            }
        }
        assertTrue(row, "a fatigue utilisation row");
        org.eclipse.ui.IWorkbenchPartReference ref = wb.page.getReference(stress);
        wb.page.setPartState(ref, org.eclipse.ui.IWorkbenchPage.STATE_MAXIMIZED);
        UiConditions.flush(wb.display);
        Screenshots.save(wb.window.getShell(), "stress-point-fatigue.png");
        wb.page.setPartState(ref, org.eclipse.ui.IWorkbenchPage.STATE_RESTORED);

        // a point inside, on the far side from the keyseat: no notch, σa' smaller in proportion to the bending lever
        stress.show(new SectionPoint(demo, STATION, r.sectionId(), null, -x / 2, -y / 2));
        UiConditions.waitUntil(wb.display, WorkbenchFixture.TIMEOUT, "the inner point",
                () -> stress.report() != null && stress.report().stress().point().x() == -x / 2);
        PointReport in = stress.report();
        assertNotNull(in.fatigue());
        assertFalse(in.fatigue().onSurface());
        CheckResult inner = in.fatigue().results().stream().filter(c -> c.caseId().equals("running")
                && c.criterion().equals("fatigueGoodman")).findFirst().orElseThrow();
        assertEquals(1, inner.fatigue().notch().kf(), 0);
        assertEquals(1, inner.fatigue().notch().kfs(), 0);
        // σa'/Kf at the outer fibre bounds its unnotched σa' from above (Kfs ≥ 1 on the shear part too); half the
        // lever arm halves the bending part; 10 % allowance for the transverse shear, larger inside than at the
        // surface (4V/3A ≈ 2 MPa against ≈ 25 MPa here)
        assertTrue(inner.fatigue().sigmaA() < d.sigmaA() / d.notch().kf() * 0.5 * 1.1,
                "half the lever arm, no Kf: " + inner.fatigue().sigmaA() + " vs " + d.sigmaA());
        assertTrue(stress.fatigueSummary().contains("inside"), stress.fatigueSummary());

        // a load history passed as the point's case (a part showing a fatigue quantity): the static case is chosen,
        // the fatigue row selected is that history's governing one
        stress.show(new SectionPoint(demo, STATION, r.sectionId(), "start_up", x, y));
        UiConditions.waitUntil(wb.display, WorkbenchFixture.TIMEOUT, "a history as the case",
                () -> stress.report() != null && stress.report().stress().point().x() == x);
        assertTrue(stress.report().caseChosen(), "start_up is no load case: the case is chosen");
        CheckResult startUp = stress.report().fatigue().results().stream().filter(c -> c.caseId().equals("start_up"))
                .max(java.util.Comparator.comparingDouble(CheckResult::utilisation)).orElseThrow();
        assertEquals(stress.report().fatigue().results().indexOf(startUp), table.getSelectionIndex());

        // a station without a fatigue check: no fatigue part
        stress.show(new SectionPoint(demo, "drive_shaft_bearing", "drive_shaft", null, 0, -29));
        UiConditions.waitUntil(wb.display, WorkbenchFixture.TIMEOUT, "a static-only station",
                () -> stress.report() != null && "drive_shaft_bearing".equals(stress.report().stress().station()));
        assertNull(stress.report().fatigue());
        assertFalse(stress.fatigueTable().isVisible());
    }
}
