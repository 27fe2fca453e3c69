package org.tensio.engine.fatigue;

import java.util.function.DoubleUnaryOperator;

/**
 * The smallest diameter of a solid round shaft that meets a required factor of safety n under alternating and
 * mean bending moments and torques (no axial force), by the distortion-energy criteria of Shigley's Mechanical
 * Engineering Design, 9th/10th ed., sec. 7-4 (from memory), with A = √(4 (Kf Ma)² + 3 (Kfs Ta)²) and
 * B = √(4 (Kf Mm)² + 3 (Kfs Tm)²):
 * <ul>
 * <li>DE-Goodman (Eq. 7-8): d = (16 n/π (A/Se + B/Sut))^(1/3); DE-Soderberg: Sy in place of Sut;</li>
 * <li>DE-Gerber (Eq. 7-10): d = (8 n A/(π Se) (1 + √(1 + (2 B Se/(A Sut))²)))^(1/3);</li>
 * <li>DE-ASME elliptic (Eq. 7-12): d = (16 n/π √(4 (Kf Ma/Se)² + 3 (Kfs Ta/Se)² + 4 (Kf Mm/Sy)²
 * + 3 (Kfs Tm/Sy)²))^(1/3).</li>
 * </ul>
 * {@link #closedForm} applies them for fixed Se, Kf and Kfs. {@link #solve} iterates them with Se (through the
 * size factor) and Kf, Kfs (through the notch radius, which scales with d) updated from the last diameter until
 * the diameter changes by less than 1e−12 relative: the fixed point satisfies the closed form with the factors of
 * its own diameter. Moments in force·length, stresses in force/length², d in length.
 *
 * @since 0.1
 */
public final class MinimumDiameter {

    /** The result of {@link #solve}: the diameter and the factors at it. */
    public record Result(double diameter, double se, double kf, double kfs, int iterations) {
    }

    private MinimumDiameter() {
    }

    /**
     * @param c  one of the four fatigue lines
     * @param n  required factor of safety, &gt; 0
     * @throws IllegalArgumentException for a yield criterion or when every load is zero
     */
    public static double closedForm(FatigueCriterion c, double n, double kf, double kfs, double ma, double mm,
            double ta, double tm, double se, double sut, double sy) {
        double a = Math.sqrt(4 * sq(kf * ma) + 3 * sq(kfs * ta));
        double b = Math.sqrt(4 * sq(kf * mm) + 3 * sq(kfs * tm));
        if (a == 0 && b == 0) {
            throw new IllegalArgumentException("loads: every moment and torque is zero; no diameter is needed");
        }
        double d3 = switch (c) {
            case fatigueGoodman -> 16 * n / Math.PI * (a / se + b / sut);
            case fatigueSoderberg -> 16 * n / Math.PI * (a / se + b / sy);
            case fatigueGerber -> a == 0 ? 16 * n * b / (Math.PI * sut)
                    : 8 * n * a / (Math.PI * se) * (1 + Math.sqrt(1 + sq(2 * b * se / (a * sut))));
            case fatigueAsmeElliptic -> 16 * n / Math.PI * Math.sqrt(4 * sq(kf * ma / se) + 3 * sq(kfs * ta / se)
                    + 4 * sq(kf * mm / sy) + 3 * sq(kfs * tm / sy));
            default -> throw new IllegalArgumentException("criterion: " + c + " has no minimum-diameter form (use a"
                    + " fatigue line)");
        };
        return Math.cbrt(d3);
    }

    /**
     * @param seOf  Se as a function of the diameter (the size factor changes with it)
     * @param kfOf  Kf as a function of the diameter
     * @param kfsOf Kfs as a function of the diameter
     * @param d0    starting diameter, &gt; 0
     * @throws IllegalStateException when 200 iterations do not converge
     */
    public static Result solve(FatigueCriterion c, double n, double ma, double mm, double ta, double tm, double sut,
            double sy, DoubleUnaryOperator seOf, DoubleUnaryOperator kfOf, DoubleUnaryOperator kfsOf, double d0) {
        if (!(d0 > 0)) {
            throw new IllegalArgumentException("d0: must be positive, got " + d0);
        }
        double d = d0;
        for (int i = 1; i <= 200; i++) {
            double se = seOf.applyAsDouble(d), kf = kfOf.applyAsDouble(d), kfs = kfsOf.applyAsDouble(d);
            double next = closedForm(c, n, kf, kfs, ma, mm, ta, tm, se, sut, sy);
            if (Math.abs(next - d) <= 1e-12 * next) {
                return new Result(next, seOf.applyAsDouble(next), kfOf.applyAsDouble(next), kfsOf.applyAsDouble(next),
                        i);
            }
            d = next;
        }
        throw new IllegalStateException("minimum diameter: no convergence in 200 iterations (last d = " + d + ")");
    }

    private static double sq(double v) {
        return v * v;
    }
}
