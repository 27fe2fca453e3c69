package org.tensio.ui.editor.parts;

import java.beans.PropertyChangeEvent;
import java.beans.PropertyChangeListener;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.draw2d.FreeformLayer;
import org.eclipse.draw2d.FreeformLayout;
import org.eclipse.draw2d.IFigure;
import org.eclipse.draw2d.geometry.Rectangle;
import org.eclipse.gef.CompoundSnapToHelper;
import org.eclipse.gef.EditPart;
import org.eclipse.gef.EditPolicy;
import org.eclipse.gef.SnapToGeometry;
import org.eclipse.gef.SnapToGrid;
import org.eclipse.gef.SnapToHelper;
import org.eclipse.gef.editparts.AbstractGraphicalEditPart;
import org.tensio.ui.editor.figures.OverlayFigure;
import org.tensio.ui.editor.figures.ViewTransform;
import org.tensio.ui.editor.model.Loop;
import org.tensio.ui.editor.model.ModelElement;
import org.tensio.ui.editor.model.Part;
import org.tensio.ui.editor.model.SectionModel;
import org.tensio.ui.editor.model.Vertex;
import org.tensio.ui.editor.policies.SectionLayoutPolicy;

/**
 * The section shown in the graphical page (the viewer's contents). Children: its parts, then the vertices of
 * its arbitrary profiles. Its figure holds an overlay layer (contour, mesh, axes) under the parts.
 */
public final class SectionEditPart extends AbstractGraphicalEditPart implements PropertyChangeListener {

    private final List<ModelElement> observed = new ArrayList<>();
    private final ViewTransform transform;
    private FreeformLayer content;
    private OverlayFigure overlay;
    private final PropertyChangeListener viewerListener = e -> refreshAll();

    /** @param section the section to show */
    public SectionEditPart(SectionModel section) {
        setModel(section);
        transform = ViewTransform.forExtent(extent(section));
    }

    private static double extent(SectionModel section) {
        List<double[]> loops = new ArrayList<>();
        for (Part p : section.parts()) {
            loops.addAll(Outlines.of(p));
        }
        double[] b = Outlines.bounds(loops);
        return b == null ? 1 : Math.max(b[2] - b[0], b[3] - b[1]);
    }

    /** @return the section */
    public SectionModel section() {
        return (SectionModel) getModel();
    }

    /** @return the mapping from the section frame to figure coordinates */
    public ViewTransform transform() {
        return transform;
    }

    /** @return the overlay figure (contour, mesh, axes, dimensions, mark) */
    public OverlayFigure overlay() {
        return overlay;
    }

    @Override
    protected IFigure createFigure() {
        FreeformLayer top = new FreeformLayer();
        top.setLayoutManager(new FreeformLayout());
        FreeformLayer overlayLayer = new FreeformLayer();
        overlayLayer.setLayoutManager(new FreeformLayout());
        overlay = new OverlayFigure();
        overlayLayer.add(overlay, new Rectangle(0, 0, 1, 1));
        content = new FreeformLayer();
        content.setLayoutManager(new FreeformLayout());
        top.add(overlayLayer);
        top.add(content);
        return top;
    }

    @Override
    public IFigure getContentPane() {
        return content;
    }

    /** Sets where the overlay is drawn (figure coordinates). */
    public void setOverlayBounds(Rectangle r) {
        overlay.getParent().setConstraint(overlay, r);
        overlay.getParent().revalidate();
    }

    @Override
    protected void createEditPolicies() {
        installEditPolicy(EditPolicy.LAYOUT_ROLE, new SectionLayoutPolicy());
    }

    @Override
    protected List<Object> getModelChildren() {
        List<Object> children = new ArrayList<>(section().parts());
        for (Part p : section().parts()) {
            for (Loop loop : p.profile().loops()) {
                for (Vertex v : loop.vertices()) {
                    children.add(new VertexHandle(p, loop, v));
                }
            }
        }
        return children;
    }

    @Override
    public void activate() {
        super.activate();
        observe();
        getViewer().addPropertyChangeListener(viewerListener);
    }

    @Override
    public void deactivate() {
        getViewer().removePropertyChangeListener(viewerListener);
        unobserve();
        super.deactivate();
    }

    private void observe() {
        listen(section());
        for (Part p : section().parts()) {
            listen(p);
            listen(p.profile());
            for (Loop loop : p.profile().loops()) {
                listen(loop);
                loop.vertices().forEach(this::listen);
            }
        }
    }

    private void listen(ModelElement e) {
        e.addPropertyChangeListener(this);
        observed.add(e);
    }

    private void unobserve() {
        observed.forEach(e -> e.removePropertyChangeListener(this));
        observed.clear();
    }

    @Override
    public void propertyChange(PropertyChangeEvent evt) {
        String p = evt.getPropertyName();
        if (SectionModel.PARTS.equals(p) || Part.PROFILE.equals(p) || Loop.VERTICES.equals(p)
                || org.tensio.ui.editor.model.Profile.LOOPS.equals(p)) {
            unobserve();
            observe();
            refreshChildren();
        }
        refreshAll();
    }

    private void refreshAll() {
        if (!isActive()) {
            return;
        }
        refreshVisuals();
        for (Object child : getChildren()) {
            ((EditPart) child).refresh();
        }
    }

    @Override
    @SuppressWarnings("rawtypes")
    public Object getAdapter(Class adapter) {
        if (adapter == SnapToHelper.class) {
            List<SnapToHelper> helpers = new ArrayList<>();
            if (Boolean.TRUE.equals(getViewer().getProperty(SnapToGeometry.PROPERTY_SNAP_ENABLED))) {
                helpers.add(new SnapToGeometry(this));
            }
            if (Boolean.TRUE.equals(getViewer().getProperty(SnapToGrid.PROPERTY_GRID_ENABLED))) {
                helpers.add(new SnapToGrid(this));
            }
            if (helpers.isEmpty()) {
                return null;
            }
            return new CompoundSnapToHelper(helpers.toArray(new SnapToHelper[0]));
        }
        return super.getAdapter(adapter);
    }
}
