package org.tensio.ui.editor.preferences;

import org.eclipse.osgi.util.NLS;

/** User-visible strings of the preferences. */
final class Messages extends NLS {

    private static final String BUNDLE_NAME = "org.tensio.ui.editor.preferences.messages"; //$NON-NLS-1$

    public static String Preferences_description;
    public static String Preferences_units;
    public static String Preferences_unitsFile;
    public static String Preferences_unitsMm;
    public static String Preferences_mesh;
    public static String Preferences_quantity;
    public static String Preferences_sigma;
    public static String Preferences_tau;
    public static String Preferences_vonMises;
    public static String Preferences_utilisation;
    public static String Preferences_fatigueUtilisation;
    public static String Preferences_scale;
    public static String Preferences_scaleBands;
    public static String Preferences_scaleGrey;

    static {
        NLS.initializeMessages(BUNDLE_NAME, Messages.class);
    }

    private Messages() {
    }
}
