package org.tensio.ui.editor.commands;

import org.eclipse.gef.commands.Command;
import org.eclipse.osgi.util.NLS;
import org.tensio.ui.editor.model.Part;
import org.tensio.ui.editor.model.Profile;

/** Replaces a part's profile (inserting a parametric profile in place of the old one). */
public final class SetProfileCommand extends Command {

    private final Part part;
    private final Profile profile;
    private Profile old;

    /** Gives {@code part} the profile {@code profile}. */
    public SetProfileCommand(Part part, Profile profile) {
        super(NLS.bind(Messages.SetProfile_label, profile.type()));
        this.part = part;
        this.profile = profile;
    }

    @Override
    public void execute() {
        old = part.profile();
        redo();
    }

    @Override
    public void redo() {
        part.setProfile(profile);
    }

    @Override
    public void undo() {
        part.setProfile(old);
    }
}
