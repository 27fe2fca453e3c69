package org.tensio.engine.section;

/**
 * An isotropic linear-elastic material as the project file defines it. Stresses are in the project's
 * stress unit (force / length²).
 *
 * @param name material id in the project file
 * @param e    Young's modulus, stress unit, &gt; 0
 * @param nu   Poisson's ratio, −1 &lt; ν &lt; 0.5
 * @param fy   yield strength, stress unit, &gt; 0; {@code null} when not given
 * @since 0.1
 */
public record Material(String name, double e, double nu, Double fy) {

    /** Validates the constants; messages name the material, the field and the value. */
    public Material {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("material name must not be empty");
        }
        if (!(e > 0) || !Double.isFinite(e)) {
            throw new IllegalArgumentException("material '" + name + "': E must be positive and finite, got " + e);
        }
        if (!(nu > -1 && nu < 0.5)) {
            throw new IllegalArgumentException("material '" + name + "': nu must lie in (-1, 0.5), got " + nu);
        }
        if (fy != null && (!(fy > 0) || !Double.isFinite(fy))) {
            throw new IllegalArgumentException("material '" + name + "': fy must be positive and finite, got " + fy);
        }
    }

    /** @return shear modulus G = E / (2 (1 + ν)), stress unit */
    public double shearModulus() {
        return e / (2 * (1 + nu));
    }
}
