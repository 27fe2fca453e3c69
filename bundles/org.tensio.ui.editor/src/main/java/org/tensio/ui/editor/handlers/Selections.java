package org.tensio.ui.editor.handlers;

import java.util.List;

import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tensio.ui.editor.parts.PartEditPart;
import org.tensio.ui.editor.parts.VertexEditPart;
import org.tensio.ui.editor.ui.ProjectEditor;

/** The active project editor and what its drawing has selected. */
final class Selections {

    private Selections() {
    }

    static ProjectEditor editor(ExecutionEvent event) throws ExecutionException {
        IEditorPart part = HandlerUtil.getActiveEditorChecked(event);
        if (part instanceof ProjectEditor e) {
            return e;
        }
        throw new ExecutionException("active editor: not a Tensio project editor: " + part.getTitle()); //$NON-NLS-1$
    }

    @SuppressWarnings("unchecked")
    static List<Object> selected(ProjectEditor editor) {
        return ((IStructuredSelection) editor.graphicalViewer().getSelection()).toList();
    }

    static VertexEditPart vertex(ProjectEditor editor) {
        return selected(editor).stream().filter(VertexEditPart.class::isInstance).map(VertexEditPart.class::cast)
                .findFirst().orElse(null);
    }

    static PartEditPart part(ProjectEditor editor) {
        return selected(editor).stream().filter(PartEditPart.class::isInstance).map(PartEditPart.class::cast)
                .findFirst().orElse(null);
    }
}
