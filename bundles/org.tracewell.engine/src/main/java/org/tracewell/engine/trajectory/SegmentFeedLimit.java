package org.tracewell.engine.trajectory;

/**
 * The limits the planner applies on one path segment after mapping the axis limits onto it.
 *
 * @param feed         largest path speed on the segment, m/s
 * @param acceleration largest tangential path acceleration, m/s²
 * @param jerk         largest path jerk, m/s³ (infinite for trapezoidal profiles)
 * @param limitedBy    what set the feed: "feed", "axis N velocity", "centripetal", "axis N centripetal",
 *                     "centripetal jerk" or "axis N centripetal jerk"
 */
public record SegmentFeedLimit(double feed, double acceleration, double jerk, String limitedBy) {
}
