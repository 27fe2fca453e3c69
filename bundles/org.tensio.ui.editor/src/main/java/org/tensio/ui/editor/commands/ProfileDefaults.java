package org.tensio.ui.editor.commands;

import java.util.Map;

import org.tensio.engine.profile.ProfileTypes;
import org.tensio.ui.editor.model.JsonNumbers;
import org.tensio.ui.editor.model.Profile;

import com.google.gson.JsonObject;

/**
 * Starting values of a parametric profile inserted by the user: each required IFC4 parameter as a fraction of
 * a size (the drawn section's extent), chosen so that every type's where-rules hold (walls and flanges thin
 * against the overall dimensions). Optional parameters are left out (IFC4 default 0).
 */
public final class ProfileDefaults {

    private static final Map<String, Double> FRACTION = Map.ofEntries(Map.entry("radius", 0.25), //$NON-NLS-1$
            Map.entry("wallThickness", 0.04), Map.entry("semiAxis1", 0.3), Map.entry("semiAxis2", 0.2), //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
            Map.entry("xDim", 0.5), Map.entry("yDim", 0.3), Map.entry("overallWidth", 0.5), //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
            Map.entry("overallDepth", 1.0), Map.entry("webThickness", 0.04), Map.entry("flangeThickness", 0.06), //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
            Map.entry("depth", 0.6), Map.entry("flangeWidth", 0.3), Map.entry("thickness", 0.06)); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$

    private ProfileDefaults() {
    }

    /**
     * @param type a parametric type name of {@link ProfileTypes#names()}
     * @param size the size the profile is scaled to, length unit, > 0
     * @return a new profile of that type
     */
    public static Profile of(String type, double size) {
        JsonObject params = new JsonObject();
        for (String name : ProfileTypes.requiredParameterNames(type)) {
            double f = FRACTION.getOrDefault(name, 0.2);
            params.add(name, JsonNumbers.of(round(f * size)));
        }
        return Profile.parametric(type, params);
    }

    /** Rounds to 2 significant digits (values a user would type). */
    static double round(double v) {
        if (!(v > 0)) {
            return 1;
        }
        double decade = Math.pow(10, Math.floor(Math.log10(v)) - 1);
        return Math.round(v / decade) * decade;
    }
}
