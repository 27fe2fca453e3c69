package org.tensio.ui.results.preferences;

import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.preferences.DefaultScope;
import org.eclipse.core.runtime.preferences.IEclipsePreferences;
import org.eclipse.core.runtime.preferences.IEclipsePreferences.IPreferenceChangeListener;
import org.eclipse.core.runtime.preferences.InstanceScope;
import org.osgi.service.prefs.BackingStoreException;

/**
 * The preferences of the result views, in the instance scope of bundle {@value #NODE}:
 * {@value #WARNING_THRESHOLD} (utilisation above which a passing check becomes a warning marker and is tinted as
 * close; default {@value #DEFAULT_WARNING_THRESHOLD}, valid (0, 1]).
 */
public final class ResultsPreferences {

    /** Preference node: the bundle's symbolic name. */
    public static final String NODE = "org.tensio.ui.results"; //$NON-NLS-1$
    /** Key of the warning threshold. */
    public static final String WARNING_THRESHOLD = "warningThreshold"; //$NON-NLS-1$
    /** Default warning threshold (common practice, no source: a 10 % margin below the limit). */
    public static final double DEFAULT_WARNING_THRESHOLD = 0.9;

    private ResultsPreferences() {
    }

    /** @return the warning threshold in force; a stored value outside (0, 1] reads as the default */
    public static double warningThreshold() {
        double v = InstanceScope.INSTANCE.getNode(NODE).getDouble(WARNING_THRESHOLD,
                DefaultScope.INSTANCE.getNode(NODE).getDouble(WARNING_THRESHOLD, DEFAULT_WARNING_THRESHOLD));
        return valid(v) ? v : DEFAULT_WARNING_THRESHOLD;
    }

    /** @return true when {@code v} is an acceptable threshold: 0 &lt; v ≤ 1 */
    public static boolean valid(double v) {
        return v > 0 && v <= 1;
    }

    /**
     * Stores the warning threshold (instance scope) and flushes it.
     *
     * @throws IllegalArgumentException when {@code v} is not in (0, 1]
     */
    public static void setWarningThreshold(double v) {
        if (!valid(v)) {
            throw new IllegalArgumentException(WARNING_THRESHOLD + " must be in (0, 1], got " + v); //$NON-NLS-1$
        }
        IEclipsePreferences node = InstanceScope.INSTANCE.getNode(NODE);
        node.putDouble(WARNING_THRESHOLD, v);
        try {
            node.flush();
        } catch (BackingStoreException e) {
            ILog.of(ResultsPreferences.class).warn("Cannot save the warning threshold", e); //$NON-NLS-1$
        }
    }

    /** Calls {@code l} when a preference of this node changes in the instance scope. */
    public static void addListener(IPreferenceChangeListener l) {
        InstanceScope.INSTANCE.getNode(NODE).addPreferenceChangeListener(l);
    }

    /** Stops calling {@code l}. */
    public static void removeListener(IPreferenceChangeListener l) {
        InstanceScope.INSTANCE.getNode(NODE).removePreferenceChangeListener(l);
    }
}
