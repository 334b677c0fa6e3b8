package org.tracewell.engine.contour;

import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.Path;

/**
 * Exact shortest distance from successive actual points to a programmed path, searched monotonically.
 * <p>
 * For each point (in time order) the search looks at the segment that held the previous nearest
 * point, the one after it, and every further segment starting within {@code window} metres of arc
 * length ahead of the previous nearest point. On each it takes the exact squared distance (projection
 * on a line, radial distance on an arc, or an end point) and keeps the nearest; the nearest point, its
 * path parameter and side are then computed for that segment alone. The window never moves back, so
 * a path that returns near itself (a circle's overshoot arcs, a reversing polyline) is measured
 * against the part being traversed, not an earlier pass. Points off the contour plane (three axes)
 * add their out-of-plane offset h: distance = √(d² + h²), signed by the in-plane side (positive on
 * the left of travel).
 * <p>
 * Mutable, not thread-safe; {@link #next} allocates nothing.
 */
public final class MonotoneContourSearch {

    private final Path path;
    private final ContourPlane plane;
    private final double window;
    private final double[] scratch = new double[4];
    private int segment;
    private double previous;

    /**
     * @param window look-ahead along the path, metres, ≥ 0. It must exceed the arc length the nearest
     *               point can advance between two samples (tiny at any real feed), and should stay
     *               below the arc length between two passes of the path that come close to each other
     *               (a reversal, an overshoot arc), or the search may measure against the later pass early.
     */
    public MonotoneContourSearch(Path path, double window) {
        if (!(window >= 0) || !Double.isFinite(window)) {
            throw new IllegalArgumentException("search window must be finite and >= 0 m, got " + window);
        }
        this.path = path;
        this.plane = path.plane();
        this.window = window;
    }

    /** Signed contour error of the next point, given per axis in metres. */
    public double next(double[] axisPoint) {
        int axes = plane.axisCount();
        double pu = 0;
        double pv = 0;
        for (int i = 0; i < axes; i++) {
            double rel = axisPoint[i] - plane.origin(i);
            pu += rel * plane.u(i);
            pv += rel * plane.v(i);
        }
        // out-of-plane offset from the residual vector itself: |p|² − pu² − pv² would cancel badly
        double h2 = 0;
        if (axes > 2) {
            for (int i = 0; i < axes; i++) {
                double residual = axisPoint[i] - plane.origin(i) - pu * plane.u(i) - pv * plane.v(i);
                h2 += residual * residual;
            }
        }
        int best = segment;
        double bestD2 = Double.POSITIVE_INFINITY;
        int segments = path.segmentCount();
        double limit = previous + window;
        for (int i = segment; i < segments; i++) {
            if (i > segment + 1 && path.segmentStart(i) > limit) {
                break;
            }
            double d2 = path.segment(i).distanceSquared(pu, pv);
            if (d2 < bestD2) {
                bestD2 = d2;
                best = i;
            }
        }
        // nearest point, parameter and side only for the winning segment
        double start = path.segmentStart(best);
        double local = path.segment(best).nearest(pu, pv, previous - start, scratch);
        double du = pu - scratch[0];
        double dv = pv - scratch[1];
        double side = scratch[2] * dv - scratch[3] * du; // (du, dv)·left normal
        double distance = Math.sqrt(du * du + dv * dv + h2);
        segment = best;
        previous = start + local;
        return side < 0 ? -distance : distance;
    }

    /** Path parameter (arc length) of the nearest point found by the last {@link #next} call, metres. */
    public double pathParameter() {
        return previous;
    }

    /** Index of the segment holding the last nearest point. */
    public int segmentIndex() {
        return segment;
    }
}
