package org.tensio.ui.editor.ui;

import java.util.function.Consumer;

import org.eclipse.core.runtime.ListenerList;
import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.selection.SectionPointerSource;

/** The editor's {@link SectionPointerSource}: pointer moves over the section, on the UI thread. */
final class PointerSource implements SectionPointerSource {

    private final ListenerList<Consumer<SectionPoint>> listeners = new ListenerList<>();

    @Override
    public void addPointerListener(Consumer<SectionPoint> listener) {
        listeners.add(listener);
    }

    @Override
    public void removePointerListener(Consumer<SectionPoint> listener) {
        listeners.remove(listener);
    }

    /** Reports the point under the pointer (null: off the section). */
    void moved(SectionPoint p) {
        for (Consumer<SectionPoint> l : listeners) {
            l.accept(p);
        }
    }
}
