package org.tracewell.engine.contour;

import org.tracewell.engine.path.Path;
import org.tracewell.engine.sim.TrackingResult;

/**
 * Contour error: the exact shortest distance from each actual point to the programmed path
 * (Koren, ASME J. Dyn. Syst. Meas. Control 102(4), 1980), found by a monotone search.
 * <p>
 * Samples are taken in time order through a {@link MonotoneContourSearch}: a window that advances
 * along the path and never moves back, with the exact nearest point on each segment in it.
 */
public final class ContourErrorAnalysis {

    /** Default look-ahead along the path, metres. */
    public static final double DEFAULT_WINDOW = 0.02;

    private ContourErrorAnalysis() {
    }

    /** Contour error of a tracking simulation against the path of its reference, default window. */
    public static ContourErrorResult analyse(TrackingResult tracking) {
        return analyse(tracking, tracking.reference().path(), DEFAULT_WINDOW);
    }

    /** Contour error of a tracking simulation against {@code path} (in the path's plane). */
    public static ContourErrorResult analyse(TrackingResult tracking, Path path, double window) {
        int axes = path.plane().axisCount();
        if (tracking.axisCount() != axes) {
            throw new IllegalArgumentException("the path's plane has " + axes + " axes but the tracking result has "
                    + tracking.axisCount());
        }
        int count = tracking.sampleCount();
        MonotoneContourSearch search = new MonotoneContourSearch(path, window);
        double[] error = new double[count];
        double[] parameter = new double[count];
        int next = 0;
        int block = 4096;
        double[][] buffer = new double[axes][block];
        double[] point = new double[axes];
        for (int start = 0; start < count; start += block) {
            int len = Math.min(block, count - start);
            for (int i = 0; i < axes; i++) {
                tracking.readActual(i, start, buffer[i], len);
            }
            for (int k = 0; k < len; k++) {
                for (int i = 0; i < axes; i++) {
                    point[i] = buffer[i][k];
                }
                error[next] = search.next(point);
                parameter[next++] = search.pathParameter();
            }
        }
        return new ContourErrorResult(path, error, parameter);
    }

    /**
     * Contour error of points given per axis ({@code positions[axis][k]}, metres) against {@code path}.
     */
    public static ContourErrorResult analyse(double[][] positions, Path path, double window) {
        int axes = path.plane().axisCount();
        if (positions.length != axes) {
            throw new IllegalArgumentException("the path's plane has " + axes + " axes but positions were given for "
                    + positions.length);
        }
        int count = positions[0].length;
        for (double[] p : positions) {
            if (p.length != count) {
                throw new IllegalArgumentException("every axis needs the same sample count " + count + ", got " + p.length);
            }
        }
        MonotoneContourSearch search = new MonotoneContourSearch(path, window);
        double[] error = new double[count];
        double[] parameter = new double[count];
        double[] point = new double[axes];
        for (int k = 0; k < count; k++) {
            for (int i = 0; i < axes; i++) {
                point[i] = positions[i][k];
            }
            error[k] = search.next(point);
            parameter[k] = search.pathParameter();
        }
        return new ContourErrorResult(path, error, parameter);
    }
}
