package org.tensio.engine.fem;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The 7-point triangle rule integrates every monomial of degree ≤ 5 exactly: ∫ξ^a η^b = a! b! / (a+b+2)!. */
class QuadratureTest {

    private static double fact(int n) {
        double f = 1;
        for (int i = 2; i <= n; i++) {
            f *= i;
        }
        return f;
    }

    @Test
    void monomialsUpToDegreeFive() {
        for (int a = 0; a <= 5; a++) {
            for (int b = 0; a + b <= 5; b++) {
                double sum = 0;
                for (double[] q : Quadrature.TRI7) {
                    sum += q[2] * Math.pow(q[0], a) * Math.pow(q[1], b);
                }
                double exact = fact(a) * fact(b) / fact(a + b + 2);
                assertEquals(exact, sum, 1e-13, "ξ^" + a + " η^" + b);
            }
        }
    }
}
