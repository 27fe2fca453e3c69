package org.tensio.ui.editor.ui;

import org.eclipse.gef.commands.CommandStack;
import org.eclipse.gef.ui.properties.UndoablePropertySheetEntry;
import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.views.properties.PropertySheetPage;
import org.tensio.ui.selection.SectionPoint;

/**
 * The editor's Properties page: the selected parts' properties, edited through the editor's command stack
 * (undoable). The {@link SectionPoint} in the editor's selection is for the result views and is left out.
 */
final class PartsPropertySheetPage extends PropertySheetPage {

    /** @param stack the editor's command stack, which records every property edit */
    PartsPropertySheetPage(CommandStack stack) {
        setRootEntry(new UndoablePropertySheetEntry(stack));
    }

    @Override
    public void selectionChanged(IWorkbenchPart part, ISelection s) {
        if (s instanceof IStructuredSelection structured) {
            s = new StructuredSelection(structured.toList().stream().filter(o -> !(o instanceof SectionPoint)).toList());
        }
        super.selectionChanged(part, s);
    }
}
