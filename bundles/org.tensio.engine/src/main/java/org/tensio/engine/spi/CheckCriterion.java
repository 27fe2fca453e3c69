package org.tensio.engine.spi;

import org.tensio.engine.section.MaterialLimits;

/**
 * A check criterion contributed by a bundle or jar outside Tensio (a firm's house rule). Once registered
 * (see {@link Extensions}), a material names it in its {@code "criteria"} list by {@link #id()}, and the engine,
 * the command line, the results tree and the reports treat it exactly like the built-in criteria: the check
 * evaluates {@link #demand} at every sample point of the section, takes the largest, divides it by
 * {@link #capacity} and reports the utilisation under the criterion name {@link #id()}.
 * <p>
 * Stresses are in the project's stress unit (force/length² of the file's units), with the engine's sign
 * convention: σz normal to the section, tension positive; τzx and τzy the shear stresses along x and y.
 * Implementations must be stateless and thread-safe, and must have a public no-argument constructor (they are
 * created by {@link java.util.ServiceLoader} outside OSGi and by the extension registry inside).
 *
 * @since 0.1
 */
public interface CheckCriterion {

    /**
     * @return the name the project file and the results use: letters and digits, starting with a lower-case
     *         letter (e.g. {@code "houseCombined"}); never one of the built-in
     *         {@link org.tensio.engine.section.Criterion} names
     */
    String id();

    /** @return one line for people: what the demand is and what it is checked against */
    String description();

    /**
     * @param sigmaZ normal stress σz at the point, stress unit
     * @param tauZX  shear stress τzx at the point, stress unit
     * @param tauZY  shear stress τzy at the point, stress unit
     * @return the demand at the point, stress unit, finite and ≥ 0
     */
    double demand(double sigmaZ, double tauZX, double tauZY);

    /**
     * @param limits the material's strengths, allowables and partial factor
     * @return the capacity against which {@link #demand} is divided, stress unit, finite and &gt; 0
     * @throws IllegalArgumentException naming the missing key when the material lacks what the criterion needs
     *                                  (e.g. "needs fy")
     */
    double capacity(MaterialLimits limits);
}
