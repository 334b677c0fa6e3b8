package org.tracewell.engine.trajectory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.path.ArcDirection;
import org.tracewell.engine.path.ArcSegment;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.LineSegment;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.path.Point2;
import org.tracewell.engine.path.Polyline;

class FeedPlannerTest {

    private static final List<AxisLimits> FREE = List.of(AxisLimits.unlimited(), AxisLimits.unlimited());

    private static Path line(double u0, double v0, double u1, double v1) {
        return Path.of(ContourPlane.xy(), List.of(LineSegment.of(u0, v0, u1, v1)));
    }

    @Test
    void sCurveRestToRestHasTheSevenPhaseDurationAndReachesTheEndExactly() {
        Path path = line(0.01, 0.02, 0.11, 0.02);
        PathLimits limits = PathLimits.of(0.1, 1.0, 20.0);
        FeedProfile profile = FeedPlanner.plan(path, limits, FREE, ProfileShape.S_CURVE);
        // seven phases (jerk+, accel, jerk−, cruise, jerk−, decel, jerk+) since F ≥ A²/J and the
        // ramps fit: T = L/F + F/A + A/J (Biagiotti & Melchiorri 2008, §3.4, from memory; [der] from the
        // symmetric ramps, each covering F/2·(F/A + A/J))
        assertEquals(7, profile.pieceCount());
        assertEquals(0.1 / 0.1 + 0.1 / 1.0 + 1.0 / 20.0, profile.duration(), 1e-12);

        double dt = 1e-4;
        Trajectory traj = Trajectory.sample(path, profile, dt);
        int last = traj.sampleCount() - 1;
        assertEquals(0.11, traj.position(0, last), 0.0); // end reached exactly
        assertEquals(0.02, traj.position(1, last), 0.0);
        assertEquals(0.0, traj.velocity(0, last), 1e-12);
        assertEquals(0.01, traj.position(0, 0), 0.0);

        double maxJerk = 0;
        for (int k = 0; k + 1 < traj.sampleCount(); k++) {
            assertTrue(traj.velocity(0, k) <= 0.1 * (1 + 1e-12), "feed limit at sample " + k);
            assertTrue(Math.abs(traj.acceleration(0, k)) <= 1.0 * (1 + 1e-12), "acceleration limit at sample " + k);
            maxJerk = Math.max(maxJerk, Math.abs(traj.acceleration(0, k + 1) - traj.acceleration(0, k)) / dt);
        }
        assertTrue(maxJerk <= 20.0 * (1 + 1e-9), "finite-difference jerk " + maxJerk + " exceeds 20 m/s³");
        assertEquals(0.1, profile.maxFeed(), 1e-12);
    }

    @Test
    void sampledVelocityIntegratesToThePosition() {
        // independent consistency: Simpson integration of the sampled velocity reproduces the travel
        Path path = line(0, 0, 0.05, 0);
        FeedProfile profile = FeedPlanner.plan(path, PathLimits.of(0.2, 2.0, 50.0), FREE, ProfileShape.S_CURVE);
        double dt = 1e-5;
        Trajectory traj = Trajectory.sample(path, profile, dt);
        int n = traj.sampleCount() - 2; // the last sample is held at the end, skip it
        if (n % 2 == 1) {
            n--;
        }
        double sum = traj.velocity(0, 0) + traj.velocity(0, n);
        for (int k = 1; k < n; k++) {
            sum += (k % 2 == 1 ? 4 : 2) * traj.velocity(0, k);
        }
        assertEquals(traj.position(0, n), sum * dt / 3, 1e-12);
    }

    @Test
    void shortMoveNeverReachesTheFeed() {
        Path path = line(0, 0, 0.001, 0);
        FeedProfile profile = FeedPlanner.plan(path, PathLimits.of(1.0, 1.0, 100.0), FREE, ProfileShape.S_CURVE);
        assertTrue(profile.maxFeed() < 1.0);
        // rest to rest without cruise: the two ramps meet; distance = v_peak·(v_peak/A + A/J) [der]
        double vp = profile.maxFeed();
        double ramp = vp * 100 >= 1.0 ? vp / 1.0 + 1.0 / 100 : 2 * Math.sqrt(vp / 100);
        assertEquals(0.001, vp * ramp, 1e-12);
    }

    @Test
    void trapezoidalDurationMatchesTheClosedForm() {
        Path path = line(0, 0, 0.3, 0.4);
        FeedProfile profile = FeedPlanner.plan(path, PathLimits.of(0.5, 2.0, Double.POSITIVE_INFINITY), FREE,
                ProfileShape.TRAPEZOIDAL);
        // T = L/F + F/A for a trapezoid that reaches the feed (elementary kinematics)
        assertEquals(0.5 / 0.5 + 0.5 / 2.0, profile.duration(), 1e-12);
        assertEquals(3, profile.pieceCount());
    }

