package org.tensio.ui.testsupport;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.function.Consumer;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;

/**
 * PNG screenshots of a shell and single screen pixels, copied from the screen with
 * {@link GC#copyArea(Image, int, int)}. UI thread only.
 * <p>
 * A toolkit drawn on SWT that defers its own painting (draw2d's update manager) passes a {@code paintPending}
 * action that paints what it has deferred; it runs on the shell before each capture. The overloads without it
 * paint only what SWT has pending.
 */
public final class Screenshots {

    /** At most this many extra captures while waiting for two in a row to agree. */
    private static final int MAX_ROUNDS = 50;

    private static final Consumer<Shell> NOTHING_PENDING = shell -> { };

    private Screenshots() {
    }

    /** @return the folder for screenshots: system property {@code tensio.screenshots}, else target/screenshots */
    public static Path folder() {
        return Path.of(System.getProperty("tensio.screenshots", "target/screenshots"));
    }

    /** Paints everything SWT has pending now (queued events and the X server's expose events). */
    public static void settle(Shell shell) {
        settle(shell, NOTHING_PENDING);
    }

    /** Paints everything pending now: events, then {@code paintPending} on {@code shell}, then expose events. */
    public static void settle(Shell shell, Consumer<? super Shell> paintPending) {
        Display display = shell.getDisplay();
        UiConditions.flush(display);
        paintPending.accept(shell);
        shell.update();
        UiConditions.flush(display);
    }

    /** @return the colour the screen shows at point (x, y), in pixels, of {@code control}'s client area */
    public static RGB pixel(Control control, int x, int y) {
        return pixel(control, x, y, NOTHING_PENDING);
    }

    /** As {@link #pixel(Control, int, int)}, after {@link #settle(Shell, Consumer)} with {@code paintPending}. */
    public static RGB pixel(Control control, int x, int y, Consumer<? super Shell> paintPending) {
        settle(control.getShell(), paintPending);
        Point p = control.toDisplay(x, y);
        Image image = new Image(control.getDisplay(), 1, 1);
        GC gc = new GC(control.getDisplay());
        try {
            gc.copyArea(image, p.x, p.y);
            ImageData data = image.getImageData();
            return data.palette.getRGB(data.getPixel(0, 0));
        } finally {
            gc.dispose();
            image.dispose();
        }
    }

    /**
     * Saves what the screen shows inside {@code shell}'s bounds as {@code folder()/name}, once it stops changing.
     *
     * @return the file written
     */
    public static Path save(Shell shell, String name) throws IOException {
        return save(shell, name, NOTHING_PENDING);
    }

    /**
     * As {@link #save(Shell, String)}, with {@code paintPending} run before every capture.
     *
     * @return the file written
     */
    public static Path save(Shell shell, String name, Consumer<? super Shell> paintPending) throws IOException {
        settle(shell, paintPending);
        Path file = folder().resolve(name);
        Files.createDirectories(file.getParent());
        // GTK paints asynchronously: capture until two captures in a row agree (at most MAX_ROUNDS rounds of events)
        ImageData shot = capture(shell);
        for (int i = 0; i < MAX_ROUNDS; i++) {
            UiConditions.dispatchOrSleep(shell.getDisplay());
            settle(shell, paintPending);
            ImageData again = capture(shell);
            boolean same = Arrays.equals(shot.data, again.data);
            shot = again;
            if (same) {
                break;
            }
        }
        ImageLoader loader = new ImageLoader();
        loader.data = new ImageData[] { shot };
        loader.save(file.toString(), SWT.IMAGE_PNG);
        return file;
    }

    private static ImageData capture(Shell shell) {
        Rectangle bounds = shell.getBounds();
        Image image = new Image(shell.getDisplay(), bounds.width, bounds.height);
        GC gc = new GC(shell.getDisplay());
        try {
            gc.copyArea(image, bounds.x, bounds.y);
            return image.getImageData();
        } finally {
            gc.dispose();
            image.dispose();
        }
    }
}
