package org.tracewell.report;

import java.util.ArrayList;
import java.util.List;

import org.tracewell.charts.CircleRun;
import org.tracewell.core.analysis.ContourResult;
import org.tracewell.core.analysis.ContourRun;

/**
 * The simulated runs of a full-circle contour as the circle-test plot draws them (polar angle and radial deviation
 * of every evaluated sample), for the report and for anything that overlays measured runs on them.
 */
public final class PredictedCircleRuns {

    private PredictedCircleRuns() {
    }

    /** One run per simulated direction that has a circle test; empty for other contours. */
    public static List<CircleRun> of(ContourResult contour) {
        List<CircleRun> runs = new ArrayList<>();
        for (ContourRun run : contour.runs()) {
            if (run.circleTest().isEmpty() || run.circleSetup().isEmpty()) {
                continue;
            }
            runs.add(ReportCharts.polar(run.direction().label(), run.circleSetup().get(), run.circleTest().get(),
                    run.contourError()));
        }
        return runs;
    }
}
