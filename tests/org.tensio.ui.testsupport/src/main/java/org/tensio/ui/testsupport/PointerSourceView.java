package org.tensio.ui.testsupport;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;

import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.selection.SectionPointerSource;

/**
 * A stand-in for the section editor: a {@link SelectionSourceView} that also offers a {@link SectionPointerSource}
 * through {@code getAdapter}, as the contract in {@code org.tensio.ui.selection} says, and lets a test move the
 * "pointer". Declare it in the test bundle's plugin.xml under the id the test opens. UI thread only.
 */
public final class PointerSourceView extends SelectionSourceView implements SectionPointerSource {

    private final List<Consumer<SectionPoint>> listeners = new CopyOnWriteArrayList<>();

    /** Tells the listeners that the pointer is over {@code p} (null: it left the section). */
    public void move(SectionPoint p) {
        for (Consumer<SectionPoint> l : listeners) {
            l.accept(p);
        }
    }

    /** @return the number of pointer listeners */
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
}
