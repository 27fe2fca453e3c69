package org.tensio.ui.editor.commands;

import org.eclipse.gef.commands.Command;
import org.tensio.ui.editor.model.Loop;
import org.tensio.ui.editor.model.Vertex;

/** Inserts a vertex into a loop (straight edges on both sides of it). */
public final class AddVertexCommand extends Command {

    private final Loop loop;
    private final int index;
    private final Vertex vertex;

    /** Inserts a new vertex at (x, y) at position {@code index} of {@code loop}. */
    public AddVertexCommand(Loop loop, int index, double x, double y) {
        super(Messages.AddVertex_label);
        this.loop = loop;
        this.index = index;
        this.vertex = new Vertex(x, y);
    }

    /** A command that inserts a vertex halfway along the edge that starts at {@code after}. */
    public static AddVertexCommand afterVertex(Loop loop, Vertex after) {
        int i = loop.vertices().indexOf(after);
        Vertex next = loop.vertices().get((i + 1) % loop.vertices().size());
        return new AddVertexCommand(loop, i + 1, (after.x() + next.x()) / 2, (after.y() + next.y()) / 2);
    }

    @Override
    public boolean canExecute() {
        return index >= 0 && index <= loop.vertices().size();
    }

    @Override
    public void execute() {
        redo();
    }

    @Override
    public void redo() {
        loop.add(index, vertex);
    }

    @Override
    public void undo() {
        loop.remove(vertex);
    }

    /** @return the vertex this command inserts */
    public Vertex vertex() {
        return vertex;
    }
}
