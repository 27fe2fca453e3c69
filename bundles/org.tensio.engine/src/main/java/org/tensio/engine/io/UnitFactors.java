package org.tensio.engine.io;

import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.units.UnitSystem;

/**
 * Conversion factors between the unit systems a project and a load table may use.
 * <p>
 * Definitions (NIST Special Publication 811, 2008 edition, Appendix B; all exact): 1 in = 25.4 mm,
 * 1 ft = 304.8 mm, 1 lbf = 4.4482216152605 N (0.45359237 kg × 9.80665 m/s²), 1 kip = 1000 lbf. Each factor
 * is one correctly rounded division of two products of these constants, so a conversion between the metric
 * units is exact whenever the true factor is a representable number (kN·m → N·mm gives exactly 1e6, equal
 * units give exactly 1). Immutable, static only.
 */
final class UnitFactors {

    private UnitFactors() {
    }

    /** @return millimetres in one {@code length} unit */
    static double millimetres(String length) {
        return switch (length) {
            case "mm" -> 1;
            case "cm" -> 10;
            case "m" -> 1000;
            case "in" -> 25.4;
            case "ft" -> 304.8;
            default -> throw new IllegalArgumentException("length: unknown unit '" + length + "' (use one of "
                    + UnitSystem.LENGTHS + ")");
        };
    }

    /** @return newtons in one {@code force} unit */
    static double newtons(String force) {
        return switch (force) {
            case "N" -> 1;
            case "kN" -> 1000;
            case "MN" -> 1e6;
            case "lbf" -> 4.4482216152605;
            case "kip" -> 4448.2216152605;
            default -> throw new IllegalArgumentException("force: unknown unit '" + force + "' (use one of "
                    + UnitSystem.FORCES + ")");
        };
    }

    /** @return the factor turning a force in {@code from} into one in {@code to} */
    static double force(UnitSystem from, UnitSystem to) {
        return newtons(from.force()) / newtons(to.force());
    }

    /** @return the factor turning a length in {@code from} into one in {@code to} */
    static double length(UnitSystem from, UnitSystem to) {
        return millimetres(from.length()) / millimetres(to.length());
    }

    /** @return the factor turning a moment (force·length) in {@code from} into one in {@code to} */
    static double moment(UnitSystem from, UnitSystem to) {
        return (newtons(from.force()) * millimetres(from.length()))
                / (newtons(to.force()) * millimetres(to.length()));
    }

    /** @return the factor of each internal force component, in {@link ForceComponent} order */
    static double[] components(UnitSystem from, UnitSystem to) {
        double f = force(from, to);
        double m = moment(from, to);
        double[] out = new double[ForceComponent.values().length];
        for (ForceComponent c : ForceComponent.values()) {
            out[c.ordinal()] = switch (c) {
                case N, VX, VY -> f;
                case MX, MY, T -> m;
            };
        }
        return out;
    }
}
