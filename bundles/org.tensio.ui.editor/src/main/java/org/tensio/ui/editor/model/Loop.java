package org.tensio.ui.editor.model;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/** A closed loop of vertices (the outer boundary or a void of an arbitrary profile); it closes back to its first vertex. */
public final class Loop extends ModelElement {

    /** Property fired when vertices are added or removed. */
    public static final String VERTICES = "vertices"; //$NON-NLS-1$

    private final List<Vertex> vertices = new ArrayList<>();

    /** A loop of {@code initial} vertices (the list is copied, the vertices are not). */
    public Loop(List<Vertex> initial) {
        vertices.addAll(initial);
    }

    /** @return the vertices, unmodifiable */
    public List<Vertex> vertices() {
        return Collections.unmodifiableList(vertices);
    }

    /** Inserts {@code v} at {@code index}. */
    public void add(int index, Vertex v) {
        vertices.add(index, v);
        fire(VERTICES, null, v);
    }

    /** Removes {@code v}; @return its former index, or -1 when it was not in the loop */
    public int remove(Vertex v) {
        int i = vertices.indexOf(v);
        if (i >= 0) {
            vertices.remove(i);
            fire(VERTICES, v, null);
        }
        return i;
    }
}
