package org.tensio.ui.editor.commands;

import org.eclipse.gef.commands.Command;
import org.tensio.ui.editor.model.Part;
import org.tensio.ui.editor.model.SectionModel;

/** Adds a part to a section (making it composite when it had one part). */
public final class AddPartCommand extends Command {

    private final SectionModel section;
    private final Part part;

    /** Adds {@code part} at the end of {@code section}'s parts. */
    public AddPartCommand(SectionModel section, Part part) {
        super(Messages.AddPart_label);
        this.section = section;
        this.part = part;
    }

    @Override
    public void execute() {
        redo();
    }

    @Override
    public void redo() {
        section.addPart(section.parts().size(), part);
    }

    @Override
    public void undo() {
        section.removePart(part);
    }
}
