package org.tracewell.core.analysis;

import java.util.OptionalDouble;

/**
 * The figures of one contour run, SI.
 *
 * @param maxContourError          largest |contour error| over all samples, m
 * @param rmsContourError          RMS contour error over all samples, m
 * @param signedContourErrorAtMax  the signed contour error at that sample (positive = left of travel), m
 * @param timeOfMax                time of that sample, s
 * @param pathParameterOfMax       arc length of the nearest path point there, m
 * @param firstAxisAtMax           position of the first (u) axis there, m
 * @param secondAxisAtMax          position of the second (v) axis there, m
 * @param peakFollowingErrorFirst  largest |following error| of the first axis, m
 * @param peakFollowingErrorSecond largest |following error| of the second axis, m
 * @param circularDeviationG       ISO 230-4 circular deviation G, m; empty unless a full circle
 * @param radialDeviationMax       largest ρ − R about the nominal centre, m (F outward); empty unless a full circle
 * @param radialDeviationMin       smallest ρ − R, m (F inward, negative when the path runs inside); idem
 * @param radialDeviationF         F = max(|F max|, |F min|), m; idem
 * @param ellipseOrientation       major-axis angle of the elliptical part, rad in [0, π); idem
 * @param ellipsePeakToPeak        peak-to-peak size of the elliptical part, m; idem
 * @param duration                 simulated time, s
 * @param sampleCount              samples simulated
 */
public record ContourRunMetrics(double maxContourError, double rmsContourError, double signedContourErrorAtMax,
        double timeOfMax, double pathParameterOfMax, double firstAxisAtMax, double secondAxisAtMax,
        double peakFollowingErrorFirst, double peakFollowingErrorSecond, OptionalDouble circularDeviationG,
        OptionalDouble radialDeviationMax, OptionalDouble radialDeviationMin, OptionalDouble radialDeviationF,
        OptionalDouble ellipseOrientation, OptionalDouble ellipsePeakToPeak, double duration, int sampleCount) {
}
