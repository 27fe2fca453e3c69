package org.tensio.ui.results.stress;

/**
 * Which row of the fatigue table to select: a load history and a fatigue criterion, or a history alone (its
 * governing row at the point). Immutable.
 *
 * @param history   the load-history id
 * @param criterion the fatigue criterion name, or null for the history's governing row
 */
record FatigueRow(String history, String criterion) {
}
