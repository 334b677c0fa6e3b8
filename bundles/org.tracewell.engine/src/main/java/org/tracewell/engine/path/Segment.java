package org.tracewell.engine.path;

/**
 * One immutable piece of a planar contour, parametrised by its own arc length s ∈ [0, length()].
 * <p>
 * The methods take and return primitives so that sampling and contour-error searches over
 * millions of points do not allocate. The normal used throughout is the <em>left</em> normal
 * (tangent turned +90° in the plane); a signed curvature is positive when the path turns left.
 */
public sealed interface Segment permits LineSegment, ArcSegment {

    /** Arc length in metres, &gt; 0. */
    double length();

    double uAt(double s);

    double vAt(double s);

    /** u component of the unit tangent at s. */
    double tangentUAt(double s);

    /** v component of the unit tangent at s. */
    double tangentVAt(double s);

    /** Signed curvature in 1/m: 0 for a line, +1/R for a CCW arc, −1/R for a CW arc. */
    double curvature();

    /**
     * The local arc length of the point of this segment nearest to (pu, pv): exact, in [0, length()].
     *
     * @param hint a local arc length near the expected answer; only used to choose between
     *             equally near points (the seam of a full circle)
     */
    double closestParameter(double pu, double pv, double hint);

    /**
     * Writes point and unit tangent at local arc length s into {@code out}: (u, v, t_u, t_v).
     * One evaluation of the trigonometry for arcs.
     */
    default void evaluate(double s, double[] out) {
        out[0] = uAt(s);
        out[1] = vAt(s);
        out[2] = tangentUAt(s);
        out[3] = tangentVAt(s);
    }

    /**
     * The nearest point of this segment to (pu, pv): writes (u, v, t_u, t_v) of it into {@code out} and
     * returns its local arc length (as {@link #closestParameter}).
     */
    default double nearest(double pu, double pv, double hint, double[] out) {
        double s = closestParameter(pu, pv, hint);
        evaluate(s, out);
        return s;
    }

    /** Largest |t(s)·w| over the segment, for an in-plane vector w (used to map limits onto axes). */
    double maxAbsTangentProjection(double wu, double wv);

    /** Largest |n(s)·w| over the segment, n the left normal. */
    default double maxAbsNormalProjection(double wu, double wv) {
        // n = (−t_v, t_u), so n·w = t·(w_v, −w_u)
        return maxAbsTangentProjection(wv, -wu);
    }

    /** Exact squared shortest distance from (pu, pv) to this segment, m²; cheaper than {@link #nearest}. */
    default double distanceSquared(double pu, double pv) {
        double s = closestParameter(pu, pv, 0);
        double du = pu - uAt(s);
        double dv = pv - vAt(s);
        return du * du + dv * dv;
    }

    default Point2 start() {
        return new Point2(uAt(0), vAt(0));
    }

    default Point2 end() {
        return new Point2(uAt(length()), vAt(length()));
    }

    default Point2 pointAt(double s) {
        return new Point2(uAt(s), vAt(s));
    }

    default Point2 tangentAt(double s) {
        return new Point2(tangentUAt(s), tangentVAt(s));
    }

    /** Exact shortest distance from (pu, pv) to this segment. */
    default double distance(double pu, double pv) {
        double s = closestParameter(pu, pv, 0);
        return Math.hypot(pu - uAt(s), pv - vAt(s));
    }
}
