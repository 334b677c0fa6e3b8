package org.tracewell.engine.measured;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.tracewell.engine.contour.BidirectionalCircleResult;
import org.tracewell.engine.contour.CircleTest;
import org.tracewell.engine.contour.CircleTestResult;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.path.ArcDirection;
import org.tracewell.engine.path.ContourPlane;

/**
 * ISO 230-4 figures of a measured circular test, computed by the same {@link CircleTest} code as the predictions:
 * per run the least-squares circle, circular deviation G and radial deviation F; with both directions measured,
 * the bidirectional G(b).
 *
 * @param test          the measurement
 * @param runs          one result per measured run, in the test's run order
 * @param bidirectional G(b) when a CW and a CCW run were measured
 */
public record MeasuredCircleEvaluation(MeasuredCircleTest test, List<CircleTestResult> runs,
        Optional<BidirectionalCircleResult> bidirectional) {

    public MeasuredCircleEvaluation {
        runs = List.copyOf(runs);
    }

    /**
     * Evaluates every run. Each run is set up as a test without overshoot arcs that starts at its first sample, so
     * the evaluated 360° is the first full turn the samples travel (later samples, e.g. an overshoot, are left out).
     */
    public static MeasuredCircleEvaluation of(MeasuredCircleTest test) {
        List<CircleTestResult> results = new ArrayList<>();
        for (MeasuredCircleRun run : test.runs()) {
            results.add(CircleTest.evaluate(setup(test, run), run.us(), run.vs()));
        }
        Optional<BidirectionalCircleResult> both = Optional.empty();
        Optional<MeasuredCircleRun> cw = test.run(ArcDirection.CW);
        Optional<MeasuredCircleRun> ccw = test.run(ArcDirection.CCW);
        if (cw.isPresent() && ccw.isPresent()) {
            both = Optional.of(CircleTest.bidirectional(setup(test, cw.get()), cw.get().us(), cw.get().vs(),
                    setup(test, ccw.get()), ccw.get().us(), ccw.get().vs()));
        }
        return new MeasuredCircleEvaluation(test, results, both);
    }

    /** The ISO 230-4 set-up a run was evaluated with. */
    public static CircleTestSetup setup(MeasuredCircleTest test, MeasuredCircleRun run) {
        double start = Math.atan2(run.v(0) - test.centre().v(), run.u(0) - test.centre().u());
        return new CircleTestSetup(ContourPlane.xy(), test.centre(), test.radius(), test.feed(), run.direction(), start,
                0);
    }

    /** The result of the run in this direction, if measured. */
    public Optional<CircleTestResult> run(ArcDirection direction) {
        return runs.stream().filter(r -> r.direction() == direction).findFirst();
    }

    /** Largest circular deviation G over the runs, metres. */
    public double circularDeviation() {
        return runs.stream().mapToDouble(CircleTestResult::circularDeviation).max().orElseThrow();
    }

    /** Largest radial deviation F (larger magnitude of the two extremes) over the runs, metres. */
    public double radialDeviation() {
        return runs.stream().mapToDouble(CircleTestResult::radialDeviation).max().orElseThrow();
    }
}
