package org.tensio.ui.editor.policies;

import org.eclipse.gef.commands.Command;
import org.eclipse.gef.editpolicies.ComponentEditPolicy;
import org.eclipse.gef.requests.GroupRequest;
import org.tensio.ui.editor.commands.DeletePartCommand;
import org.tensio.ui.editor.parts.PartEditPart;
import org.tensio.ui.editor.parts.SectionEditPart;

/** Delete of a part: a {@link DeletePartCommand} (not for the last part of a section). */
public final class PartComponentPolicy extends ComponentEditPolicy {

    @Override
    protected Command createDeleteCommand(GroupRequest request) {
        SectionEditPart section = (SectionEditPart) getHost().getParent();
        return new DeletePartCommand(section.section(), ((PartEditPart) getHost()).part());
    }
}
