package org.tensio.engine.section;

import java.util.List;

import org.tensio.engine.geometry.Bounds;

/**
 * A cross-section: one or more material parts in the section's frame (x along the width, y along the depth,
 * z along the member axis). With several materials the section is composite: properties are E-weighted and
 * transformed to the material of the first part (the reference material).
 *
 * @param name  section id in the project file
 * @param parts at least one part
 * @since 0.1
 */
public record Section(String name, List<SectionPart> parts) {

    /** Copies the part list; rejects an empty one. */
    public Section {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("section name must not be empty");
        }
        if (parts == null || parts.isEmpty()) {
            throw new IllegalArgumentException("section '" + name + "': needs at least one part");
        }
        parts = List.copyOf(parts);
    }

    /** @return the reference material (first part's) to which E-weighted properties are transformed */
    public Material referenceMaterial() {
        return parts.get(0).material();
    }

    /** @return true when the parts do not all share one Young's modulus */
    public boolean isComposite() {
        double e = parts.get(0).material().e();
        return parts.stream().anyMatch(p -> p.material().e() != e);
    }

    /** @return exact bounding box of all parts */
    public Bounds bounds() {
        Bounds b = Bounds.EMPTY;
        for (SectionPart p : parts) {
            b = b.union(p.region().bounds());
        }
        return b;
    }
}
