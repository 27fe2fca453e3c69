package org.tensio.ui.results.tests;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;

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
import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.selection.SectionPointerSource;

/**
 * A stand-in for the section editor (built in another bundle): a part that offers a {@link SectionPointerSource}
 * through {@code getAdapter}, as the contract in {@code org.tensio.ui.selection} says, and lets a test move the
 * "pointer" and publish a selection.
 */
public final class PointerSourceView extends ViewPart implements SectionPointerSource {

    /** View id (plugin.xml of this test bundle). */
    public static final String ID = "org.tensio.ui.results.tests.pointerSource";

    private final List<Consumer<SectionPoint>> listeners = new CopyOnWriteArrayList<>();

    private final ListenerList<ISelectionChangedListener> selectionListeners = new ListenerList<>();
    private ISelection selection = StructuredSelection.EMPTY;

    @Override
    public void createPartControl(Composite parent) {
        new Label(parent, SWT.NONE).setText("pointer source (test stand-in for the section editor)");
        getSite().setSelectionProvider(new ISelectionProvider() {
            @Override
            public void addSelectionChangedListener(ISelectionChangedListener l) {
                selectionListeners.add(l);
            }

            @Override
            public void removeSelectionChangedListener(ISelectionChangedListener l) {
                selectionListeners.remove(l);
            }

            @Override
            public ISelection getSelection() {
                return selection;
            }

            @Override
            public void setSelection(ISelection s) {
                selection = s;
                SelectionChangedEvent e = new SelectionChangedEvent(this, s);
                for (ISelectionChangedListener l : selectionListeners) {
                    l.selectionChanged(e);
                }
            }
        });
    }

    /** Publishes {@code value} (a SectionPoint or StationRef) as this part's selection. UI thread. */
    public void publish(Object value) {
        getSite().getSelectionProvider().setSelection(new StructuredSelection(value));
    }

    /** Tells the listeners that the pointer is over {@code p} (null: it left the section). UI thread. */
    public void move(SectionPoint p) {
        for (Consumer<SectionPoint> l : listeners) {
            l.accept(p);
        }
    }

    /** @return the number of listeners */
    public int listenerCount() {
        return listeners.size();
    }

    @Override
    public void addPointerListener(Consumer<SectionPoint> listener) {
        if (!listeners.contains(listener)) {
            listeners.add(listener);
        }
    }

    @Override
    public void removePointerListener(Consumer<SectionPoint> listener) {
        listeners.remove(listener);
    }

    @Override
    public <T> T getAdapter(Class<T> adapter) {
        if (adapter == SectionPointerSource.class) {
            return adapter.cast(this);
        }
        return super.getAdapter(adapter);
    }

    @Override
    public void setFocus() {
        // nothing to focus
    }
}
