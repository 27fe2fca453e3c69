package org.tensio.ui.editor.parts;

import org.tensio.ui.editor.model.Loop;
import org.tensio.ui.editor.model.Part;
import org.tensio.ui.editor.model.Vertex;

/**
 * A vertex as a child of the section's edit part, with the loop and part it belongs to (commands need them).
 * Equal when the same vertex of the same loop and part.
 *
 * @param part   the part
 * @param loop   the loop of the part's profile
 * @param vertex the vertex of the loop
 */
public record VertexHandle(Part part, Loop loop, Vertex vertex) {
}
