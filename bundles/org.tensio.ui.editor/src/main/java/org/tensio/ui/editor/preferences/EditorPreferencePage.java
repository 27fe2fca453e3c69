package org.tensio.ui.editor.preferences;

import org.eclipse.jface.preference.ComboFieldEditor;
import org.eclipse.jface.preference.FieldEditorPreferencePage;
import org.eclipse.jface.preference.IntegerFieldEditor;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.IWorkbenchPreferencePage;
import org.eclipse.ui.preferences.ScopedPreferenceStore;
import org.eclipse.core.runtime.preferences.InstanceScope;
import org.tensio.engine.mesh.MeshOptions;
import org.tensio.ui.editor.overlay.ColourScale;
import org.tensio.ui.editor.overlay.Quantity;

/** Preferences of the section editor: display units, mesh density, default contour quantity, colour scale. */
public final class EditorPreferencePage extends FieldEditorPreferencePage implements IWorkbenchPreferencePage {

    /** Creates the page (grid layout of field editors). */
    public EditorPreferencePage() {
        super(GRID);
    }

    @Override
    public void init(IWorkbench workbench) {
        ScopedPreferenceStore store = new ScopedPreferenceStore(InstanceScope.INSTANCE, EditorPreferences.NODE);
        store.setDefault(EditorPreferences.DISPLAY_UNITS, DisplayUnits.FILE.name());
        store.setDefault(EditorPreferences.MESH_DENSITY, MeshOptions.DEFAULT_ELEMENTS);
        store.setDefault(EditorPreferences.QUANTITY, Quantity.VON_MISES.name());
        store.setDefault(EditorPreferences.COLOUR_SCALE, ColourScale.BANDS.name());
        setPreferenceStore(store);
        setDescription(Messages.Preferences_description);
    }

    @Override
    protected void createFieldEditors() {
        addField(new ComboFieldEditor(EditorPreferences.DISPLAY_UNITS, Messages.Preferences_units,
                new String[][] { { Messages.Preferences_unitsFile, DisplayUnits.FILE.name() },
                        { Messages.Preferences_unitsMm, DisplayUnits.MM_MPA.name() } },
                getFieldEditorParent()));
        IntegerFieldEditor density = new IntegerFieldEditor(EditorPreferences.MESH_DENSITY, Messages.Preferences_mesh,
                getFieldEditorParent());
        density.setValidRange(EditorPreferences.MIN_DENSITY, EditorPreferences.MAX_DENSITY);
        addField(density);
        addField(new ComboFieldEditor(EditorPreferences.QUANTITY, Messages.Preferences_quantity,
                new String[][] { { Messages.Preferences_sigma, Quantity.SIGMA_Z.name() },
                        { Messages.Preferences_tau, Quantity.TAU.name() },
                        { Messages.Preferences_vonMises, Quantity.VON_MISES.name() },
                        { Messages.Preferences_utilisation, Quantity.UTILISATION.name() },
                        { Messages.Preferences_fatigueUtilisation, Quantity.FATIGUE_UTILISATION.name() } },
                getFieldEditorParent()));
        addField(new ComboFieldEditor(EditorPreferences.COLOUR_SCALE, Messages.Preferences_scale,
                new String[][] { { Messages.Preferences_scaleBands, ColourScale.BANDS.name() },
                        { Messages.Preferences_scaleGrey, ColourScale.GREY.name() } },
                getFieldEditorParent()));
    }
}
