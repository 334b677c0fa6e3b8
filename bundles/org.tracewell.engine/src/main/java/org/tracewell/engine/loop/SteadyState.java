package org.tracewell.engine.loop;

import java.util.Optional;

import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.tf.TransferFunction;

/**
 * System type, static error constants and steady-state errors of a loop
 * (Nise, Control Systems Engineering, ch. 7; Ogata, Modern Control Engineering, ch. 5).
 * <p>
 * For unity feedback the type is the number of poles of L(s) at s = 0 and
 * Kp = lim L, Kv = lim s·L, Ka = lim s²·L. For non-unity feedback or feedforward the values
 * describe the error transfer function E(s)/R(s) with E = R − Y: the type is the number of
 * its zeros at s = 0 (the "effective" type) and the constants are those of the equivalent
 * unity-feedback forward path G_e = (R − E)/E (Nise §7.6). The constants are NaN (undefined)
 * only when E/R has a pole at s = 0, which means a closed-loop pole at the origin.
 *
 * @param systemType type N ≥ 0
 * @param kp position constant (+∞ for type ≥ 1)
 * @param kv velocity constant, 1/s (0 for type 0, +∞ for type ≥ 2)
 * @param ka acceleration constant, 1/s² (0 for type ≤ 1, +∞ for type ≥ 3)
 * @param errors steady-state errors; empty when the closed loop is not stable, because the
 *        final-value theorem does not apply
 */
public record SteadyState(int systemType, double kp, double kv, double ka, Optional<SteadyStateErrors> errors) {

    /** Relative size under which a coefficient left by cancellation is taken as zero. */
    static final double CANCELLATION_TOLERANCE = 1e-10;

    /** From a unity-feedback forward path (exact coefficients: exact zeros count as integrators). */
    public static SteadyState ofUnityFeedback(TransferFunction forward, boolean closedLoopStable) {
        Polynomial n = forward.numerator();
        Polynomial d = forward.denominator();
        int nz = n.zeroRootMultiplicity();
        int dz = d.zeroRootMultiplicity();
        int type = Math.max(0, dz - nz);
        double lowGain = n.coefficient(nz) / d.coefficient(dz);
        if (dz < nz) {
            // Net differentiator: L(0) = 0, the loop does not act on a constant error.
            return build(0, 0.0, closedLoopStable);
        }
        return build(type, lowGain, closedLoopStable);
    }

    /**
     * From the error transfer function E/R = num/den. {@code numBound} bounds the magnitude
     * of the terms whose cancellation produced each numerator coefficient; coefficients below
     * {@value #CANCELLATION_TOLERANCE} of it are zero.
     */
    public static SteadyState ofErrorTransfer(Polynomial num, Polynomial numBound, Polynomial den,
            boolean closedLoopStable) {
        Polynomial cleaned = clean(num, numBound);
        if (cleaned.isZero()) {
            // E ≡ 0: perfect tracking of every reference.
            return new SteadyState(Integer.MAX_VALUE, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY,
                    Double.POSITIVE_INFINITY, closedLoopStable ? Optional.of(new SteadyStateErrors(0, 0, 0))
                            : Optional.empty());
        }
        int zn = cleaned.zeroRootMultiplicity();
        int zd = den.zeroRootMultiplicity();
        int type = zn - zd;
        double c = cleaned.coefficient(zn) / den.coefficient(zd);
        if (type < 0) {
            // A closed-loop pole at s = 0 (the loop is not stable): the constants are undefined.
            return new SteadyState(0, Double.NaN, Double.NaN, Double.NaN, Optional.empty());
        }
        // E/R ≈ c·s^type near 0: type 0 → c = 1/(1 + Kp); type N ≥ 1 → c = 1/K_N.
        double constant = type == 0 ? 1.0 / c - 1.0 : 1.0 / c;
        return build(type, constant, closedLoopStable);
    }

    /** Coefficients that are cancellation noise set to exactly zero (low powers only). */
    static Polynomial clean(Polynomial num, Polynomial bound) {
        double[] c = num.ascendingCoefficients();
        for (int k = 0; k < c.length; k++) {
            if (Math.abs(c[k]) <= CANCELLATION_TOLERANCE * bound.coefficient(k)) {
                c[k] = 0.0;
            } else {
                break;
            }
        }
        return c.length == 0 ? Polynomial.ZERO : Polynomial.ofAscending(c);
    }

    private static SteadyState build(int type, double lowGain, boolean stable) {
        double inf = Double.POSITIVE_INFINITY;
        double kp = type == 0 ? lowGain : inf;
        double kv = type == 0 ? 0.0 : type == 1 ? lowGain : inf;
        double ka = type <= 1 ? 0.0 : type == 2 ? lowGain : inf;
        Optional<SteadyStateErrors> errors = Optional.empty();
        if (stable) {
            double step = type == 0 ? 1.0 / (1.0 + kp) : 0.0;
            double ramp = type == 0 ? inf : type == 1 ? 1.0 / kv : 0.0;
            double parabola = type <= 1 ? inf : type == 2 ? 1.0 / ka : 0.0;
            errors = Optional.of(new SteadyStateErrors(step, ramp, parabola));
        }
        return new SteadyState(type, kp, kv, ka, errors);
    }
}
