package org.tensio.ui.views;

import java.util.Locale;
import java.util.function.Function;

import org.tensio.engine.properties.SectionProperties;

/**
 * The columns of the Sections table, in display order. Values in the project's units (length, length², length³,
 * length⁴; angle in degrees), six significant digits. Centroid coordinates, Ixy and the angle within round-off of zero
 * (|v| ≤ 1e-12 × the section's extent, × max(Ixx, Iyy), or × 90°) are shown as 0: display only, the engine's values are
 * untouched.
 */
enum SectionColumn {
    SECTION(Messages.SectionColumn_section, 100, SectionProperties::section),
    AREA(Messages.SectionColumn_area, p -> number(p.area())),
    XC(Messages.SectionColumn_xc, p -> number(snap(p.centroid().x(), extent(p)))),
    YC(Messages.SectionColumn_yc, p -> number(snap(p.centroid().y(), extent(p)))),
    IXX(Messages.SectionColumn_ixx, p -> number(p.ixx())),
    IYY(Messages.SectionColumn_iyy, p -> number(p.iyy())),
    IXY(Messages.SectionColumn_ixy, p -> number(snap(p.ixy(), Math.max(Math.abs(p.ixx()), Math.abs(p.iyy()))))),
    I1(Messages.SectionColumn_i1, p -> number(p.i1())),
    I2(Messages.SectionColumn_i2, p -> number(p.i2())),
    ANGLE(Messages.SectionColumn_angle, p -> number(snap(p.principalAngleDeg(), 90))),
    ZX(Messages.SectionColumn_zx, p -> number(p.zx())),
    ZY(Messages.SectionColumn_zy, p -> number(p.zy())),
    J(Messages.SectionColumn_j, p -> p.j() == null ? Messages.SectionColumn_notComputed : number(p.j()));

    private static final int NUMBER_WIDTH = 72;
    private static final double ROUND_OFF = 1e-12;

    private final String header;
    private final int width;
    private final Function<SectionProperties, String> text;

    SectionColumn(String header, Function<SectionProperties, String> text) {
        this(header, NUMBER_WIDTH, text);
    }

    SectionColumn(String header, int width, Function<SectionProperties, String> text) {
        this.header = header;
        this.width = width;
        this.text = text;
    }

    String header() {
        return header;
    }

    int width() {
        return width;
    }

    String text(SectionProperties properties) {
        return text.apply(properties);
    }

    static double snap(double value, double scale) {
        return Math.abs(value) <= ROUND_OFF * scale ? 0.0 : value;
    }

    private static double extent(SectionProperties p) {
        return Math.max(p.maxX() - p.minX(), p.maxY() - p.minY());
    }

    static String number(double value) {
        // + 0.0 turns -0.0 into 0.0
        return String.format(Locale.ROOT, "%.6g", value + 0.0); //$NON-NLS-1$
    }
}
