package org.tracewell.engine.loop;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apache.commons.math3.complex.Complex;
import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.tf.TransferFunction;

/**
 * Single-loop analysis: a pure function from transfer functions to a {@link LoopAnalysis}.
 * The loop is Y = G·(R − H·Y) with the error E = R − Y; G may carry dead time.
 */
public final class LoopAnalyzer {

    /** Padé order used where dead time must be rational (poles, stability, step, gain range). */
    public static final int PADE_ORDER = 6;

    private LoopAnalyzer() {
    }

    /**
     * Analyses the loop with forward path G and feedback H.
     *
     * @param forward G(s), proper
     * @param feedback H(s), or {@code null} for unity feedback
     * @throws IllegalArgumentException if G or G·H is improper, or 1 + G·H makes the closed
     *         loop improper (an algebraic loop)
     */
    public static LoopAnalysis analyze(TransferFunction forward, TransferFunction feedback) {
        return analyzeLoop(forward, feedback, null);
    }

    /**
     * Analyses the loop with G = C·P and additionally the steady-state error caused by a
     * disturbance at the plant input.
     *
     * @param controller C(s)
     * @param plant P(s), proper
     * @param feedback H(s), or {@code null} for unity feedback
     */
    public static LoopAnalysis analyzeWithPlant(TransferFunction controller, TransferFunction plant,
            TransferFunction feedback) {
        return analyzeLoop(controller.series(plant), feedback, new TransferFunction[] {controller, plant});
    }

    private static LoopAnalysis analyzeLoop(TransferFunction forward, TransferFunction feedbackOrNull,
            TransferFunction[] split) {
        TransferFunction h = feedbackOrNull == null ? TransferFunction.ONE : feedbackOrNull;
        boolean unity = h.equals(TransferFunction.ONE);
        if (!forward.isProper()) {
            throw new IllegalArgumentException("forward path " + forward + " is improper (numerator degree "
                    + forward.numerator().degree() + " > denominator degree " + forward.denominator().degree()
                    + "); loop analysis needs a proper forward path");
        }
        TransferFunction loop = forward.series(h);
        if (!loop.isProper()) {
            throw new IllegalArgumentException("loop G·H = " + loop + " is improper; loop analysis needs a proper"
                    + " loop transfer function");
        }
        int padeOrder = loop.hasDelay() ? PADE_ORDER : 0;
        TransferFunction g = forward.withPadeDelay(PADE_ORDER);
        TransferFunction hr = h.withPadeDelay(PADE_ORDER);
        Polynomial ng = g.numerator();
        Polynomial dg = g.denominator();
        Polynomial nh = hr.numerator();
        Polynomial dh = hr.denominator();
        Polynomial clNum = ng.multiply(dh);
        Polynomial characteristic = dg.multiply(dh).add(ng.multiply(nh));
        if (characteristic.isZero() || characteristic.degree() < clNum.degree()) {
            throw new IllegalArgumentException("1 + G·H vanishes at high frequency (algebraic loop): the closed loop"
                    + " of " + loop + " is improper");
        }
        TransferFunction closedLoop = TransferFunction.of(clNum, characteristic);
        List<Complex> poles = closedLoop.poles();
        List<Complex> zeros = closedLoop.zeros();
        boolean stable = allInOpenLeftHalfPlane(poles);
        RouthArray routh = RouthArray.of(characteristic);

        SteadyState steadyState;
        if (unity) {
            // Exact user coefficients; dead time is 1 at s = 0 and does not change type or constants.
            steadyState = SteadyState.ofUnityFeedback(TransferFunction.of(forward.numerator(),
                    forward.denominator()), stable);
        } else {
            // E/R = (D_G·D_H + N_G·N_H − N_G·D_H) / characteristic
            Sum e = Sum.ZERO.plus(dg, dh).plus(ng, nh).minus(ng, dh);
            steadyState = SteadyState.ofErrorTransfer(e.value(), e.bound(), characteristic, stable);
        }

        double[] grid = FrequencyGrid.forLoop(loop, poles, FrequencyGrid.DEFAULT_POINTS_PER_DECADE);
        Margins margins = LoopFrequencyAnalysis.margins(loop, grid);
        Optional<SensitivityPeak> ms = Optional.empty();
        OptionalDouble bandwidth = OptionalDouble.empty();
        Optional<StepResponse> step = Optional.empty();
        Optional<DisturbanceErrors> disturbance = Optional.empty();
        if (stable) {
            ms = Optional.of(LoopFrequencyAnalysis.sensitivityPeak(loop, grid));
            bandwidth = LoopFrequencyAnalysis.bandwidth(forward, unity ? null : h, closedLoop.dcGain(), grid);
            try {
                step = Optional.of(StepResponse.of(closedLoop));
            } catch (ArithmeticException e) {
                // Response that does not settle within a very long horizon: no figures rather than wrong ones.
                step = Optional.empty();
            }
            if (split != null) {
                disturbance = Optional.of(disturbanceErrors(split[0].withPadeDelay(PADE_ORDER),
                        split[1].withPadeDelay(PADE_ORDER), hr));
            }
        }
        StableGainRange gainRange = StableGainRange.of(ng.multiply(nh), dg.multiply(dh));
        int loopType = Math.max(0, loop.integratorCount());
        return new LoopAnalysis(forward, h, loop, padeOrder, closedLoop, poles, zeros, stable, routh, loopType,
                steadyState, margins, ms, bandwidth, step, gainRange, disturbance);
    }

