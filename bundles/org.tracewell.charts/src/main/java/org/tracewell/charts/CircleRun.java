package org.tracewell.charts;

/**
 * One run of a circle test to draw, SI: the polar angle of each evaluated sample about the nominal centre
 * (radians) and its radial deviation ρ − R from the nominal circle (metres), with the run's figures.
 *
 * @param label direction as printed, e.g. "CW" or "CCW"
 * @param circularDeviationG G of the run, metres
 * @param radialDeviationF F of the run (larger magnitude of the two extremes), metres
 */
public record CircleRun(String label, double[] angleRad, double[] radialDeviation, double circularDeviationG,
        double radialDeviationF) {

    public CircleRun {
        if (angleRad.length != radialDeviation.length) {
            throw new IllegalArgumentException("circle run '" + label + "': " + angleRad.length + " angles but "
                    + radialDeviation.length + " radial deviations");
        }
    }

    /** Largest |ρ − R| of the run, metres. */
    public double maxAbsDeviation() {
        double max = 0;
        for (double d : radialDeviation) {
            max = Math.max(max, Math.abs(d));
        }
        return max;
    }

    /** Radial deviation of the sample whose angle is nearest to {@code angle} (taken modulo 2π), metres. */
    public double deviationNear(double angle) {
        if (angleRad.length == 0) {
            throw new IllegalArgumentException("circle run '" + label + "' has no samples");
        }
        int best = 0;
        double bestGap = Double.POSITIVE_INFINITY;
        for (int k = 0; k < angleRad.length; k++) {
            double gap = Math.abs(Math.IEEEremainder(angleRad[k] - angle, 2 * Math.PI));
            if (gap < bestGap) {
                bestGap = gap;
                best = k;
            }
        }
        return radialDeviation[best];
    }
}
