package org.tensio.ui.selection;

import java.nio.file.Path;
import java.util.Objects;

import org.eclipse.core.runtime.IAdaptable;
import org.eclipse.core.runtime.Platform;

/**
 * A station of a project (and optionally one of its load cases or combinations), as the results tree
 * publishes it through the workbench selection service when a station or case node is selected. The
 * section editor shows that station's section. Immutable.
 *
 * @param project   the project file (absolute, normalised)
 * @param stationId the station id
 * @param caseId    the load case or combination, or {@code null}
 * @param historyId the load history of the station's fatigue check (a fatigue history node), or {@code null};
 *                  independent of {@code caseId}
 * @since 0.1
 */
public record StationRef(Path project, String stationId, String caseId, String historyId) implements IAdaptable {

    /** A station (and case) without a load history. */
    public StationRef(Path project, String stationId, String caseId) {
        this(project, stationId, caseId, null);
    }

    /** Checks the file and the station id. */
    public StationRef {
        Objects.requireNonNull(project, "project");
        Objects.requireNonNull(stationId, "stationId");
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
