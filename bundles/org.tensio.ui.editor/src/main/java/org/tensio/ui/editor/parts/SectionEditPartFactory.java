package org.tensio.ui.editor.parts;

import org.eclipse.gef.EditPart;
import org.eclipse.gef.EditPartFactory;
import org.tensio.ui.editor.model.Part;
import org.tensio.ui.editor.model.SectionModel;

/** Edit parts of the graphical page: section → parts and vertex handles. */
public final class SectionEditPartFactory implements EditPartFactory {

    @Override
    public EditPart createEditPart(EditPart context, Object model) {
        if (model instanceof SectionModel s) {
            return new SectionEditPart(s);
        }
        if (model instanceof Part p) {
            return new PartEditPart(p);
        }
        if (model instanceof VertexHandle v) {
            return new VertexEditPart(v);
        }
        throw new IllegalArgumentException("model: no edit part for " + model);
    }
}
