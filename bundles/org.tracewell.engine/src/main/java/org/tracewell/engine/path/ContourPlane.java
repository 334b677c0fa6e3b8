package org.tracewell.engine.path;

import java.util.Arrays;

/**
 * The plane a contour lies in, inside the space of two or three linear axes: an origin and two
 * orthonormal direction vectors u and v, each with one component per axis (metres).
 * A point (pu, pv) of the plane sits at axis position {@code origin + pu·u + pv·v}.
 */
public final class ContourPlane {

    private static final double ORTHONORMAL_TOLERANCE = 1e-9;

    private final double[] origin;
    private final double[] u;
    private final double[] v;

    private ContourPlane(double[] origin, double[] u, double[] v) {
        this.origin = origin;
        this.u = u;
        this.v = v;
    }

    /**
     * A plane through {@code origin} spanned by the orthonormal vectors {@code u} and {@code v}.
     *
     * @throws IllegalArgumentException when the arrays differ in length, have other than 2 or 3 axes,
     *                                  or u, v are not orthonormal within 1e-9
     */
    public static ContourPlane of(double[] origin, double[] u, double[] v) {
        int n = origin.length;
        if (n < 2 || n > 3) {
            throw new IllegalArgumentException("a contour plane needs 2 or 3 linear axes, got " + n);
        }
        if (u.length != n || v.length != n) {
            throw new IllegalArgumentException("origin, u and v need the same axis count " + n
                    + ", got " + u.length + " and " + v.length);
        }
        double uu = dot(u, u);
        double vv = dot(v, v);
        double uv = dot(u, v);
        // written as "not within" so that NaN entries fail too
        if (!(Math.abs(uu - 1) <= ORTHONORMAL_TOLERANCE) || !(Math.abs(vv - 1) <= ORTHONORMAL_TOLERANCE)
                || !(Math.abs(uv) <= ORTHONORMAL_TOLERANCE)) {
            throw new IllegalArgumentException("plane vectors must be orthonormal: |u|²=" + uu + ", |v|²=" + vv
                    + ", u·v=" + uv + " (expected 1, 1, 0)");
        }
        for (double x : origin) {
            if (!Double.isFinite(x)) {
                throw new IllegalArgumentException("plane origin must be finite, got " + Arrays.toString(origin));
            }
        }
        return new ContourPlane(origin.clone(), u.clone(), v.clone());
    }

    /** The XY plane of a machine with two linear axes: u = X, v = Y. */
    public static ContourPlane xy() {
        return new ContourPlane(new double[] {0, 0}, new double[] {1, 0}, new double[] {0, 1});
    }

    /**
     * The plane of two of three linear axes (0 = X, 1 = Y, 2 = Z): u along {@code first}, v along
     * {@code second}, origin at zero; the third axis stays at zero.
     */
    public static ContourPlane ofAxes(int axisCount, int first, int second) {
        if (axisCount < 2 || axisCount > 3 || first == second || first < 0 || second < 0
                || first >= axisCount || second >= axisCount) {
            throw new IllegalArgumentException("need two distinct axes among " + axisCount
                    + " (2 or 3) axes, got " + first + " and " + second);
        }
        double[] u = new double[axisCount];
        double[] v = new double[axisCount];
        u[first] = 1;
        v[second] = 1;
        return new ContourPlane(new double[axisCount], u, v);
    }

    public int axisCount() {
        return origin.length;
    }

    public double origin(int axis) {
        return origin[axis];
    }

    /** Component of the in-plane direction u along {@code axis}. */
    public double u(int axis) {
        return u[axis];
    }

    /** Component of the in-plane direction v along {@code axis}. */
    public double v(int axis) {
        return v[axis];
    }

    /** Axis coordinate of the plane point (pu, pv). */
    public double axisPosition(int axis, double pu, double pv) {
        return origin[axis] + pu * u[axis] + pv * v[axis];
    }

    /** Axis component of the in-plane vector (wu, wv) (no origin). */
    public double axisComponent(int axis, double wu, double wv) {
        return wu * u[axis] + wv * v[axis];
    }

    private static double dot(double[] a, double[] b) {
        double sum = 0;
        for (int i = 0; i < a.length; i++) {
            sum += a[i] * b[i];
        }
        return sum;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ContourPlane p && Arrays.equals(origin, p.origin) && Arrays.equals(u, p.u)
                && Arrays.equals(v, p.v);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * Arrays.hashCode(origin) + Arrays.hashCode(u)) + Arrays.hashCode(v);
    }

    @Override
    public String toString() {
        return "ContourPlane[origin=" + Arrays.toString(origin) + ", u=" + Arrays.toString(u)
                + ", v=" + Arrays.toString(v) + "]";
    }
}
