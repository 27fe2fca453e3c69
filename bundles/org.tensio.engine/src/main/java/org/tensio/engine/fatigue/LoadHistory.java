package org.tensio.engine.fatigue;

import java.util.function.Function;

import org.tensio.engine.loads.InternalForces;

/**
 * The load history of a station as the project file gives it; {@link #cycle} turns it into {@link CycleLoads}.
 * The parts add up:
 * <ul>
 * <li>{@code rotating}: a load case or combination whose forces are fixed in space while the shaft turns
 * ({@link CycleLoads#rotating}: bending fully reversed at every fibre, axial force and torque steady);</li>
 * <li>{@code maximum} and {@code minimum}: two load cases or combinations, the extremes of the cycle
 * ({@link CycleLoads#between}: amplitude and mean of every component); given together or not at all, and not
 * together with {@code rotating};</li>
 * <li>{@code alternating} and {@code mean}: forces given directly (a fluctuating torque on a rotating shaft:
 * the alternating part is taken in phase with the rotating bending at θ = 0; every point of a round shaft
 * passes through that phase, so its worst combination is found).</li>
 * </ul>
 *
 * @param rotating    case or combination id, or null
 * @param maximum     case or combination id, or null
 * @param minimum     case or combination id, or null
 * @param alternating forces, or null
 * @param mean        forces, or null
 * @since 0.1
 */
public record LoadHistory(String rotating, String maximum, String minimum, InternalForces alternating,
        InternalForces mean) {

    /** Validates the combination of parts. */
    public LoadHistory {
        if ((maximum == null) != (minimum == null)) {
            throw new IllegalArgumentException("maximum: 'maximum' and 'minimum' are given together, got maximum "
                    + maximum + " and minimum " + minimum);
        }
        if (rotating != null && maximum != null) {
            throw new IllegalArgumentException("rotating: a rotating history takes no maximum/minimum pair");
        }
        if (rotating == null && maximum == null && alternating == null && mean == null) {
            throw new IllegalArgumentException("history: give 'rotating', 'maximum' and 'minimum', or 'alternating'"
                    + " and/or 'mean'");
        }
    }

    /**
     * @param forces the forces of a load case or combination id at the station
     * @return the cycle
     */
    public CycleLoads cycle(Function<String, InternalForces> forces) {
        CycleLoads c = CycleLoads.of(InternalForces.ZERO, InternalForces.ZERO);
        if (rotating != null) {
            c = c.plus(CycleLoads.rotating(forces.apply(rotating)));
        }
        if (maximum != null) {
            c = c.plus(CycleLoads.between(forces.apply(maximum), forces.apply(minimum)));
        }
        return c.plus(CycleLoads.of(mean == null ? InternalForces.ZERO : mean,
                alternating == null ? InternalForces.ZERO : alternating));
    }

    /** @return a description for reports */
    public String describe() {
        StringBuilder sb = new StringBuilder();
        if (rotating != null) {
            sb.append("rotating under case ").append(rotating).append(" (bending fully reversed, axial force and torque"
                    + " steady)");
        }
        if (maximum != null) {
            sb.append("between cases ").append(maximum).append(" (maximum) and ").append(minimum).append(" (minimum)");
        }
        if (alternating != null) {
            sb.append(sb.length() == 0 ? "" : "; ").append("alternating forces given");
        }
        if (mean != null) {
            sb.append(sb.length() == 0 ? "" : "; ").append("mean forces given");
        }
        return sb.toString();
    }
}
