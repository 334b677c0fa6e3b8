package org.tracewell.engine.axis;

/** Parameter checks whose messages name the parameter, the bad value and the valid range. */
final class Checks {

    private Checks() {
    }

    /** Finite and &gt; 0. */
    static double positive(String name, double value, String unit) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be a finite number > 0 " + unit + ", got " + value);
        }
        return value;
    }

    /** Finite and ≥ 0. */
    static double nonNegative(String name, double value, String unit) {
        if (!(value >= 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be a finite number >= 0 " + unit + ", got " + value);
        }
        return value;
    }

    /** &gt; 0, +∞ allowed (an ideal, infinitely fast or stiff element). */
    static double positiveOrInfinite(String name, double value, String unit) {
        if (!(value > 0)) {
            throw new IllegalArgumentException(name + " must be > 0 " + unit
                    + " (or +Infinity for an ideal element), got " + value);
        }
        return value;
    }

    /** In [0, 1]. */
    static double fraction(String name, double value) {
        if (!(value >= 0 && value <= 1)) {
            throw new IllegalArgumentException(name + " must lie in 0..1, got " + value);
        }
        return value;
    }
}
