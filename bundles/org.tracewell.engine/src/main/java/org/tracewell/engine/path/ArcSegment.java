package org.tracewell.engine.path;

/**
 * A circular arc about {@code centre}, starting at polar angle {@code startAngle} (radians, measured
 * from the +u axis toward +v) and sweeping the signed angle {@code sweep}: positive is CCW, negative CW.
 * A sweep of ±2π is a full circle. Derived quantities (length, end points) are computed once, since
 * the contour-error search evaluates segments millions of times.
 */
public final class ArcSegment implements Segment {

    private static final double TWO_PI = 2 * Math.PI;
    /** Sweeps this close to 2π count as full circles (seam handling). */
    private static final double FULL_CIRCLE_SLACK = 1e-12;

    private final Point2 centre;
    private final double radius;
    private final double startAngle;
    private final double sweep;
    private final double sign;
    private final double length;
    private final double cu;
    private final double cv;
    private final double startU;
    private final double startV;
    private final double endU;
    private final double endV;
    private final boolean fullCircle;
    private final double startRadialU;
    private final double startRadialV;
    private final double endRadialU;
    private final double endRadialV;

    /**
     * @param centre     arc centre
     * @param radius     radius in metres, &gt; 0
     * @param startAngle polar angle of the start point, radians
     * @param sweep      signed swept angle, 0 &lt; |sweep| ≤ 2π
     */
    public ArcSegment(Point2 centre, double radius, double startAngle, double sweep) {
        if (centre == null) {
            throw new IllegalArgumentException("arc centre must not be null");
        }
        if (!(radius > 0) || !Double.isFinite(radius)) {
            throw new IllegalArgumentException("arc radius must be finite and > 0 m, got " + radius);
        }
        if (!Double.isFinite(startAngle)) {
            throw new IllegalArgumentException("arc start angle must be finite, got " + startAngle);
        }
        if (!(Math.abs(sweep) > 0) || Math.abs(sweep) > TWO_PI * (1 + FULL_CIRCLE_SLACK)) {
            throw new IllegalArgumentException("arc sweep must satisfy 0 < |sweep| <= 2π rad, got " + sweep);
        }
        this.centre = centre;
        this.radius = radius;
        this.startAngle = startAngle;
        this.sweep = sweep;
        this.sign = sweep > 0 ? 1 : -1;
        this.length = radius * Math.abs(sweep);
        this.cu = centre.u();
        this.cv = centre.v();
        this.startU = cu + radius * Math.cos(startAngle);
        this.startV = cv + radius * Math.sin(startAngle);
        this.endU = cu + radius * Math.cos(startAngle + sweep);
        this.endV = cv + radius * Math.sin(startAngle + sweep);
        this.fullCircle = Math.abs(sweep) >= TWO_PI * (1 - FULL_CIRCLE_SLACK);
        this.startRadialU = Math.cos(startAngle);
        this.startRadialV = Math.sin(startAngle);
        this.endRadialU = Math.cos(startAngle + sweep);
        this.endRadialV = Math.sin(startAngle + sweep);
    }

    public Point2 centre() {
        return centre;
    }

    public double radius() {
        return radius;
    }

    public double startAngle() {
        return startAngle;
    }

    /** Signed swept angle, radians (positive CCW). */
    public double sweep() {
        return sweep;
    }

    /** Arc from polar angle {@code startAngle} to {@code endAngle} in the given direction (less than a full turn). */
    public static ArcSegment of(Point2 centre, double radius, double startAngle, double endAngle, ArcDirection direction) {
        double sweep = direction == ArcDirection.CCW
                ? positiveModulo(endAngle - startAngle, TWO_PI)
                : -positiveModulo(startAngle - endAngle, TWO_PI);
        if (sweep == 0) {
            throw new IllegalArgumentException("arc start and end angles coincide (" + startAngle
                    + " rad); use ArcSegment.fullCircle for a full turn");
        }
        return new ArcSegment(centre, radius, startAngle, sweep);
    }

    /** A full circle starting (and ending) at polar angle {@code startAngle}. */
    public static ArcSegment fullCircle(Point2 centre, double radius, double startAngle, ArcDirection direction) {
        return new ArcSegment(centre, radius, startAngle, direction.sign() * TWO_PI);
    }

    public ArcDirection direction() {
        return sweep > 0 ? ArcDirection.CCW : ArcDirection.CW;
    }

    public double endAngle() {
        return startAngle + sweep;
    }

    public boolean isFullCircle() {
        return fullCircle;
    }

    private double angleAt(double s) {
        return startAngle + sign * s / radius;
    }

    @Override
    public double length() {
        return length;
    }

    @Override
    public double uAt(double s) {
        if (s >= length) {
            return endU;
        }
        return s <= 0 ? startU : cu + radius * Math.cos(angleAt(s));
    }

    @Override
    public double vAt(double s) {
        if (s >= length) {
            return endV;
        }
        return s <= 0 ? startV : cv + radius * Math.sin(angleAt(s));
    }

