package org.tensio.engine.checks;

/**
 * The largest value of a non-negative quantity (von Mises, τmax) over the load cases and combinations of a
 * station, with the case that gives it (the first in project order on a tie).
 *
 * @param max     largest value, stress unit, ≥ 0
 * @param maxCase load case or combination id giving it
 * @since 0.1
 */
public record Peak(double max, String maxCase) {
}
