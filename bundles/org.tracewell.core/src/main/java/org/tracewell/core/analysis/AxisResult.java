package org.tracewell.core.analysis;

import java.util.List;
import java.util.Optional;

import org.tracewell.engine.axis.AxisDynamics;

/**
 * Loop results of one axis.
 *
 * @param axisId                 model id of the axis
 * @param axisName               axis name (X1, Y, …)
 * @param rotary                 true for a rotary axis (positions rad, velocities rad/s)
 * @param dynamics               both loops analysed (margins with exact dead time, Kv, types, bandwidths, resonance)
 * @param maxVelocity            the axis velocity limit, m/s (rad/s)
 * @param atMaxVelocity          following error at {@code maxVelocity}
 * @param atContourFeeds         following error at the feed of every contour the axis takes part in, model order
 * @param positionResolution     encoder step at the load, m (rad); 0 when the model gives no encoder resolution
 * @param gantryPartnerId        model id of the other motor of a gantry pair
 * @param notes                  simplifications made while mapping the axis
 */
public record AxisResult(String axisId, String axisName, boolean rotary, AxisDynamics dynamics, double maxVelocity,
        FeedFollowingError atMaxVelocity, List<FeedFollowingError> atContourFeeds, double positionResolution,
        Optional<String> gantryPartnerId, List<String> notes) {

    public AxisResult {
        atContourFeeds = List.copyOf(atContourFeeds);
        notes = List.copyOf(notes);
    }

    /** Position-loop Kv, 1/s. */
    public double positionGain() {
        return dynamics.positionGain();
    }

    /** Position-loop phase margin (dead time exact), rad; +∞ when |L| never crosses 1. */
    public double positionPhaseMargin() {
        return Math.toRadians(dynamics.positionLoopMargins().phaseMarginDeg());
    }

    /** Position-loop gain margin as a ratio (dead time exact); +∞ when the phase never crosses −180°. */
    public double positionGainMargin() {
        return dynamics.positionLoopMargins().gainMarginFactor();
    }

    /** Velocity-loop phase margin (dead time exact), rad. */
    public double velocityPhaseMargin() {
        return Math.toRadians(dynamics.velocityLoopMargins().phaseMarginDeg());
    }

    /** Velocity-loop gain margin as a ratio (dead time exact). */
    public double velocityGainMargin() {
        return dynamics.velocityLoopMargins().gainMarginFactor();
    }

    /** The following error at the feed of {@code contourId}, if the axis takes part in it. */
    public Optional<FeedFollowingError> atContourFeed(String contourId) {
        return atContourFeeds.stream().filter(f -> contourId.equals(f.contourId())).findFirst();
    }
}
