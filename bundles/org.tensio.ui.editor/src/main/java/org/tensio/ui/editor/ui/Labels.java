package org.tensio.ui.editor.ui;

import org.tensio.ui.editor.overlay.Quantity;

/** Display names of enum values. */
final class Labels {

    private Labels() {
    }

    static String quantity(Quantity q) {
        return switch (q) {
        case SIGMA_Z -> Messages.Quantity_sigmaZ;
        case TAU -> Messages.Quantity_tau;
        case VON_MISES -> Messages.Quantity_vonMises;
        case UTILISATION -> Messages.Quantity_utilisation;
        case FATIGUE_UTILISATION -> Messages.Quantity_fatigueUtilisation;
        };
    }
}
