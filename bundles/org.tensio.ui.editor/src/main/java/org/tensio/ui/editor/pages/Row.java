package org.tensio.ui.editor.pages;

import org.tensio.ui.editor.model.ObjectNode;

/**
 * A table row: the label of its first column and the JSON object its cells edit. Immutable.
 *
 * @param label the row's name (material id, "station / case", combination id)
 * @param node  the object the cells edit
 */
public record Row(String label, ObjectNode node) {
}
