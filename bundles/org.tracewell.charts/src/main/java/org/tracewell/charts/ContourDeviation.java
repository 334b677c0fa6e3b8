package org.tracewell.charts;

/**
 * A programmed path sampled at the points nearest to the actual motion, in SI: plane coordinates of each
 * path point (metres), the unit normal there (left of travel) and the signed normal (contour) error of
 * the actual motion at that point (metres, positive = left of travel).
 */
public record ContourDeviation(String name, double[] pathU, double[] pathV, double[] normalU, double[] normalV,
        double[] signedError) {

    public ContourDeviation {
        int n = pathU.length;
        if (pathV.length != n || normalU.length != n || normalV.length != n || signedError.length != n) {
            throw new IllegalArgumentException("contour '" + name + "': " + n + " path u, " + pathV.length
                    + " path v, " + normalU.length + " normal u, " + normalV.length + " normal v and "
                    + signedError.length + " errors; all must match");
        }
    }

    public int sampleCount() {
        return pathU.length;
    }

    /** Largest |signed error|, metres (0 for an empty contour). */
    public double maxAbsError() {
        double max = 0;
        for (double e : signedError) {
            max = Math.max(max, Math.abs(e));
        }
        return max;
    }

    /** Index of the largest |signed error| (the first one on ties; 0 when empty). */
    public int indexOfMax() {
        int at = 0;
        for (int k = 1; k < signedError.length; k++) {
            if (Math.abs(signedError[k]) > Math.abs(signedError[at])) {
                at = k;
            }
        }
        return at;
    }

    /** Larger of the path's two bounding-box edges, metres. */
    public double extent() {
        return Math.max(span(pathU), span(pathV));
    }

    static double span(double[] values) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        return values.length == 0 ? 0 : hi - lo;
    }
}
