package org.tensio.ui.views;

import org.eclipse.osgi.util.NLS;

/** User-visible strings of this package. */
public final class Messages extends NLS {

    private static final String BUNDLE_NAME = "org.tensio.ui.views.messages"; //$NON-NLS-1$

    public static String SectionsView_noFile;
    public static String SectionsView_loading;
    public static String SectionsView_job;
    public static String SectionsView_loaded;
    public static String SectionsView_noSections;
    public static String SectionsView_badFile;
    public static String SectionsView_unreadable;
    public static String SectionsView_engineFailed;
    public static String SectionsView_noService;
    public static String SectionsView_caution;
    public static String SectionColumn_section;
    public static String SectionColumn_area;
    public static String SectionColumn_xc;
    public static String SectionColumn_yc;
    public static String SectionColumn_ixx;
    public static String SectionColumn_iyy;
    public static String SectionColumn_ixy;
    public static String SectionColumn_i1;
    public static String SectionColumn_i2;
    public static String SectionColumn_angle;
    public static String SectionColumn_zx;
    public static String SectionColumn_zy;
    public static String SectionColumn_j;
    public static String SectionColumn_notComputed;

    static {
        NLS.initializeMessages(BUNDLE_NAME, Messages.class);
    }

    private Messages() {
    }
}
