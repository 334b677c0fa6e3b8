package org.tracewell.engine.loop;

import java.util.OptionalDouble;

/**
 * Time-domain figures of a unit-step response (definitions in {@link StepResponse}).
 * Relative figures are empty when the final value is 0 (or below 1e-9 of the largest sample,
 * i.e. within rounding noise).
 *
 * @param finalValue y(∞) = T(0)
 * @param overshootPercent (y_max − y_∞)/|y_∞|·100, 0 without overshoot
 * @param peakValue largest value of y/y_∞ times y_∞ (y itself at the peak)
 * @param peakTimeSeconds instant of the peak; empty without overshoot
 * @param riseTimeSeconds 10 % to 90 % of the final value
 * @param settlingTimeSeconds last entry into the ±2 % band, measured from the response
 */
public record StepMetrics(double finalValue, OptionalDouble overshootPercent, double peakValue,
        OptionalDouble peakTimeSeconds, OptionalDouble riseTimeSeconds, OptionalDouble settlingTimeSeconds) {
}
