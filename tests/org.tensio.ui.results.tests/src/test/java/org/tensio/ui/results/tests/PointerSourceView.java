package org.tensio.ui.results.tests;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.part.ViewPart;
import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.selection.SectionPointerSource;

/**
 * A stand-in for the section editor (built in another bundle): a part that offers a {@link SectionPointerSource}
 * through {@code getAdapter}, as the contract in {@code org.tensio.ui.selection} says, and lets a test move the
 * "pointer".
 */
public final class PointerSourceView extends ViewPart implements SectionPointerSource {

    /** View id (plugin.xml of this test bundle). */
    public static final String ID = "org.tensio.ui.results.tests.pointerSource";

    private final List<Consumer<SectionPoint>> listeners = new CopyOnWriteArrayList<>();

    @Override
    public void createPartControl(Composite parent) {
        new Label(parent, SWT.NONE).setText("pointer source (test stand-in for the section editor)");
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
