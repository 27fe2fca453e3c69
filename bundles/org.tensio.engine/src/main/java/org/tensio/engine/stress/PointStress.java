package org.tensio.engine.stress;

import java.util.List;
import java.util.Map;

import org.tensio.engine.geometry.Point2;
import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.loads.InternalForces;

/**
 * The full stress state at one point of a section under one load case or combination, stress unit.
 * <p>
 * {@code total} and {@code principal} are {@code null} when a needed part of the solution is not available
 * (e.g. torsion of a non-circular section before the finite-element solution): {@code torsionMethod} then
 * says so and {@code warnings} explains; no number is guessed. {@code contributions} holds the part of each
 * stress component due to each internal force alone (their sum is {@code total}); the torsion entry is
 * absent when torsion is not available.
 *
 * @param station       station id
 * @param caseId        load case or combination id
 * @param point         the point, section frame, length unit
 * @param partIndex     index of the section part the point lies in
 * @param material      that part's material id
 * @param forces        the internal forces used
 * @param sigmaZ        total normal stress (always available)
 * @param total         total stress components, or null
 * @param principal     principal and equivalent stresses, or null
 * @param contributions per-force contributions
 * @param shearCuts     the elementary shear cuts through the point (first moments and widths), when used
 * @param shearMethod   how τ from Vx, Vy was obtained
 * @param torsionMethod how τ from T was obtained
 * @param warnings      human-readable warnings, empty when none
 * @since 0.1
 */
public record PointStress(String station, String caseId, Point2 point, int partIndex, String material,
        InternalForces forces, double sigmaZ, StressComponents total, PrincipalStresses principal,
        Map<ForceComponent, StressComponents> contributions, ShearCuts shearCuts, String shearMethod,
        String torsionMethod, List<String> warnings) {
}
