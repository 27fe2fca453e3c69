package org.tensio.engine.stress;

/**
 * How the shear stresses from Vx and Vy are obtained.
 *
 * @since 0.1
 */
public enum ShearMethod {
    /** Shear functions with Poisson's ratio on the finite-element mesh (homogeneous sections). */
    finiteElement,
    /** Shear flow VQ/(I·t) on straight cuts through the point (average across the cut). */
    elementary
}
