package org.tensio.ui.editor.parts;

import java.util.HashMap;
import java.util.Map;

import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.widgets.Display;

/**
 * The colours of the section drawing, created on first use and disposed by the owner (the editor page) with
 * {@link #dispose()}. Registered on the viewer under {@link #PROPERTY} so that edit parts find them.
 */
public final class Inks {

    /** Viewer property holding the editor's Inks. */
    public static final String PROPERTY = "org.tensio.ui.editor.inks"; //$NON-NLS-1$

    /** Canvas background (also the fill of voids). */
    public static final RGB CANVAS = new RGB(255, 255, 255);
    /** Fill of a steel-grey part (the first material). */
    public static final RGB PART_FILL = new RGB(200, 210, 222);
    /** Fill of parts of a second and further materials. */
    public static final RGB PART_FILL_2 = new RGB(226, 214, 190);
    /** Part outline. */
    public static final RGB OUTLINE = new RGB(40, 52, 70);
    /** Outline of a part with a validation error. */
    public static final RGB ERROR = new RGB(200, 30, 40);
    /** Vertex handle fill. */
    public static final RGB VERTEX = new RGB(255, 255, 255);
    /** Mesh lines. */
    public static final RGB MESH = new RGB(90, 100, 115);
    /** Axes, centroid and shear centre. */
    public static final RGB AXES = new RGB(20, 90, 60);
    /** The marked point. */
    public static final RGB MARK = new RGB(150, 20, 150);

    private final Display display;
    private final Map<RGB, Color> colours = new HashMap<>();

    /** Colours for {@code display}. */
    public Inks(Display display) {
        this.display = display;
    }

    /** @return the colour of {@code rgb}, owned by this registry */
    public Color get(RGB rgb) {
        return colours.computeIfAbsent(rgb, c -> new Color(display, c));
    }

    /** Disposes every colour handed out. */
    public void dispose() {
        colours.values().forEach(Color::dispose);
        colours.clear();
    }
}
