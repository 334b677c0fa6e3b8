package org.tracewell.charts;

/**
 * Figures of a unit-step response to mark on its chart, SI; NaN where a figure is undefined (no overshoot, not
 * settled).
 *
 * @param finalValue          y(∞)
 * @param peakValue           largest y
 * @param peakTimeSeconds     when y peaks; NaN without overshoot
 * @param overshootPercent    (y_max − y_∞)/|y_∞|·100
 * @param settlingTimeSeconds last instant |y − y_∞| equals the band
 * @param settlingBand        the settling band as a fraction of |y_∞|, e.g. 0.02
 */
public record StepFigures(double finalValue, double peakValue, double peakTimeSeconds, double overshootPercent,
        double settlingTimeSeconds, double settlingBand) {

    public StepFigures {
        if (!Double.isFinite(finalValue)) {
            throw new IllegalArgumentException("step final value must be finite, got " + finalValue);
        }
        if (!(settlingBand > 0 && settlingBand < 1)) {
            throw new IllegalArgumentException("settling band must lie in (0, 1), got " + settlingBand);
        }
    }
}
