package org.tracewell.engine.path;

/**
 * A straight segment between two distinct points. Length and direction are computed once, since the
 * contour-error search evaluates segments millions of times.
 */
public final class LineSegment implements Segment {

    private final Point2 from;
    private final Point2 to;
    private final double length;
    private final double tu;
    private final double tv;

    /**
     * @param from start point
     * @param to   end point, distinct from the start
     */
    public LineSegment(Point2 from, Point2 to) {
        if (from == null || to == null) {
            throw new IllegalArgumentException("line end points must not be null");
        }
        double len = from.distanceTo(to);
        if (len <= 0) {
            throw new IllegalArgumentException("line needs two distinct end points, got " + from + " twice");
        }
        this.from = from;
        this.to = to;
        this.length = len;
        this.tu = (to.u() - from.u()) / len;
        this.tv = (to.v() - from.v()) / len;
    }

    public static LineSegment of(double u0, double v0, double u1, double v1) {
        return new LineSegment(new Point2(u0, v0), new Point2(u1, v1));
    }

    public Point2 from() {
        return from;
    }

    public Point2 to() {
        return to;
    }

    @Override
    public double length() {
        return length;
    }

    @Override
    public double uAt(double s) {
        if (s >= length) {
            return to.u(); // the end point exactly, not a rounded interpolation
        }
        return from.u() + tu * s;
    }

    @Override
    public double vAt(double s) {
        if (s >= length) {
            return to.v();
        }
        return from.v() + tv * s;
    }

    @Override
    public double tangentUAt(double s) {
        return tu;
    }

    @Override
    public double tangentVAt(double s) {
        return tv;
    }

    @Override
    public double curvature() {
        return 0;
    }

    @Override
    public double closestParameter(double pu, double pv, double hint) {
        // projection onto the line, clamped to the segment
        double s = (pu - from.u()) * tu + (pv - from.v()) * tv;
        return s <= 0 ? 0 : (s >= length ? length : s);
    }

    @Override
    public double distanceSquared(double pu, double pv) {
        double du = pu - from.u();
        double dv = pv - from.v();
        double s = du * tu + dv * tv;
        if (s <= 0) {
            return du * du + dv * dv;
        }
        if (s >= length) {
            double eu = pu - to.u();
            double ev = pv - to.v();
            return eu * eu + ev * ev;
        }
        double across = du * tv - dv * tu; // offset along the normal
        return across * across;
    }

    @Override
    public double maxAbsTangentProjection(double wu, double wv) {
        return Math.abs(tu * wu + tv * wv);
    }

    @Override
    public Point2 start() {
        return from;
    }

    @Override
    public Point2 end() {
        return to;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof LineSegment l && from.equals(l.from) && to.equals(l.to);
    }

    @Override
    public int hashCode() {
        return 31 * from.hashCode() + to.hashCode();
    }

    @Override
    public String toString() {
        return "LineSegment[" + from + " -> " + to + "]";
    }
}
