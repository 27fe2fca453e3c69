package org.tensio.ui.editor.commands;

import org.eclipse.gef.commands.Command;
import org.eclipse.osgi.util.NLS;
import org.tensio.ui.editor.model.Profile;

import com.google.gson.JsonElement;

/** Sets one parameter of a parametric profile (length unit of the file); null removes it (IFC4 default). */
public final class SetParameterCommand extends Command {

    private final Profile profile;
    private final String name;
    private final JsonElement value;
    private JsonElement old;

    /** Sets {@code name} of {@code profile} to {@code value}. */
    public SetParameterCommand(Profile profile, String name, JsonElement value) {
        super(NLS.bind(Messages.SetParameter_label, name));
        this.profile = profile;
        this.name = name;
        this.value = value;
    }

    @Override
    public void execute() {
        old = profile.parameter(name);
        redo();
    }

    @Override
    public void redo() {
        profile.setParameter(name, value);
    }

    @Override
    public void undo() {
        profile.setParameter(name, old);
    }
}
