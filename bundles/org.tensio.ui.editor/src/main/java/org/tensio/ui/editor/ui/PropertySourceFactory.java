package org.tensio.ui.editor.ui;

import org.eclipse.core.runtime.IAdapterFactory;
import org.eclipse.ui.views.properties.IPropertySource;
import org.tensio.ui.editor.model.ProjectModel;
import org.tensio.ui.editor.parts.PartEditPart;

/** Property sources of the drawing's edit parts (the model itself never implements IPropertySource). */
public final class PropertySourceFactory implements IAdapterFactory {

    @Override
    public <T> T getAdapter(Object adaptable, Class<T> type) {
        if (type == IPropertySource.class && adaptable instanceof PartEditPart p
                && p.getViewer().getEditDomain() instanceof org.eclipse.gef.DefaultEditDomain d
                && d.getEditorPart() instanceof ProjectEditor editor) {
            ProjectModel model = editor.model();
            return type.cast(new PartPropertySource(p.part(), model));
        }
        return null;
    }

    @Override
    public Class<?>[] getAdapterList() {
        return new Class<?>[] { IPropertySource.class };
    }
}
