package org.tracewell.core.analysis;

import java.util.OptionalDouble;

import org.tracewell.model.ContourMetric;

/**
 * The figures of one contour run that budgets and requirement values read, SI: taken from a full {@link ContourRun},
 * or computed directly by a study's fast run of a variant.
 *
 * @param direction               as programmed, or CW / CCW of a circle test
 * @param maxContourError         largest |contour error| over all samples, m
 * @param circularDeviationG      ISO 230-4 circular deviation G, m; empty unless a full circle
 * @param radialDeviationF        radial deviation F, m; empty unless a full circle
 * @param peakFollowingErrorFirst largest |following error| of the first axis, m
 * @param peakFollowingErrorSecond largest |following error| of the second axis, m
 */
public record RunFigures(RunDirection direction, double maxContourError, OptionalDouble circularDeviationG,
        OptionalDouble radialDeviationF, double peakFollowingErrorFirst, double peakFollowingErrorSecond) {

    public static RunFigures of(ContourRun run) {
        ContourRunMetrics m = run.metrics();
        return new RunFigures(run.direction(), m.maxContourError(), m.circularDeviationG(), m.radialDeviationF(),
                m.peakFollowingErrorFirst(), m.peakFollowingErrorSecond());
    }

    /** The figure of a contour-deviation metric; empty when the metric needs a circle and this run is none. */
    public OptionalDouble value(ContourMetric metric) {
        return switch (metric) {
            case CIRCULAR_DEVIATION -> circularDeviationG;
            case RADIAL_DEVIATION -> radialDeviationF;
            default -> OptionalDouble.of(maxContourError);
        };
    }

    /** Peak following error of the axis at {@code index} of the contour plane (0 first, 1 second). */
    public double peakFollowingError(int index) {
        return index == 0 ? peakFollowingErrorFirst : peakFollowingErrorSecond;
    }
}
