package org.tracewell.core.analysis;

import org.tracewell.engine.contour.ContourErrorResult;
import org.tracewell.engine.sim.TrackingResult;

/**
 * Read-only view of every sample of one run (nothing decimated): reference and actual positions of the two axes,
 * their following errors, and the signed contour error. Axis 0 = the contour's first axis (u), 1 = second (v). SI.
 */
public final class ContourTimeSeries {

    private final TrackingResult tracking;
    private final ContourErrorResult contourError;

    ContourTimeSeries(TrackingResult tracking, ContourErrorResult contourError) {
        this.tracking = tracking;
        this.contourError = contourError;
    }

    public int sampleCount() {
        return tracking.sampleCount();
    }

    /** Time of sample k, s. */
    public double time(int k) {
        return tracking.reference().time(k);
    }

    /** Reference position of axis (0 or 1) at sample k, m. */
    public double reference(int axis, int k) {
        return tracking.reference().position(axis, k);
    }

    /** Simulated load position of axis (0 or 1) at sample k, m. */
    public double actual(int axis, int k) {
        return tracking.actual(axis, k);
    }

    /** Following error (reference − actual) of axis (0 or 1) at sample k, m. */
    public double followingError(int axis, int k) {
        return tracking.followingError(axis, k);
    }

    /** Signed contour error at sample k (positive = left of travel), m. */
    public double contourError(int k) {
        return contourError.signedError(k);
    }

    /** The engine's tracking result behind this view. */
    public TrackingResult tracking() {
        return tracking;
    }

    /** The engine's contour-error result behind this view. */
    public ContourErrorResult contourErrorResult() {
        return contourError;
    }
}
