package org.tensio.cli.report;

import java.util.ArrayList;
import java.util.List;

/**
 * A vector drawing in its own pixel frame (origin top left, y down, 1 unit = 1 CSS pixel = 0.75 pt), built once
 * and rendered both to inline SVG ({@link Svg}) and to PDF ({@link Pdf}), so the two reports show the same
 * picture. Colours are {@code #rrggbb} strings; {@code null} means none. Mutable while it is being built, then
 * only read.
 */
final class Scene {

    /** Horizontal text anchor. */
    enum Anchor {
        START, MIDDLE, END
    }

    /** Something drawn. */
    sealed interface Item permits Shape, Label, Dot {
    }

    /**
     * One or more polylines or polygons drawn with one fill and one stroke.
     *
     * @param rings       each ring as x0, y0, x1, y1, ...
     * @param closed      polygons (true) or open polylines (false)
     * @param evenOdd     even-odd fill rule (holes in outlines), else non-zero
     * @param fill        fill colour or null
     * @param stroke      stroke colour or null
     * @param strokeWidth stroke width, px
     * @param dash        dash pattern, px, or null for solid
     */
    record Shape(List<double[]> rings, boolean closed, boolean evenOdd, String fill, String stroke, double strokeWidth,
            double[] dash) implements Item {
    }

    /**
     * Text on one line; {@code (x, y)} is the baseline point at the anchor.
     *
     * @param size font size, px
     */
    record Label(double x, double y, String text, double size, Anchor anchor, String colour, boolean bold)
            implements Item {
    }

    /** A circle. */
    record Dot(double cx, double cy, double r, String fill, String stroke, double strokeWidth) implements Item {
    }

    final double width;
    final double height;
    /** Short description for assistive technology (the SVG title). */
    final String title;
    final List<Item> items = new ArrayList<>();

    Scene(double width, double height, String title) {
        this.width = width;
        this.height = height;
        this.title = title;
    }

    Scene add(Item item) {
        items.add(item);
        return this;
    }

    /** A single open line. */
    Scene line(String stroke, double width, double[] dash, double... xy) {
        return add(new Shape(List.of(xy), false, false, null, stroke, width, dash));
    }

    Scene polygon(String fill, String stroke, double width, double... xy) {
        return add(new Shape(List.of(xy), true, false, fill, stroke, width, null));
    }

    Scene text(double x, double y, String text, double size, Anchor anchor, String colour) {
        return add(new Label(x, y, text, size, anchor, colour, false));
    }

    Scene bold(double x, double y, String text, double size, Anchor anchor, String colour) {
        return add(new Label(x, y, text, size, anchor, colour, true));
    }

    Scene circle(double cx, double cy, double r, String fill, String stroke, double width) {
        return add(new Dot(cx, cy, r, fill, stroke, width));
    }

    /**
     * An arrow from (x0, y0) to (x1, y1) with a filled head at the end.
     *
     * @param head length of the head, px
     */
    Scene arrow(double x0, double y0, double x1, double y1, String colour, double width, double head) {
        double dx = x1 - x0, dy = y1 - y0, len = Math.hypot(dx, dy);
        if (len == 0) {
            return this;
        }
        double ux = dx / len, uy = dy / len;
        double h = Math.min(head, 0.6 * len);
        double bx = x1 - ux * h, by = y1 - uy * h;
        line(colour, width, null, x0, y0, bx, by);
        return polygon(colour, null, 0, x1, y1, bx - uy * h * 0.38, by + ux * h * 0.38, bx + uy * h * 0.38,
                by - ux * h * 0.38);
    }
}
