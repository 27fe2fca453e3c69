package org.tensio.ui.results.preferences;

import org.eclipse.osgi.util.NLS;

/** User-visible strings of this package. */
public final class Messages extends NLS {

    private static final String BUNDLE_NAME = "org.tensio.ui.results.preferences.messages"; //$NON-NLS-1$

    public static String ResultsPreferencePage_description;
    public static String ResultsPreferencePage_threshold;
    public static String ResultsPreferencePage_invalid;

    static {
        NLS.initializeMessages(BUNDLE_NAME, Messages.class);
    }

    private Messages() {
    }
}
