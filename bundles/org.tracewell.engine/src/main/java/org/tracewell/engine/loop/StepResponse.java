package org.tracewell.engine.loop;

import java.util.List;
import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.linear.RealMatrix;
import org.tracewell.engine.linalg.ZeroOrderHold;
import org.tracewell.engine.sim.ContinuousStateSpace;
import org.tracewell.engine.sim.DiscreteStateSpace;
import org.tracewell.engine.sim.SampledLoop;
import org.tracewell.engine.tf.StateSpace;
import org.tracewell.engine.tf.TransferFunction;

/**
 * Unit-step response of a stable, proper, rational closed loop and its time-domain figures.
 * <p>
 * Method ({@link #METHOD}): the transfer function is rescaled in frequency so its poles are
 * of order one, realised as a cascade of first- and second-order sections and discretised
 * with the zero-order hold (Van Loan block exponential) and run by the simulation's loop kernel
 * ({@link SampledLoop}). For a step input the hold is exact, so every sample is the true response up to
 * rounding. Rise, peak and settling instants are then refined between samples with Brent's method on the exact inter-sample solution x(t_k + τ) = Φ(τ)x_k + Γ(τ).
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

    /**
     * One sampled run in scaled time, by the simulation's loop kernel (tens of thousands of samples per loop
     * analysed). The kernel keeps an orthogonally transformed state; the run keeps it every {@link #CHECKPOINT}
     * samples, and the few instants that are refined between samples re-run from the nearest one.
     */
    private static final class Simulation {
        static final int CHECKPOINT = 256;
        final RealMatrix a;
        final RealMatrix b;
        final double[][] aRows;
        final double[] bColumn;
        final double[] c;
        final double d;
        final int states;
        final double h;
        final double[] times;
        final double[] y;
        final SampledLoop kernel;
        /** Kernel state at samples 0, CHECKPOINT, 2·CHECKPOINT, … */
        final double[][] checkpoints;

        Simulation(StateSpace ss, double horizon, double fastest) {
            this.a = ss.a();
            this.b = ss.b();
            this.aRows = a.getData();
            this.bColumn = b.getColumn(0);
            this.c = ss.c().getRow(0);
            this.d = ss.d();
            this.states = c.length;
            int n = (int) Math.ceil(Math.max(MIN_SAMPLES, horizon * fastest * 10));
            n = Math.min(n, MAX_SAMPLES);
            this.h = horizon / n;
            kernel = SampledLoop.of(DiscreteStateSpace.zeroOrderHold(
                    new ContinuousStateSpace(aRows, b.getData(), c, new double[] {d}), h));
            times = new double[n + 1];
            y = new double[n + 1];
            checkpoints = new double[n / CHECKPOINT + 1][];
            double[] one = new double[CHECKPOINT];
            java.util.Arrays.fill(one, 1.0);
            double[] x = new double[kernel.stateCount()];
            double[] spare = new double[kernel.stateCount()];
            for (int k = 0; k <= n; k += CHECKPOINT) {
                checkpoints[k / CHECKPOINT] = x.clone();
                int length = Math.min(CHECKPOINT, n + 1 - k);
                double[] now = kernel.run(x, spare, one, null, null, y, k, length);
                spare = now == x ? spare : x;
                x = now;
            }
            for (int k = 0; k <= n; k++) {
                times[k] = k * h;
                if (!Double.isFinite(y[k])) {
                    // Poles spread over too many decades for one sampled horizon.
                    throw new ArithmeticException("step response overflowed at sample " + k + " of " + n);
                }
            }
        }

        /** The last sample asked for by {@link #stateAtSample} and its state (a refinement asks for one many times). */
        private int cachedSample = -1;
        private double[] cachedState;

        /** State of sample k in the model's coordinates, re-run from the checkpoint before it. */
        double[] stateAtSample(int k) {
            if (k == cachedSample) {
                return cachedState;
            }
            double[] x = checkpoints[k / CHECKPOINT].clone();
            double[] spare = new double[x.length];
            for (int i = k / CHECKPOINT * CHECKPOINT; i < k; i++) {
                kernel.step(x, spare, 1.0, 0.0, 0.0);
                double[] swap = x;
                x = spare;
                spare = swap;
            }
            cachedState = kernel.toModel(x);
            cachedSample = k;
            return cachedState;
        }

        /** State at t_k + τ, 0 ≤ τ ≤ h, from the exact solution. */
        double[] stateAt(int k, double tau) {
            double[] xk = stateAtSample(k);
            if (tau == 0) {
                return xk;
            }
            ZeroOrderHold.Discretized z = ZeroOrderHold.discretize(a, b, tau);
            double[][] phi = z.phi().getData();
            double[] out = new double[states];
            for (int i = 0; i < states; i++) {
                double sum = z.gamma().getEntry(i, 0);
                for (int j = 0; j < states; j++) {
                    sum += phi[i][j] * xk[j];
                }
                out[i] = sum;
            }
            return out;
        }

        private double output(double[] state) {
            double sum = d;
            for (int j = 0; j < states; j++) {
                sum += c[j] * state[j];
            }
            return sum;
        }

        double outputAt(int k, double tau) {
            return output(stateAt(k, tau));
        }

        /** dy/dt = C(Ax + B) at t_k + τ. */
        double slopeAt(int k, double tau) {
            double[] state = stateAt(k, tau);
            double sum = 0;
            for (int i = 0; i < states; i++) {
                double dx = bColumn[i];
                for (int j = 0; j < states; j++) {
                    dx += aRows[i][j] * state[j];
                }
                sum += c[i] * dx;
            }
            return sum;
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
