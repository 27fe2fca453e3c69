package org.tensio.ui.editor.handlers;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.tensio.ui.editor.commands.AddVertexCommand;
import org.tensio.ui.editor.parts.VertexEditPart;
import org.tensio.ui.editor.ui.ProjectEditor;

/** Inserts a vertex halfway along the edge that starts at the selected vertex. */
public final class AddVertexHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        ProjectEditor editor = Selections.editor(event);
        VertexEditPart v = Selections.vertex(editor);
        if (v != null) {
            editor.execute(AddVertexCommand.afterVertex(v.handle().loop(), v.handle().vertex()));
        }
        return null;
    }
}
