package com.fenwickroe.tensio.housekit;

import java.util.Locale;

import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.part.ViewPart;
import org.tensio.ui.selection.SectionPoint;

/**
 * A view of the fictitious firm's own that follows the point selected in Tensio's section editor, results
 * tree or stress-point view through the standard selection service, and shows what its checkers note for a
 * point: station, case, coordinates and the distance from the section origin. Uses only public API.
 */
public final class PointNotesView extends ViewPart implements ISelectionListener {

    /** The view id in plugin.xml. */
    public static final String ID = "com.fenwickroe.tensio.housekit.pointNotes";

    private Label text;
    private SectionPoint shown;

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new FillLayout());
        text = new Label(parent, SWT.WRAP);
        text.setText("Select a point in a Tensio view.");
        getSite().getWorkbenchWindow().getSelectionService().addPostSelectionListener(this);
    }

    @Override
    public void selectionChanged(IWorkbenchPart part, ISelection selection) {
        if (part == this || !(selection instanceof IStructuredSelection s) || s.isEmpty()) {
            return;
        }
        Object first = s.getFirstElement();
        SectionPoint p = first instanceof SectionPoint sp ? sp
                : org.eclipse.core.runtime.Adapters.adapt(first, SectionPoint.class);
        if (p != null && !text.isDisposed()) {
            shown = p;
            text.setText(String.format(Locale.ROOT, "Station %s, case %s, section %s%nx = %.6g, y = %.6g, r = %.6g",
                    p.stationId(), p.caseId() == null ? "(governing)" : p.caseId(), p.sectionId(), p.x(), p.y(),
                    Math.hypot(p.x(), p.y())));
        }
    }

    /** @return the point shown last, or null */
    public SectionPoint shown() {
        return shown;
    }

    @Override
    public void setFocus() {
        text.setFocus();
    }

    @Override
    public void dispose() {
        getSite().getWorkbenchWindow().getSelectionService().removePostSelectionListener(this);
        super.dispose();
    }
}
