package org.tracewell.engine.trajectory;

/** Shape of each change of feed along the path. */
public enum ProfileShape {
    /** Constant path acceleration during a feed change; the acceleration jumps (infinite jerk). */
    TRAPEZOIDAL,
    /**
     * Jerk-limited: a change of feed ramps the acceleration up and down with constant jerk, so a
     * move from rest to rest has the seven phases jerk+, accel, jerk−, cruise, jerk−, decel, jerk+.
     */
    S_CURVE
}
