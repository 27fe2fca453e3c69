package org.tensio.ui.editor.tests;

import org.eclipse.core.runtime.ListenerList;
import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.ISelectionChangedListener;
import org.eclipse.jface.viewers.ISelectionProvider;
import org.eclipse.jface.viewers.SelectionChangedEvent;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.part.ViewPart;

/** A view that publishes what the results tree will publish (a StationRef or a SectionPoint). */
public final class StandInResultsView extends ViewPart implements ISelectionProvider {

    static final String ID = "org.tensio.ui.editor.tests.standInResults";

    private final ListenerList<ISelectionChangedListener> listeners = new ListenerList<>();
    private ISelection selection = StructuredSelection.EMPTY;
    private Label label;

    @Override
    public void createPartControl(Composite parent) {
        label = new Label(parent, SWT.NONE);
        label.setText("stand-in results");
        getSite().setSelectionProvider(this);
    }

    /** Selects {@code element} as the results tree would. */
    void select(Object element) {
        setSelection(new StructuredSelection(element));
    }

    @Override
    public void setFocus() {
        label.setFocus();
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
        selection = s;
        SelectionChangedEvent e = new SelectionChangedEvent(this, s);
        for (ISelectionChangedListener l : listeners) {
            l.selectionChanged(e);
        }
    }
}
