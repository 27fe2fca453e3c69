package org.tensio.ui.editor.validation;

import org.eclipse.osgi.util.NLS;

/** User-visible strings of the validation. */
final class Messages extends NLS {

    private static final String BUNDLE_NAME = "org.tensio.ui.editor.validation.messages"; //$NON-NLS-1$

    public static String ValidationJob_name;
    public static String ValidationJob_noService;

    static {
        NLS.initializeMessages(BUNDLE_NAME, Messages.class);
    }

    private Messages() {
    }
}
