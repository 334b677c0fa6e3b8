package org.tracewell.engine.axis;

import java.util.List;
import java.util.OptionalDouble;

import org.apache.commons.math3.complex.Complex;
import org.tracewell.engine.loop.FrequencyGrid;
import org.tracewell.engine.loop.LoopAnalyzer;
import org.tracewell.engine.loop.LoopFrequencyAnalysis;
import org.tracewell.engine.loop.Margins;
import org.tracewell.engine.loop.StepResponse;
import org.tracewell.engine.loop.SteadyState;
import org.tracewell.engine.tf.TransferFunction;

/**
 * The single figures of one axis that {@link AxisModel#analyze()} reports, each computed only when asked for and
 * then kept: Kv, stability, the margins of both loops (dead time exact), both −3 dB bandwidths, the following error
 * at a velocity and the 2 % settling time of the position loop. The definitions, and the transfer functions they are
 * taken from, are those of {@code analyze()} (same Padé order, same frequency grid), so the values agree with
 * {@link AxisDynamics} to rounding; what {@code analyze()} adds (Routh array, stable gain range, disturbance errors,
 * every step figure) is left out. That makes one figure cost a few milliseconds instead of a full analysis: what
 * sweeps and Monte-Carlo runs over thousands of variants need.
 * <p>
 * Not thread-safe (it caches); one instance per axis variant.
 */
public final class AxisLoopFigures {

    private final AxisModel model;
    private UnityLoop position;
    private UnityLoop velocity;
    private Margins positionMargins;
    private Margins velocityMargins;
    private SteadyState tracking;

    private AxisLoopFigures(AxisModel model) {
        this.model = model;
    }

    public static AxisLoopFigures of(AxisModel model) {
        if (model == null) {
            throw new IllegalArgumentException("loop figures need an axis model");
        }
        return new AxisLoopFigures(model);
    }

    public AxisModel model() {
        return model;
    }

    /** Kv of the position loop, 1/s ({@link AxisDynamics#positionGain()}). */
    public double positionGain() {
        return positionLoop().steadyState().kv();
    }

    /** True when the position closed loop (which contains the velocity loop's poles) is stable. */
    public boolean stable() {
        return positionLoop().stable();
    }

    /** Margins of the position loop, dead time exact ({@link AxisDynamics#positionLoopMargins()}). */
    public Margins positionMargins() {
        if (positionMargins == null) {
            positionMargins = LoopFrequencyAnalysis.margins(model.positionOpenLoop());
        }
        return positionMargins;
    }

    /** Margins of the velocity loop, dead time exact ({@link AxisDynamics#velocityLoopMargins()}). */
    public Margins velocityMargins() {
        if (velocityMargins == null) {
            velocityMargins = LoopFrequencyAnalysis.margins(model.velocityOpenLoop());
        }
        return velocityMargins;
    }

    /** Position-loop −3 dB bandwidth, Hz; empty when not stable ({@link AxisDynamics#positionBandwidthHz()}). */
    public OptionalDouble positionBandwidthHz() {
        return positionLoop().bandwidthHz();
    }

    /** Velocity-loop −3 dB bandwidth, Hz; empty when not stable ({@link AxisDynamics#velocityBandwidthHz()}). */
    public OptionalDouble velocityBandwidthHz() {
        return velocityLoop().bandwidthHz();
    }

    /**
     * Steady following error at constant velocity v (m/s) with the controller's feedforward, m; empty when not
     * stable ({@link AxisDynamics#followingError(double)}).
     */
    public OptionalDouble followingError(double v) {
        if (tracking == null) {
            tracking = model.trackingSteadyState(stable());
        }
        return tracking.errors().map(e -> OptionalDouble.of(e.ramp(v))).orElse(OptionalDouble.empty());
    }

    /** 2 % settling time of the position-loop step response, s; empty when not stable or not settling. */
    public OptionalDouble settlingTime() {
        UnityLoop p = positionLoop();
        if (!p.stable()) {
            return OptionalDouble.empty();
        }
        try {
            return StepResponse.of(p.closedLoop).metrics().settlingTimeSeconds();
        } catch (ArithmeticException e) {
            return OptionalDouble.empty(); // a response that does not settle: no figure, as analyze() gives none
        }
    }

    private UnityLoop positionLoop() {
        if (position == null) {
            position = new UnityLoop(model.positionOpenLoop().withPadeDelay(model.padeOrder()));
        }
        return position;
    }

    private UnityLoop velocityLoop() {
        if (velocity == null) {
            CascadeController c = model.controller();
            TransferFunction controller = c.velocityController().withDelay(c.velocityDeadTime())
                    .withPadeDelay(model.padeOrder());
            velocity = new UnityLoop(controller.series(model.plant().torqueCommandToMotorVelocity()));
        }
        return velocity;
    }

    /**
     * A rational loop G under unity feedback, as {@code LoopAnalyzer} closes it: T = N_G/(D_G + N_G), stability from
     * the poles of T, the bandwidth bracketed on the analyzer's grid.
     */
    private static final class UnityLoop {
        private final TransferFunction forward;
        private final TransferFunction closedLoop;
        private final List<Complex> poles;
        private final boolean stable;
        private SteadyState steadyState;

        UnityLoop(TransferFunction forward) {
            this.forward = forward;
            this.closedLoop = TransferFunction.of(forward.numerator(),
                    forward.denominator().add(forward.numerator()));
            this.poles = closedLoop.poles();
            this.stable = LoopAnalyzer.allInOpenLeftHalfPlane(poles);
        }

        boolean stable() {
            return stable;
        }

        SteadyState steadyState() {
            if (steadyState == null) {
                steadyState = SteadyState.ofUnityFeedback(TransferFunction.of(forward.numerator(),
                        forward.denominator()), stable);
            }
            return steadyState;
        }

        OptionalDouble bandwidthHz() {
            if (!stable) {
                return OptionalDouble.empty();
            }
            double[] grid = FrequencyGrid.forLoop(forward, poles, FrequencyGrid.DEFAULT_POINTS_PER_DECADE);
            OptionalDouble w = LoopFrequencyAnalysis.bandwidth(forward, null, closedLoop.dcGain(), grid);
            return w.isPresent() ? OptionalDouble.of(w.getAsDouble() / (2 * Math.PI)) : OptionalDouble.empty();
        }
    }
}
