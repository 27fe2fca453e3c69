package org.tensio.ui.editor.ui;

import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.part.MultiPageEditorActionBarContributor;

/**
 * The editor's action-bar contributor. Undo, Redo, Delete and the editor's own commands are contributed
 * through org.eclipse.ui.handlers and org.eclipse.ui.menus (plugin.xml), so nothing is added here; the pages
 * are controls, not nested editors, so there is nothing to switch per page either.
 */
public final class ProjectEditorContributor extends MultiPageEditorActionBarContributor {

    @Override
    public void setActivePage(IEditorPart activeEditor) {
        // the handlers in plugin.xml serve every page
    }
}
