package org.tensio.ui.editor.handlers;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.tensio.ui.editor.commands.SetArcCommand;
import org.tensio.ui.editor.model.Vertex;
import org.tensio.ui.editor.parts.VertexEditPart;
import org.tensio.ui.editor.ui.ProjectEditor;

/** Turns the edge that starts at the selected vertex into an arc, or an arc back into a straight edge. */
public final class ToggleArcHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        ProjectEditor editor = Selections.editor(event);
        VertexEditPart v = Selections.vertex(editor);
        if (v == null) {
            return null;
        }
        Vertex vertex = v.handle().vertex();
        var vs = v.handle().loop().vertices();
        Vertex next = vs.get((vs.indexOf(vertex) + 1) % vs.size());
        editor.execute(vertex.arcToNext() != null ? new SetArcCommand(vertex, null) : SetArcCommand.bulge(vertex, next));
        return null;
    }
}
