package org.tensio.ui.editor.policies;

import org.eclipse.draw2d.geometry.Rectangle;
import org.eclipse.gef.EditPart;
import org.eclipse.gef.EditPolicy;
import org.eclipse.gef.commands.Command;
import org.eclipse.gef.editpolicies.NonResizableEditPolicy;
import org.eclipse.gef.editpolicies.XYLayoutEditPolicy;
import org.eclipse.gef.requests.CreateRequest;
import org.tensio.ui.editor.commands.MovePartCommand;
import org.tensio.ui.editor.commands.MoveVertexCommand;
import org.tensio.ui.editor.figures.VertexFigure;
import org.tensio.ui.editor.figures.ViewTransform;
import org.tensio.ui.editor.parts.PartEditPart;
import org.tensio.ui.editor.parts.SectionEditPart;
import org.tensio.ui.editor.parts.VertexEditPart;
import org.tensio.ui.editor.parts.VertexHandle;

/**
 * Moves of vertices and parts on the section: the new figure bounds (snapped by the viewer's grid and geometry
 * helpers) become a {@link MoveVertexCommand} or a {@link MovePartCommand} in the file's units.
 */
public final class SectionLayoutPolicy extends XYLayoutEditPolicy {

    @Override
    protected EditPolicy createChildEditPolicy(EditPart child) {
        return new NonResizableEditPolicy();
    }

    @Override
    protected Command createChangeConstraintCommand(EditPart child, Object constraint) {
        ViewTransform t = ((SectionEditPart) getHost()).transform();
        Rectangle r = (Rectangle) constraint;
        if (child instanceof VertexEditPart v) {
            VertexHandle h = v.handle();
            double x = t.x(r.x + VertexFigure.SIZE / 2) - h.part().offsetX();
            double y = t.y(r.y + VertexFigure.SIZE / 2) - h.part().offsetY();
            return new MoveVertexCommand(h.vertex(), x, y);
        }
        if (child instanceof PartEditPart p) {
            Rectangle old = p.getFigure().getBounds();
            double dx = (r.x - old.x) / t.scale();
            double dy = -(r.y - old.y) / t.scale();
            return new MovePartCommand(p.part(), p.part().offsetX() + dx, p.part().offsetY() + dy);
        }
        return null;
    }

    @Override
    protected Command getCreateCommand(CreateRequest request) {
        return null;
    }

    @Override
    protected Command getDeleteDependantCommand(org.eclipse.gef.Request request) {
        return null;
    }
}
