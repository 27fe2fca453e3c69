package org.tensio.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.osgi.framework.Bundle;
import org.osgi.framework.Constants;
import org.osgi.framework.FrameworkUtil;
import org.tensio.engine.service.SectionAnalysisService;

/** The engine bundle stays headless: its manifest names no SWT, JFace, workbench or AWT dependency. */
class EngineManifestHeadlessTest {

    private static final List<String> FORBIDDEN = List.of("org.eclipse.swt", "org.eclipse.jface", "org.eclipse.ui",
            "java.awt");

    /** Commas outside quotes separate clauses; a clause is {@code name(;name)*(;attribute)*}. */
    private static final Pattern CLAUSES = Pattern.compile(",(?=(?:[^\"]*\"[^\"]*\")*[^\"]*$)");

    @Test
    void engineManifestHasNoUiDependency() {
        Bundle engine = FrameworkUtil.getBundle(SectionAnalysisService.class);
        assertNotNull(engine, "SectionAnalysisService must come from an OSGi bundle");
        assertEquals("org.tensio.engine", engine.getSymbolicName());

        List<String> offending = new ArrayList<>();
        for (String header : List.of(Constants.IMPORT_PACKAGE, Constants.REQUIRE_BUNDLE,
                Constants.DYNAMICIMPORT_PACKAGE)) {
            for (String name : names(engine.getHeaders("").get(header))) {
                if (isForbidden(name)) {
                    offending.add(header + ": " + name);
                }
            }
        }
        assertTrue(offending.isEmpty(), "engine must stay headless, but its manifest has " + offending);
    }

    @Test
    void checkRecognisesUiNames() {
        assertTrue(isForbidden("org.eclipse.swt.widgets"));
        assertTrue(isForbidden("org.eclipse.ui"));
        assertTrue(isForbidden("java.awt.geom"));
        assertTrue(!isForbidden("org.eclipse.uiextra") && !isForbidden("org.locationtech.jts.geom"));
        assertEquals(List.of("a.b", "d", "c"), names("a.b;d;version=\"[1,2)\",c;resolution:=optional"));
    }

    private static boolean isForbidden(String name) {
        return FORBIDDEN.stream().anyMatch(f -> name.equals(f) || name.startsWith(f + "."));
    }

    private static List<String> names(String header) {
        List<String> names = new ArrayList<>();
        if (header == null || header.isBlank()) {
            return names;
        }
        for (String clause : CLAUSES.split(header)) {
            for (String part : clause.split(";")) {
                String name = part.trim();
                if (!name.isEmpty() && !name.contains("=")) {
                    names.add(name);
                }
            }
        }
        return names;
    }
}
