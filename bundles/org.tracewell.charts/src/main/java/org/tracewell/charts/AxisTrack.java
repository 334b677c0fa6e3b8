package org.tracewell.charts;

/**
 * How one axis tracked its reference during a contour run, SI (seconds, metres): every sample, nothing decimated.
 *
 * @param axisName       e.g. "X1"
 * @param timeSeconds    sample instants, ascending
 * @param reference      commanded position
 * @param actual         simulated load position
 * @param followingError reference − actual
 */
public record AxisTrack(String axisName, double[] timeSeconds, double[] reference, double[] actual,
        double[] followingError) {

    public AxisTrack {
        int n = timeSeconds.length;
        if (reference.length != n || actual.length != n || followingError.length != n) {
            throw new IllegalArgumentException("axis " + axisName + ": " + n + " times, " + reference.length
                    + " references, " + actual.length + " actual positions and " + followingError.length
                    + " following errors; all must match");
        }
    }

    /** Index of the largest |following error| (the first on ties; 0 when empty). */
    public int indexOfPeak() {
        int at = 0;
        for (int k = 1; k < followingError.length; k++) {
            if (Math.abs(followingError[k]) > Math.abs(followingError[at])) {
                at = k;
            }
        }
        return at;
    }
}
