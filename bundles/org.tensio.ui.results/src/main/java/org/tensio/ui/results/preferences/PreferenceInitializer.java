package org.tensio.ui.results.preferences;

import org.eclipse.core.runtime.preferences.AbstractPreferenceInitializer;
import org.eclipse.core.runtime.preferences.DefaultScope;

/** Default values of {@link ResultsPreferences} (extension org.eclipse.core.runtime.preferences). */
public final class PreferenceInitializer extends AbstractPreferenceInitializer {

    @Override
    public void initializeDefaultPreferences() {
        DefaultScope.INSTANCE.getNode(ResultsPreferences.NODE).putDouble(ResultsPreferences.WARNING_THRESHOLD,
                ResultsPreferences.DEFAULT_WARNING_THRESHOLD);
    }
}
