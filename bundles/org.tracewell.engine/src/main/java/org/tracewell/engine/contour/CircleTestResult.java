package org.tracewell.engine.contour;

import org.tracewell.engine.path.ArcDirection;

/**
 * Circle-test figures of one run (ISO 230-4 terms).
 *
 * @param direction              direction of the run
 * @param evaluatedSamples       samples inside the evaluated 360° (overshoot arcs left out)
 * @param leastSquaresCircle     least-squares circle of the evaluated samples
 * @param circularDeviation      G: radial width of the thinnest ring about the least-squares centre
 *                               holding every evaluated sample, metres
 * @param radialDeviationMax     largest (ρ − R) about the nominal centre, metres (F, outward)
 * @param radialDeviationMin     smallest (ρ − R) about the nominal centre, metres (F, inward; negative
 *                               when the path runs inside)
 * @param ellipseOrientation     polar angle of the major axis of the elliptical (second-harmonic) part
 *                               of the radial deviation about the least-squares centre, radians in [0, π)
 * @param ellipsePeakToPeak      peak-to-peak size of that elliptical part, metres
 */
public record CircleTestResult(ArcDirection direction, int evaluatedSamples, FittedCircle leastSquaresCircle,
                               double circularDeviation, double radialDeviationMax, double radialDeviationMin,
                               double ellipseOrientation, double ellipsePeakToPeak) {

    /** Radial deviation F as the larger magnitude of the two extremes, metres. */
    public double radialDeviation() {
        return Math.max(Math.abs(radialDeviationMax), Math.abs(radialDeviationMin));
    }
}
