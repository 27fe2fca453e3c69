package org.tensio.ui.editor.handlers;

import java.util.List;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.gef.EditPart;
import org.eclipse.gef.RequestConstants;
import org.eclipse.gef.commands.Command;
import org.eclipse.gef.commands.CompoundCommand;
import org.eclipse.gef.requests.GroupRequest;
import org.tensio.ui.editor.ui.ProjectEditor;

/** Delete (org.eclipse.ui.edit.delete) of the drawing's selected vertices and parts, as one command. */
public final class DeleteHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        ProjectEditor editor = Selections.editor(event);
        List<Object> selected = Selections.selected(editor);
        GroupRequest delete = new GroupRequest(RequestConstants.REQ_DELETE);
        delete.setEditParts(selected);
        CompoundCommand all = new CompoundCommand();
        for (Object o : selected) {
            if (o instanceof EditPart part) {
                Command c = part.getCommand(delete);
                if (c != null) {
                    all.add(c);
                }
            }
        }
        if (!all.isEmpty() && all.canExecute()) {
            editor.execute(all.unwrap());
        }
        return null;
    }
}
