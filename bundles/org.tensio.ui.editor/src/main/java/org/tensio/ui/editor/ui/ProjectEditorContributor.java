package org.tensio.ui.editor.ui;

import org.eclipse.gef.ui.actions.DeleteAction;
import org.eclipse.gef.ui.actions.RedoAction;
import org.eclipse.gef.ui.actions.UndoAction;
import org.eclipse.jface.action.IAction;
import org.eclipse.ui.IActionBars;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.actions.ActionFactory;
import org.eclipse.ui.part.MultiPageEditorActionBarContributor;

/**
 * Connects the workbench's Undo, Redo and Delete commands (org.eclipse.ui.edit.*) to the active project
 * editor's command stack and drawing selection, as global action handlers.
 */
public final class ProjectEditorContributor extends MultiPageEditorActionBarContributor {

    private ProjectEditor editor;
    private UndoAction undo;
    private RedoAction redo;
    private DeleteAction delete;

    @Override
    public void setActiveEditor(IEditorPart part) {
        if (part == editor) {
            super.setActiveEditor(part);
            return;
        }
        disposeActions();
        editor = part instanceof ProjectEditor p ? p : null;
        if (editor != null) {
            undo = new UndoAction(editor);
            redo = new RedoAction(editor);
            delete = new DeleteAction((org.eclipse.ui.IWorkbenchPart) editor);
            delete.setSelectionProvider(editor.graphicalViewer());
            editor.graphicalViewer().addSelectionChangedListener(e -> {
                if (delete != null) {
                    delete.update();
                }
            });
        }
        IActionBars bars = getActionBars();
        bars.setGlobalActionHandler(ActionFactory.UNDO.getId(), undo);
        bars.setGlobalActionHandler(ActionFactory.REDO.getId(), redo);
        bars.setGlobalActionHandler(ActionFactory.DELETE.getId(), delete);
        bars.updateActionBars();
        super.setActiveEditor(part);
    }

    @Override
    public void setActivePage(IEditorPart activeEditor) {
        // the pages are controls, not nested editors: the handlers above serve every page
    }

    private void disposeActions() {
        for (IAction a : new IAction[] { undo, redo, delete }) {
            if (a instanceof org.eclipse.gef.Disposable d) {
                d.dispose();
            }
        }
        undo = null;
        redo = null;
        delete = null;
    }

    @Override
    public void dispose() {
        disposeActions();
        super.dispose();
    }
}
