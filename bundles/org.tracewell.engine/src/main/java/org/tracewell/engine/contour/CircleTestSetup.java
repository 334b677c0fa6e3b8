package org.tracewell.engine.contour;

import java.util.ArrayList;
import java.util.List;
import org.tracewell.engine.path.ArcDirection;
import org.tracewell.engine.path.ArcSegment;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.path.Point2;
import org.tracewell.engine.path.Segment;

/**
 * A circular test set up as ISO 230-4 describes it (plane, centre position, radius, feed, direction,
 * start point and overshoot arcs): the path runs an overshoot arc up to the start angle, the full
 * evaluated circle, and an overshoot arc past it; only the full circle is evaluated.
 *
 * @param plane          contour plane of the two (or three) axes
 * @param centre         nominal centre in plane coordinates, metres
 * @param radius         nominal radius, metres, &gt; 0
 * @param feed           programmed feed, m/s, &gt; 0
 * @param direction      CW or CCW
 * @param startAngle     polar angle where the evaluated circle starts and ends, radians
 * @param overshootAngle length of each overshoot arc, radians, 0 ≤ angle ≤ 2π
 */
public record CircleTestSetup(ContourPlane plane, Point2 centre, double radius, double feed, ArcDirection direction,
                              double startAngle, double overshootAngle) {

    public CircleTestSetup {
        if (plane == null || centre == null || direction == null) {
            throw new IllegalArgumentException("circle test needs a plane, a centre and a direction");
        }
        if (!(radius > 0) || !Double.isFinite(radius)) {
            throw new IllegalArgumentException("circle test radius must be finite and > 0 m, got " + radius);
        }
        if (!(feed > 0) || !Double.isFinite(feed)) {
            throw new IllegalArgumentException("circle test feed must be finite and > 0 m/s, got " + feed);
        }
        if (!(overshootAngle >= 0 && overshootAngle <= 2 * Math.PI)) {
            throw new IllegalArgumentException("overshoot angle must lie in 0..2π rad, got " + overshootAngle);
        }
    }

    /** The programmed path: overshoot in, full circle, overshoot out (the overshoots omitted when 0). */
    public Path path() {
        int sign = direction.sign();
        List<Segment> segments = new ArrayList<>();
        if (overshootAngle > 0) {
            segments.add(new ArcSegment(centre, radius, startAngle - sign * overshootAngle, sign * overshootAngle));
        }
        segments.add(ArcSegment.fullCircle(centre, radius, startAngle, direction));
        if (overshootAngle > 0) {
            segments.add(new ArcSegment(centre, radius, startAngle, sign * overshootAngle));
        }
        return Path.of(plane, segments);
    }

    /** The same test in the other direction (start angle and overshoots unchanged). */
    public CircleTestSetup reversed() {
        return new CircleTestSetup(plane, centre, radius, feed, direction.reversed(), startAngle, overshootAngle);
    }

    /** Angular velocity of the programmed motion, rad/s. */
    public double angularVelocity() {
        return feed / radius;
    }
}
