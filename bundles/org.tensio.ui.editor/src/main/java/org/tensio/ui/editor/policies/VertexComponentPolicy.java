package org.tensio.ui.editor.policies;

import org.eclipse.gef.commands.Command;
import org.eclipse.gef.editpolicies.ComponentEditPolicy;
import org.eclipse.gef.requests.GroupRequest;
import org.tensio.ui.editor.commands.DeleteVertexCommand;
import org.tensio.ui.editor.parts.VertexEditPart;
import org.tensio.ui.editor.parts.VertexHandle;

/** Delete of a vertex handle: a {@link DeleteVertexCommand}. */
public final class VertexComponentPolicy extends ComponentEditPolicy {

    @Override
    protected Command createDeleteCommand(GroupRequest request) {
        VertexHandle h = ((VertexEditPart) getHost()).handle();
        return new DeleteVertexCommand(h.loop(), h.vertex());
    }
}
