package org.tracewell.engine.trajectory;

import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.path.Segment;

/**
 * Produces the reference samples of a feed profile along a path one at a time, without storing them:
 * the streaming counterpart of {@link Trajectory}, for paths too long to hold (10⁷ samples and more).
 * Sample k is at time k·T; the last sample lies exactly at the path end. Mutable and not thread-safe;
 * fastest when samples are requested in increasing order.
 */
public final class TrajectorySampler {

    private final Path path;
    private final FeedProfile profile;
    private final double samplePeriod;
    private final long sampleCount;
    private final FeedProfile.Cursor cursor;
    private final double[] point = new double[4];
    private int segment;
    private double pathPosition;

    /**
     * @param samplePeriod seconds, &gt; 0
     * @throws IllegalArgumentException when the profile was planned for another path length
     */
    public TrajectorySampler(Path path, FeedProfile profile, double samplePeriod) {
        if (!(samplePeriod > 0) || !Double.isFinite(samplePeriod)) {
            throw new IllegalArgumentException("sample period must be finite and > 0 s, got " + samplePeriod);
        }
        if (Math.abs(profile.length() - path.length()) > 1e-9 * Math.max(1, path.length())) {
            throw new IllegalArgumentException("feed profile covers " + profile.length() + " m but the path is "
                    + path.length() + " m long; plan the profile for this path");
        }
        this.path = path;
        this.profile = profile;
        this.samplePeriod = samplePeriod;
        this.sampleCount = (long) Math.ceil(profile.duration() / samplePeriod - 1e-9) + 1;
        this.cursor = profile.cursor();
    }

    public Path path() {
        return path;
    }

    public FeedProfile profile() {
        return profile;
    }

    public double samplePeriod() {
        return samplePeriod;
    }

    public long sampleCount() {
        return sampleCount;
    }

    public int axisCount() {
        return path.plane().axisCount();
    }

    /** Arc length of the last sample produced, metres. */
    public double pathPosition() {
        return pathPosition;
    }

    /**
     * Writes sample k into the given arrays (one entry per axis): position (m), velocity (m/s) and
     * acceleration (m/s²). Axis velocity is the feed times the tangent; acceleration adds the
     * centripetal part feed²·κ along the left normal (κ the signed curvature).
     */
    public void sample(long k, double[] position, double[] velocity, double[] acceleration) {
        if (k < 0 || k >= sampleCount) {
            throw new IndexOutOfBoundsException("sample " + k + " outside 0.." + (sampleCount - 1));
        }
        boolean last = k == sampleCount - 1;
        cursor.seek(last ? profile.duration() : k * samplePeriod);
        double s = last ? path.length() : cursor.pathPosition();
        if (s < path.segmentStart(segment)) {
            segment = path.segmentIndexAt(s);
        }
        int lastSegment = path.segmentCount() - 1;
        while (segment < lastSegment && s >= path.segmentStart(segment + 1)) {
            segment++;
        }
        Segment seg = path.segment(segment);
        // the last sample sits on the end point itself, not on a rounded arc-length difference
        double local = last ? seg.length() : Math.min(Math.max(s - path.segmentStart(segment), 0), seg.length());
        seg.evaluate(local, point);
        double pu = point[0];
        double pv = point[1];
        double tu = point[2];
        double tv = point[3];
        double f = cursor.feed();
        double at = cursor.acceleration();
        double an = f * f * seg.curvature();
        // acceleration = at·t + an·n, n = (−tv, tu)
        double au = at * tu - an * tv;
        double av = at * tv + an * tu;
        ContourPlane plane = path.plane();
        for (int i = 0; i < plane.axisCount(); i++) {
            position[i] = plane.axisPosition(i, pu, pv);
            velocity[i] = plane.axisComponent(i, f * tu, f * tv);
            acceleration[i] = plane.axisComponent(i, au, av);
        }
        pathPosition = s;
    }
}
