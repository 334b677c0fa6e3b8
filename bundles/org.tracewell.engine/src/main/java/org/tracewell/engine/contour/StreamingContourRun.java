package org.tracewell.engine.contour;

import java.util.List;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.sim.AxisLoop;
import org.tracewell.engine.sim.AxisStepper;
import org.tracewell.engine.trajectory.FeedProfile;
import org.tracewell.engine.trajectory.TrajectorySampler;

/**
 * Plan-sample-simulate-measure in one pass without holding any per-sample array: each reference sample
 * is produced, fed through every axis loop and measured against the path, then dropped. Memory stays
 * constant however long the path is (10⁷ samples and beyond); the figures match
 * {@code TrackingSimulator} followed by {@code ContourErrorAnalysis} on the same inputs.
 */
public final class StreamingContourRun {

    private StreamingContourRun() {
    }

    /**
     * @param loops  one loop per axis of the path's plane
     * @param window look-ahead of the monotone contour search, metres
     */
    public static StreamingContourSummary run(Path path, FeedProfile profile, double samplePeriod, List<AxisLoop> loops,
                                              double window) {
        TrajectorySampler sampler = new TrajectorySampler(path, profile, samplePeriod);
        int axes = sampler.axisCount();
        if (loops.size() != axes) {
            throw new IllegalArgumentException("need one axis loop per axis of the contour plane: " + axes + " axes, got "
                    + loops.size() + " loops");
        }
        double[] position = new double[axes];
        double[] velocity = new double[axes];
        double[] acceleration = new double[axes];
        double[] actual = new double[axes];
        sampler.sample(0, position, velocity, acceleration);
        AxisStepper[] steppers = new AxisStepper[axes];
        for (int i = 0; i < axes; i++) {
            steppers[i] = new AxisStepper(loops.get(i), samplePeriod, position[i]);
        }
        MonotoneContourSearch search = new MonotoneContourSearch(path, window);
        double[] peakFollowing = new double[axes];
        double[] sumSqFollowing = new double[axes];
        double maxAbs = 0;
        long indexOfMax = 0;
        double parameterOfMax = 0;
        double signedAtMax = 0;
        double sumSq = 0;
        long count = sampler.sampleCount();
        for (long k = 0; k < count; k++) {
            if (k > 0) {
                sampler.sample(k, position, velocity, acceleration);
            }
            for (int i = 0; i < axes; i++) {
                actual[i] = steppers[i].step(position[i], velocity[i], acceleration[i]);
                double e = position[i] - actual[i];
                sumSqFollowing[i] += e * e;
                peakFollowing[i] = Math.max(peakFollowing[i], Math.abs(e));
            }
            double err = search.next(actual);
            sumSq += err * err;
            if (Math.abs(err) > maxAbs) {
                maxAbs = Math.abs(err);
                indexOfMax = k;
                parameterOfMax = search.pathParameter();
                signedAtMax = err;
            }
        }
        double[] rmsFollowing = new double[axes];
        for (int i = 0; i < axes; i++) {
            rmsFollowing[i] = Math.sqrt(sumSqFollowing[i] / count);
        }
        return new StreamingContourSummary(count, maxAbs, signedAtMax, indexOfMax, parameterOfMax,
                Math.sqrt(sumSq / count), peakFollowing, rmsFollowing);
    }
}
