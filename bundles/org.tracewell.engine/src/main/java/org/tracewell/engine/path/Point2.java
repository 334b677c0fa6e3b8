package org.tracewell.engine.path;

/**
 * A point or vector in the coordinates (u, v) of a contour plane, in metres.
 *
 * @param u first in-plane coordinate
 * @param v second in-plane coordinate
 */
public record Point2(double u, double v) {

    public Point2 {
        if (!Double.isFinite(u) || !Double.isFinite(v)) {
            throw new IllegalArgumentException("point coordinates must be finite, got (" + u + ", " + v + ")");
        }
    }

    public double distanceTo(Point2 other) {
        return Math.hypot(u - other.u, v - other.v);
    }

    public double norm() {
        return Math.hypot(u, v);
    }
}
