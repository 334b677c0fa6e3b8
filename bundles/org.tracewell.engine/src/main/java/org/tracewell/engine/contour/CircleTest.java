package org.tracewell.engine.contour;

import java.util.Arrays;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealVector;
import org.tracewell.engine.path.ArcDirection;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.sim.TrackingResult;

/**
 * Evaluates circle tests after ISO 230-4: the samples of the evaluated 360° (selected by the angle
 * travelled about the nominal centre, so the overshoot arcs are left out), their least-squares circle,
 * circular deviation G about its centre, radial deviation F against the nominal circle, and the
 * orientation of any elliptical distortion (a second-harmonic fit of the radial deviation).
 */
public final class CircleTest {

    private CircleTest() {
    }

    /** Evaluates the actual motion of a tracking simulation of {@code setup.path()}. */
    public static CircleTestResult evaluate(CircleTestSetup setup, TrackingResult tracking) {
        double[][] uv = project(setup.plane(), tracking);
        return evaluate(setup, uv[0], uv[1]);
    }

    /** Evaluates measured points in plane coordinates (u[k], v[k]), metres, in time order. */
    public static CircleTestResult evaluate(CircleTestSetup setup, double[] u, double[] v) {
        double[][] sel = select(setup, u, v);
        return evaluateSelected(setup, sel[0], sel[1]);
    }

    /** Evaluates a CW and a CCW run of the same circle and their bidirectional deviation G(b). */
    public static BidirectionalCircleResult bidirectional(CircleTestSetup clockwiseSetup, TrackingResult clockwise,
                                                          CircleTestSetup counterClockwiseSetup,
                                                          TrackingResult counterClockwise) {
        double[][] cw = project(clockwiseSetup.plane(), clockwise);
        double[][] ccw = project(counterClockwiseSetup.plane(), counterClockwise);
        return bidirectional(clockwiseSetup, cw[0], cw[1], counterClockwiseSetup, ccw[0], ccw[1]);
    }

    /**
     * As {@link #bidirectional(CircleTestSetup, TrackingResult, CircleTestSetup, TrackingResult)} for runs already
     * evaluated one by one ({@link #evaluate(CircleTestSetup, TrackingResult)} of each): only the common circle of
     * both is fitted, the runs' own results are taken as they are.
     */
    public static BidirectionalCircleResult bidirectional(CircleTestSetup clockwiseSetup, TrackingResult clockwise,
                                                          CircleTestResult clockwiseResult,
                                                          CircleTestSetup counterClockwiseSetup,
                                                          TrackingResult counterClockwise,
                                                          CircleTestResult counterClockwiseResult) {
        if (clockwiseSetup.direction() == counterClockwiseSetup.direction()
                || clockwiseResult.direction() != clockwiseSetup.direction()
                || counterClockwiseResult.direction() != counterClockwiseSetup.direction()) {
            throw new IllegalArgumentException("a bidirectional test needs one CW and one CCW run with their own"
                    + " results, got " + clockwiseSetup.direction() + "/" + clockwiseResult.direction() + " and "
                    + counterClockwiseSetup.direction() + "/" + counterClockwiseResult.direction());
        }
        double[][] cw = project(clockwiseSetup.plane(), clockwise);
        double[][] ccw = project(counterClockwiseSetup.plane(), counterClockwise);
        double[][] a = select(clockwiseSetup, cw[0], cw[1]);
        double[][] b = select(counterClockwiseSetup, ccw[0], ccw[1]);
        return common(clockwiseResult, counterClockwiseResult, a, b);
    }

    /** As {@link #bidirectional(CircleTestSetup, TrackingResult, CircleTestSetup, TrackingResult)}, for plane points. */
    public static BidirectionalCircleResult bidirectional(CircleTestSetup clockwiseSetup, double[] cwU, double[] cwV,
                                                          CircleTestSetup counterClockwiseSetup, double[] ccwU,
                                                          double[] ccwV) {
        if (clockwiseSetup.direction() == counterClockwiseSetup.direction()) {
            throw new IllegalArgumentException("a bidirectional test needs one CW and one CCW run, got two "
                    + clockwiseSetup.direction() + " runs");
        }
        double[][] a = select(clockwiseSetup, cwU, cwV);
        double[][] b = select(counterClockwiseSetup, ccwU, ccwV);
        CircleTestResult first = evaluateSelected(clockwiseSetup, a[0], a[1]);
        CircleTestResult second = evaluateSelected(counterClockwiseSetup, b[0], b[1]);
        return common(first, second, a, b);
    }

    /** G(b) of two evaluated runs from their selected points {u, v}: the band about their common circle. */
    private static BidirectionalCircleResult common(CircleTestResult first, CircleTestResult second, double[][] a,
                                                    double[][] b) {
        double[] u = concat(a[0], b[0]);
        double[] v = concat(a[1], b[1]);
        FittedCircle common = CircleFit.geometric(u, v, 0, u.length);
        double[] band = radialBand(u, v, common.centreU(), common.centreV());
        CircleTestResult cwResult = first.direction() == ArcDirection.CW ? first : second;
        CircleTestResult ccwResult = cwResult == first ? second : first;
        return new BidirectionalCircleResult(cwResult, ccwResult, common, band[1] - band[0]);
    }

