package org.tensio.ui.editor.figures;

import org.eclipse.draw2d.DeferredUpdateManager;
import org.eclipse.draw2d.Graphics;
import org.eclipse.draw2d.geometry.Rectangle;
import org.eclipse.swt.widgets.Control;

/**
 * An update manager for draw2d 3.2 on current SWT: draw2d 3.2 repairs damage by drawing on a GC made on the
 * canvas outside a paint event, which GTK 3 discards, so figures changed after the first paint stayed stale on
 * screen. This manager asks the canvas to redraw the damaged area instead; the paint event then paints the
 * figures with the event's GC (the path draw2d already uses for expose events).
 */
public final class RedrawUpdateManager extends DeferredUpdateManager {

    private final Control canvas;

    /** @param canvas the draw2d canvas whose lightweight system this manager serves */
    public RedrawUpdateManager(Control canvas) {
        this.canvas = canvas;
    }

    @Override
    protected Graphics getGraphics(Rectangle region) {
        if (!canvas.isDisposed()) {
            canvas.redraw(region.x, region.y, region.width, region.height, false);
        }
        return null;
    }
}
