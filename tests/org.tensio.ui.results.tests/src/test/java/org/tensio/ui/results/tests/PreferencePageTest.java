package org.tensio.ui.results.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.eclipse.core.runtime.preferences.InstanceScope;
import org.eclipse.jface.preference.PreferenceDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Text;
import org.eclipse.ui.dialogs.PreferencesUtil;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.tensio.ui.results.preferences.ResultsPreferences;
import org.tensio.ui.testsupport.Screenshots;
import org.tensio.ui.testsupport.UiConditions;

/** The preference page "Tensio Checks": the warning threshold, default 0.9, accepted only in (0, 1]. */
class PreferencePageTest {

    @AfterEach
    void reset() {
        InstanceScope.INSTANCE.getNode(ResultsPreferences.NODE).remove(ResultsPreferences.WARNING_THRESHOLD);
    }

    @Test
    void setsTheWarningThresholdAndRejectsValuesAboveOne() throws Exception {
        WorkbenchFixture wb = new WorkbenchFixture();
        assertEquals(0.9, ResultsPreferences.warningThreshold(), 0.0, "default");
        PreferenceDialog dialog = PreferencesUtil.createPreferenceDialogOn(wb.window.getShell(),
                "org.tensio.ui.results.preferences.checks", null, null);
        dialog.setBlockOnOpen(false);
        dialog.open();
        try {
            List<Text> texts = UiConditions.find(dialog.getShell(), Text.class, t -> "0.9".equals(t.getText()));
            assertEquals(1, texts.size(), "one field showing the default 0.9");
            Text field = texts.get(0);
            Button ok = UiConditions.find(dialog.getShell(), Button.class,
                    b -> b.getText().replace("&", "").startsWith("Apply and Close")).get(0);

            field.setText("1.5");
            UiConditions.flush(wb.display);
            assertFalse(ok.isEnabled(), "1.5 is not a valid threshold");
            Screenshots.save(dialog.getShell(), "preferences-invalid.png");
            field.setText("0.75");
            UiConditions.flush(wb.display);
            assertTrue(ok.isEnabled());
            ok.notifyListeners(SWT.Selection, new org.eclipse.swt.widgets.Event());
            UiConditions.flush(wb.display);
        } finally {
            if (dialog.getShell() != null && !dialog.getShell().isDisposed()) {
                dialog.close();
            }
        }
        assertEquals(0.75, ResultsPreferences.warningThreshold(), 0.0, "stored");
    }
}
