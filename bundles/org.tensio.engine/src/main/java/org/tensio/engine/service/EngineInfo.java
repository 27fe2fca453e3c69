package org.tensio.engine.service;

import java.io.IOException;
import java.io.InputStream;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.CodeSource;
import java.util.Enumeration;
import java.util.jar.JarFile;
import java.util.jar.Manifest;

/**
 * The engine's version as its bundle manifest states it ({@code Bundle-Version} of {@code org.tensio.engine}):
 * the manifest among the class loader's {@code META-INF/MANIFEST.MF} resources that names the engine (inside
 * OSGi the bundle's own), else the jar or class folder the engine classes came from ({@code target/classes}
 * during the engine's own tests); "unknown" when none can be read. Reports and records print it so that a
 * result can be tied to the engine that made it.
 *
 * @since 0.1
 */
public final class EngineInfo {

    private static final String BSN = "org.tensio.engine";

    private EngineInfo() {
    }

    /** @return the engine's Bundle-Version, e.g. {@code 0.1.0.202612012247}, or {@code "unknown"} */
    public static String version() {
        try {
            ClassLoader cl = EngineInfo.class.getClassLoader();
            if (cl != null) {
                Enumeration<URL> all = cl.getResources("META-INF/MANIFEST.MF");
                while (all.hasMoreElements()) {
                    try (InputStream in = all.nextElement().openStream()) {
                        String v = version(new Manifest(in));
                        if (v != null) {
                            return v;
                        }
                    }
                }
            }
            CodeSource source = EngineInfo.class.getProtectionDomain().getCodeSource();
            if (source != null) {
                Path p = Path.of(source.getLocation().toURI());
                if (Files.isRegularFile(p)) {
                    try (JarFile jar = new JarFile(p.toFile())) {
                        String v = version(jar.getManifest());
                        if (v != null) {
                            return v;
                        }
                    }
                }
                // a class folder (target/classes): the bundle's manifest is a few folders up
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
        } catch (IOException | RuntimeException | URISyntaxException e) {
            // no readable manifest (e.g. a bundle URL without a file system path): "unknown"
        }
        return "unknown";
    }

    private static String version(Manifest m) {
        if (m == null) {
            return null;
        }
        String bsn = m.getMainAttributes().getValue("Bundle-SymbolicName");
        if (bsn == null || !bsn.split(";")[0].strip().equals(BSN)) {
            return null;
        }
        return m.getMainAttributes().getValue("Bundle-Version");
    }
}
