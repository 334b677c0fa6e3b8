package org.tracewell.engine.loop;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.tracewell.engine.tf.TransferFunction;

/**
 * Frequency-domain figures of a loop, dead time exact: margins with every crossing,
 * sensitivity peak, closed-loop −3 dB bandwidth.
 * <p>
 * Method: a {@link FrequencyGrid} brackets sign changes of ln|L(jω)| (gain crossovers) and of
 * Im L(jω) (phase crossovers, kept where Re L &lt; 0); each bracket is refined by Brent's
 * method to a relative 1e-13 in ω. Nothing is read off the grid. A crossing is missed only if
 * two crossings fall between neighbouring grid points (a tangency); the grid is refined
 * around lightly damped poles and zeros to make that unlikely.
 */
public final class LoopFrequencyAnalysis {

    private static final double RELATIVE_ACCURACY = 1e-13;
    private static final int MAX_EVALUATIONS = 200;

    private LoopFrequencyAnalysis() {
    }

    /** Margins of L on its own grid. */
    public static Margins margins(TransferFunction loop) {
        return margins(loop, FrequencyGrid.forLoop(loop));
    }

    /** Margins of L with brackets from the given ascending grid (rad/s). */
    public static Margins margins(TransferFunction loop, double[] grid) {
        int n = grid.length;
        double[] re = new double[n];
        double[] im = new double[n];
        double[] out = new double[2];
        double[] sn = new double[2];
        double[] sd = new double[2];
        for (int i = 0; i < n; i++) {
            loop.evaluateAtFrequency(grid[i], out, sn, sd);
            re[i] = out[0];
            im[i] = out[1];
        }
        DoubleUnaryOperator logMagnitude = w -> {
            double[] v = new double[2];
            loop.evaluateAtFrequency(w, v);
            return Math.log(Math.hypot(v[0], v[1]));
        };
        DoubleUnaryOperator imaginary = w -> {
            double[] v = new double[2];
            loop.evaluateAtFrequency(w, v);
            return v[1];
        };
        List<GainCrossover> gains = new ArrayList<>();
        List<PhaseCrossover> phases = new ArrayList<>();
        BrentSolver solver = new BrentSolver(RELATIVE_ACCURACY, 1e-300);
        for (int i = 0; i + 1 < n; i++) {
            double m0 = Math.log(Math.hypot(re[i], im[i]));
            double m1 = Math.log(Math.hypot(re[i + 1], im[i + 1]));
            if (Double.isFinite(m0) && Double.isFinite(m1) && (m0 > 0) != (m1 > 0)) {
                double w = refine(solver, logMagnitude, grid[i], grid[i + 1], m0, m1);
                loop.evaluateAtFrequency(w, out);
                double phase = Math.toDegrees(Math.atan2(out[1], out[0]));
                double pm = normalise(180.0 + phase);
                double pmMod = pm < 0 ? pm + 360.0 : pm;
                gains.add(new GainCrossover(w, pm, Math.toRadians(pmMod) / w));
            }
            double i0 = im[i];
            double i1 = im[i + 1];
            if (Double.isFinite(i0) && Double.isFinite(i1) && (i0 > 0) != (i1 > 0)
                    && (re[i] < 0 || re[i + 1] < 0)) {
                double w = refine(solver, imaginary, grid[i], grid[i + 1], i0, i1);
                loop.evaluateAtFrequency(w, out);
                double mag = Math.hypot(out[0], out[1]);
                // Keep real −180° crossings; drop sign flips through a pole on the jω axis.
                if (out[0] < 0 && Double.isFinite(mag) && Math.abs(out[1]) <= 1e-6 * mag) {
                    phases.add(new PhaseCrossover(w, mag, -20.0 * Math.log10(mag)));
                }
            }
        }
        GainCrossover worstPhase = gains.stream()
                .min(Comparator.comparingDouble(GainCrossover::phaseMarginDeg)).orElse(null);
        PhaseCrossover worstGain = phases.stream()
                .min(Comparator.comparingDouble(p -> Math.abs(p.gainMarginDb()))).orElse(null);
        double delayMargin = gains.stream().mapToDouble(GainCrossover::delayMarginSeconds).min()
                .orElse(Double.POSITIVE_INFINITY);
        return new Margins(gains, phases,
                worstGain == null ? Double.POSITIVE_INFINITY : worstGain.gainMarginDb(),
                worstGain == null ? OptionalDouble.empty() : OptionalDouble.of(worstGain.frequencyRadPerSec()),
                worstPhase == null ? Double.POSITIVE_INFINITY : worstPhase.phaseMarginDeg(),
                worstPhase == null ? OptionalDouble.empty() : OptionalDouble.of(worstPhase.frequencyRadPerSec()),
                delayMargin);
    }

