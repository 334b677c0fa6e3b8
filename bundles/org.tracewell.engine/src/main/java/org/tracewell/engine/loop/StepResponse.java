package org.tracewell.engine.loop;

import java.util.List;
import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.tracewell.engine.linalg.ZeroOrderHold;
import org.tracewell.engine.tf.StateSpace;
import org.tracewell.engine.tf.TransferFunction;

/**
 * Unit-step response of a stable, proper, rational closed loop and its time-domain figures.
 * <p>
 * Method ({@link #METHOD}): the transfer function is rescaled in frequency so its poles are
 * of order one, realised as a cascade of first- and second-order sections and discretised
 * with the zero-order hold (Van Loan block exponential). For a step input the hold is exact, so every sample is
 * the true response up to rounding. Rise, peak and settling instants are then refined between
 * samples with Brent's method on the exact inter-sample solution x(t_k + τ) = Φ(τ)x_k + Γ(τ).
 * The final value is T(0), exact.
 * <p>
 * Definitions: overshoot = (y_max − y_∞)/|y_∞|·100 %; peak time = instant of y_max (empty
 * without overshoot); rise time = first 90 % crossing − first 10 % crossing; settling time =
 * last instant |y − y_∞| = 2 %·|y_∞| measured from the response (not the 4/(ζω_n) estimate).
 * Samples: horizon 12/σ_min (σ_min the slowest pole's decay rate), extended if the response
 * has not settled, at least 2000 and at most 40000 samples. Loops whose closed-loop poles
 * span so many decades that this cannot resolve them raise {@link ArithmeticException}
 * ({@link LoopAnalyzer} then reports no step figures rather than wrong ones).
 */
public final class StepResponse {

    /** How the response is computed, for reports. */
    public static final String METHOD = "exact zero-order-hold discretisation of the closed loop"
            + " (Van Loan block matrix exponential), instants refined by Brent's method between samples";

    private static final int MIN_SAMPLES = 2000;
    private static final int MAX_SAMPLES = 40000;
    private static final double SETTLING_BAND = 0.02;

    private final double[] times;
    private final double[] values;
    private final StepMetrics metrics;

    private StepResponse(double[] times, double[] values, StepMetrics metrics) {
        this.times = times;
        this.values = values;
        this.metrics = metrics;
    }

    public StepMetrics metrics() {
        return metrics;
    }

    /** Sample instants in seconds (a copy). */
    public double[] times() {
        return times.clone();
    }

    /** Response samples (a copy). */
    public double[] values() {
        return values.clone();
    }

    /**
     * Step response of {@code closedLoop}.
     *
     * @throws IllegalArgumentException if it is improper, has dead time, or is not stable
     */
    public static StepResponse of(TransferFunction closedLoop) {
        if (!closedLoop.isProper() || closedLoop.hasDelay()) {
            throw new IllegalArgumentException("step response needs a proper rational transfer function, got "
                    + closedLoop);
        }
        List<Complex> poles = closedLoop.poles();
        double sigmaMin = Double.POSITIVE_INFINITY;
        double magMin = Double.POSITIVE_INFINITY;
        double magMax = 0;
        for (Complex p : poles) {
            if (!(p.getReal() < 0)) {
                throw new IllegalArgumentException("step response metrics need a stable closed loop; pole " + p
                        + " is not in the open left half plane");
            }
            sigmaMin = Math.min(sigmaMin, -p.getReal());
            magMin = Math.min(magMin, p.abs());
            magMax = Math.max(magMax, p.abs());
        }
        double finalValue = closedLoop.dcGain();
        if (poles.isEmpty()) {
            // Pure gain: the output jumps to its final value at t = 0.
            double[] t = {0.0, 1.0};
            double[] y = {finalValue, finalValue};
            return new StepResponse(t, y, new StepMetrics(finalValue, OptionalDouble.of(0.0), finalValue,
                    OptionalDouble.empty(), OptionalDouble.of(0.0), OptionalDouble.of(0.0)));
        }
        // Rescale time so poles are O(1): response of T(s/a) at τ equals y(a·τ).
        double a = 1.0 / Math.sqrt(magMin * magMax);
        TransferFunction scaled = closedLoop.scaleFrequency(a);
        double sigma = sigmaMin * a;
        double fastest = magMax * a;
        StateSpace ss = StateSpace.cascade(scaled);
        double horizon = 12.0 / sigma;
        for (int attempt = 0; attempt < 6; attempt++) {
            StepMetrics m;
            Simulation sim;
            try {
                sim = new Simulation(ss, horizon, fastest);
                m = sim.metrics(finalValue, a);
            } catch (MathIllegalStateException | MathIllegalArgumentException e) {
                throw new ArithmeticException("step response of " + closedLoop + " could not be refined: "
                        + e.getMessage());
            }
            if (m != null) {
                double[] t = sim.times.clone();
                for (int i = 0; i < t.length; i++) {
                    t[i] *= a;
                }
                return new StepResponse(t, sim.y, m);
            }
            horizon *= 3;
        }
        throw new ArithmeticException("step response of " + closedLoop + " did not settle within "
                + horizon * a + " s");
    }

    /** One sampled run in scaled time. */
    private static final class Simulation {
        final StateSpace ss;
        final RealMatrix a;
        final RealMatrix b;
        final RealVector c;
        final double d;
        final double h;
        final double[] times;
        final double[] y;
        final RealVector[] states;

