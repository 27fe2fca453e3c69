package org.tensio.ui.editor.ui;

import java.util.Locale;

/** Number formatting of the editor: four significant digits, no grouping, dot as decimal separator. */
final class Format {

    private Format() {
    }

    static String number(double v) {
        if (!Double.isFinite(v)) {
            return "–"; //$NON-NLS-1$
        }
        if (v == 0) {
            return "0"; //$NON-NLS-1$
        }
        double a = Math.abs(v);
        if (a >= 1e6 || a < 1e-3) {
            return String.format(Locale.ROOT, "%.3e", v); //$NON-NLS-1$
        }
        int decimals = Math.max(0, 3 - (int) Math.floor(Math.log10(a)));
        return String.format(Locale.ROOT, "%." + decimals + "f", v); //$NON-NLS-1$ //$NON-NLS-2$
    }
}
