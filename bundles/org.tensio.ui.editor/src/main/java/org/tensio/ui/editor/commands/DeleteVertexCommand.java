package org.tensio.ui.editor.commands;

import org.eclipse.gef.commands.Command;
import org.tensio.ui.editor.model.Loop;
import org.tensio.ui.editor.model.Vertex;

/**
 * Deletes a vertex. The arc that started at it goes with it; a loop keeps at least three vertices (the
 * command cannot execute on a triangle: delete the void or the part instead).
 */
public final class DeleteVertexCommand extends Command {

    private final Loop loop;
    private final Vertex vertex;
    private int index = -1;

    /** Deletes {@code vertex} from {@code loop}. */
    public DeleteVertexCommand(Loop loop, Vertex vertex) {
        super(Messages.DeleteVertex_label);
        this.loop = loop;
        this.vertex = vertex;
    }

    @Override
    public boolean canExecute() {
        return loop.vertices().size() > 3 && loop.vertices().contains(vertex);
    }

    @Override
    public void execute() {
        redo();
    }

    @Override
    public void redo() {
        index = loop.remove(vertex);
    }

    @Override
    public void undo() {
        loop.add(index, vertex);
    }
}
