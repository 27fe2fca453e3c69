package org.tensio.ui.editor.commands;

import org.eclipse.gef.commands.Command;
import org.tensio.ui.editor.model.ProjectModel;

import com.google.gson.JsonObject;

/** Replaces the whole document (an edit of the raw JSON text). */
public final class ReplaceDocumentCommand extends Command {

    private final ProjectModel model;
    private final JsonObject replacement;
    private JsonObject old;

    /** Replaces {@code model}'s content by {@code replacement} (copied). */
    public ReplaceDocumentCommand(ProjectModel model, JsonObject replacement) {
        super(Messages.ReplaceDocument_label);
        this.model = model;
        this.replacement = replacement.deepCopy();
    }

    @Override
    public void execute() {
        old = model.toJson();
        redo();
    }

    @Override
    public void redo() {
        model.replace(replacement);
    }

    @Override
    public void undo() {
        model.replace(old);
    }
}
