package org.tensio.ui.editor.commands;

import org.eclipse.osgi.util.NLS;

/** Command labels (shown in Undo/Redo menu items). */
final class Messages extends NLS {

    private static final String BUNDLE_NAME = "org.tensio.ui.editor.commands.messages"; //$NON-NLS-1$

    public static String MoveVertex_label;
    public static String AddVertex_label;
    public static String DeleteVertex_label;
    public static String AddHole_label;
    public static String SetArc_label;
    public static String ClearArc_label;
    public static String AddPart_label;
    public static String SetProfile_label;
    public static String SetParameter_label;
    public static String AssignMaterial_label;
    public static String SetValue_label;
    public static String ReplaceDocument_label;
    public static String MovePart_label;
    public static String DeletePart_label;
    public static String SetStationSection_label;

    static {
        NLS.initializeMessages(BUNDLE_NAME, Messages.class);
    }

    private Messages() {
    }
}
