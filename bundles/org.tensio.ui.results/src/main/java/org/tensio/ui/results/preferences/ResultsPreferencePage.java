package org.tensio.ui.results.preferences;

import org.eclipse.jface.preference.FieldEditorPreferencePage;
import org.eclipse.jface.preference.StringFieldEditor;
import org.eclipse.osgi.util.NLS;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.IWorkbenchPreferencePage;
import org.eclipse.ui.preferences.ScopedPreferenceStore;
import org.eclipse.core.runtime.preferences.InstanceScope;

/** Preference page "Tensio > Checks": the warning threshold of {@link ResultsPreferences}. */
public final class ResultsPreferencePage extends FieldEditorPreferencePage implements IWorkbenchPreferencePage {

    /** Creates the page with a grid of field editors. */
    public ResultsPreferencePage() {
        super(GRID);
    }

    @Override
    public void init(IWorkbench workbench) {
        setPreferenceStore(new ScopedPreferenceStore(InstanceScope.INSTANCE, ResultsPreferences.NODE));
        setDescription(Messages.ResultsPreferencePage_description);
    }

    @Override
    protected void createFieldEditors() {
        addField(new ThresholdField(getFieldEditorParent()));
    }

    /** A number in (0, 1]. */
    private static final class ThresholdField extends StringFieldEditor {
        ThresholdField(org.eclipse.swt.widgets.Composite parent) {
            super(ResultsPreferences.WARNING_THRESHOLD, Messages.ResultsPreferencePage_threshold, 8, parent);
            setErrorMessage(NLS.bind(Messages.ResultsPreferencePage_invalid, ResultsPreferences.WARNING_THRESHOLD));
        }

        @Override
        protected boolean doCheckState() {
            try {
                return ResultsPreferences.valid(Double.parseDouble(getStringValue().trim()));
            } catch (NumberFormatException e) {
                return false;
            }
        }
    }
}
