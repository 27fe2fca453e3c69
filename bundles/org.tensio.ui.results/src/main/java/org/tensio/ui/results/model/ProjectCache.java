package org.tensio.ui.results.model;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tensio.engine.io.ProjectFormatException;
import org.tensio.engine.project.Project;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * The projects the result views have read, keyed by file and the SHA-256 of its content, so that the results tree
 * and the stress-point view share one {@link Project} instance per file version — and therefore the engine's
 * cached finite-element solutions, which are kept per section instance. A changed file is read again (a change
 * in a CSV load table the file refers to alone is not noticed until the file itself changes). Small LRU (four
 * files); thread-safe.
 */
public final class ProjectCache {

    private static final int SIZE = 4;

    private record Key(Path file, String sha256) {
    }

    private static final Map<Key, Project> CACHE = new LinkedHashMap<>(8, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<Key, Project> eldest) {
            return size() > SIZE;
        }
    };

    private ProjectCache() {
    }

    /**
     * @return the project in {@code file}, read through {@code service} unless this version was read before
     * @throws ProjectFormatException as {@link SectionAnalysisService#readProject}
     * @throws IOException            when the file cannot be read
     */
    public static Project read(SectionAnalysisService service, Path file) throws ProjectFormatException, IOException {
        Path f = file.toAbsolutePath().normalize();
        Key key = new Key(f, sha256(Files.readAllBytes(f)));
        synchronized (CACHE) {
            Project p = CACHE.get(key);
            if (p != null) {
                return p;
            }
        }
        Project p = service.readProject(f);
        synchronized (CACHE) {
            CACHE.put(key, p);
        }
        return p;
    }

    private static String sha256(byte[] content) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(content)); //$NON-NLS-1$
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java runtime", e); //$NON-NLS-1$
        }
    }
}