    private static double refine(BrentSolver solver, DoubleUnaryOperator f, double a, double b, double fa,
            double fb) {
        if (fa == 0) {
            return a;
        }
        if (fb == 0) {
            return b;
        }
        return solver.solve(MAX_EVALUATIONS, f::applyAsDouble, a, b);
    }

    /** Angle into (−180°, 180°]. */
    static double normalise(double deg) {
        double d = deg % 360.0;
        if (d > 180.0) {
            d -= 360.0;
        } else if (d <= -180.0) {
            d += 360.0;
        }
        return d;
    }

    /** Ms = max |1/(1 + L(jω))| over the loop's grid, refined by Brent's optimiser. */
    public static SensitivityPeak sensitivityPeak(TransferFunction loop) {
        return sensitivityPeak(loop, FrequencyGrid.forLoop(loop));
    }

    /** Ms with the peak bracketed on the given grid. */
    public static SensitivityPeak sensitivityPeak(TransferFunction loop, double[] grid) {
        DoubleUnaryOperator s = w -> {
            double[] v = new double[2];
            loop.evaluateAtFrequency(w, v);
            return 1.0 / Math.hypot(1.0 + v[0], v[1]);
        };
        int best = 0;
        double bestValue = -1;
        for (int i = 0; i < grid.length; i++) {
            double v = s.applyAsDouble(grid[i]);
            if (v > bestValue) {
                bestValue = v;
                best = i;
            }
        }
        double w = grid[best];
        if (best > 0 && best + 1 < grid.length) {
            var result = new BrentOptimizer(1e-12, 1e-300).optimize(new MaxEval(MAX_EVALUATIONS),
                    new UnivariateObjectiveFunction(s::applyAsDouble), GoalType.MAXIMIZE,
                    new SearchInterval(grid[best - 1], grid[best + 1], w));
            if (result.getValue() >= bestValue) {
                w = result.getPoint();
                bestValue = result.getValue();
            }
        }
        // Above the grid S tends to 1/|1 + L(∞)|.
        double lInf = loop.isStrictlyProper() ? 0.0
                : loop.numerator().leadingCoefficient() / loop.denominator().leadingCoefficient();
        if (!loop.hasDelay() && 1.0 / Math.abs(1.0 + lInf) > bestValue) {
            return new SensitivityPeak(1.0 / Math.abs(1.0 + lInf), Double.POSITIVE_INFINITY);
        }
        return new SensitivityPeak(bestValue, w);
    }

    /**
     * Closed-loop −3 dB bandwidth: the lowest frequency where |T(jω)| = |T(0)|/√2 with
     * T = G/(1 + G·H). +∞ when |T| never falls that far (a biproper loop); empty when
     * T(0) = 0 (no DC response to measure against).
     *
     * @param forward G (dead time exact)
     * @param feedback H, or {@code null} for unity
     * @param dcGain T(0), computed from the rational closed loop
     * @param grid ascending frequencies (rad/s)
     */
    public static OptionalDouble bandwidth(TransferFunction forward, TransferFunction feedback, double dcGain,
            double[] grid) {
        if (dcGain == 0 || !Double.isFinite(dcGain)) {
            return OptionalDouble.empty();
        }
        double level = Math.abs(dcGain) / Math.sqrt(2.0);
        DoubleUnaryOperator excess = w -> Math.log(closedLoopMagnitude(forward, feedback, w) / level);
        double previous = grid[0];
        double fPrevious = excess.applyAsDouble(previous);
        if (fPrevious < 0) {
            // Already below at the lowest grid point: search down towards DC.
            double lo = previous;
            while (excess.applyAsDouble(lo) < 0 && lo > previous * 1e-12) {
                lo /= 10;
            }
            if (excess.applyAsDouble(lo) < 0) {
                return OptionalDouble.empty();
            }
            return OptionalDouble.of(new BrentSolver(RELATIVE_ACCURACY, 1e-300)
                    .solve(MAX_EVALUATIONS, excess::applyAsDouble, lo, previous));
        }
        for (int i = 1; i < grid.length; i++) {
            double f = excess.applyAsDouble(grid[i]);
            if (f < 0) {
                return OptionalDouble.of(refine(new BrentSolver(RELATIVE_ACCURACY, 1e-300), excess, previous,
                        grid[i], fPrevious, f));
            }
            previous = grid[i];
            fPrevious = f;
        }
        return OptionalDouble.of(Double.POSITIVE_INFINITY);
    }

    private static double closedLoopMagnitude(TransferFunction g, TransferFunction h, double w) {
        double[] gv = new double[2];
        g.evaluateAtFrequency(w, gv);
        double lre = gv[0];
        double lim = gv[1];
        if (h != null) {
            double[] hv = new double[2];
            h.evaluateAtFrequency(w, hv);
            lre = gv[0] * hv[0] - gv[1] * hv[1];
            lim = gv[0] * hv[1] + gv[1] * hv[0];
        }
        return Math.hypot(gv[0], gv[1]) / Math.hypot(1.0 + lre, lim);
    }
}
