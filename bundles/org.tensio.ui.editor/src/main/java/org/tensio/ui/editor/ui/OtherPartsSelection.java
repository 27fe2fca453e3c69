package org.tensio.ui.editor.ui;

import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.IWorkbenchPart;
import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.selection.StationRef;

/**
 * The editor's side of the selection contract of {@code org.tensio.ui.selection}: when another part (a result
 * view) selects a station or a point of the edited file, the drawing shows that station and case (for a load
 * history of its fatigue check, the fatigue quantity for that history), or that section, and marks the point (a
 * station alone clears the mark). Selections of other files are ignored.
 */
final class OtherPartsSelection implements ISelectionListener {

    private final ProjectEditor editor;

    OtherPartsSelection(ProjectEditor editor) {
        this.editor = editor;
    }

    @Override
    public void selectionChanged(IWorkbenchPart part, ISelection s) {
        SectionPage page = editor.sectionPage();
        if (part == editor || !(s instanceof IStructuredSelection structured) || page == null) {
            return;
        }
        for (Object element : structured.toList()) {
            if (element instanceof StationRef ref && editor.path().equals(ref.project())) {
                page.showStation(ref.stationId(), ref.caseId(), ref.historyId());
                page.mark(null);
            } else if (element instanceof SectionPoint p && editor.path().equals(p.project())) {
                if (p.stationId() != null) {
                    page.showStation(p.stationId(), p.caseId(), p.historyId());
                } else {
                    page.showSection(p.sectionId());
                }
                page.mark(new double[] { p.x(), p.y() });
            }
        }
    }
}
