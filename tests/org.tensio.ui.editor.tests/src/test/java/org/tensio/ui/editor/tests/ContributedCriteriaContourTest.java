package org.tensio.ui.editor.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tensio.engine.checks.CheckOp;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.linalg.ProgressMonitor;
import org.tensio.engine.mesh.MeshOptions;
import org.tensio.engine.project.Project;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.spi.CheckCriterion;
import org.tensio.engine.spi.Extensions;
import org.tensio.ui.editor.overlay.ContourOp;
import org.tensio.ui.editor.overlay.ContourRequest;
import org.tensio.ui.editor.overlay.ContourResult;
import org.tensio.ui.editor.overlay.Quantity;

/**
 * The utilisation contour counts a material's contributed criteria ({@link CheckCriterion}) as the engine's check
 * does: its maximum is the check's largest utilisation of the station and case, to round-off (1e-12 relative; the
 * same demands and capacities at the same nodes).
 */
class ContributedCriteriaContourTest {

    /** A house rule stricter than von Mises where shear is small: demand 1.5·|σz| against fy/γ. */
    public static final class HouseNormal implements CheckCriterion {
        @Override
        public String id() {
            return "houseNormal";
        }

        @Override
        public String description() {
            return "1.5 |σz| against fy/γ (test rule)";
        }

        @Override
        public double demand(double sigmaZ, double tauZX, double tauZY) {
            return 1.5 * Math.abs(sigmaZ);
        }

        @Override
        public double capacity(MaterialLimits limits) {
            return limits.yieldStrength() / limits.partialFactor();
        }
    }

    private static final String PROJECT = """
            {"tensio": 1, "materials": {"st": {"E": 210000, "nu": 0.3, "fy": 355, "criteria": ["vonMises", "houseNormal"]}},
             "sections": {"r": {"material": "st", "profile": {"type": "RectangleProfile", "xDim": 40, "yDim": 80}}},
             "stations": {"A": {"section": "r", "forces": {"ULS": {"Mx": 1.2e7, "T": 2e5}}}}}
            """;

    @Test
    void theUtilisationContourCountsContributedCriteria() throws Exception {
        SectionAnalysisService engine = SectionAnalysisService.create(Extensions.of(List.of(new HouseNormal()), List.of()));
        Project project = engine.parseProject(PROJECT, "house.tensio.json");
        ContourRequest request = new ContourRequest(project, "r", "A", "ULS", Quantity.UTILISATION,
                MeshOptions.DEFAULT_ELEMENTS);
        ContourResult r = ContourOp.compute(engine, request, ProgressMonitor.NONE);
        List<CheckResult> check = CheckOp.check(project, engine).results();
        double governing = check.stream().mapToDouble(CheckResult::utilisation).max().orElseThrow();
        assertEquals("houseNormal", check.stream().filter(c -> c.utilisation() == governing).findFirst().orElseThrow()
                .criterion(), "the house rule governs");
        assertEquals(governing, r.max(), 1e-12 * governing, "the contour's max is the check's");
        // σz = M·(h/2)/I at the outer fibre, I = b h³/12 (exact for a rectangle): 1.5 σz / fy
        double sigma = 1.2e7 * 40 / (40 * Math.pow(80, 3) / 12);
        assertEquals(1.5 * sigma / 355, r.max(), 1e-9 * r.max(), "house rule at the outer fibre");
    }

    @Test
    void aCriterionTheEngineDoesNotKnowIsReported() throws Exception {
        SectionAnalysisService withHouse = SectionAnalysisService
                .create(Extensions.of(List.of(new HouseNormal()), List.of()));
        Project project = withHouse.parseProject(PROJECT, "house.tensio.json");
        ContourRequest request = new ContourRequest(project, "r", "A", "ULS", Quantity.UTILISATION,
                MeshOptions.DEFAULT_ELEMENTS);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ContourOp.compute(SectionAnalysisService.create(), request, ProgressMonitor.NONE));
        assertTrue(e.getMessage().contains("'houseNormal' is not contributed"), e.getMessage());
        // the stresses do not need the criterion
        ContourResult mises = ContourOp.compute(SectionAnalysisService.create(),
                new ContourRequest(project, "r", "A", "ULS", Quantity.VON_MISES, MeshOptions.DEFAULT_ELEMENTS),
                ProgressMonitor.NONE);
        assertTrue(mises.max() > 0);
    }
}
