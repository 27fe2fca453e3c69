package org.tensio.ui.handlers;

import org.eclipse.osgi.util.NLS;

/** User-visible strings of this package. */
public final class Messages extends NLS {

    private static final String BUNDLE_NAME = "org.tensio.ui.handlers.messages"; //$NON-NLS-1$

    public static String OpenProjectHandler_title;
    public static String OpenProjectHandler_filterProjects;
    public static String OpenProjectHandler_filterJson;
    public static String OpenProjectHandler_filterAll;
    public static String OpenProjectHandler_noView;

    static {
        NLS.initializeMessages(BUNDLE_NAME, Messages.class);
    }

    private Messages() {
    }
}
