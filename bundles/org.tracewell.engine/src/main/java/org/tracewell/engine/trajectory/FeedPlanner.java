package org.tracewell.engine.trajectory;

import java.util.ArrayList;
import java.util.List;
import org.tracewell.engine.path.ArcSegment;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.path.Segment;

/**
 * Plans the feed along a path: look-ahead over the segments with per-segment limits, then one
 * accelerate–cruise–decelerate profile inside each segment.
 * <ol>
 * <li>Each segment gets its own feed, acceleration and jerk limit ({@link #segmentLimits}): the
 * programmed feed, reduced where the segment's direction would drive an axis past its velocity limit;
 * on arcs also F²/R ≤ centripetal limit, each axis's share of the centripetal acceleration within its
 * acceleration limit, and (S-curve) the centripetal jerk F³/R² within the jerk limits. The tangential
 * acceleration and jerk are reduced so that no axis exceeds its own limits along the tangent.</li>
 * <li>Junction feeds: zero at the start, the end and every stop junction, otherwise the smaller limit
 * of the two segments; a backward then a forward pass lowers them until every segment can make its
 * feed change in its length.</li>
 * <li>Inside each segment the profile rises from the entry feed to the highest peak that fits, cruises
 * and falls to the exit feed; each change starts and ends at zero acceleration.</li>
 * </ol>
 * Scope of the guarantee: on lines the axis velocity, acceleration and jerk limits hold exactly. On
 * arcs the tangential and centripetal parts are each held within their limits; while the feed changes
 * on an arc their vector sum can exceed either one (by at most √2 when both are at their limit).
 */
public final class FeedPlanner {

    private FeedPlanner() {
    }

    /**
     * Plans a feed profile for {@code path}.
     *
     * @param axisLimits one entry per axis of the path's plane
     */
    public static FeedProfile plan(Path path, PathLimits limits, List<AxisLimits> axisLimits, ProfileShape shape) {
        SegmentFeedLimit[] seg = segmentLimits(path, limits, axisLimits, shape);
        int n = path.segmentCount();
        double[] junction = new double[n + 1];
        for (int j = 1; j < n; j++) {
            junction[j] = path.isStopJunction(j - 1) ? 0 : Math.min(seg[j - 1].feed(), seg[j].feed());
        }
        for (int k = n - 1; k >= 0; k--) {
            double len = path.segment(k).length();
            junction[k] = FeedChange.maxReachable(junction[k + 1], len, seg[k].acceleration(), seg[k].jerk(), junction[k]);
        }
        for (int k = 0; k < n; k++) {
            double len = path.segment(k).length();
            junction[k + 1] = FeedChange.maxReachable(junction[k], len, seg[k].acceleration(), seg[k].jerk(), junction[k + 1]);
        }
        FeedProfile.Builder out = new FeedProfile.Builder();
        for (int k = 0; k < n; k++) {
            double s0 = path.segmentStart(k);
            double len = path.segment(k).length();
            double a = seg[k].acceleration();
            double j = seg[k].jerk();
            double v0 = junction[k];
            double v1 = junction[k + 1];
            double peak = FeedChange.peakFeed(v0, v1, len, seg[k].feed(), a, j);
            double rise = FeedChange.append(out, s0, v0, peak, a, j);
            double fall = FeedChange.distance(peak, v1, a, j);
            double cruise = len - rise - fall;
            if (cruise > 0) {
                out.add(cruise / peak, s0 + rise, peak, 0, 0);
            }
            FeedChange.append(out, s0 + Math.max(rise, len - fall), peak, v1, a, j);
        }
        return out.build(path.length());
    }

    /**
     * The whole path at one constant feed, starting at full speed and passing corners without slowing:
     * the idealised reference behind the analytic following- and contour-error formulas. It ignores
     * every acceleration limit and stop.
     */
    public static FeedProfile constantFeed(Path path, double feed) {
        PathLimits.positiveFinite("feed", feed, "m/s");
        FeedProfile.Builder out = new FeedProfile.Builder();
        out.add(path.length() / feed, 0, feed, 0, 0);
        return out.build(path.length());
    }

    /** The limits applied on each segment (see the class comment). */
    public static SegmentFeedLimit[] segmentLimits(Path path, PathLimits limits, List<AxisLimits> axisLimits,
                                                   ProfileShape shape) {
        ContourPlane plane = path.plane();
        if (axisLimits.size() != plane.axisCount()) {
            throw new IllegalArgumentException("need limits for each of the " + plane.axisCount()
                    + " axes of the contour plane, got " + axisLimits.size());
        }
        boolean jerkLimited = shape == ProfileShape.S_CURVE;
        if (jerkLimited && Double.isInfinite(limits.jerk())) {
            throw new IllegalArgumentException("an S-curve profile needs a finite path jerk limit, got " + limits.jerk());
        }
        SegmentFeedLimit[] out = new SegmentFeedLimit[path.segmentCount()];
        for (int k = 0; k < out.length; k++) {
            Segment seg = path.segment(k);
            double feed = limits.feed();
            String by = "feed";
            double accel = limits.acceleration();
            double jerk = jerkLimited ? limits.jerk() : Double.POSITIVE_INFINITY;
            double radius = seg instanceof ArcSegment arc ? arc.radius() : Double.POSITIVE_INFINITY;
            if (seg instanceof ArcSegment) {
                double vc = Math.sqrt(limits.centripetalAcceleration() * radius);
                if (vc < feed) {
                    feed = vc;
                    by = "centripetal";
                }
                if (jerkLimited) {
                    double vj = Math.cbrt(limits.jerk() * radius * radius);
                    if (vj < feed) {
                        feed = vj;
                        by = "centripetal jerk";
                    }
                }
            }
            for (int i = 0; i < axisLimits.size(); i++) {
                AxisLimits ax = axisLimits.get(i);
                double tMax = seg.maxAbsTangentProjection(plane.u(i), plane.v(i));
                double nMax = seg.maxAbsNormalProjection(plane.u(i), plane.v(i));
                if (tMax > 0) {
                    double v = ax.velocity() / tMax;
                    if (v < feed) {
                        feed = v;
                        by = "axis " + i + " velocity";
                    }
                    accel = Math.min(accel, ax.acceleration() / tMax);
                    if (jerkLimited) {
                        jerk = Math.min(jerk, ax.jerk() / tMax);
                    }
                }
                if (seg instanceof ArcSegment) {
                    if (nMax > 0) {
                        double v = Math.sqrt(ax.acceleration() * radius / nMax);
                        if (v < feed) {
                            feed = v;
                            by = "axis " + i + " centripetal";
                        }
                    }
                    if (jerkLimited && tMax > 0) {
                        // the centripetal acceleration vector turns at F/R: its rate F³/R² points along −t
                        double v = Math.cbrt(ax.jerk() * radius * radius / tMax);
                        if (v < feed) {
                            feed = v;
                            by = "axis " + i + " centripetal jerk";
                        }
                    }
                }
            }
            out[k] = new SegmentFeedLimit(feed, accel, jerk, by);
        }
        return out;
    }

    /** Convenience: the same limits for every axis of the path's plane. */
    public static List<AxisLimits> sameForAllAxes(Path path, AxisLimits limits) {
        List<AxisLimits> list = new ArrayList<>();
        for (int i = 0; i < path.plane().axisCount(); i++) {
            list.add(limits);
        }
        return List.copyOf(list);
    }
}
