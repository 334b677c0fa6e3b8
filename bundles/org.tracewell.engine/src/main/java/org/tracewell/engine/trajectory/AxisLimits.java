package org.tracewell.engine.trajectory;

/**
 * Motion limits of one linear axis, SI units; {@code Double.POSITIVE_INFINITY} means unlimited.
 *
 * @param velocity     m/s, &gt; 0
 * @param acceleration m/s², &gt; 0
 * @param jerk         m/s³, &gt; 0 (only used by S-curve profiles)
 */
public record AxisLimits(double velocity, double acceleration, double jerk) {

    public AxisLimits {
        positive("axis velocity", velocity, "m/s");
        positive("axis acceleration", acceleration, "m/s²");
        positive("axis jerk", jerk, "m/s³");
    }

    public static AxisLimits unlimited() {
        return new AxisLimits(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY);
    }

    private static void positive(String what, double value, String unit) {
        if (!(value > 0) || Double.isNaN(value)) {
            throw new IllegalArgumentException(what + " must be > 0 " + unit + " (or +infinity), got " + value);
        }
    }
}
