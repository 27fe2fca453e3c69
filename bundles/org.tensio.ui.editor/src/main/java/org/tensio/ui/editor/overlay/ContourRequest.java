package org.tensio.ui.editor.overlay;

import org.tensio.engine.project.Project;

/**
 * What to contour. Immutable.
 *
 * @param project        the validated project
 * @param sectionId      the section
 * @param stationId      the station (of that section), or null for geometry only (mesh, centroid, axes)
 * @param caseId         load case or combination at the station; for {@link Quantity#FATIGUE_UTILISATION} one of
 *                       the load histories of the station's fatigue check; or null (no contour)
 * @param quantity       the quantity
 * @param targetElements mesh density: about this many triangles
 */
public record ContourRequest(Project project, String sectionId, String stationId, String caseId, Quantity quantity,
        int targetElements) {
}
