package org.tensio.ui.editor.commands;

import org.eclipse.gef.commands.Command;
import org.tensio.ui.editor.model.Part;
import org.tensio.ui.editor.model.SectionModel;

/** Removes a part from a section; a section keeps at least one part. */
public final class DeletePartCommand extends Command {

    private final SectionModel section;
    private final Part part;
    private int index = -1;

    /** Removes {@code part} from {@code section}. */
    public DeletePartCommand(SectionModel section, Part part) {
        super(Messages.DeletePart_label);
        this.section = section;
        this.part = part;
    }

    @Override
    public boolean canExecute() {
        return section.parts().size() > 1 && section.parts().contains(part);
    }

    @Override
    public void execute() {
        redo();
    }

    @Override
    public void redo() {
        index = section.removePart(part);
    }

    @Override
    public void undo() {
        section.addPart(index, part);
    }
}
