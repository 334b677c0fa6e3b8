package org.tracewell.ui.views;

import java.util.ArrayList;
import java.util.List;

import org.tracewell.charts.CircleRun;
import org.tracewell.charts.CircleTestChart;
import org.tracewell.charts.ContourChartData;
import org.tracewell.charts.ReversalPoint;
import org.tracewell.core.analysis.ContourResult;
import org.tracewell.core.analysis.ContourRun;
import org.tracewell.engine.contour.BidirectionalCircleResult;

/**
 * Circle Test: the selected full-circle contour tested both ways (ISO 230-4 set-up with overshoot arcs), as a polar
 * plot of the magnified radial deviation of the CW and CCW runs, with G and F of each run, G(b) of both, and the
 * points where each axis reverses.
 */
public final class CircleTestView extends ContourView {

    public static final String ID = "org.tracewell.ui.view.circleTest";

    @Override
    boolean accepts(ContourResult contour) {
        return contour.fullCircle();
    }

    @Override
    String noContourMessage(String machineName) {
        return machineName + " has no full-circle contour: a circle test needs a contour of one full circle.";
    }

    @Override
    boolean choosesRun() {
        return false;
    }

    @Override
    boolean planePlot() {
        return true;
    }

    @Override
    Drawing draw(ContourResult contour, int runIndex, Object options, int widthPx) {
        List<CircleRun> runs = new ArrayList<>();
        StringBuilder figures = new StringBuilder();
        for (ContourRun run : contour.runs()) {
            if (run.circleSetup().isEmpty() || run.circleTest().isEmpty()) {
                continue;
            }
            CircleRun polar = ContourChartData.circleRun(run.direction().label(), run.circleSetup().get(),
                    run.circleTest().get(), run.contourError(), displayPoints(widthPx));
            runs.add(polar);
            figures.append(polar.label()).append(": G ").append(Units.um(polar.circularDeviationG()))
                    .append(" µm, F ").append(Units.um(polar.radialDeviationF())).append(" µm · ");
        }
        double bidirectional = contour.bidirectional().map(BidirectionalCircleResult::bidirectionalDeviation)
                .orElse(Double.NaN);
        if (Double.isFinite(bidirectional)) {
            figures.append("G(b) ").append(Units.um(bidirectional)).append(" µm · ");
        }
        figures.append("R ").append(Units.plain(contour.radius() * 1e3, 3)).append(" mm at F ")
                .append(Units.mPerMin(contour.feed())).append(" m/min");
        return new Drawing(CircleTestChart.create(contour.contourName(), contour.radius(), runs, bidirectional,
                ReversalPoint.quadrants(contour.firstAxisName(), contour.secondAxisName()), contour.firstAxisName(),
                contour.secondAxisName(), widthPx, true), figures.toString());
    }
}
