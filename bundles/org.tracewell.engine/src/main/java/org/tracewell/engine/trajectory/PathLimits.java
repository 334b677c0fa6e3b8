package org.tracewell.engine.trajectory;

/**
 * Limits along the path, SI units.
 *
 * @param feed                    programmed feed (path speed), m/s, &gt; 0
 * @param acceleration            tangential path acceleration limit, m/s², &gt; 0
 * @param jerk                    path jerk limit, m/s³, &gt; 0; {@code Double.POSITIVE_INFINITY} when
 *                                only trapezoidal profiles are planned
 * @param centripetalAcceleration limit of F²/R on arcs, m/s², &gt; 0
 */
public record PathLimits(double feed, double acceleration, double jerk, double centripetalAcceleration) {

    public PathLimits {
        positiveFinite("feed", feed, "m/s");
        positiveFinite("path acceleration", acceleration, "m/s²");
        if (!(jerk > 0) || Double.isNaN(jerk)) {
            throw new IllegalArgumentException("path jerk must be > 0 m/s³ (or +infinity), got " + jerk);
        }
        positiveFinite("centripetal acceleration", centripetalAcceleration, "m/s²");
    }

    /** Limits with the centripetal acceleration on arcs bounded by the path acceleration. */
    public static PathLimits of(double feed, double acceleration, double jerk) {
        return new PathLimits(feed, acceleration, jerk, acceleration);
    }

    static void positiveFinite(String what, double value, String unit) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(what + " must be finite and > 0 " + unit + ", got " + value);
        }
    }
}
