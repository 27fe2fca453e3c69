package org.tensio.ui.editor.parts;

import java.beans.PropertyChangeEvent;
import java.beans.PropertyChangeListener;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;

import org.eclipse.draw2d.IFigure;
import org.eclipse.gef.EditPolicy;
import org.eclipse.gef.GraphicalEditPart;
import org.eclipse.gef.editparts.AbstractGraphicalEditPart;
import org.tensio.ui.editor.figures.PartFigure;
import org.tensio.ui.editor.figures.ViewTransform;
import org.tensio.ui.editor.model.Part;
import org.tensio.ui.editor.policies.PartComponentPolicy;

/** A part of the section: its outline, filled by material; moving it changes its offset. */
public final class PartEditPart extends AbstractGraphicalEditPart implements PropertyChangeListener {

    /** Viewer property: the parts that have a validation error (a {@code Collection<Part>}). */
    public static final String ERROR_PARTS = "org.tensio.ui.editor.errorParts"; //$NON-NLS-1$
    /** Viewer property: Boolean, true while a contour is shown (parts are then drawn unfilled). */
    public static final String CONTOUR_SHOWN = "org.tensio.ui.editor.contourShown"; //$NON-NLS-1$

    /** @param part the part */
    public PartEditPart(Part part) {
        setModel(part);
    }

    /** @return the part */
    public Part part() {
        return (Part) getModel();
    }

    @Override
    protected IFigure createFigure() {
        return new PartFigure();
    }

    /** @return the part's figure */
    public PartFigure partFigure() {
        return (PartFigure) getFigure();
    }

    @Override
    protected void createEditPolicies() {
        installEditPolicy(EditPolicy.COMPONENT_ROLE, new PartComponentPolicy());
    }

    @Override
    public void activate() {
        super.activate();
        part().addPropertyChangeListener(this);
    }

    @Override
    public void deactivate() {
        part().removePropertyChangeListener(this);
        super.deactivate();
    }

    @Override
    public void propertyChange(PropertyChangeEvent evt) {
        refreshVisuals();
    }

    @Override
    @SuppressWarnings("rawtypes")
    public Object getAdapter(Class key) {
        Object a = super.getAdapter(key);
        return a != null ? a : org.eclipse.core.runtime.Platform.getAdapterManager().getAdapter(this, key);
    }

    @Override
    protected void refreshVisuals() {
        SectionEditPart section = (SectionEditPart) getParent();
        ViewTransform t = section.transform();
        List<int[]> loops = new ArrayList<>();
        for (double[] xy : Outlines.of(part())) {
            int[] f = new int[xy.length];
            for (int i = 0; i + 1 < xy.length; i += 2) {
                f[i] = t.fx(xy[i]);
                f[i + 1] = t.fy(xy[i + 1]);
            }
            loops.add(f);
        }
        PartFigure figure = partFigure();
        figure.setLoops(loops);
        Inks inks = (Inks) getViewer().getProperty(Inks.PROPERTY);
        if (inks != null) {
            int index = section.section().parts().indexOf(part());
            boolean firstMaterial = index <= 0
                    || java.util.Objects.equals(part().material(), section.section().parts().get(0).material());
            figure.setColours(inks.get(firstMaterial ? Inks.PART_FILL : Inks.PART_FILL_2), inks.get(Inks.OUTLINE),
                    inks.get(Inks.ERROR));
            figure.setHoleColour(inks.get(Inks.CANVAS));
        }
        Object errors = getViewer().getProperty(ERROR_PARTS);
        figure.setError(errors instanceof Collection<?> c && c.contains(part()));
        figure.setFilled(!Boolean.TRUE.equals(getViewer().getProperty(CONTOUR_SHOWN)));
        ((GraphicalEditPart) getParent()).setLayoutConstraint(this, figure, figure.loopBounds());
    }
}
