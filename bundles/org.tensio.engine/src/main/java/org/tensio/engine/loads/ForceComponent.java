package org.tensio.engine.loads;

/**
 * The six internal force components, with the key each has in the project file.
 *
 * @since 0.1
 */
public enum ForceComponent {
    /** Axial force, tension positive. */
    N("N"),
    /** Shear force along x. */
    VX("Vx"),
    /** Shear force along y. */
    VY("Vy"),
    /** Bending moment about x (positive stretches +y). */
    MX("Mx"),
    /** Bending moment about y (positive stretches −x). */
    MY("My"),
    /** Torque about z. */
    T("T");

    private final String key;

    ForceComponent(String key) {
        this.key = key;
    }

    /** @return the key used in files and reports */
    public String key() {
        return key;
    }
}
