package org.tracewell.charts;

import java.util.Arrays;

import org.tracewell.engine.contour.CircleTestResult;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.contour.ContourErrorResult;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.path.Point2;
import org.tracewell.engine.sim.TrackingResult;

/**
 * The data the contour charts draw, taken from the engine's results of one run (SI in, SI out): the programmed
 * path with its normal and contour error, the polar radial deviation of a circle test, each axis's tracking.
 */
public final class ContourChartData {

    private ContourChartData() {
    }

    /**
     * The path points nearest to the actual motion, with the left normal and the signed contour error there, at the
     * samples {@link ContourDeviationChart#displayIndices} keeps (every run of samples keeps its peak).
     */
    public static ContourDeviation deviation(String name, ContourErrorResult errors, int displayPoints) {
        Path path = errors.path();
        int[] keep = ContourDeviationChart.displayIndices(errors.signedErrors(), displayPoints);
        int m = keep.length;
        double[] pu = new double[m];
        double[] pv = new double[m];
        double[] nu = new double[m];
        double[] nv = new double[m];
        double[] e = new double[m];
        for (int i = 0; i < m; i++) {
            double s = errors.pathParameter(keep[i]);
            Point2 p = path.pointAt(s);
            Point2 normal = path.normalAt(s);
            pu[i] = p.u();
            pv[i] = p.v();
            nu[i] = normal.u();
            nv[i] = normal.v();
            e[i] = errors.signedError(keep[i]);
        }
        return new ContourDeviation(name, pu, pv, nu, nv, e);
    }

    /**
     * The magnification {@link Magnification#suggest} picks for {@code contour} (path extent, or its length for a
     * path without extent), 1 for an empty one.
     */
    public static double suggestedMagnification(ContourDeviation contour, double pathLength) {
        double extent = contour.extent() > 0 ? contour.extent() : pathLength;
        return extent > 0 ? Magnification.suggest(extent, contour.maxAbsError(), Magnification.DEFAULT_FRACTION) : 1;
    }

    /**
     * Polar angle about the nominal centre and radial deviation ρ − R of the evaluated samples of a circle-test run
     * (overshoot arcs left out). The actual point is rebuilt from its nearest path point and the signed contour
     * error along the left normal, which is exact for the shortest-distance error.
     */
    public static CircleRun circleRun(String label, CircleTestSetup setup, CircleTestResult test,
            ContourErrorResult errors, int displayPoints) {
        Path path = errors.path();
        int[] range = evaluatedRange(setup, errors);
        double[] window = Arrays.copyOfRange(errors.signedErrors(), range[0], range[1]);
        int[] keep = ContourDeviationChart.displayIndices(window, displayPoints);
        double[] angle = new double[keep.length];
        double[] deviation = new double[keep.length];
        for (int i = 0; i < keep.length; i++) {
            int k = range[0] + keep[i];
            double s = errors.pathParameter(k);
            Point2 p = path.pointAt(s);
            Point2 normal = path.normalAt(s);
            double e = errors.signedError(k);
            double du = p.u() + e * normal.u() - setup.centre().u();
            double dv = p.v() + e * normal.v() - setup.centre().v();
            angle[i] = Math.atan2(dv, du);
            deviation[i] = Math.hypot(du, dv) - setup.radius();
        }
        return new CircleRun(label, angle, deviation, test.circularDeviation(), test.radialDeviation());
    }

    /**
     * Samples [from, to) of the evaluated full circle, in time order: from the first sample whose nearest path point
     * lies on the circle segment up to the first that leaves it. Leaving is also recognised by the nearest point
     * jumping back by more than half a turn: the outgoing overshoot arc lies on top of the circle's start, and a
     * nearest-point search may place its samples there rather than on the overshoot segment.
     */
    public static int[] evaluatedRange(CircleTestSetup setup, ContourErrorResult errors) {
        Path path = errors.path();
        int full = setup.overshootAngle() > 0 && path.segmentCount() > 1 ? 1 : 0;
        double start = path.segmentStart(full);
        double end = start + path.segment(full).length();
        double halfTurn = Math.PI * setup.radius();
        double[] s = errors.pathParameters();
        int from = 0;
        while (from < s.length && s[from] < start) {
            from++;
        }
        int to = from;
        while (to < s.length && s[to] <= end && (to == from || s[to] > s[to - 1] - halfTurn)) {
            to++;
        }
        return new int[] {from, to};
    }

    /** Axis {@code axis} (0 = u, 1 = v) of a tracking result: every sample of reference, actual and following error. */
    public static AxisTrack track(String axisName, TrackingResult tracking, int axis) {
        int n = tracking.sampleCount();
        double[] t = new double[n];
        double[] reference = tracking.reference().positions(axis);
        double[] actual = tracking.actualPositions(axis);
        double[] error = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = tracking.reference().time(k);
            error[k] = tracking.followingError(axis, k);
        }
        return new AxisTrack(axisName, t, reference, actual, error);
    }
}
