package org.tracewell.engine.path;

import java.util.Arrays;
import java.util.List;
import java.util.Set;

/**
 * An immutable planar contour: connected segments in a {@link ContourPlane}, parametrised by arc
 * length s from the start.
 * <p>
 * Junction j joins segment j to segment j+1. A junction is a <em>stop</em> junction, where the feed
 * must reach zero, when it was requested as an exact stop or when the tangent turns there by more
 * than {@value #TANGENT_TOLERANCE_RAD} rad (a sharp corner cannot be passed at speed by real axes).
 */
public final class Path {

    /** Tangent jumps larger than this (radians) make a junction a stop. */
    public static final double TANGENT_TOLERANCE_RAD = 1e-6;
    /** Allowed gap between one segment's end and the next one's start, metres. */
    public static final double CONTINUITY_TOLERANCE = 1e-9;

    private final ContourPlane plane;
    private final Segment[] segments;
    private final double[] starts;
    private final boolean[] stopJunction;
    private final boolean[] exactStopRequested;

    private Path(ContourPlane plane, Segment[] segments, boolean[] exactStopRequested) {
        this.plane = plane;
        this.segments = segments;
        this.exactStopRequested = exactStopRequested;
        this.starts = new double[segments.length + 1];
        for (int i = 0; i < segments.length; i++) {
            starts[i + 1] = starts[i] + segments[i].length();
        }
        this.stopJunction = new boolean[Math.max(0, segments.length - 1)];
        for (int j = 0; j < stopJunction.length; j++) {
            stopJunction[j] = exactStopRequested[j] || tangentTurn(segments[j], segments[j + 1]) > TANGENT_TOLERANCE_RAD;
        }
    }

    /** A path through the given connected segments; sharp corners become stops automatically. */
    public static Path of(ContourPlane plane, List<? extends Segment> segments) {
        return of(plane, segments, Set.of());
    }

    /**
     * A path through the given connected segments with exact stops requested at the listed junctions
     * (junction j lies between segment j and j+1).
     */
    public static Path of(ContourPlane plane, List<? extends Segment> segments, Set<Integer> exactStopJunctions) {
        if (plane == null) {
            throw new IllegalArgumentException("contour plane must not be null");
        }
        if (segments == null || segments.isEmpty()) {
            throw new IllegalArgumentException("a path needs at least one segment, got none");
        }
        Segment[] array = segments.toArray(new Segment[0]);
        for (int i = 0; i < array.length; i++) {
            if (array[i] == null) {
                throw new IllegalArgumentException("segment " + i + " is null");
            }
        }
        for (int i = 0; i + 1 < array.length; i++) {
            double gap = array[i].end().distanceTo(array[i + 1].start());
            if (gap > CONTINUITY_TOLERANCE) {
                throw new IllegalArgumentException("segment " + (i + 1) + " starts " + gap + " m away from the end of segment "
                        + i + " (at most " + CONTINUITY_TOLERANCE + " m allowed)");
            }
        }
        if (exactStopJunctions == null) {
            throw new IllegalArgumentException("exact-stop junctions must not be null; pass an empty set for none");
        }
        boolean[] stops = new boolean[Math.max(0, array.length - 1)];
        for (Integer j : exactStopJunctions) {
            if (j == null || j < 0 || j >= stops.length) {
                throw new IllegalArgumentException("exact-stop junction " + j + " does not exist; valid junctions are 0.."
                        + (stops.length - 1));
            }
            stops[j] = true;
        }
        return new Path(plane, array, stops);
    }

    private static double tangentTurn(Segment a, Segment b) {
        double au = a.tangentUAt(a.length());
        double av = a.tangentVAt(a.length());
        double bu = b.tangentUAt(0);
        double bv = b.tangentVAt(0);
        return Math.abs(Math.atan2(au * bv - av * bu, au * bu + av * bv));
    }

    public ContourPlane plane() {
        return plane;
    }

    /** The same geometry placed in another plane. */
    public Path inPlane(ContourPlane other) {
        return new Path(other, segments, exactStopRequested);
    }

    public double length() {
        return starts[segments.length];
    }

    public int segmentCount() {
        return segments.length;
    }

    public Segment segment(int index) {
        return segments[index];
    }

    public List<Segment> segments() {
        return List.of(segments);
    }

    /** Arc length at which segment {@code index} starts; {@code segmentStart(segmentCount())} is the length. */
    public double segmentStart(int index) {
        return starts[index];
    }

    /** True when the feed must be zero at junction j (between segment j and j+1). */
    public boolean isStopJunction(int junction) {
        return stopJunction[junction];
    }

    /** True when an exact stop was requested at junction j (a subset of the stop junctions). */
    public boolean isExactStopRequested(int junction) {
        return exactStopRequested[junction];
    }

    /** Index of the segment containing arc length s (clamped to the path). */
    public int segmentIndexAt(double s) {
        if (s <= 0) {
            return 0;
        }
        if (s >= length()) {
            return segments.length - 1;
        }
        int i = Arrays.binarySearch(starts, s);
        if (i >= 0) {
            return Math.min(i, segments.length - 1);
        }
        return -i - 2;
    }

    private double clamp(double s) {
        return s <= 0 ? 0 : Math.min(s, length());
    }

    public Point2 pointAt(double s) {
        double c = clamp(s);
        int i = segmentIndexAt(c);
        return segments[i].pointAt(Math.min(c - starts[i], segments[i].length()));
    }

    /** Unit tangent at s (direction of travel). */
    public Point2 tangentAt(double s) {
        double c = clamp(s);
        int i = segmentIndexAt(c);
        return segments[i].tangentAt(Math.min(c - starts[i], segments[i].length()));
    }

    /** Unit left normal at s (tangent turned +90°). */
    public Point2 normalAt(double s) {
        Point2 t = tangentAt(s);
        return new Point2(-t.v(), t.u());
    }

    /** Signed curvature at s, 1/m (positive turning left). */
    public double curvatureAt(double s) {
        return segments[segmentIndexAt(clamp(s))].curvature();
    }

    /** The exact nearest point of the whole path to the plane point (pu, pv). */
    public PathProjection project(double pu, double pv) {
        PathProjection best = null;
        for (int i = 0; i < segments.length; i++) {
            PathProjection p = projectOnSegment(i, pu, pv, 0);
            if (best == null || Math.abs(p.signedDistance()) < Math.abs(best.signedDistance())) {
                best = p;
            }
        }
        return best;
    }

    /** Exact shortest distance from (pu, pv) to the path. */
    public double distance(double pu, double pv) {
        return Math.abs(project(pu, pv).signedDistance());
    }

    /** Nearest point on segment {@code index}; {@code hintLocal} is a local arc length near the expected answer. */
    public PathProjection projectOnSegment(int index, double pu, double pv, double hintLocal) {
        Segment seg = segments[index];
        double s = seg.closestParameter(pu, pv, hintLocal);
        double qu = seg.uAt(s);
        double qv = seg.vAt(s);
        return new PathProjection(index, starts[index] + s, qu, qv,
                signedDistance(pu - qu, pv - qv, seg.tangentUAt(s), seg.tangentVAt(s)));
    }

    /**
     * Distance of the offset (du, dv) signed by the side of the left normal of the tangent (tu, tv):
     * positive on the left of travel. An offset exactly along the tangent counts as positive.
     */
    public static double signedDistance(double du, double dv, double tu, double tv) {
        double d = Math.hypot(du, dv);
        double side = tu * dv - tv * du; // (du, dv)·(−tv, tu)
        return side < 0 ? -d : d;
    }
}
