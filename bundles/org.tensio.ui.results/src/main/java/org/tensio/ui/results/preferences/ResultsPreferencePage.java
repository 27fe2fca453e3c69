package org.tensio.ui.results.preferences;

import org.eclipse.jface.preference.FieldEditorPreferencePage;
import org.eclipse.jface.preference.StringFieldEditor;
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
            setErrorMessage(Messages.ResultsPreferencePage_invalid);
        }

        @Override
        protected void doFillIntoGrid(org.eclipse.swt.widgets.Composite parent, int numColumns) {
            super.doFillIntoGrid(parent, numColumns);
            // validate on every change (typing, pasting, a program), not only on key strokes
            getTextControl(parent).addModifyListener(e -> valueChanged());
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
