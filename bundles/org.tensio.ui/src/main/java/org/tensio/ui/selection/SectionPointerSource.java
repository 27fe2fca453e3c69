package org.tensio.ui.selection;

import java.util.function.Consumer;

/**
 * Pointer tracking offered by a part that draws a section (the section editor), obtained with
 * {@code part.getAdapter(SectionPointerSource.class)}. Pointer moves are too frequent for the selection
 * service, so they travel through this listener interface; a click that selects a point goes through the
 * selection service as a {@link SectionPoint}.
 * <p>
 * Listeners are called on the UI thread, at most once per pointer-move event, with the point under the
 * pointer, or {@code null} when the pointer leaves the section.
 *
 * @since 0.1
 */
public interface SectionPointerSource {

    /** Adds a listener (no effect when already added). */
    void addPointerListener(Consumer<SectionPoint> listener);

    /** Removes a listener (no effect when not added). */
    void removePointerListener(Consumer<SectionPoint> listener);
}
