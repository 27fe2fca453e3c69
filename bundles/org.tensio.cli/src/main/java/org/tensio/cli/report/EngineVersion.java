package org.tensio.cli.report;

import java.io.InputStream;
import java.net.URL;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.jar.JarFile;
import java.util.jar.Manifest;

import org.tensio.engine.service.SectionAnalysisService;

/**
 * The engine's version as its bundle manifest states it ({@code Bundle-Version} of {@code org.tensio.engine}): read
 * from the jar the engine classes were loaded from, or from the bundle's {@code META-INF/MANIFEST.MF} when they come
 * from a class folder ({@code target/classes}); "unknown" when neither can be read.
 */
final class EngineVersion {

    private static final String BSN = "org.tensio.engine";

    private EngineVersion() {
    }

    static String get() {
        try {
            URL where = SectionAnalysisService.class.getProtectionDomain().getCodeSource().getLocation();
            Path p = Path.of(where.toURI());
            if (Files.isRegularFile(p)) {
                try (JarFile jar = new JarFile(p.toFile())) {
                    String v = version(jar.getManifest());
                    if (v != null) {
                        return v;
                    }
                }
            } else {
                for (Path d = p; d != null; d = d.getParent()) {
                    Path mf = d.resolve("META-INF/MANIFEST.MF");
                    if (Files.isRegularFile(mf)) {
                        try (InputStream in = Files.newInputStream(mf)) {
                            String v = version(new Manifest(in));
                            if (v != null) {
                                return v;
                            }
                        }
                    }
                    if (d.getFileName() != null && d.getFileName().toString().equals(BSN)) {
                        break;
                    }
                }
            }
        } catch (Exception e) {
            // no code source (e.g. inside OSGi with a bundle URL): fall through
        }
        return "unknown";
    }

    private static String version(Manifest m) {
        if (m == null) {
            return null;
        }
        String bsn = m.getMainAttributes().getValue("Bundle-SymbolicName");
        if (bsn == null || !bsn.split(";")[0].trim().equals(BSN)) {
            return null;
        }
        return m.getMainAttributes().getValue("Bundle-Version");
    }
}
