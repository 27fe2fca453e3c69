package org.tensio.ui.editor.preferences;

/**
 * How the editor shows lengths and stresses: in the file's units (nothing converted, as the engine computes),
 * or converted to mm and MPa. Factors exact by definition: 1 in = 25.4 mm, 1 ft = 304.8 mm,
 * 1 lbf = 4.4482216152605 N, 1 kip = 1000 lbf (NIST SP 811, 2008, App. B).
 */
public enum DisplayUnits {
    /** The units written in the project file. */
    FILE,
    /** Millimetres and megapascals. */
    MM_MPA;

    /** @return the factor that turns a length in {@code unit} into this display's length */
    public double length(String unit) {
        return this == FILE ? 1 : mm(unit);
    }

    /** @return the factor that turns a stress in force/length² of the file into this display's stress */
    public double stress(String lengthUnit, String forceUnit) {
        if (this == FILE) {
            return 1;
        }
        double mm = mm(lengthUnit);
        return newtons(forceUnit) / (mm * mm);
    }

    /** @return the length unit symbol shown */
    public String lengthSymbol(String fileUnit) {
        return this == FILE ? fileUnit : "mm"; //$NON-NLS-1$
    }

    /** @return the stress unit symbol shown ({@code fileStress} is the file's, e.g. kPa or N/mm²) */
    public String stressSymbol(String fileStress) {
        return this == FILE ? fileStress : "MPa"; //$NON-NLS-1$
    }

    private static double mm(String unit) {
        return switch (unit) {
        case "cm" -> 10; //$NON-NLS-1$
        case "m" -> 1000; //$NON-NLS-1$
        case "in" -> 25.4; //$NON-NLS-1$
        case "ft" -> 304.8; //$NON-NLS-1$
        default -> 1;
        };
    }

    private static double newtons(String unit) {
        return switch (unit) {
        case "kN" -> 1e3; //$NON-NLS-1$
        case "MN" -> 1e6; //$NON-NLS-1$
        case "lbf" -> 4.4482216152605; //$NON-NLS-1$
        case "kip" -> 4448.2216152605; //$NON-NLS-1$
        default -> 1;
        };
    }
}
