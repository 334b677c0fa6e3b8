package org.tracewell.core.variation;

import org.tracewell.engine.variation.SweepAxis;

/**
 * The grid of one attribute in a sweep: {@code steps} values evenly spaced from {@code from} to {@code to}, both
 * included, SI unit of the attribute.
 *
 * @param path  the attribute
 * @param from  first value
 * @param to    last value
 * @param steps grid points, ≥ 2
 */
public record SweepRange(String path, double from, double to, int steps) {

    /** Most grid points of one axis. */
    public static final int MAX_STEPS = 1000;

    public SweepRange {
        if (path == null || path.isBlank()) {
            throw new IllegalArgumentException("a sweep range needs the path of the attribute it varies");
        }
        if (!Double.isFinite(from) || !Double.isFinite(to) || from == to) {
            throw new IllegalArgumentException("sweep of " + path + " needs two different finite ends, got " + from
                    + " and " + to);
        }
        if (steps < 2 || steps > MAX_STEPS) {
            throw new IllegalArgumentException("sweep of " + path + " needs 2.." + MAX_STEPS + " grid points, got "
                    + steps);
        }
    }

    SweepAxis axis(int parameter) {
        return SweepAxis.linear(parameter, from, to, steps);
    }

    /** E.g. {@code 30:50:11}: the command line's spelling. */
    public String spec() {
        return from + ":" + to + ":" + steps;
    }
}
