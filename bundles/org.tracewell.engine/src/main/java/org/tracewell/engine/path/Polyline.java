package org.tracewell.engine.path;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Builds paths through corner points: either with an exact stop at every corner or with every
 * corner blended by a tangent arc whose deviation from the programmed corner stays within a
 * stated tolerance.
 */
public final class Polyline {

    /** Turns closer to a full reversal than this (radians) cannot be blended and become exact stops. */
    private static final double REVERSAL_MARGIN_RAD = 1e-6;
    /** Turns smaller than this (radians) count as straight: no blend arc. */
    private static final double STRAIGHT_RAD = 1e-12;
    /** Line pieces shorter than this (metres) left between two blends are dropped. */
    private static final double MIN_LINE = 1e-12;

    private Polyline() {
    }

    /** Straight lines through the points, stopping exactly at every corner. */
    public static Path exactStop(ContourPlane plane, List<Point2> points) {
        checkPoints(points);
        List<Segment> segments = new ArrayList<>();
        Set<Integer> stops = new HashSet<>();
        for (int i = 0; i + 1 < points.size(); i++) {
            segments.add(new LineSegment(points.get(i), points.get(i + 1)));
            if (i + 2 < points.size()) {
                stops.add(i);
            }
        }
        return Path.of(plane, segments, stops);
    }

    /**
     * Straight lines through the points with each corner replaced by the tangent arc that deviates
     * from the corner point by {@code tolerance} (midpoint of the arc to the corner). Where the
     * neighbouring lines are too short, the arc shrinks so that it uses at most half of each line,
     * and then deviates less. A corner reversing the direction (turn ≈ 180°) cannot be blended and
     * becomes an exact stop.
     *
     * @param tolerance largest allowed distance between the blend arc and the corner, metres, &gt; 0
     */
    public static Path blended(ContourPlane plane, List<Point2> points, double tolerance) {
        checkPoints(points);
        if (!(tolerance > 0) || !Double.isFinite(tolerance)) {
            throw new IllegalArgumentException("blend tolerance must be finite and > 0 m, got " + tolerance);
        }
        int n = points.size();
        // distance from each interior corner to its tangent points (0 = no blend)
        double[] cut = new double[n];
        double[] radius = new double[n];
        double[] turn = new double[n];
        for (int i = 1; i + 1 < n; i++) {
            Point2 a = direction(points.get(i - 1), points.get(i));
            Point2 b = direction(points.get(i), points.get(i + 1));
            double phi = Math.atan2(a.u() * b.v() - a.v() * b.u(), a.u() * b.u() + a.v() * b.v());
            turn[i] = phi;
            double half = Math.abs(phi) / 2;
            if (Math.abs(phi) < STRAIGHT_RAD || Math.abs(phi) > Math.PI - REVERSAL_MARGIN_RAD) {
                continue;
            }
            // deviation of the arc midpoint from the corner: r·(1/cos(φ/2) − 1)
            double r = tolerance / (1 / Math.cos(half) - 1);
            double d = r * Math.tan(half);
            double room = 0.5 * Math.min(points.get(i - 1).distanceTo(points.get(i)),
                    points.get(i).distanceTo(points.get(i + 1)));
            if (d > room) {
                d = room;
                r = d / Math.tan(half);
            }
            cut[i] = d;
            radius[i] = r;
        }
        List<Segment> segments = new ArrayList<>();
        Set<Integer> stops = new HashSet<>();
        Point2 current = points.get(0);
        for (int i = 1; i < n; i++) {
            Point2 corner = points.get(i);
            Point2 a = direction(points.get(i - 1), corner);
            Point2 lineEnd = new Point2(corner.u() - a.u() * cut[i], corner.v() - a.v() * cut[i]);
            if (current.distanceTo(lineEnd) > MIN_LINE) {
                segments.add(new LineSegment(current, lineEnd));
            }
            current = lineEnd;
            if (i + 1 < n) {
                if (cut[i] > 0) {
                    Point2 b = direction(corner, points.get(i + 1));
                    double side = Math.signum(turn[i]);
                    Point2 centre = new Point2(lineEnd.u() - a.v() * radius[i] * side, lineEnd.v() + a.u() * radius[i] * side);
                    double start = Math.atan2(lineEnd.v() - centre.v(), lineEnd.u() - centre.u());
                    segments.add(new ArcSegment(centre, radius[i], start, turn[i]));
                    current = new Point2(corner.u() + b.u() * cut[i], corner.v() + b.v() * cut[i]);
                } else if (Math.abs(turn[i]) >= STRAIGHT_RAD) {
                    stops.add(segments.size() - 1);
                }
            }
        }
        return Path.of(plane, segments, stops);
    }

    private static Point2 direction(Point2 from, Point2 to) {
        double d = from.distanceTo(to);
        return new Point2((to.u() - from.u()) / d, (to.v() - from.v()) / d);
    }

    private static void checkPoints(List<Point2> points) {
        if (points == null || points.size() < 2) {
            throw new IllegalArgumentException("a polyline needs at least 2 points, got "
                    + (points == null ? "none" : points.size()));
        }
        for (int i = 0; i + 1 < points.size(); i++) {
            if (points.get(i).distanceTo(points.get(i + 1)) <= 0) {
                throw new IllegalArgumentException("polyline points " + i + " and " + (i + 1)
                        + " coincide at " + points.get(i) + "; consecutive points must differ");
            }
        }
    }
}
