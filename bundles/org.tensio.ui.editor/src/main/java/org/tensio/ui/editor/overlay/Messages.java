package org.tensio.ui.editor.overlay;

import org.eclipse.osgi.util.NLS;

/** User-visible strings of the overlays. */
final class Messages extends NLS {

    private static final String BUNDLE_NAME = "org.tensio.ui.editor.overlay.messages"; //$NON-NLS-1$

    public static String ContourJob_name;
    public static String ContourJob_noService;

    static {
        NLS.initializeMessages(BUNDLE_NAME, Messages.class);
    }

    private Messages() {
    }
}