    @Test
    void axisVelocityAndAccelerationLimitsReduceTheDiagonalFeed() {
        Path path = line(0, 0, 0.2, 0.1);
        double theta = Math.atan2(0.1, 0.2);
        List<AxisLimits> axes = List.of(new AxisLimits(0.05, 0.5, 10), new AxisLimits(1, 10, 1000));
        PathLimits limits = PathLimits.of(0.2, 5.0, 200.0);
        SegmentFeedLimit seg = FeedPlanner.segmentLimits(path, limits, axes, ProfileShape.S_CURVE)[0];
        assertEquals(0.05 / Math.cos(theta), seg.feed(), 1e-12);
        assertEquals("axis 0 velocity", seg.limitedBy());
        assertEquals(0.5 / Math.cos(theta), seg.acceleration(), 1e-12);
        assertEquals(10 / Math.cos(theta), seg.jerk(), 1e-12);
        Trajectory traj = Trajectory.sample(path, FeedPlanner.plan(path, limits, axes, ProfileShape.S_CURVE), 1e-4);
        assertEquals(0.05, traj.peakVelocity(0), 1e-12);
        assertTrue(traj.peakAcceleration(0) <= 0.5 * (1 + 1e-12));
    }

    @Test
    void arcsLimitCentripetalAcceleration() {
        Path path = Path.of(ContourPlane.xy(),
                List.of(ArcSegment.fullCircle(new Point2(0, 0), 0.01, 0, ArcDirection.CCW)));
        PathLimits limits = PathLimits.of(0.1, 0.5, 1000.0);
        SegmentFeedLimit seg = FeedPlanner.segmentLimits(path, limits, FREE, ProfileShape.S_CURVE)[0];
        assertEquals(Math.sqrt(0.5 * 0.01), seg.feed(), 1e-12); // F²/R ≤ a
        assertEquals("centripetal", seg.limitedBy());
        FeedProfile profile = FeedPlanner.plan(path, limits, FREE, ProfileShape.S_CURVE);
        assertTrue(profile.maxFeed() <= Math.sqrt(0.005) * (1 + 1e-12));
        // the feed reaches the limit and the sampled radial acceleration stays within 0.5 m/s²
        Trajectory traj = Trajectory.sample(path, profile, 1e-4);
        for (int k = 0; k < traj.sampleCount(); k++) {
            double ax = traj.acceleration(0, k);
            double ay = traj.acceleration(1, k);
            double x = traj.position(0, k);
            double y = traj.position(1, k);
            double radial = -(ax * x + ay * y) / Math.hypot(x, y);
            assertTrue(radial <= 0.5 * (1 + 1e-9), "centripetal acceleration " + radial + " at sample " + k);
        }
    }

    @Test
    void exactStopCornersDecelerateToZero() {
        Path path = Polyline.exactStop(ContourPlane.xy(), List.of(new Point2(0, 0), new Point2(0.02, 0),
                new Point2(0.02, 0.02)));
        FeedProfile profile = FeedPlanner.plan(path, PathLimits.of(0.1, 1.0, 50.0), FREE, ProfileShape.S_CURVE);
        Trajectory traj = Trajectory.sample(path, profile, 1e-4);
        double slowestNearCorner = Double.POSITIVE_INFINITY;
        for (int k = 0; k < traj.sampleCount(); k++) {
            if (Math.abs(traj.pathPosition(k) - 0.02) < 1e-6) {
                slowestNearCorner = Math.min(slowestNearCorner, Math.hypot(traj.velocity(0, k), traj.velocity(1, k)));
            }
        }
        // the feed is zero at the corner; a sample within dt of a rest point moves at most J·dt²/2
        // = 2.5e-7 m/s (S-curve starts from rest with constant jerk) [der]
        assertTrue(slowestNearCorner <= 50.0 * 1e-8 / 2 * (1 + 1e-9), "speed at the exact-stop corner " + slowestNearCorner);
    }

