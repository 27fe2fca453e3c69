package org.tensio.ui.editor.commands;

import org.eclipse.gef.commands.Command;
import org.eclipse.osgi.util.NLS;
import org.tensio.ui.editor.model.ObjectNode;

import com.google.gson.JsonElement;

/** Sets one member of a table row (material property, force component, combination factor); null removes it. */
public final class SetValueCommand extends Command {

    private final ObjectNode node;
    private final String key;
    private final JsonElement value;
    private JsonElement old;

    /** Sets {@code key} of {@code node} to {@code value}. */
    public SetValueCommand(ObjectNode node, String key, JsonElement value) {
        super(NLS.bind(Messages.SetValue_label, key, node.id()));
        this.node = node;
        this.key = key;
        this.value = value;
    }

    @Override
    public void execute() {
        old = node.get(key);
        redo();
    }

    @Override
    public void redo() {
        node.set(key, value);
    }

    @Override
    public void undo() {
        node.set(key, old);
    }
}
