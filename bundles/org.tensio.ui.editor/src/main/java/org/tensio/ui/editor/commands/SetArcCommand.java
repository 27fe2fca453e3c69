package org.tensio.ui.editor.commands;

import org.eclipse.gef.commands.Command;
import org.tensio.ui.editor.model.ArcMarker;
import org.tensio.ui.editor.model.Vertex;

/** Sets or clears the arc from a vertex to the next one of its loop. */
public final class SetArcCommand extends Command {

    private final Vertex vertex;
    private final ArcMarker arc;
    private ArcMarker old;

    /** Sets the arc from {@code vertex} to the next vertex to {@code arc} (null: straight edge). */
    public SetArcCommand(Vertex vertex, ArcMarker arc) {
        super(arc == null ? Messages.ClearArc_label : Messages.SetArc_label);
        this.vertex = vertex;
        this.arc = arc;
    }

    /**
     * A command that bends the straight edge from {@code vertex} to {@code next} into an arc through the
     * point at a quarter of the edge length off its midpoint (to the right of the edge direction, i.e.
     * outwards for a counter-clockwise loop).
     */
    public static SetArcCommand bulge(Vertex vertex, Vertex next) {
        double mx = (vertex.x() + next.x()) / 2;
        double my = (vertex.y() + next.y()) / 2;
        double dx = next.x() - vertex.x();
        double dy = next.y() - vertex.y();
        return new SetArcCommand(vertex, new ArcMarker(ArcMarker.Kind.THROUGH, mx + dy / 4, my - dx / 4));
    }

    @Override
    public void execute() {
        old = vertex.arcToNext();
        redo();
    }

    @Override
    public void redo() {
        vertex.setArcToNext(arc);
    }

    @Override
    public void undo() {
        vertex.setArcToNext(old);
    }
}