    @Test
    void blendedCornersKeepMoving() {
        Path path = Polyline.blended(ContourPlane.xy(), List.of(new Point2(0, 0), new Point2(0.05, 0),
                new Point2(0.05, 0.05)), 50e-6);
        PathLimits limits = PathLimits.of(0.1, 2.0, 100.0);
        SegmentFeedLimit[] segs = FeedPlanner.segmentLimits(path, limits, FREE, ProfileShape.S_CURVE);
        FeedProfile profile = FeedPlanner.plan(path, limits, FREE, ProfileShape.S_CURVE);
        Trajectory traj = Trajectory.sample(path, profile, 1e-4);
        double arcMid = path.segmentStart(1) + path.segment(1).length() / 2;
        double minSpeedOnArc = Double.POSITIVE_INFINITY;
        for (int k = 0; k < traj.sampleCount(); k++) {
            if (Math.abs(traj.pathPosition(k) - arcMid) < path.segment(1).length() / 2) {
                minSpeedOnArc = Math.min(minSpeedOnArc, Math.hypot(traj.velocity(0, k), traj.velocity(1, k)));
            }
        }
        assertTrue(minSpeedOnArc > 0.5 * segs[1].feed(), "blend must not stop: " + minSpeedOnArc);
        assertTrue(minSpeedOnArc <= segs[1].feed() * (1 + 1e-9));
    }

    @Test
    void manySegmentPathKeepsEveryLimitAndEndsExactly() {
        // a seeded random blended polyline: 40 corners, short and long legs, sharp and shallow turns
        java.util.Random random = new java.util.Random(5);
        List<Point2> pts = new java.util.ArrayList<>();
        double u = 0;
        double v = 0;
        pts.add(new Point2(u, v));
        for (int i = 0; i < 41; i++) {
            double heading = (random.nextDouble() - 0.5) * 2.5 + (i % 2) * 1.2;
            double leg = 0.001 + 0.02 * random.nextDouble();
            u += leg * Math.cos(heading);
            v += leg * Math.sin(heading);
            pts.add(new Point2(u, v));
        }
        Path path = Polyline.blended(ContourPlane.xy(), pts, 20e-6);
        List<AxisLimits> axes = List.of(new AxisLimits(0.15, 1.5, 60), new AxisLimits(0.12, 1.0, 40));
        PathLimits limits = PathLimits.of(0.2, 2.0, 100.0);
        SegmentFeedLimit[] seg = FeedPlanner.segmentLimits(path, limits, axes, ProfileShape.S_CURVE);
        FeedProfile profile = FeedPlanner.plan(path, limits, axes, ProfileShape.S_CURVE);
        double dt = 5e-4;
        Trajectory traj = Trajectory.sample(path, profile, dt);
        int last = traj.sampleCount() - 1;
        assertEquals(pts.get(pts.size() - 1).u(), traj.position(0, last), 0.0);
        assertEquals(pts.get(pts.size() - 1).v(), traj.position(1, last), 0.0);
        for (int k = 0; k < traj.sampleCount(); k++) {
            int i = path.segmentIndexAt(traj.pathPosition(k));
            double feed = Math.hypot(traj.velocity(0, k), traj.velocity(1, k));
            assertTrue(feed <= seg[i].feed() * (1 + 1e-9) + 1e-12, "feed " + feed + " above segment " + i + " limit");
            assertTrue(Math.abs(traj.velocity(0, k)) <= 0.15 * (1 + 1e-9), "X velocity at sample " + k);
            assertTrue(Math.abs(traj.velocity(1, k)) <= 0.12 * (1 + 1e-9), "Y velocity at sample " + k);
            if (path.segment(i) instanceof LineSegment) {
                // on lines the axis acceleration limits hold exactly (see FeedPlanner's scope note)
                assertTrue(Math.abs(traj.acceleration(0, k)) <= 1.5 * (1 + 1e-9), "X acceleration at sample " + k);
                assertTrue(Math.abs(traj.acceleration(1, k)) <= 1.0 * (1 + 1e-9), "Y acceleration at sample " + k);
            }
            if (k > 0) {
                double step = Math.hypot(traj.position(0, k) - traj.position(0, k - 1),
                        traj.position(1, k) - traj.position(1, k - 1));
                assertTrue(step <= 0.2 * dt * (1 + 1e-9), "position jump " + step + " at sample " + k);
            }
        }
        assertTrue(profile.maxFeed() <= 0.2 * (1 + 1e-12));
    }

    @Test
    void badInputsNameTheValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> PathLimits.of(-1, 1, 1));
        assertTrue(e.getMessage().contains("-1"));
        Path path = line(0, 0, 1, 0);
        assertThrows(IllegalArgumentException.class,
                () -> FeedPlanner.plan(path, PathLimits.of(1, 1, Double.POSITIVE_INFINITY), FREE, ProfileShape.S_CURVE));
        assertThrows(IllegalArgumentException.class,
                () -> FeedPlanner.plan(path, PathLimits.of(1, 1, 1), List.of(AxisLimits.unlimited()), ProfileShape.S_CURVE));
    }
}
