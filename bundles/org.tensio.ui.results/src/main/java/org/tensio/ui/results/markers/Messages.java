package org.tensio.ui.results.markers;

import org.eclipse.osgi.util.NLS;

/** User-visible strings of this package. */
public final class Messages extends NLS {

    private static final String BUNDLE_NAME = "org.tensio.ui.results.markers.messages"; //$NON-NLS-1$

    public static String CheckMarkers_job;
    public static String CheckMarkers_failed;
    public static String CheckMarkers_close;

    static {
        NLS.initializeMessages(BUNDLE_NAME, Messages.class);
    }

    private Messages() {
    }
}
