package org.tensio.example.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.osgi.framework.BundleContext;
import org.osgi.framework.FrameworkUtil;
import org.osgi.util.tracker.ServiceTracker;
import org.tensio.cli.report.spi.ReportSection;
import org.tensio.engine.checks.CheckOp;
import org.tensio.engine.checks.CheckReport;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.project.Project;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * The example bundle's contributions arrive through the extension points in an OSGi runtime (org.tensio.extensions
 * registers them as services, the engine's DS component binds them), and the engine then reads and checks a
 * project that uses the contributed profile type and criterion.
 */
class HouseKitInOsgiTest {

    private static final long TIMEOUT_MS = 30_000;

    private ServiceTracker<SectionAnalysisService, SectionAnalysisService> engines;
    private ServiceTracker<ReportSection, ReportSection> sections;

    @BeforeEach
    void open() {
        BundleContext context = FrameworkUtil.getBundle(getClass()).getBundleContext();
        engines = new ServiceTracker<>(context, SectionAnalysisService.class, null);
        engines.open();
        sections = new ServiceTracker<>(context, ReportSection.class, null);
        sections.open();
    }

    @AfterEach
    void close() {
        engines.close();
        sections.close();
    }

    /** Waits until the engine has bound the example's contributions (DS binds them dynamically). */
    private SectionAnalysisService engineWithHouseKit() throws InterruptedException {
        return engineWithHouseKit(engines);
    }

    /** Waits until the tracked engine has bound the example's contributions (DS binds them dynamically). */
    static SectionAnalysisService engineWithHouseKit(
            ServiceTracker<SectionAnalysisService, SectionAnalysisService> engines) throws InterruptedException {
        SectionAnalysisService engine = engines.waitForService(TIMEOUT_MS);
        assertNotNull(engine, "SectionAnalysisService not registered");
        long end = System.currentTimeMillis() + TIMEOUT_MS;
        while (System.currentTimeMillis() < end && (engine.extensions().criterion("houseCombined").isEmpty()
                || engine.extensions().profileType("HexagonBarProfile").isEmpty())) {
            Thread.sleep(50);
        }
        assertTrue(engine.extensions().criterion("houseCombined").isPresent(), "criterion bound: " + engine.extensions());
        assertTrue(engine.extensions().profileType("HexagonBarProfile").isPresent(), "profile bound: "
                + engine.extensions());
        return engine;
    }

    static String resource(String name) throws IOException {
        try (InputStream in = HouseKitInOsgiTest.class.getResourceAsStream("/" + name)) {
            assertNotNull(in, name);
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    /**
     * Hexagon 36 across flats with a 12 bore: A = (√3/2)s² − πd²/4 and I = 5√3·s⁴/144 − πd⁴/64 about any
     * centroidal axis (regular hexagon, Roark's Formulas for Stress and Strain, 7th ed., Table A.1 — from memory;
     * both follow from six equilateral triangles). The engine integrates polygons and circles exactly: 1e-9.
     */
    @Test
    void contributedProfileTypeIsReadInOsgi() throws Exception {
        SectionAnalysisService engine = engineWithHouseKit();
        Project p = engine.parseProject(resource("sluice-spindle.tensio.json"), "sluice-spindle.tensio.json");
        SectionProperties sp = engine.properties(p.section("spindle"));
        double s = 36, d = 12;
        double area = Math.sqrt(3) / 2 * s * s - Math.PI * d * d / 4;
        double inertia = 5 * Math.sqrt(3) * Math.pow(s, 4) / 144 - Math.PI * Math.pow(d, 4) / 64;
        assertEquals(area, sp.area(), 1e-9 * area);
        assertEquals(inertia, sp.ixx(), 1e-9 * inertia);
        assertEquals(inertia, sp.iyy(), 1e-9 * inertia);
    }

    /** The house rule is checked like a built-in: demand |σz| + 2τ at the governing point, capacity 0.9·fy/γ. */
    @Test
    void contributedCriterionIsCheckedInOsgi() throws Exception {
        SectionAnalysisService engine = engineWithHouseKit();
        Project p = engine.parseProject(resource("sluice-spindle.tensio.json"), "sluice-spindle.tensio.json");
        CheckReport r = CheckOp.check(p, engine);
        List<CheckResult> house = r.results().stream().filter(c -> c.criterion().equals("houseCombined")).toList();
        assertEquals(2, house.size(), "one per case: " + r.results());
        for (CheckResult c : house) {
            assertEquals(0.9 * 355 / 1.1, c.capacity(), 1e-12);
            assertEquals(Math.abs(c.sigmaZ()) + 2 * Math.hypot(c.tauZX(), c.tauZY()), c.demand(), 1e-9 * c.demand());
            CheckResult vm = r.results().stream().filter(v -> v.criterion().equals("vonMises")
                    && v.caseId().equals(c.caseId())).findFirst().orElseThrow();
            assertTrue(c.demand() >= vm.demand() * (1 - 1e-12), "|σ| + 2τ ≥ √(σ² + 3τ²) everywhere");
        }
        assertTrue(sections.waitForService(TIMEOUT_MS) != null, "the sign-off report section is registered");
        assertEquals("signOff", sections.getService().id());
    }
}