    /**
     * Type, constants and errors of E = R − Y when a feedforward F adds F·R to the controller
     * output: Y = P·(C·(R − H·Y) + F·R), so E/R = (1 + P·C·H − P·C − P·F)/(1 + P·C·H). The type
     * reported is the effective type (zeros of E/R at s = 0), feedforward included.
     *
     * @param feedback H, or {@code null} for unity
     */
    public static SteadyState withFeedforward(TransferFunction controller, TransferFunction plant,
            TransferFunction feedforward, TransferFunction feedback) {
        TransferFunction c = controller.withPadeDelay(PADE_ORDER);
        TransferFunction p = plant.withPadeDelay(PADE_ORDER);
        TransferFunction f = feedforward.withPadeDelay(PADE_ORDER);
        TransferFunction h = (feedback == null ? TransferFunction.ONE : feedback).withPadeDelay(PADE_ORDER);
        Polynomial np = p.numerator();
        Polynomial dp = p.denominator();
        Polynomial nc = c.numerator();
        Polynomial dc = c.denominator();
        Polynomial nf = f.numerator();
        Polynomial df = f.denominator();
        Polynomial nh = h.numerator();
        Polynomial dh = h.denominator();
        // Common denominator Dp·Dc·Df·Dh.
        Sum num = Sum.ZERO.plus(dp, dc, df, dh).plus(np, nc, df, nh).minus(np, nc, df, dh).minus(np, nf, dc, dh);
        Polynomial characteristic = dp.multiply(dc).multiply(dh).add(np.multiply(nc).multiply(nh));
        boolean stable = allInOpenLeftHalfPlane(characteristic.roots());
        return SteadyState.ofErrorTransfer(num.value(), num.bound(), characteristic.multiply(df), stable);
    }

    /** E/D = −P/(1 + C·P·H) at s → 0 for unit step and ramp disturbances at the plant input. */
    static DisturbanceErrors disturbanceErrors(TransferFunction c, TransferFunction p, TransferFunction h) {
        Polynomial num = p.numerator().multiply(c.denominator()).multiply(h.denominator()).scale(-1.0);
        Polynomial den = p.denominator().multiply(c.denominator()).multiply(h.denominator())
                .add(p.numerator().multiply(c.numerator()).multiply(h.numerator()));
        int zn = num.zeroRootMultiplicity();
        int zd = den.zeroRootMultiplicity();
        double lead = num.coefficient(zn) / den.coefficient(zd);
        int order = zn - zd; // E/D ≈ lead·s^order near 0
        return new DisturbanceErrors(limit(order, 0, lead), limit(order, 1, lead));
    }

    /** lim s·(lead·s^order)·1/s^(k+1) = lead·s^(order−k) at s → 0. */
    private static double limit(int order, int k, double lead) {
        if (order > k) {
            return 0.0;
        }
        if (order == k) {
            return lead;
        }
        return Math.copySign(Double.POSITIVE_INFINITY, lead);
    }

    /** The stability test of every analysis: each root strictly left of the imaginary axis (relative 1e-9). */
    public static boolean allInOpenLeftHalfPlane(List<Complex> roots) {
        for (Complex p : roots) {
            if (p.abs() == 0 || !(p.getReal() < -1e-9 * p.abs())) {
                return false;
            }
        }
        return true;
    }

    /** Signed sum of polynomial products with the absolute-value bound of its terms. */
    private record Sum(Polynomial value, Polynomial bound) {
        static final Sum ZERO = new Sum(Polynomial.ZERO, Polynomial.ZERO);

        Sum plus(Polynomial... factors) {
            return add(1.0, factors);
        }

        Sum minus(Polynomial... factors) {
            return add(-1.0, factors);
        }

        private Sum add(double sign, Polynomial... factors) {
            Polynomial product = Polynomial.ONE;
            Polynomial abs = Polynomial.ONE;
            for (Polynomial f : factors) {
                product = product.multiply(f);
                abs = abs.multiply(f.abs());
            }
            return new Sum(value.add(product.scale(sign)), bound.add(abs));
        }
    }
}
