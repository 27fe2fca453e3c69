package org.tensio.ui.editor.handlers;

import java.util.List;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.tensio.ui.editor.commands.AddHoleCommand;
import org.tensio.ui.editor.model.Part;
import org.tensio.ui.editor.model.Vertex;
import org.tensio.ui.editor.parts.PartEditPart;
import org.tensio.ui.editor.parts.VertexEditPart;
import org.tensio.ui.editor.ui.ProjectEditor;

/** Adds a square void, a fifth of the outer boundary's smaller side, at the centre of the selected arbitrary part. */
public final class AddHoleHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        ProjectEditor editor = Selections.editor(event);
        PartEditPart pe = Selections.part(editor);
        VertexEditPart ve = Selections.vertex(editor);
        Part part = pe != null ? pe.part() : ve != null ? ve.handle().part() : null;
        if (part == null || !part.profile().isArbitrary()) {
            return null;
        }
        List<Vertex> outer = part.profile().outer().vertices();
        double minX = outer.stream().mapToDouble(Vertex::x).min().orElse(0);
        double maxX = outer.stream().mapToDouble(Vertex::x).max().orElse(0);
        double minY = outer.stream().mapToDouble(Vertex::y).min().orElse(0);
        double maxY = outer.stream().mapToDouble(Vertex::y).max().orElse(0);
        double size = Math.min(maxX - minX, maxY - minY) / 5;
        editor.execute(new AddHoleCommand(part.profile(), (minX + maxX) / 2, (minY + maxY) / 2, size));
        return null;
    }
}
