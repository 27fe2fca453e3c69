package org.tensio.engine.fatigue;

/**
 * Surface finish of a part, for the Marin surface factor ka = a · Sut^b (Sut in MPa).
 * <p>
 * The constants are those of J. E. Shigley's Mechanical Engineering Design (R. G. Budynas, J. K. Nisbett), 9th and
 * 10th editions, Table 6-2 ("Parameters for Marin surface modification factor", SI columns; from memory). They
 * are curve fits through scattered test data on steels; the factor can exceed 1 for a ground surface of a
 * low-strength steel, as the fit gives it.
 *
 * @since 0.1
 */
public enum SurfaceFinish {
    /** Ground: a = 1.58 MPa, b = −0.085. */
    ground(1.58, -0.085),
    /** Machined or cold-drawn: a = 4.51 MPa, b = −0.265. */
    machined(4.51, -0.265),
    /** Hot-rolled: a = 57.7 MPa, b = −0.718. */
    hotRolled(57.7, -0.718),
    /** As-forged: a = 272 MPa, b = −0.995. */
    asForged(272, -0.995);

    private final double a;
    private final double b;

    SurfaceFinish(double a, double b) {
        this.a = a;
        this.b = b;
    }

    /** @return the factor a of Shigley's Table 6-2, for Sut in MPa */
    public double a() {
        return a;
    }

    /** @return the exponent b of Shigley's Table 6-2 */
    public double b() {
        return b;
    }

    /**
     * @param sutMpa ultimate tensile strength, MPa, &gt; 0
     * @return ka = a · Sut^b
     * @throws IllegalArgumentException naming the value when Sut is not positive and finite
     */
    public double factor(double sutMpa) {
        if (!(sutMpa > 0) || !Double.isFinite(sutMpa)) {
            throw new IllegalArgumentException("Sut: must be positive and finite, got " + sutMpa + " MPa");
        }
        return a * Math.pow(sutMpa, b);
    }
}