    private static CircleTestResult evaluateSelected(CircleTestSetup setup, double[] u, double[] v) {
        if (u.length < 3) {
            throw new IllegalArgumentException("the evaluated 360° of the circle test holds " + u.length
                    + " samples; at least 3 are needed (does the motion complete the circle?)");
        }
        FittedCircle fit = CircleFit.geometric(u, v, 0, u.length);
        double[] band = radialBand(u, v, fit.centreU(), fit.centreV());
        double[] nominal = radialBand(u, v, setup.centre().u(), setup.centre().v());
        double[] ellipse = secondHarmonic(u, v, fit);
        return new CircleTestResult(setup.direction(), u.length, fit, band[1] - band[0],
                nominal[1] - setup.radius(), nominal[0] - setup.radius(), ellipse[0], ellipse[1]);
    }

    /** Samples whose travelled angle from the run start lies within the evaluated full circle. */
    static double[][] select(CircleTestSetup setup, double[] u, double[] v) {
        if (u.length != v.length) {
            throw new IllegalArgumentException("u and v need the same length, got " + u.length + " and " + v.length);
        }
        int sign = setup.direction().sign();
        double cu = setup.centre().u();
        double cv = setup.centre().v();
        double runStart = setup.startAngle() - sign * setup.overshootAngle();
        double from = setup.overshootAngle();
        double to = setup.overshootAngle() + 2 * Math.PI;
        double[] su = new double[u.length];
        double[] sv = new double[v.length];
        int n = 0;
        double previous = runStart;
        double travelled = 0;
        for (int k = 0; k < u.length; k++) {
            double angle = Math.atan2(v[k] - cv, u[k] - cu);
            travelled += sign * wrapToPi(angle - previous);
            previous = angle;
            if (travelled >= from && travelled <= to) {
                su[n] = u[k];
                sv[n] = v[k];
                n++;
            }
        }
        return new double[][] {Arrays.copyOf(su, n), Arrays.copyOf(sv, n)};
    }

    /** {min ρ, max ρ} about (cu, cv). */
    private static double[] radialBand(double[] u, double[] v, double cu, double cv) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < u.length; k++) {
            double du = u[k] - cu;
            double dv = v[k] - cv;
            double rho = Math.sqrt(du * du + dv * dv);
            min = Math.min(min, rho);
            max = Math.max(max, rho);
        }
        return new double[] {min, max};
    }

    /**
     * Least-squares fit ρ − R ≈ c0 + a1 cos φ + b1 sin φ + a2 cos 2φ + b2 sin 2φ about the fitted centre;
     * returns {major-axis angle in [0, π), peak-to-peak 2·√(a2² + b2²)}.
     */
    private static double[] secondHarmonic(double[] u, double[] v, FittedCircle fit) {
        double[][] normal = new double[5][5];
        double[] rhs = new double[5];
        double[] row = new double[5];
        for (int k = 0; k < u.length; k++) {
            double du = u[k] - fit.centreU();
            double dv = v[k] - fit.centreV();
            double rho = Math.sqrt(du * du + dv * dv);
            double e = rho - fit.radius();
            double cos = du / rho;
            double sin = dv / rho;
            row[0] = 1;
            row[1] = cos;
            row[2] = sin;
            row[3] = cos * cos - sin * sin; // cos 2φ
            row[4] = 2 * sin * cos;         // sin 2φ
            for (int i = 0; i < 5; i++) {
                rhs[i] += row[i] * e;
                for (int j = 0; j < 5; j++) {
                    normal[i][j] += row[i] * row[j];
                }
            }
        }
        RealVector c = new LUDecomposition(MatrixUtils.createRealMatrix(normal)).getSolver()
                .solve(MatrixUtils.createRealVector(rhs));
        double a2 = c.getEntry(3);
        double b2 = c.getEntry(4);
        double orientation = 0.5 * Math.atan2(b2, a2);
        if (orientation < 0) {
            orientation += Math.PI;
        }
        return new double[] {orientation, 2 * Math.hypot(a2, b2)};
    }

    private static double[][] project(ContourPlane plane, TrackingResult tracking) {
        if (tracking.axisCount() != plane.axisCount()) {
            throw new IllegalArgumentException("the circle test plane has " + plane.axisCount()
                    + " axes but the tracking result has " + tracking.axisCount());
        }
        int count = tracking.sampleCount();
        double[] u = new double[count];
        double[] v = new double[count];
        for (int k = 0; k < count; k++) {
            for (int i = 0; i < plane.axisCount(); i++) {
                double rel = tracking.actual(i, k) - plane.origin(i);
                u[k] += rel * plane.u(i);
                v[k] += rel * plane.v(i);
            }
        }
        return new double[][] {u, v};
    }

    private static double[] concat(double[] a, double[] b) {
        double[] out = Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }

    private static double wrapToPi(double angle) {
        return Math.IEEEremainder(angle, 2 * Math.PI);
    }
}
