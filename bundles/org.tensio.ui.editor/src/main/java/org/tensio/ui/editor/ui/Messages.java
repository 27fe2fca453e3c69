package org.tensio.ui.editor.ui;

import org.eclipse.osgi.util.NLS;

/** User-visible strings of the editor. */
final class Messages extends NLS {

    private static final String BUNDLE_NAME = "org.tensio.ui.editor.ui.messages"; //$NON-NLS-1$

    public static String ProjectEditor_noFile;
    public static String ProjectEditor_cannotRead;
    public static String ProjectEditor_pageSection;
    public static String ProjectEditor_pageMaterials;
    public static String ProjectEditor_pageCases;
    public static String ProjectEditor_pageStations;
    public static String ProjectEditor_columnStation;
    public static String ProjectEditor_columnSection;
    public static String ProjectEditor_columnCases;
    public static String ProjectEditor_pageCombinations;
    public static String ProjectEditor_pageJson;
    public static String ProjectEditor_columnMaterial;
    public static String ProjectEditor_columnCase;
    public static String ProjectEditor_columnCombination;
    public static String ProjectEditor_saveFailedTitle;
    public static String ProjectEditor_saveFailed;
    public static String ProjectEditor_changedTitle;
    public static String ProjectEditor_changed;
    public static String ProjectEditor_changedDirty;
    public static String SectionPage_section;
    public static String SectionPage_station;
    public static String SectionPage_case;
    public static String SectionPage_history;
    public static String SectionPage_quantity;
    public static String SectionPage_contour;
    public static String SectionPage_mesh;
    public static String SectionPage_axes;
    public static String SectionPage_fit;
    public static String SectionPage_noStation;
    public static String SectionPage_pointer;
    public static String Quantity_sigmaZ;
    public static String Quantity_tau;
    public static String Quantity_vonMises;
    public static String Quantity_utilisation;
    public static String Quantity_fatigueUtilisation;
    public static String Legend_title;
    public static String Legend_case;
    public static String Legend_history;
    public static String Legend_minMax;
    public static String Legend_overLimit;
    public static String Legend_computing;
    public static String Legend_invalid;
    public static String Legend_noCase;
    public static String Legend_noHistory;
    public static String Legend_noFatigue;
    public static String Legend_noFatigueHere;
    public static String Legend_noValues;
    public static String Legend_failed;
    public static String FatigueCaution;
    public static String Caution;
    public static String Property_part;
    public static String Property_parameters;
    public static String Property_material;
    public static String Property_type;
    public static String Property_offsetX;
    public static String Property_offsetY;

    static {
        NLS.initializeMessages(BUNDLE_NAME, Messages.class);
    }

    private Messages() {
    }
}
