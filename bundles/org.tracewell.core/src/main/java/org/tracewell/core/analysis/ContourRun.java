package org.tracewell.core.analysis;

import java.util.Optional;

import org.tracewell.engine.contour.CircleTestResult;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.contour.ContourErrorResult;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.sim.TrackingResult;
import org.tracewell.engine.trajectory.Trajectory;

/**
 * One simulated run of a contour: planned trajectory, tracking of both axes, contour error of every sample, and for
 * full circles the circle test of this direction.
 *
 * @param direction    as programmed, or CW / CCW of a circle test
 * @param path         the path this run followed (for the reversed circle: the circle run the other way)
 * @param tracking     reference trajectory and simulated axis positions
 * @param contourError exact contour error per sample
 * @param circleSetup  the circle-test set-up of this run; empty unless the contour is a full circle
 * @param circleTest   G, F, ellipse of this run; empty unless the contour is a full circle
 * @param metrics      the run's figures
 */
public record ContourRun(RunDirection direction, Path path, TrackingResult tracking, ContourErrorResult contourError,
        Optional<CircleTestSetup> circleSetup, Optional<CircleTestResult> circleTest, ContourRunMetrics metrics) {

    /** The reference trajectory of the run. */
    public Trajectory trajectory() {
        return tracking.reference();
    }

    /** Every sample of the run, for CSV and charts. */
    public ContourTimeSeries timeSeries() {
        return new ContourTimeSeries(tracking, contourError);
    }

    /** True when this is the direction the model programs (or the only run of a non-circle contour). */
    public boolean isProgrammedDirection(RunDirection programmed) {
        return direction == RunDirection.PROGRAMMED || direction == programmed;
    }
}
