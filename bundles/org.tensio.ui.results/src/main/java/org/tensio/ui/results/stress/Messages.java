package org.tensio.ui.results.stress;

import org.eclipse.osgi.util.NLS;

/** User-visible strings of this package. */
public final class Messages extends NLS {

    private static final String BUNDLE_NAME = "org.tensio.ui.results.stress.messages"; //$NON-NLS-1$

    public static String StressPointView_noPoint;
    public static String StressPointView_header;
    public static String StressPointView_headerChosen;
    public static String StressPointView_pinned;
    public static String StressPointView_preparing;
    public static String StressPointView_job;
    public static String StressPointView_noService;
    public static String StressPointView_failed;
    public static String StressPointView_outside;
    public static String StressPointView_noStation;
    public static String StressPointView_incomplete;
    public static String StressPointView_caution;
    public static String StressTables_quantity;
    public static String StressTables_value;
    public static String StressTables_unit;
    public static String StressTables_force;
    public static String StressTables_x;
    public static String StressTables_y;
    public static String StressTables_sigmaZ;
    public static String StressTables_tauZX;
    public static String StressTables_tauZY;
    public static String StressTables_tau;
    public static String StressTables_sigma1;
    public static String StressTables_sigma2;
    public static String StressTables_sigma3;
    public static String StressTables_dir1;
    public static String StressTables_dir2;
    public static String StressTables_dir3;
    public static String StressTables_tauMax;
    public static String StressTables_vonMises;
    public static String StressTables_tresca;
    public static String StressTables_utilisation;
    public static String StressTables_utilisationOf;
    public static String StressTables_governing;
    public static String StressTables_fatigueUtilisation;
    public static String StressTables_fatigueGoverning;
    public static String StressTables_fatigueHistory;
    public static String StressTables_noLimits;
    public static String StressTables_unavailable;
    public static String StressTables_total;
    public static String PointEvaluator_fatigueNoSolution;
    public static String FatigueTable_history;
    public static String FatigueTable_criterion;
    public static String FatigueTable_sigmaA;
    public static String FatigueTable_sigmaM;
    public static String FatigueTable_sigmaMax;
    public static String FatigueTable_se;
    public static String FatigueTable_n;
    public static String FatigueTable_utilisation;
    public static String FatigueTable_problem;
    public static String FatigueTable_notChecked;
    public static String FatigueTable_onSurface;
    public static String FatigueTable_inside;
    public static String FatigueTable_summary;
    public static String FatigueTable_endurance;
    public static String FatigueTable_caution;
    public static String StressElement_title;
    public static String StressElement_sigma;
    public static String StressElement_tau;
    public static String StressElement_uAngle;
    public static String StressElement_unstressed;
    public static String Mohr_title;
    public static String Mohr_legend;

    static {
        NLS.initializeMessages(BUNDLE_NAME, Messages.class);
    }

    private Messages() {
    }
}
