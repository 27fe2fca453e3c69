/**
 * Sparse symmetric positive (semi-)definite linear algebra for the finite-element systems of cross-section
 * analysis (St. Venant warping function, Prandtl stress function, shear functions on meshes of 6-node
 * triangles, 10⁴–4·10⁵ unknowns). Pure Java 17, no dependencies, headless.
 * <ul>
 * <li>{@link org.tensio.engine.linalg.SparseMatrixBuilder} assembles, {@link org.tensio.engine.linalg.SymmetricCsr}
 * holds the immutable matrix (full symmetric pattern, CSR).</li>
 * <li>{@link org.tensio.engine.linalg.Ordering}: nested dissection from coordinates or from the graph, reverse
 * Cuthill–McKee.</li>
 * <li>{@link org.tensio.engine.linalg.SparseCholesky}: supernodal multifrontal LLᵀ with pinned (Dirichlet)
 * unknowns, several right-hand sides, fill and operation counts, progress and cancellation through
 * {@link org.tensio.engine.linalg.ProgressMonitor}; failures as
 * {@link org.tensio.engine.linalg.NotPositiveDefiniteException}.</li>
 * <li>{@link org.tensio.engine.linalg.ConjugateGradient} with {@link org.tensio.engine.linalg.Preconditioner}
 * (identity, Jacobi, IC(0)) as fallback and cross-check.</li>
 * </ul>
 * Main sources (all from memory): A. George &amp; J. W. H. Liu, <i>Computer Solution of Large Sparse Positive
 * Definite Systems</i>, Prentice-Hall 1981; T. A. Davis, <i>Direct Methods for Sparse Linear Systems</i>, SIAM
 * 2006; J. W. H. Liu, The multifrontal method for sparse matrix solution: theory and practice, SIAM Review 34
 * (1992); Y. Saad, <i>Iterative Methods for Sparse Linear Systems</i>, 2nd ed., SIAM 2003.
 * <p>
 * Null policy: no method accepts or returns null unless its documentation says so.
 *
 * @since 0.1
 */
package org.tensio.engine.linalg;
