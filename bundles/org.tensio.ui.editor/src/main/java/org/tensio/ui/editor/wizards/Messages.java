package org.tensio.ui.editor.wizards;

import org.eclipse.osgi.util.NLS;

/** User-visible strings of the wizard. */
final class Messages extends NLS {

    private static final String BUNDLE_NAME = "org.tensio.ui.editor.wizards.messages"; //$NON-NLS-1$

    public static String NewProjectWizard_title;
    public static String NewProjectPage_title;
    public static String NewProjectPage_description;
    public static String NewProjectPage_folder;
    public static String NewProjectPage_browse;
    public static String NewProjectPage_name;
    public static String NewProjectPage_noFolder;
    public static String NewProjectPage_badName;
    public static String NewProjectPage_exists;
    public static String NewProjectPage_failed;

    static {
        NLS.initializeMessages(BUNDLE_NAME, Messages.class);
    }

    private Messages() {
    }
}
