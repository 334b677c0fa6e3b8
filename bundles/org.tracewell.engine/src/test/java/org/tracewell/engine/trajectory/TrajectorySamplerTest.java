package org.tracewell.engine.trajectory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.LineSegment;
import org.tracewell.engine.path.Path;

class TrajectorySamplerTest {

    @Test
    void tiltedPlaneMapsFeedOntoThreeAxes() {
        double s = Math.sqrt(0.5);
        ContourPlane tilted = ContourPlane.of(new double[] {0.1, 0.2, 0.3}, new double[] {s, 0, s}, new double[] {0, 1, 0});
        Path path = Path.of(tilted, List.of(LineSegment.of(0, 0, 0.06, 0.08))); // direction (0.6, 0.8) in-plane
        FeedProfile profile = FeedPlanner.constantFeed(path, 0.1);
        Trajectory traj = Trajectory.sample(path, profile, 1e-3);
        int k = 300;
        // axis velocity = F·(t_u·u + t_v·v) = 0.1·(0.6·s, 0.8, 0.6·s) (geometry)
        assertEquals(0.1 * 0.6 * s, traj.velocity(0, k), 1e-15);
        assertEquals(0.1 * 0.8, traj.velocity(1, k), 1e-15);
        assertEquals(0.1 * 0.6 * s, traj.velocity(2, k), 1e-15);
        assertEquals(0.3 + 0.1 * k * 1e-3 * 0.6 * s, traj.position(2, k), 1e-15);
        TrajectorySampler sampler = new TrajectorySampler(path, profile, 1e-3);
        double[] p = new double[3];
        double[] v = new double[3];
        double[] a = new double[3];
        sampler.sample(k, p, v, a);
        assertEquals(traj.position(0, k), p[0], 0.0);
        assertEquals(traj.sampleCount(), sampler.sampleCount());
        assertThrows(IndexOutOfBoundsException.class, () -> sampler.sample(sampler.sampleCount(), p, v, a));
    }

    @Test
    void profileForAnotherPathIsRejected() {
        Path a = Path.of(ContourPlane.xy(), List.of(LineSegment.of(0, 0, 1, 0)));
        Path b = Path.of(ContourPlane.xy(), List.of(LineSegment.of(0, 0, 2, 0)));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Trajectory.sample(b, FeedPlanner.constantFeed(a, 0.1), 1e-3));
        assertEquals("feed profile covers 1.0 m but the path is 2.0 m long; plan the profile for this path", e.getMessage());
    }
}
