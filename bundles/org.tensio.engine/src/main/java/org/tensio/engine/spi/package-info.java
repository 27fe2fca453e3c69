/**
 * Service provider interfaces for a firm's own additions to the engine: {@link org.tensio.engine.spi.CheckCriterion}
 * (a house check rule) and {@link org.tensio.engine.spi.ProfileType} (a parameterised profile family), gathered
 * in {@link org.tensio.engine.spi.Extensions}. Public API, versioned with the bundle's Export-Package (see the
 * contributor guide, "API and versions").
 *
 * @since 0.1
 */
package org.tensio.engine.spi;
