package org.tensio.ui.editor.parts;

import java.beans.PropertyChangeEvent;
import java.beans.PropertyChangeListener;

import org.eclipse.draw2d.IFigure;
import org.eclipse.gef.EditPolicy;
import org.eclipse.gef.GraphicalEditPart;
import org.eclipse.gef.editparts.AbstractGraphicalEditPart;
import org.tensio.ui.editor.figures.VertexFigure;
import org.tensio.ui.editor.figures.ViewTransform;
import org.tensio.ui.editor.model.Vertex;
import org.tensio.ui.editor.policies.VertexComponentPolicy;

/** A vertex handle of an arbitrary profile's loop; dragging it moves the vertex. */
public final class VertexEditPart extends AbstractGraphicalEditPart implements PropertyChangeListener {

    /** @param handle the vertex with its loop and part */
    public VertexEditPart(VertexHandle handle) {
        setModel(handle);
    }

    /** @return the vertex with its loop and part */
    public VertexHandle handle() {
        return (VertexHandle) getModel();
    }

    @Override
    protected IFigure createFigure() {
        return new VertexFigure();
    }

    @Override
    protected void createEditPolicies() {
        installEditPolicy(EditPolicy.COMPONENT_ROLE, new VertexComponentPolicy());
    }

    @Override
    public void activate() {
        super.activate();
        handle().vertex().addPropertyChangeListener(this);
        handle().part().addPropertyChangeListener(this);
    }

    @Override
    public void deactivate() {
        handle().vertex().removePropertyChangeListener(this);
        handle().part().removePropertyChangeListener(this);
        super.deactivate();
    }

    @Override
    public void propertyChange(PropertyChangeEvent evt) {
        refreshVisuals();
    }

    @Override
    protected void refreshVisuals() {
        ViewTransform t = ((SectionEditPart) getParent()).transform();
        Vertex v = handle().vertex();
        VertexFigure figure = (VertexFigure) getFigure();
        Inks inks = (Inks) getViewer().getProperty(Inks.PROPERTY);
        if (inks != null) {
            figure.setColours(inks.get(Inks.VERTEX), inks.get(Inks.OUTLINE));
        }
        figure.setArc(v.arcToNext() != null);
        double x = v.x() + handle().part().offsetX();
        double y = v.y() + handle().part().offsetY();
        ((GraphicalEditPart) getParent()).setLayoutConstraint(this, figure, VertexFigure.boundsAt(t.fx(x), t.fy(y)));
    }
}
