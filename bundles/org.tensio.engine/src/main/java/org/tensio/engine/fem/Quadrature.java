package org.tensio.engine.fem;

/**
 * Gauss points on the reference triangle (0,0), (1,0), (0,1): the 7-point rule exact for polynomials of
 * degree 5 (Dunavant, Int. J. Numer. Meth. Eng. 21, 1985, rule 5; also Zienkiewicz &amp; Taylor, The Finite
 * Element Method, vol. 1, table of triangle rules — from memory; checked against ∫ξ^a η^b = a! b! / (a+b+2)!
 * in the tests). Weights sum to 1/2, the reference area.
 */
final class Quadrature {

    /** Rows {ξ, η, weight}. */
    static final double[][] TRI7;

    static {
        double a1 = 0.059715871789770, b1 = 0.470142064105115, w1 = 0.132394152788506;
        double a2 = 0.797426985353087, b2 = 0.101286507323456, w2 = 0.125939180544827;
        TRI7 = new double[][] {
            {1.0 / 3, 1.0 / 3, 0.225},
            {a1, b1, w1}, {b1, a1, w1}, {b1, b1, w1},
            {a2, b2, w2}, {b2, a2, w2}, {b2, b2, w2},
        };
        for (double[] r : TRI7) {
            r[2] *= 0.5;
        }
    }

    private Quadrature() {
    }
}
