package org.tensio.ui.editor.handlers;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.gef.commands.CommandStack;

/**
 * Undo and Redo of the workbench (org.eclipse.ui.edit.undo / redo) on the active project editor's command
 * stack; the handler class is declared twice in plugin.xml, with the parameter {@code redo} for Redo.
 */
public final class StackHandler extends AbstractHandler implements org.eclipse.core.runtime.IExecutableExtension {

    private boolean redo;

    @Override
    public void setInitializationData(org.eclipse.core.runtime.IConfigurationElement config, String property,
            Object data) {
        redo = "redo".equals(data); //$NON-NLS-1$
    }

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        CommandStack stack = Selections.editor(event).getCommandStack();
        if (redo && stack.canRedo()) {
            stack.redo();
        } else if (!redo && stack.canUndo()) {
            stack.undo();
        }
        return null;
    }
}