        Simulation(StateSpace ss, double horizon, double fastest) {
            this.ss = ss;
            this.a = ss.a();
            this.b = ss.b();
            this.c = ss.c().getRowVector(0);
            this.d = ss.d();
            int n = (int) Math.ceil(Math.max(MIN_SAMPLES, horizon * fastest * 10));
            n = Math.min(n, MAX_SAMPLES);
            this.h = horizon / n;
            ZeroOrderHold.Discretized zoh = ZeroOrderHold.discretize(a, b, h);
            RealMatrix phi = zoh.phi();
            RealVector gamma = zoh.gamma().getColumnVector(0);
            times = new double[n + 1];
            y = new double[n + 1];
            states = new RealVector[n + 1];
            RealVector x = gamma.mapMultiply(0.0);
            for (int k = 0; k <= n; k++) {
                times[k] = k * h;
                states[k] = x;
                y[k] = c.dotProduct(x) + d;
                if (!Double.isFinite(y[k])) {
                    // Poles spread over too many decades for one sampled horizon.
                    throw new ArithmeticException("step response overflowed at sample " + k + " of " + n);
                }
                x = phi.operate(x).add(gamma);
            }
        }

        /** State at t_k + τ, 0 ≤ τ ≤ h, from the exact solution. */
        RealVector stateAt(int k, double tau) {
            if (tau == 0) {
                return states[k];
            }
            ZeroOrderHold.Discretized z = ZeroOrderHold.discretize(a, b, tau);
            return z.phi().operate(states[k]).add(z.gamma().getColumnVector(0));
        }

        double outputAt(int k, double tau) {
            return c.dotProduct(stateAt(k, tau)) + d;
        }

        double slopeAt(int k, double tau) {
            RealVector x = stateAt(k, tau);
            return c.dotProduct(a.operate(x).add(b.getColumnVector(0)));
        }

        /** Root of f on sample interval [t_k, t_k+1]; f must change sign. */
        double refine(int k, DoubleUnaryOperator f) {
            double f0 = f.applyAsDouble(0.0);
            double f1 = f.applyAsDouble(h);
            if (f0 == 0) {
                return times[k];
            }
            if (f1 == 0 || (f0 > 0) == (f1 > 0)) {
                return times[k] + h;
            }
            double tau = new BrentSolver(1e-14, 1e-15 * h).solve(200, f::applyAsDouble, 0.0, h);
            return times[k] + tau;
        }

        /** Metrics in real time (scale a), or null when the horizon was too short to settle. */
        StepMetrics metrics(double finalValue, double scale) {
            int n = y.length - 1;
            double largest = 0;
            for (double v : y) {
                largest = Math.max(largest, Math.abs(v));
            }
            // A final value lost in the response's rounding noise cannot anchor relative figures.
            if (finalValue == 0 || Math.abs(finalValue) < 1e-9 * largest) {
                double peak = 0;
                for (double v : y) {
                    peak = Math.abs(v) > Math.abs(peak) ? v : peak;
                }
                return new StepMetrics(finalValue, OptionalDouble.empty(), peak, OptionalDouble.empty(),
                        OptionalDouble.empty(), OptionalDouble.empty());
            }
            double band = SETTLING_BAND * Math.abs(finalValue);
            int lastOut = -1;
            for (int k = n; k >= 0; k--) {
                if (Math.abs(y[k] - finalValue) > band) {
                    lastOut = k;
                    break;
                }
            }
            if (lastOut >= n - n / 10) {
                return null; // still outside the band near the end: extend the horizon
            }
            double settling = 0.0;
            if (lastOut >= 0) {
                final int k = lastOut;
                settling = refine(k, tau -> Math.abs(outputAt(k, tau) - finalValue) - band);
            }
            // Peak of the normalised response r = y/y_final.
            int kMax = 0;
            for (int k = 1; k <= n; k++) {
                if (y[k] / finalValue > y[kMax] / finalValue) {
                    kMax = k;
                }
            }
            double peakValue = y[kMax];
            OptionalDouble peakTime = OptionalDouble.empty();
            double overshoot = 0.0;
            if (y[kMax] / finalValue > 1.0) {
                double tPeak = times[kMax];
                if (kMax > 0 && kMax < n) {
                    double sign = Math.signum(finalValue);
                    // Slope changes sign from + to − (of r) inside [t_{k−1}, t_{k+1}].
                    int k0 = sign * slopeAt(kMax, 0.0) > 0 ? kMax : kMax - 1;
                    final int kk = k0;
                    tPeak = refine(kk, tau -> sign * slopeAt(kk, tau));
                    int base = (int) Math.max(0, Math.min(n - 1, Math.floor(tPeak / h)));
                    // Clamp: k·h and the refined instant may differ in the last bit.
                    peakValue = outputAt(base, Math.max(0.0, Math.min(h, tPeak - times[base])));
                    if (peakValue / finalValue < y[kMax] / finalValue) {
                        peakValue = y[kMax];
                        tPeak = times[kMax];
                    }
                }
                overshoot = (peakValue / finalValue - 1.0) * 100.0;
                peakTime = OptionalDouble.of(tPeak * scale);
            }
            double t10 = firstCrossing(0.1, finalValue);
            double t90 = firstCrossing(0.9, finalValue);
            return new StepMetrics(finalValue, OptionalDouble.of(overshoot), peakValue, peakTime,
                    OptionalDouble.of((t90 - t10) * scale), OptionalDouble.of(settling * scale));
        }

        private double firstCrossing(double fraction, double finalValue) {
            if (y[0] / finalValue >= fraction) {
                return 0.0;
            }
            for (int k = 1; k < y.length; k++) {
                if (y[k] / finalValue >= fraction) {
                    final int kk = k - 1;
                    return refine(kk, tau -> outputAt(kk, tau) / finalValue - fraction);
                }
            }
            throw new ArithmeticException("step response never reached " + fraction * 100 + " % of its final value");
        }
    }
}
