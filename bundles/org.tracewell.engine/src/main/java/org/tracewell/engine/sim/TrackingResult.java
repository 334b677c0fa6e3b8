package org.tracewell.engine.sim;

import java.util.List;
import org.tracewell.engine.trajectory.Trajectory;

/**
 * Actual axis positions from a tracking simulation, beside the reference they followed.
 * Following error = reference − actual (positive when the axis lags behind a positive motion).
 */
public final class TrackingResult {

    private final Trajectory reference;
    private final List<AxisLoop> loops;
    private final double[][] actual;
    private final double[] peakFollowingError;
    private final double[] rmsFollowingError;
    private final int[] peakIndex;

    TrackingResult(Trajectory reference, List<AxisLoop> loops, double[][] actual) {
        this.reference = reference;
        this.loops = List.copyOf(loops);
        this.actual = actual;
        int axes = actual.length;
        this.peakFollowingError = new double[axes];
        this.rmsFollowingError = new double[axes];
        this.peakIndex = new int[axes];
        for (int i = 0; i < axes; i++) {
            double sumSq = 0;
            double peak = 0;
            int at = 0;
            for (int k = 0; k < actual[i].length; k++) {
                double e = reference.position(i, k) - actual[i][k];
                sumSq += e * e;
                if (Math.abs(e) > peak) {
                    peak = Math.abs(e);
                    at = k;
                }
            }
            peakFollowingError[i] = peak;
            peakIndex[i] = at;
            rmsFollowingError[i] = Math.sqrt(sumSq / actual[i].length);
        }
    }

    public Trajectory reference() {
        return reference;
    }

    public List<AxisLoop> loops() {
        return loops;
    }

    public int axisCount() {
        return actual.length;
    }

    public int sampleCount() {
        return reference.sampleCount();
    }

    public double actual(int axis, int k) {
        return actual[axis][k];
    }

    public double followingError(int axis, int k) {
        return reference.position(axis, k) - actual[axis][k];
    }

    /** Copies {@code length} actual positions of one axis from sample {@code from} into {@code target}. */
    public void readActual(int axis, int from, double[] target, int length) {
        System.arraycopy(actual[axis], from, target, 0, length);
    }

    public double[] actualPositions(int axis) {
        return actual[axis].clone();
    }

    /** Largest |following error| of the axis, metres. */
    public double peakFollowingError(int axis) {
        return peakFollowingError[axis];
    }

    /** Sample index of the largest |following error|. */
    public int peakFollowingErrorIndex(int axis) {
        return peakIndex[axis];
    }

    /** Root mean square of the following error over all samples, metres. */
    public double rmsFollowingError(int axis) {
        return rmsFollowingError[axis];
    }
}
