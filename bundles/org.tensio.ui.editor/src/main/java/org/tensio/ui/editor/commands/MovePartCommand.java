package org.tensio.ui.editor.commands;

import org.eclipse.gef.commands.Command;
import org.tensio.ui.editor.model.Part;

/** Sets a part's offset (length unit of the file). */
public final class MovePartCommand extends Command {

    private final Part part;
    private final double[] offset;
    private double[] old;

    /** Places {@code part}'s profile origin at (dx, dy). */
    public MovePartCommand(Part part, double dx, double dy) {
        super(Messages.MovePart_label);
        this.part = part;
        this.offset = new double[] { dx, dy };
    }

    @Override
    public void execute() {
        old = part.offset();
        redo();
    }

    @Override
    public void redo() {
        part.setOffset(offset);
    }

    @Override
    public void undo() {
        part.setOffset(old);
    }
}
