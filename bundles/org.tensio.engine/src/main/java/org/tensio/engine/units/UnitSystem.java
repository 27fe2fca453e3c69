package org.tensio.engine.units;

import java.util.List;

/**
 * The unit system of a project: a length unit and a force unit; stresses come out in force / length²,
 * named by {@link #stressUnit()}. Computation is done in the file's own units: no conversion happens.
 *
 * @param length length unit symbol
 * @param force  force unit symbol
 * @since 0.1
 */
public record UnitSystem(String length, String force) {

    /** Length units understood. */
    public static final List<String> LENGTHS = List.of("mm", "cm", "m", "in", "ft");
    /** Force units understood. */
    public static final List<String> FORCES = List.of("N", "kN", "MN", "lbf", "kip");

    /** The default, mm and N (stress in MPa). */
    public static final UnitSystem MM_N = new UnitSystem("mm", "N");

    /** Rejects unknown symbols, naming the field and the value. */
    public UnitSystem {
        if (!LENGTHS.contains(length)) {
            throw new IllegalArgumentException("units.length: unknown length unit '" + length + "' (use one of " + LENGTHS + ")");
        }
        if (!FORCES.contains(force)) {
            throw new IllegalArgumentException("units.force: unknown force unit '" + force + "' (use one of " + FORCES + ")");
        }
    }

    /** @return the stress unit's usual name: MPa for N/mm², kPa for kN/m², psi, ksi, otherwise force/length² */
    public String stressUnit() {
        return switch (force + "/" + length) {
            case "N/mm", "MN/m" -> "MPa";
            case "kN/m" -> "kPa";
            case "N/m" -> "Pa";
            case "kN/mm" -> "GPa";
            case "lbf/in" -> "psi";
            case "kip/in" -> "ksi";
            case "lbf/ft" -> "psf";
            case "kip/ft" -> "ksf";
            default -> force + "/" + length + "²";
        };
    }

    /** @return the moment unit, force·length */
    public String momentUnit() {
        return force + "·" + length;
    }
}
