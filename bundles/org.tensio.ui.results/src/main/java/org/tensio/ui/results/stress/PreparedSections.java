package org.tensio.ui.results.stress;

import java.io.IOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.io.ProjectFormatException;
import org.tensio.engine.project.Project;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.ui.results.model.ProjectCache;

/**
 * The sections the stress-point view has prepared ({@link PreparedSection}), by project file and section id: a
 * small LRU (eight), thread-safe. {@link #prepare} does the expensive part (read, properties, finite-element
 * solution — the engine caches the solution per section instance) and belongs in a background job; {@link #get}
 * is cheap and is what a pointer move calls.
 */
public final class PreparedSections {

    private static final int SIZE = 8;

    private record Key(Path file, String sectionId) {
    }

    private final Map<Key, PreparedSection> ready = new LinkedHashMap<>(16, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<Key, PreparedSection> eldest) {
            return size() > SIZE;
        }
    };

    /** @return the prepared section, or null when it has not been prepared */
    public PreparedSection get(Path file, String sectionId) {
        synchronized (ready) {
            return ready.get(new Key(file, sectionId));
        }
    }

    /** Keeps {@code p} (replacing an earlier preparation of the same file and section). */
    public void put(PreparedSection p) {
        synchronized (ready) {
            ready.put(new Key(p.file(), p.section().name()), p);
        }
    }

    /** Forgets every prepared section of {@code file} (the file changed). */
    public void forget(Path file) {
        synchronized (ready) {
            ready.keySet().removeIf(k -> k.file().equals(file));
        }
    }

    /**
     * Reads the project, computes the section's properties and finite-element solution, and keeps the result.
     * Slow (a solve when the engine has not solved this section yet): call off the UI thread.
     *
     * @throws IllegalArgumentException naming the section when the project has no such section
     */
    public PreparedSection prepare(SectionAnalysisService service, Path file, String sectionId)
            throws ProjectFormatException, IOException {
        Project project = ProjectCache.read(service, file);
        Section section = project.section(sectionId);
        SectionProperties props = service.properties(section);
        FiniteElementSolution fe = "finiteElementFailed".equals(props.torsionSource()) ? null //$NON-NLS-1$
                : service.solution(section);
        PreparedSection p = new PreparedSection(file, project, section, props, fe, service.extensions(),
                PreparedSection.fatigueOf(project, section, props, fe));
        put(p);
        return p;
    }
}
