package org.tensio.ui.editor.preferences;

import org.eclipse.core.runtime.preferences.IEclipsePreferences;
import org.eclipse.core.runtime.preferences.InstanceScope;
import org.tensio.engine.mesh.MeshOptions;
import org.tensio.ui.editor.overlay.ColourScale;
import org.tensio.ui.editor.overlay.Quantity;

/** The editor's preferences (instance scope of this bundle) with their defaults. */
public final class EditorPreferences {

    /** Preference node (the bundle's symbolic name). */
    public static final String NODE = "org.tensio.ui.editor"; //$NON-NLS-1$
    /** Key: {@link DisplayUnits} name. */
    public static final String DISPLAY_UNITS = "displayUnits"; //$NON-NLS-1$
    /** Key: about how many triangles the contour mesh has. */
    public static final String MESH_DENSITY = "meshDensity"; //$NON-NLS-1$
    /** Key: {@link Quantity} name shown by default. */
    public static final String QUANTITY = "contourQuantity"; //$NON-NLS-1$
    /** Key: {@link ColourScale} name. */
    public static final String COLOUR_SCALE = "colourScale"; //$NON-NLS-1$
    /** Smallest and largest mesh density accepted. */
    public static final int MIN_DENSITY = 100;
    /** Largest mesh density accepted. */
    public static final int MAX_DENSITY = 50_000;

    private EditorPreferences() {
    }

    /** @return the preference node */
    public static IEclipsePreferences node() {
        return InstanceScope.INSTANCE.getNode(NODE);
    }

    /** @return the display units */
    public static DisplayUnits displayUnits() {
        return parse(DisplayUnits.class, node().get(DISPLAY_UNITS, DisplayUnits.FILE.name()), DisplayUnits.FILE);
    }

    /** @return the mesh density (triangles), clamped to the accepted range */
    public static int meshDensity() {
        int n = node().getInt(MESH_DENSITY, MeshOptions.DEFAULT_ELEMENTS);
        return Math.max(MIN_DENSITY, Math.min(MAX_DENSITY, n));
    }

    /** @return the default contour quantity */
    public static Quantity quantity() {
        return parse(Quantity.class, node().get(QUANTITY, Quantity.VON_MISES.name()), Quantity.VON_MISES);
    }

    /** @return the colour scale */
    public static ColourScale colourScale() {
        return parse(ColourScale.class, node().get(COLOUR_SCALE, ColourScale.BANDS.name()), ColourScale.BANDS);
    }

    private static <E extends Enum<E>> E parse(Class<E> type, String name, E fallback) {
        try {
            return Enum.valueOf(type, name);
        } catch (IllegalArgumentException e) {
            return fallback;
        }
    }
}
