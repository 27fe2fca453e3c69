package org.tensio.ui.editor.commands;

import org.eclipse.gef.commands.Command;
import org.eclipse.osgi.util.NLS;
import org.tensio.ui.editor.model.Part;

/** Assigns a material (by id) to a part. */
public final class AssignMaterialCommand extends Command {

    private final Part part;
    private final String material;
    private String old;

    /** Gives {@code part} the material {@code material}. */
    public AssignMaterialCommand(Part part, String material) {
        super(NLS.bind(Messages.AssignMaterial_label, material));
        this.part = part;
        this.material = material;
    }

    @Override
    public void execute() {
        old = part.material();
        redo();
    }

    @Override
    public void redo() {
        part.setMaterial(material);
    }

    @Override
    public void undo() {
        part.setMaterial(old);
    }
}
