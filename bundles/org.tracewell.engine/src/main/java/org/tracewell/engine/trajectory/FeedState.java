package org.tracewell.engine.trajectory;

/**
 * Motion along the path at one instant.
 *
 * @param time         seconds from the start
 * @param pathPosition arc length s, metres
 * @param feed         path speed ds/dt, m/s
 * @param acceleration d²s/dt², m/s²
 * @param jerk         d³s/dt³, m/s³
 */
public record FeedState(double time, double pathPosition, double feed, double acceleration, double jerk) {
}
