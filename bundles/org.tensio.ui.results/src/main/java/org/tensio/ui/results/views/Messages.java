package org.tensio.ui.results.views;

import org.eclipse.osgi.util.NLS;

/** User-visible strings of this package. */
public final class Messages extends NLS {

    private static final String BUNDLE_NAME = "org.tensio.ui.results.views.messages"; //$NON-NLS-1$

    public static String ResultsView_noFile;
    public static String ResultsView_loading;
    public static String ResultsView_job;
    public static String ResultsView_passed;
    public static String ResultsView_failedChecks;
    public static String ResultsView_nothingChecked;
    public static String ResultsView_badFile;
    public static String ResultsView_unreadable;
    public static String ResultsView_engineFailed;
    public static String ResultsView_noService;
    public static String ResultsView_cancelled;
    public static String ResultsView_onlyFailing;
    public static String ResultsView_onlyGoverning;
    public static String ResultsView_warnings;
    public static String ResultsView_caution;
    public static String ResultsLoader_reading;
    public static String ResultsLoader_solving;
    public static String ResultsLoader_checking;
    public static String ResultsColumn_name;
    public static String ResultsColumn_utilisation;
    public static String ResultsColumn_result;
    public static String ResultsColumn_demand;
    public static String ResultsColumn_capacity;
    public static String ResultsColumn_material;
    public static String ResultsColumn_x;
    public static String ResultsColumn_y;
    public static String ResultsColumn_pass;
    public static String ResultsColumn_fail;

    static {
        NLS.initializeMessages(BUNDLE_NAME, Messages.class);
    }

    private Messages() {
    }
}
