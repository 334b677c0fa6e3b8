package org.tracewell.engine.contour;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.path.Point2;
import org.tracewell.engine.path.Polyline;
import org.tracewell.engine.sim.AxisLoop;
import org.tracewell.engine.sim.TrackingResult;
import org.tracewell.engine.sim.TrackingSimulator;
import org.tracewell.engine.trajectory.AxisLimits;
import org.tracewell.engine.trajectory.FeedPlanner;
import org.tracewell.engine.trajectory.FeedProfile;
import org.tracewell.engine.trajectory.PathLimits;
import org.tracewell.engine.trajectory.ProfileShape;
import org.tracewell.engine.trajectory.Trajectory;

class StreamingContourRunTest {

    @Test
    void streamingRunMatchesTheStoredPipeline() {
        // a 3-axis blended polyline in a tilted plane, mismatched loops: every stage takes part
        double s = Math.sqrt(0.5);
        ContourPlane tilted = ContourPlane.of(new double[] {0.1, 0.2, 0.05}, new double[] {s, 0, s}, new double[] {0, 1, 0});
        Path path = Polyline.blended(tilted, List.of(new Point2(0, 0), new Point2(0.03, 0.005), new Point2(0.035, 0.03),
                new Point2(0.0, 0.04)), 30e-6);
        AxisLimits lim = new AxisLimits(0.5, 4, 400);
        FeedProfile profile = FeedPlanner.plan(path, PathLimits.of(0.1, 2, 200), List.of(lim, lim, lim),
                ProfileShape.S_CURVE);
        List<AxisLoop> loops = List.of(AxisLoop.withVelocityLag("X", 40, 3e-3, 0.5, 0),
                AxisLoop.firstOrder("Y", 35), AxisLoop.withVelocityLag("Z", 30, 5e-3, 0, 0));
        double dt = 5e-4;
        TrackingResult stored = TrackingSimulator.simulate(Trajectory.sample(path, profile, dt), loops);
        ContourErrorResult contour = ContourErrorAnalysis.analyse(stored);
        StreamingContourSummary streamed = StreamingContourRun.run(path, profile, dt, loops,
                ContourErrorAnalysis.DEFAULT_WINDOW);
        // same arithmetic in the same order: agreement to rounding
        assertEquals(stored.sampleCount(), streamed.sampleCount());
        assertEquals(contour.maxAbsError(), streamed.maxAbsContourError(), 1e-15);
        assertEquals(contour.indexOfMax(), streamed.indexOfMax());
        assertEquals(contour.rmsError(), streamed.rmsContourError(), 1e-15);
        for (int i = 0; i < 3; i++) {
            assertEquals(stored.peakFollowingError(i), streamed.peakFollowingError(i), 1e-15);
            assertEquals(stored.rmsFollowingError(i), streamed.rmsFollowingError(i), 1e-15);
        }
    }
}
