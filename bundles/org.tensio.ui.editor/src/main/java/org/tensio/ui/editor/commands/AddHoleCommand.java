package org.tensio.ui.editor.commands;

import java.util.List;

import org.eclipse.gef.commands.Command;
import org.tensio.ui.editor.model.Loop;
import org.tensio.ui.editor.model.Profile;
import org.tensio.ui.editor.model.Vertex;

/** Adds a square void to an arbitrary profile (the type becomes ArbitraryProfileWithVoids). */
public final class AddHoleCommand extends Command {

    private final Profile profile;
    private final Loop hole;
    private String oldType;

    /** Adds a square void of side {@code size} centred at (cx, cy) of the profile frame, length unit. */
    public AddHoleCommand(Profile profile, double cx, double cy, double size) {
        super(Messages.AddHole_label);
        this.profile = profile;
        double h = size / 2;
        // clockwise, as voids are stored (the engine orients loops anyway)
        this.hole = new Loop(List.of(new Vertex(cx - h, cy - h), new Vertex(cx - h, cy + h), new Vertex(cx + h, cy + h),
                new Vertex(cx + h, cy - h)));
    }

    @Override
    public boolean canExecute() {
        return profile.isArbitrary() && hole.vertices().get(2).x() > hole.vertices().get(0).x();
    }

    @Override
    public void execute() {
        oldType = profile.type();
        redo();
    }

    @Override
    public void redo() {
        profile.addVoid(profile.voids().size(), hole);
    }

    @Override
    public void undo() {
        profile.removeVoid(hole);
        profile.setType(oldType);
    }

    /** @return the void this command adds */
    public Loop hole() {
        return hole;
    }
}
