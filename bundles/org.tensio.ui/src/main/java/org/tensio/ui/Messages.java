package org.tensio.ui;

import org.eclipse.osgi.util.NLS;

/** User-visible strings of this package. */
public final class Messages extends NLS {

    private static final String BUNDLE_NAME = "org.tensio.ui.messages"; //$NON-NLS-1$

    public static String TensioWindowAdvisor_title;

    static {
        NLS.initializeMessages(BUNDLE_NAME, Messages.class);
    }

    private Messages() {
    }
}
