package org.tensio.ui.editor.handlers;

import org.eclipse.osgi.util.NLS;

/** User-visible strings of the handlers. */
final class Messages extends NLS {

    private static final String BUNDLE_NAME = "org.tensio.ui.editor.handlers.messages"; //$NON-NLS-1$

    public static String InsertProfile_title;
    public static String InsertProfile_message;
    public static String OpenFile_title;

    static {
        NLS.initializeMessages(BUNDLE_NAME, Messages.class);
    }

    private Messages() {
    }
}
