package org.tensio.example.tests;

import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.ISelectionChangedListener;
import org.eclipse.jface.viewers.ISelectionProvider;
import org.eclipse.jface.viewers.SelectionChangedEvent;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.part.ViewPart;
import org.eclipse.core.runtime.ListenerList;

/** A test view that publishes a selection it is told, as a Tensio view publishes a selected point. */
public final class PointSourceView extends ViewPart implements ISelectionProvider {

    private final ListenerList<ISelectionChangedListener> listeners = new ListenerList<>();
    private ISelection selection = StructuredSelection.EMPTY;
    private Label label;

    @Override
    public void createPartControl(Composite parent) {
        label = new Label(parent, SWT.NONE);
        label.setText("test point source");
        getSite().setSelectionProvider(this);
    }

    /** Publishes {@code element} as the selection. UI thread. */
    public void select(Object element) {
        selection = new StructuredSelection(element);
        SelectionChangedEvent e = new SelectionChangedEvent(this, selection);
        for (ISelectionChangedListener l : listeners) {
            l.selectionChanged(e);
        }
    }

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
        return selection;
    }

    @Override
    public void setSelection(ISelection s) {
        select(((StructuredSelection) s).getFirstElement());
    }

    @Override
    public void setFocus() {
        label.setFocus();
    }
}
