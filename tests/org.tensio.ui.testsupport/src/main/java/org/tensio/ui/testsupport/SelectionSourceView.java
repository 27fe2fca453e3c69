package org.tensio.ui.testsupport;

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

/**
 * A stand-in view for a Tensio view that publishes selections (the results tree, the section editor): it is its
 * site's selection provider and publishes whatever a test tells it, typically a
 * {@link org.tensio.ui.selection.SectionPoint} or a {@link org.tensio.ui.selection.StationRef}. It shows one label
 * with its part name. Declare it in the test bundle's plugin.xml under the id the test opens. UI thread only.
 */
public class SelectionSourceView extends ViewPart implements ISelectionProvider {

    private final ListenerList<ISelectionChangedListener> listeners = new ListenerList<>();
    private ISelection selection = StructuredSelection.EMPTY;
    private Label label;

    @Override
    public void createPartControl(Composite parent) {
        label = new Label(parent, SWT.NONE);
        label.setText(getPartName());
        getSite().setSelectionProvider(this);
    }

    /** Publishes {@code element} as this part's selection (a one-element structured selection). */
    public void select(Object element) {
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

    /** Sets the selection and tells every listener, also when it equals the previous one. */
    @Override
    public void setSelection(ISelection s) {
        selection = s;
        SelectionChangedEvent e = new SelectionChangedEvent(this, s);
        for (ISelectionChangedListener l : listeners) {
            l.selectionChanged(e);
        }
    }
}
