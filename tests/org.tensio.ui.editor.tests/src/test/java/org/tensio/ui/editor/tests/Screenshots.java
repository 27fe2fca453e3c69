package org.tensio.ui.editor.tests;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.draw2d.FigureCanvas;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;

/** PNG screenshots of a shell, copied from the screen with {@link GC#copyArea(Image, int, int)}. */
final class Screenshots {

    private Screenshots() {
    }

    /** @return the folder for screenshots: system property {@code tensio.screenshots}, else target/screenshots */
    static Path folder() {
        return Path.of(System.getProperty("tensio.screenshots", "target/screenshots"));
    }

    /** Paints everything pending now (draw2d's deferred updates and the X server's expose events). */
    static void settle(Shell shell) {
        Display display = shell.getDisplay();
        UiConditions.flush(display);
        paintNow(shell);
        shell.update();
        UiConditions.flush(display);
    }

    private static void paintNow(Control c) {
        if (c instanceof FigureCanvas canvas) {
            canvas.getLightweightSystem().getUpdateManager().performUpdate();
        }
        if (c instanceof Composite composite) {
            for (Control child : composite.getChildren()) {
                paintNow(child);
            }
        }
    }

    /** @return the colour the screen shows at point (x, y) of {@code control} */
    static RGB pixel(Control control, int x, int y) {
        settle(control.getShell());
        org.eclipse.swt.graphics.Point p = control.toDisplay(x, y);
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

    /** Saves what the screen shows inside {@code shell}'s bounds as {@code folder()/name}, once it stops changing. */
    static Path save(Shell shell, String name) throws IOException {
        settle(shell);
        Path file = folder().resolve(name);
        Files.createDirectories(file.getParent());
        // GTK paints asynchronously: capture until two captures in a row agree (at most 50 rounds of events)
        ImageData shot = capture(shell);
        for (int i = 0; i < 50; i++) {
            UiConditions.waitUntil(shell.getDisplay(), java.time.Duration.ofSeconds(5), "one round of events",
                    new java.util.function.BooleanSupplier() {
                        private boolean ran;

                        @Override
                        public boolean getAsBoolean() {
                            boolean done = ran;
                            ran = true;
                            return done;
                        }
                    });
            settle(shell);
            ImageData again = capture(shell);
            boolean same = java.util.Arrays.equals(shot.data, again.data);
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
