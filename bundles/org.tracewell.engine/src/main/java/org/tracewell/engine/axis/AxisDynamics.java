package org.tracewell.engine.axis;

import java.util.Optional;
import java.util.OptionalDouble;

import org.tracewell.engine.loop.LoopAnalysis;
import org.tracewell.engine.loop.Margins;
import org.tracewell.engine.loop.SteadyState;

/**
 * What Tracewell reports about one axis: both loops analysed, the tracking figures with and
 * without feedforward, and the mechanical mode against the velocity loop.
 *
 * @param axisName the axis
 * @param velocityLoop analysis of the velocity loop (controller C_v, plant with current lag), its dead time as
 *        the model's Padé approximant
 * @param velocityLoopMargins margins of the velocity loop with its dead time exact (the figures to report)
 * @param positionLoop analysis of the position loop around the closed velocity loop, its dead time as the
 *        model's Padé approximant (poles, stability, step, gain range)
 * @param positionLoopMargins margins of the position loop with its dead time exact (the figures to report)
 * @param tracking type and constants of the load-position error E/R with the controller's feedforward
 *        (the effective type)
 * @param trackingWithoutFeedforward the same with both feedforward fractions at 0
 * @param resonance first mechanical mode; empty for a rigid drive
 * @param velocityOpenLoopGainAtResonanceDb |L_v| at the resonance frequency, dB; empty for a rigid drive
 * @param staticStiffnessNPerM static stiffness against a constant load force (+∞ with integral action)
 */
public record AxisDynamics(String axisName, LoopAnalysis velocityLoop, Margins velocityLoopMargins,
        LoopAnalysis positionLoop, Margins positionLoopMargins,
        SteadyState tracking,
        SteadyState trackingWithoutFeedforward, Optional<Resonance> resonance,
        OptionalDouble velocityOpenLoopGainAtResonanceDb, double staticStiffnessNPerM) {

    /** Kv of the position loop, 1/s (its velocity error constant). */
    public double positionGain() {
        return positionLoop.steadyState().kv();
    }

    /** Type of the position loop L_p (poles at s = 0). */
    public int positionLoopType() {
        return positionLoop.loopType();
    }

    /** Effective type of E/R, feedforward included. */
    public int effectiveType() {
        return tracking.systemType();
    }

    /** True when both loops are stable (the position closed loop contains the velocity loop's poles). */
    public boolean stable() {
        return velocityLoop.stable() && positionLoop.stable();
    }

    /** Velocity-loop −3 dB bandwidth, Hz; empty when not stable. */
    public OptionalDouble velocityBandwidthHz() {
        return hz(velocityLoop.bandwidthRadPerSec());
    }

    /** Position-loop −3 dB bandwidth (feedback only, no feedforward), Hz; empty when not stable. */
    public OptionalDouble positionBandwidthHz() {
        return hz(positionLoop.bandwidthRadPerSec());
    }

    /**
     * Steady following error (reference − load position) at constant feed v (m/s) with the controller's
     * feedforward, m: v/Kv_eff for effective type 1, 0 for type ≥ 2; empty when not stable.
     */
    public OptionalDouble followingError(double feed) {
        return tracking.errors().map(e -> OptionalDouble.of(e.ramp(feed))).orElse(OptionalDouble.empty());
    }

    /** As {@link #followingError(double)} without feedforward: v/Kv (plus screw wind-up with a motor encoder). */
    public OptionalDouble followingErrorWithoutFeedforward(double feed) {
        return trackingWithoutFeedforward.errors().map(e -> OptionalDouble.of(e.ramp(feed)))
                .orElse(OptionalDouble.empty());
    }

    private static OptionalDouble hz(OptionalDouble radPerSec) {
        return radPerSec.isPresent() ? OptionalDouble.of(radPerSec.getAsDouble() / (2 * Math.PI)) : OptionalDouble.empty();
    }
}
