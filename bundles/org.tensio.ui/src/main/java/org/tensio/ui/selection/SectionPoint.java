package org.tensio.ui.selection;

import java.nio.file.Path;
import java.util.Objects;

import org.eclipse.core.runtime.IAdaptable;
import org.eclipse.core.runtime.Platform;

/**
 * A point of a station's cross-section, as the section editor and the result views exchange it through the
 * workbench selection service (as an element of an {@code IStructuredSelection}) and through
 * {@link SectionPointerSource}. Immutable.
 * <p>
 * Coordinates are in the engine's model units (the lengths of {@code Project}, i.e. as the engine read the
 * file: mm), in the section's own x–y frame (x right, y up, z out of the section towards the viewer, the same
 * frame as the file).
 *
 * @param project   the project file the point belongs to (absolute, normalised)
 * @param stationId the station, or {@code null} when only a section is known (the editor without stations)
 * @param sectionId the section id
 * @param caseId    the load case or combination, or {@code null} for "the governing one"
 * @param x         x, model length units
 * @param y         y, model length units
 * @param historyId the load history of the station's fatigue check the point stands for (a fatigue result, or the
 *                  editor showing a fatigue quantity), or {@code null}; independent of {@code caseId} (a history is
 *                  not a load case: the two may even share an id)
 * @since 0.1
 */
public record SectionPoint(Path project, String stationId, String sectionId, String caseId, double x, double y,
        String historyId) implements IAdaptable {

    /** A point without a load history. */
    public SectionPoint(Path project, String stationId, String sectionId, String caseId, double x, double y) {
        this(project, stationId, sectionId, caseId, x, y, null);
    }

    /** Checks the file, the section id and that the coordinates are finite. */
    public SectionPoint {
        Objects.requireNonNull(project, "project");
        Objects.requireNonNull(sectionId, "sectionId");
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("point: coordinates must be finite, got (" + x + ", " + y + ")");
        }
    }

    /** @return the same point for another load case or combination (the load history kept) */
    public SectionPoint withCase(String newCaseId) {
        return new SectionPoint(project, stationId, sectionId, newCaseId, x, y, historyId);
    }

    /** @return the same point for another load history of the station's fatigue check, or none (null) */
    public SectionPoint withHistory(String newHistoryId) {
        return new SectionPoint(project, stationId, sectionId, caseId, x, y, newHistoryId);
    }

    /** @return this when it is an instance of {@code adapter}, else what the platform's adapter factories give */
    @Override
    public <T> T getAdapter(Class<T> adapter) {
        if (adapter.isInstance(this)) {
            return adapter.cast(this);
        }
        return Platform.getAdapterManager().getAdapter(this, adapter);
    }
}
