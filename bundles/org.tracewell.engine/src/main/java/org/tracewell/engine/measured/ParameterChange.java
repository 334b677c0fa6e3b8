package org.tracewell.engine.measured;

/**
 * One plant parameter changed by a fit, SI.
 *
 * @param parameter name as the model calls it, e.g. "load mass"
 * @param before    value before, in {@code unit}
 * @param after     fitted value, in {@code unit}
 * @param unit      SI unit, e.g. "kg", "kg·m²", "N/m"
 */
public record ParameterChange(String parameter, double before, double after, String unit) {

    /** Relative change (after − before)/before; NaN when before is 0. */
    public double relativeChange() {
        return before == 0 ? Double.NaN : (after - before) / before;
    }
}
