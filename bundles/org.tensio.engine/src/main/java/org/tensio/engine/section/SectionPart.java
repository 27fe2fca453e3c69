package org.tensio.engine.section;

import org.tensio.engine.geometry.Region;
import org.tensio.engine.profile.ProfileDef;

/**
 * One material region of a section, already placed in the section's frame.
 *
 * @param profile  the definition it came from (its own frame: bounding-box centre at the origin)
 * @param offsetX  placement of the profile's origin in the section frame, length unit
 * @param offsetY  placement of the profile's origin in the section frame, length unit
 * @param region   the placed region (profile region moved by the offset)
 * @param material the part's material
 * @since 0.1
 */
public record SectionPart(ProfileDef profile, double offsetX, double offsetY, Region region, Material material) {

    /** Rejects nulls and non-finite offsets. */
    public SectionPart {
        if (profile == null || region == null || material == null) {
            throw new IllegalArgumentException("section part needs a profile, a region and a material");
        }
        if (!Double.isFinite(offsetX) || !Double.isFinite(offsetY)) {
            throw new IllegalArgumentException("section part offset must be finite, got (" + offsetX + ", " + offsetY + ")");
        }
    }

    /** Places {@code profile} with its origin at (offsetX, offsetY). */
    public static SectionPart of(ProfileDef profile, double offsetX, double offsetY, Material material) {
        return new SectionPart(profile, offsetX, offsetY, profile.region().translated(offsetX, offsetY), material);
    }
}
