package org.tensio.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.osgi.framework.BundleContext;
import org.osgi.framework.FrameworkUtil;
import org.osgi.util.tracker.ServiceTracker;
import org.tensio.engine.project.Project;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.service.SectionAnalysisService;

/** The engine's DS component is registered by Felix SCR and answers through the service interface. */
class SectionAnalysisServiceDsTest {

    /** Solid circle r = 25 mm: A = π r² (exact, elementary geometry). */
    static final String SHAFT_PROJECT = """
            {"tensio":1,"units":{"length":"mm","force":"N"},\
            "materials":{"S355":{"E":210000,"nu":0.3,"fy":355}},\
            "sections":{"shaft":{"material":"S355","profile":{"type":"CircleProfile","radius":25}}},\
            "stations":{},"combinations":{}}""";

    private static final long SERVICE_TIMEOUT_MS = 30_000;

    private ServiceTracker<SectionAnalysisService, SectionAnalysisService> tracker;

    @BeforeEach
    void openTracker() {
        BundleContext context = FrameworkUtil.getBundle(getClass()).getBundleContext();
        assertNotNull(context, "test bundle must be started (Bundle-ActivationPolicy: lazy)");
        tracker = new ServiceTracker<>(context, SectionAnalysisService.class, null);
        tracker.open();
    }

    @AfterEach
    void closeTracker() {
        tracker.close();
    }

    @Test
    void serviceIsRegisteredAndReadsAProject(@TempDir Path dir) throws Exception {
        SectionAnalysisService service = tracker.waitForService(SERVICE_TIMEOUT_MS);
        assertNotNull(service, "SectionAnalysisService not registered within " + SERVICE_TIMEOUT_MS
                + " ms: is org.apache.felix.scr started and the engine's Service-Component header present?");

        Path file = dir.resolve("shaft.tensio.json");
        Files.writeString(file, SHAFT_PROJECT, StandardCharsets.UTF_8);
        Project project = service.readProject(file);
        assertTrue(project.sections().containsKey("shaft"), "sections: " + project.sections().keySet());

        SectionProperties properties = service.properties(project.sections().get("shaft"));
        double expected = Math.PI * 25 * 25;
        assertEquals(expected, properties.area(), 1e-9 * expected, "area of a circle r = 25 mm");
    }

    /**
     * The finite-element path (Tinfour meshing, sparse Cholesky) runs inside OSGi: a 60 × 20 rectangle's J
     * from the series solution, 126 392 mm⁴ (Timoshenko &amp; Goodier, Theory of Elasticity, §109), within 0.1 %.
     */
    @Test
    void finiteElementTorsionRunsInOsgi() throws Exception {
        SectionAnalysisService service = tracker.waitForService(SERVICE_TIMEOUT_MS);
        assertNotNull(service);
        Project project = service.parseProject("""
                {"tensio":1,"materials":{"S":{"E":210000,"nu":0.3,"fy":355}},\
                "sections":{"bar":{"material":"S","profile":{"type":"RectangleProfile","xDim":60,"yDim":20}}},\
                "stations":{},"combinations":{}}""", "bar.json");
        SectionProperties p = service.properties(project.sections().get("bar"));
        assertNotNull(p.j(), "J of a rectangle from the finite-element solution");
        assertEquals(126392.0, p.j(), 126.4, "J");
        assertEquals("finiteElement", p.torsionSource());
    }
}
