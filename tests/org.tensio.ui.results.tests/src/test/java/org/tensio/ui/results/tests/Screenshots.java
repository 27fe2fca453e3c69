package org.tensio.ui.results.tests;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Shell;

/** PNG screenshots of a shell, copied from the screen with {@link GC#copyArea(Image, int, int)}. */
final class Screenshots {

    private Screenshots() {
    }

    /** @return the folder for screenshots: system property {@code tensio.screenshots}, else target/screenshots */
    static Path folder() {
        return Path.of(System.getProperty("tensio.screenshots", "target/screenshots"));
    }

    /** Saves what the screen shows inside {@code shell}'s bounds as {@code folder()/name}. */
    static Path save(Shell shell, String name) throws IOException {
        Path file = folder().resolve(name);
        Files.createDirectories(file.getParent());
        Rectangle bounds = shell.getBounds();
        Image image = new Image(shell.getDisplay(), bounds.width, bounds.height);
        GC gc = new GC(shell.getDisplay());
        try {
            gc.copyArea(image, bounds.x, bounds.y);
            ImageLoader loader = new ImageLoader();
            loader.data = new ImageData[] { image.getImageData() };
            loader.save(file.toString(), SWT.IMAGE_PNG);
        } finally {
            gc.dispose();
            image.dispose();
        }
        return file;
    }
}
