package org.tensio.ui.editor.pages;

import org.eclipse.gef.commands.Command;
import org.tensio.ui.editor.model.ProjectModel;

/** What a table page needs from its editor: the model and the command stack. */
public interface PageHost {

    /** @return the edited model */
    ProjectModel model();

    /** Executes {@code command} on the editor's command stack. */
    void execute(Command command);
}
