package org.tracewell.engine.contour;

import org.tracewell.engine.path.Path;

/**
 * Contour error of every sample of an actual motion against a programmed path: the exact shortest
 * distance, signed positive when the actual point lies to the left of the direction of travel, and
 * the path parameter (arc length) of the nearest path point.
 */
public final class ContourErrorResult {

    private final Path path;
    private final double[] signedError;
    private final double[] pathParameter;
    private final double maxAbsError;
    private final int indexOfMax;
    private final double rmsError;

    ContourErrorResult(Path path, double[] signedError, double[] pathParameter) {
        this.path = path;
        this.signedError = signedError;
        this.pathParameter = pathParameter;
        double max = 0;
        int at = 0;
        double sumSq = 0;
        for (int k = 0; k < signedError.length; k++) {
            double e = signedError[k];
            sumSq += e * e;
            if (Math.abs(e) > max) {
                max = Math.abs(e);
                at = k;
            }
        }
        this.maxAbsError = max;
        this.indexOfMax = at;
        this.rmsError = signedError.length == 0 ? 0 : Math.sqrt(sumSq / signedError.length);
    }

    public Path path() {
        return path;
    }

    public int sampleCount() {
        return signedError.length;
    }

    /** Signed contour error of sample k, metres (positive = left of travel). */
    public double signedError(int k) {
        return signedError[k];
    }

    /** Arc length of the path point nearest to sample k, metres. */
    public double pathParameter(int k) {
        return pathParameter[k];
    }

    public double[] signedErrors() {
        return signedError.clone();
    }

    public double[] pathParameters() {
        return pathParameter.clone();
    }

    /** Largest |contour error|, metres. */
    public double maxAbsError() {
        return maxAbsError;
    }

    /** Sample index where the largest |contour error| occurs. */
    public int indexOfMax() {
        return indexOfMax;
    }

    /** Path parameter (arc length) where the largest |contour error| occurs, metres. */
    public double pathParameterOfMax() {
        return signedError.length == 0 ? 0 : pathParameter[indexOfMax];
    }

    /** Signed contour error at the sample of the largest magnitude, metres. */
    public double signedErrorAtMax() {
        return signedError.length == 0 ? 0 : signedError[indexOfMax];
    }

    /** Root mean square contour error over all samples, metres. */
    public double rmsError() {
        return rmsError;
    }
}
