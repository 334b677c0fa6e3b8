package org.tracewell.engine.contour;

/**
 * Figures of a streaming contour run: contour error over the whole run and following error per axis.
 * All lengths in metres.
 */
public final class StreamingContourSummary {

    private final long sampleCount;
    private final double maxAbsContourError;
    private final double signedContourErrorAtMax;
    private final long indexOfMax;
    private final double pathParameterOfMax;
    private final double rmsContourError;
    private final double[] peakFollowingError;
    private final double[] rmsFollowingError;

    StreamingContourSummary(long sampleCount, double maxAbsContourError, double signedContourErrorAtMax, long indexOfMax,
                            double pathParameterOfMax, double rmsContourError, double[] peakFollowingError,
                            double[] rmsFollowingError) {
        this.sampleCount = sampleCount;
        this.maxAbsContourError = maxAbsContourError;
        this.signedContourErrorAtMax = signedContourErrorAtMax;
        this.indexOfMax = indexOfMax;
        this.pathParameterOfMax = pathParameterOfMax;
        this.rmsContourError = rmsContourError;
        this.peakFollowingError = peakFollowingError.clone();
        this.rmsFollowingError = rmsFollowingError.clone();
    }

    public long sampleCount() {
        return sampleCount;
    }

    public double maxAbsContourError() {
        return maxAbsContourError;
    }

    /** Signed contour error (positive = left of travel) at the sample of the largest magnitude. */
    public double signedContourErrorAtMax() {
        return signedContourErrorAtMax;
    }

    public long indexOfMax() {
        return indexOfMax;
    }

    public double pathParameterOfMax() {
        return pathParameterOfMax;
    }

    public double rmsContourError() {
        return rmsContourError;
    }

    public int axisCount() {
        return peakFollowingError.length;
    }

    public double peakFollowingError(int axis) {
        return peakFollowingError[axis];
    }

    public double rmsFollowingError(int axis) {
        return rmsFollowingError[axis];
    }
}
