package org.tensio.engine.checks;

/**
 * The largest and smallest value of one quantity over the load cases and combinations of a station, with the
 * case that gives each (the first in project order on a tie).
 *
 * @param max     largest value (signed), unit of the quantity
 * @param maxCase load case or combination id giving {@code max}
 * @param min     smallest value (signed)
 * @param minCase load case or combination id giving {@code min}
 * @since 0.1
 */
public record Range(double max, String maxCase, double min, String minCase) {
}
