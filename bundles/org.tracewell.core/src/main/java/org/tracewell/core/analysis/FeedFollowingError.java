package org.tracewell.core.analysis;

import java.util.OptionalDouble;

/**
 * Steady following error of one axis at one constant axis velocity (v/Kv_eff for an effective type-1 loop).
 *
 * @param contourId                        model id of the contour whose feed this is; empty for the axis max velocity
 * @param contourName                      its name; "max velocity" for the axis max velocity
 * @param velocity                         axis velocity, m/s (rad/s for a rotary axis)
 * @param followingError                   with the controller's feedforward, m (rad); empty when the loop is unstable
 * @param followingErrorWithoutFeedforward both feedforward fractions at 0, m (rad); empty when unstable
 */
public record FeedFollowingError(String contourId, String contourName, double velocity, OptionalDouble followingError,
        OptionalDouble followingErrorWithoutFeedforward) {
}
