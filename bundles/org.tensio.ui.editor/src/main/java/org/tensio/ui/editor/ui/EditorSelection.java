package org.tensio.ui.editor.ui;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.runtime.ListenerList;
import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.ISelectionChangedListener;
import org.eclipse.jface.viewers.ISelectionProvider;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.SelectionChangedEvent;
import org.eclipse.jface.viewers.StructuredSelection;
import org.tensio.ui.selection.SectionPoint;

/**
 * The editor's selection provider: the graphical viewer's selected edit parts, followed by the
 * {@link SectionPoint} last clicked (the selection contract with the result views).
 */
final class EditorSelection implements ISelectionProvider {

    private final ListenerList<ISelectionChangedListener> listeners = new ListenerList<>();
    private List<Object> parts = List.of();
    private SectionPoint point;

    @Override
    public void addSelectionChangedListener(ISelectionChangedListener l) {
        listeners.add(l);
    }

    @Override
    public void removeSelectionChangedListener(ISelectionChangedListener l) {
        listeners.remove(l);
    }

    @Override
    public ISelection getSelection() {
        List<Object> all = new ArrayList<>(parts);
        if (point != null) {
            all.add(point);
        }
        return new StructuredSelection(all);
    }

    @Override
    public void setSelection(ISelection selection) {
        parts = selection instanceof IStructuredSelection s ? new ArrayList<>(s.toList()) : List.of();
        fire();
    }

    /** The viewer's selection changed. */
    void partsSelected(ISelection selection) {
        parts = selection instanceof IStructuredSelection s ? new ArrayList<>(s.toList()) : List.of();
        fire();
    }

    /** A point was clicked (null: none). */
    void pointSelected(SectionPoint p) {
        point = p;
        fire();
    }

    /** @return the last point clicked, or null */
    SectionPoint point() {
        return point;
    }

    private void fire() {
        SelectionChangedEvent e = new SelectionChangedEvent(this, getSelection());
        for (ISelectionChangedListener l : listeners) {
            l.selectionChanged(e);
        }
    }
}
