package org.tracewell.engine.axis;

import java.util.Optional;
import java.util.OptionalDouble;

import org.tracewell.engine.loop.LoopAnalysis;
import org.tracewell.engine.loop.Margins;
import org.tracewell.engine.loop.SteadyState;

/**
 * Report of a PID axis: the one loop, tracking with and without feedforward, the mechanical mode.
 *
 * @param axisName the axis
 * @param loop analysis of the position loop (dead time as Padé)
 * @param loopMargins margins with the dead time exact
 * @param tracking E/R with feedforward (effective type)
 * @param trackingWithoutFeedforward E/R without feedforward
 * @param resonance first mechanical mode; empty for a rigid drive
 * @param loopGainAtResonanceDb |L| at the resonance, dB
 * @param staticStiffnessNPerM static stiffness, N/m
 */
public record PidAxisDynamics(String axisName, LoopAnalysis loop, Margins loopMargins, SteadyState tracking,
        SteadyState trackingWithoutFeedforward, Optional<Resonance> resonance, OptionalDouble loopGainAtResonanceDb,
        double staticStiffnessNPerM) {

    /** Effective type of E/R, feedforward included. */
    public int effectiveType() {
        return tracking.systemType();
    }

    /** Steady following error at constant feed v (m/s) with feedforward, m; empty when not stable. */
    public OptionalDouble followingError(double feed) {
        return tracking.errors().map(e -> OptionalDouble.of(e.ramp(feed))).orElse(OptionalDouble.empty());
    }

    /** −3 dB bandwidth of the feedback loop, Hz. */
    public OptionalDouble bandwidthHz() {
        OptionalDouble w = loop.bandwidthRadPerSec();
        return w.isPresent() ? OptionalDouble.of(w.getAsDouble() / (2 * Math.PI)) : OptionalDouble.empty();
    }
}