    @Override
    public double tangentUAt(double s) {
        return -sign * Math.sin(angleAt(s));
    }

    @Override
    public double tangentVAt(double s) {
        return sign * Math.cos(angleAt(s));
    }

    @Override
    public void evaluate(double s, double[] out) {
        double angle = angleAt(s);
        double c = Math.cos(angle);
        double sn = Math.sin(angle);
        out[0] = s >= length ? endU : (s <= 0 ? startU : cu + radius * c);
        out[1] = s >= length ? endV : (s <= 0 ? startV : cv + radius * sn);
        out[2] = -sign * sn;
        out[3] = sign * c;
    }

    @Override
    public double curvature() {
        return sign / radius;
    }

    @Override
    public double closestParameter(double pu, double pv, double hint) {
        double du = pu - cu;
        double dv = pv - cv;
        if (du == 0 && dv == 0) {
            // every arc point is equally near to the centre
            return hint <= 0 ? 0 : (hint >= length ? length : hint);
        }
        double along = positiveModulo(sign * (Math.atan2(dv, du) - startAngle), TWO_PI);
        if (along <= Math.abs(sweep)) {
            if (fullCircle && along == 0 && hint > length / 2) {
                return length; // the seam: start and end coincide, stay on the side of the hint
            }
            return Math.min(along * radius, length);
        }
        // outside the swept angle: the nearer end point is the nearest point
        double ds = (pu - startU) * (pu - startU) + (pv - startV) * (pv - startV);
        double de = (pu - endU) * (pu - endU) + (pv - endV) * (pv - endV);
        return ds <= de ? 0 : length;
    }

    /**
     * Whether the direction (du, dv) from the centre lies within the swept angle, by cross products
     * with the start and end radii (no trigonometry).
     */
    private boolean withinSweep(double du, double dv) {
        if (fullCircle) {
            return true;
        }
        double afterStart = sign * (startRadialU * dv - startRadialV * du);
        double beforeEnd = sign * (endRadialU * dv - endRadialV * du);
        if (Math.abs(sweep) <= Math.PI) {
            // sweep ≤ π: after the start radius (within π) and before the end radius (within π)
            return afterStart >= 0 && beforeEnd <= 0;
        }
        // sweep > π: outside only strictly inside the complementary sector, which is below π
        return afterStart >= 0 || beforeEnd <= 0;
    }

    @Override
    public double distanceSquared(double pu, double pv) {
        double du = pu - cu;
        double dv = pv - cv;
        if (withinSweep(du, dv)) {
            double off = Math.sqrt(du * du + dv * dv) - radius;
            return off * off;
        }
        double ds = (pu - startU) * (pu - startU) + (pv - startV) * (pv - startV);
        double de = (pu - endU) * (pu - endU) + (pv - endV) * (pv - endV);
        return Math.min(ds, de);
    }

    @Override
    public double nearest(double pu, double pv, double hint, double[] out) {
        double du = pu - cu;
        double dv = pv - cv;
        double rho = Math.sqrt(du * du + dv * dv);
        double s = closestParameter(pu, pv, hint);
        if (rho > 0 && s > 0 && s < length) {
            // interior: the radial projection, no trigonometry for the point and tangent
            double k = radius / rho;
            out[0] = cu + du * k;
            out[1] = cv + dv * k;
            out[2] = -sign * dv / rho;
            out[3] = sign * du / rho;
            return s;
        }
        evaluate(s, out);
        return s;
    }

    @Override
    public double maxAbsTangentProjection(double wu, double wv) {
        double norm = Math.hypot(wu, wv);
        if (norm == 0) {
            return 0;
        }
        double width = Math.abs(sweep);
        if (width >= Math.PI) {
            return norm;
        }
        double tangentStart = startAngle + sign * Math.PI / 2;
        double low = sweep > 0 ? tangentStart : tangentStart + sweep;
        double alpha = Math.atan2(wv, wu);
        // |cos(θ − α)| reaches 1 where θ ≡ α (mod π)
        if (positiveModulo(alpha - low, Math.PI) <= width) {
            return norm;
        }
        return norm * Math.max(Math.abs(Math.cos(low - alpha)), Math.abs(Math.cos(low + width - alpha)));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ArcSegment a && centre.equals(a.centre) && radius == a.radius && startAngle == a.startAngle
                && sweep == a.sweep;
    }

    @Override
    public int hashCode() {
        return ((centre.hashCode() * 31 + Double.hashCode(radius)) * 31 + Double.hashCode(startAngle)) * 31
                + Double.hashCode(sweep);
    }

    @Override
    public String toString() {
        return "ArcSegment[centre=" + centre + ", radius=" + radius + ", startAngle=" + startAngle + ", sweep=" + sweep + "]";
    }

    static double positiveModulo(double x, double m) {
        double r = x % m;
        if (r < 0) {
            r += m;
        }
        return r >= m ? 0 : r;
    }
}
