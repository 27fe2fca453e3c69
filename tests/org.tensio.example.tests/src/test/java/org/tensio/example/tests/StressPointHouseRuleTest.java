package org.tensio.example.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;

import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.osgi.framework.FrameworkUtil;
import org.osgi.util.tracker.ServiceTracker;
import org.tensio.engine.checks.CheckOp;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.project.Project;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.ui.results.stress.PointReport;
import org.tensio.ui.results.stress.StressPointView;
import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.testsupport.UiConditions;

/**
 * The stress-point view evaluates a contributed criterion at a point like the built-in ones: at the check's
 * governing point of the house rule the view's utilisation equals the check's (the same demand and capacity at
 * the same point: round-off between the check's unit-field superposition and the point evaluation, 1e-9), and the
 * values table lists it.
 */
class StressPointHouseRuleTest {

    @Test
    void contributedCriterionIsShownAtThePoint(@TempDir Path dir) throws Exception {
        ServiceTracker<SectionAnalysisService, SectionAnalysisService> engines = new ServiceTracker<>(
                FrameworkUtil.getBundle(getClass()).getBundleContext(), SectionAnalysisService.class, null);
        engines.open();
        try {
            SectionAnalysisService engine = HouseKitInOsgiTest.engineWithHouseKit(engines);
            String json = HouseKitInOsgiTest.resource("sluice-spindle.tensio.json");
            Path file = dir.resolve("sluice-spindle.tensio.json");
            Files.writeString(file, json, StandardCharsets.UTF_8);
            Project p = engine.parseProject(json, file.getFileName().toString());
            CheckResult house = CheckOp.check(p, engine).results().stream()
                    .filter(c -> c.criterion().equals("houseCombined") && c.caseId().equals("jammed")).findFirst()
                    .orElseThrow();

            IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
            StressPointView view = (StressPointView) page.showView(StressPointView.ID);
            view.setPinned(false);
            view.show(new SectionPoint(file, "gearbox_end", "spindle", "jammed", house.point().x(), house.point().y()));
            UiConditions.waitUntil(Display.getCurrent(), Duration.ofSeconds(30), "the view to evaluate the point",
                    () -> view.report() != null);
            PointReport r = view.report();
            assertNotNull(r, "the view evaluated the point");
            Double u = r.utilisations().get("houseCombined");
            assertNotNull(u, "the contributed criterion is evaluated: " + r.utilisations());
            assertEquals(house.utilisation(), u, 1e-9 * house.utilisation());
            assertTrue(r.utilisations().containsKey("vonMises"), "the built-in ones too");
            boolean row = false;
            for (TableItem item : view.valuesTable().getItems()) {
                row |= item.getText(0).equals("utilisation, houseCombined");
            }
            assertTrue(row, "the values table lists the house rule");
        } finally {
            engines.close();
        }
    }
}
