package org.tensio.ui.editor.commands;

import org.eclipse.gef.commands.Command;
import org.tensio.ui.editor.model.Vertex;

/** Moves a vertex to a new location (profile frame, length unit of the file). */
public final class MoveVertexCommand extends Command {

    private final Vertex vertex;
    private final double x;
    private final double y;
    private double oldX;
    private double oldY;

    /** Moves {@code vertex} to (x, y). */
    public MoveVertexCommand(Vertex vertex, double x, double y) {
        super(Messages.MoveVertex_label);
        this.vertex = vertex;
        this.x = x;
        this.y = y;
    }

    @Override
    public boolean canExecute() {
        return Double.isFinite(x) && Double.isFinite(y);
    }

    @Override
    public void execute() {
        oldX = vertex.x();
        oldY = vertex.y();
        redo();
    }

    @Override
    public void redo() {
        vertex.setLocation(x, y);
    }

    @Override
    public void undo() {
        vertex.setLocation(oldX, oldY);
    }
}
