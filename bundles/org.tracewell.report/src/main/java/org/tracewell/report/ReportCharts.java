package org.tracewell.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.jfree.chart.JFreeChart;
import org.tracewell.charts.BodeChart;
import org.tracewell.charts.BudgetBar;
import org.tracewell.charts.BudgetBarChart;
import org.tracewell.charts.CircleRun;
import org.tracewell.charts.CircleTestChart;
import org.tracewell.charts.ContourChartData;
import org.tracewell.charts.ContourDeviation;
import org.tracewell.charts.ContourDeviationChart;
import org.tracewell.charts.DisplayScale;
import org.tracewell.charts.FrequencySeries;
import org.tracewell.charts.Margins;
import org.tracewell.charts.ReversalPoint;
import org.tracewell.charts.TimeChart;
import org.tracewell.charts.TimeSeries;
import org.tracewell.core.analysis.ContourResult;
import org.tracewell.core.analysis.ContourRun;
import org.tracewell.core.analysis.ContourTimeSeries;
import org.tracewell.core.analysis.RequirementBudget;
import org.tracewell.engine.budget.BudgetEvaluation;
import org.tracewell.engine.budget.LineContribution;
import org.tracewell.engine.budget.TargetComparison;
import org.tracewell.engine.contour.CircleTestResult;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.contour.ContourErrorResult;
import org.tracewell.engine.loop.FrequencyGrid;
import org.tracewell.engine.loop.LoopAnalysis;
import org.tracewell.engine.tf.FrequencyResponse;
import org.tracewell.engine.tf.TransferFunction;

/** Turns analysis results into the report's charts (SI in, the charts bundle shows trade units). */
final class ReportCharts {

    /** Samples kept for the contour-deviation and polar plots (the charts keep each run's peak). */
    static final int DISPLAY_POINTS = 4000;

    private ReportCharts() {
    }

    /** Open-loop Bode chart of {@code loop} with the summary margins of {@code margins} marked. */
    static JFreeChart bode(String title, String seriesName, TransferFunction loop,
            org.tracewell.engine.loop.Margins margins) {
        FrequencyResponse response = loop.frequencyResponse(FrequencyGrid.forLoop(loop));
        double[] magnitude = new double[response.size()];
        double[] phaseRad = response.unwrappedPhaseDeg();
        for (int i = 0; i < magnitude.length; i++) {
            magnitude[i] = response.magnitude(i);
            phaseRad[i] = Math.toRadians(phaseRad[i]);
        }
        Margins marked = new Margins(margins.gainCrossoverRadPerSec().orElse(Double.NaN),
                Math.toRadians(margins.phaseMarginDeg()), margins.phaseCrossoverRadPerSec().orElse(Double.NaN),
                margins.gainMarginFactor());
        return BodeChart.create(title, List.of(new FrequencySeries(seriesName, response.omegas(), magnitude, phaseRad)),
                marked);
    }

    /** Unit-step response of the closed loop; empty when the loop is not stable. */
    static Optional<JFreeChart> step(String title, LoopAnalysis analysis) {
        return analysis.step().map(response -> TimeChart.create(title,
                List.of(new TimeSeries("y(t)", response.times(), response.values())), DisplayScale.MILLISECONDS,
                DisplayScale.RATIO.named("Position / commanded step"), Double.NaN, false));
    }

    /** Following error of both axes of one run against time, in µm. */
    static JFreeChart followingError(String title, ContourResult contour, ContourRun run) {
        ContourTimeSeries series = run.timeSeries();
        int n = series.sampleCount();
        double[] t = new double[n];
        double[] first = new double[n];
        double[] second = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = series.time(k);
            first[k] = series.followingError(0, k);
            second[k] = series.followingError(1, k);
        }
        List<TimeSeries> both = contour.firstAxisName().equals(contour.secondAxisName())
                ? List.of(new TimeSeries(contour.firstAxisName() + " (u)", t, first),
                        new TimeSeries(contour.secondAxisName() + " (v)", t, second))
                : List.of(new TimeSeries(contour.firstAxisName(), t, first),
                        new TimeSeries(contour.secondAxisName(), t, second));
        return TimeChart.create(title, both, DisplayScale.SECONDS,
                DisplayScale.MICROMETRES.named("Following error"), Double.NaN, false);
    }

    /** The programmed path with the contour error magnified along the normal; the factor is returned with it. */
    static Magnified contourDeviation(String title, ContourResult contour, ContourRun run) {
        ContourErrorResult errors = run.contourError();
        ContourDeviation data = ContourChartData.deviation(contour.contourName(), errors, DISPLAY_POINTS);
        double factor = ContourChartData.suggestedMagnification(data, errors.path().length());
        return new Magnified(ContourDeviationChart.create(title, data, factor, contour.firstAxisName(),
                contour.secondAxisName()), factor);
    }

    /** Polar plot of the circle-test runs of a full-circle contour; empty when no run has a circle test. */
    static Optional<Magnified> circleTest(String title, ContourResult contour) {
        List<CircleRun> runs = PredictedCircleRuns.of(contour);
        if (runs.isEmpty()) {
            return Optional.empty();
        }
        double radius = contour.radius() > 0 ? contour.radius()
                : contour.runs().get(0).circleSetup().get().radius();
        double bidirectional = contour.bidirectional().map(b -> b.bidirectionalDeviation()).orElse(Double.NaN);
        List<ReversalPoint> reversals = ReversalPoint.quadrants(contour.firstAxisName(), contour.secondAxisName());
        CircleTestChart.Scale scale = CircleTestChart.scaleOf(radius, runs);
        return Optional.of(new Magnified(CircleTestChart.create(title, radius, runs, bidirectional, reversals,
                contour.firstAxisName(), contour.secondAxisName()), scale.magnification()));
    }

    /** Polar radial deviation of the evaluated samples of a circle-test run (overshoot arcs left out). */
    static CircleRun polar(String label, CircleTestSetup setup, CircleTestResult test, ContourErrorResult errors) {
        return ContourChartData.circleRun(label, setup, test, errors, DISPLAY_POINTS);
    }

    /** Ranked budget contributors against the requirement's limit (and the allowed total after the reserve). */
    static JFreeChart budget(String title, RequirementBudget budget) {
        BudgetEvaluation evaluation = budget.evaluation();
        List<BudgetBar> bars = new ArrayList<>();
        for (LineContribution c : evaluation.ranking()) {
            String axis = c.line().axis() == null ? "" : c.line().axis() + ": ";
            bars.add(new BudgetBar(axis + c.line().name() + " [" + c.line().id() + "]", Math.max(0, c.portion())));
        }
        double target = evaluation.comparison().map(TargetComparison::target).orElse(Double.NaN);
        double allowed = evaluation.comparison().map(TargetComparison::allowedTotal).orElse(Double.NaN);
        return BudgetBarChart.create(title, bars, "total (" + evaluation.method().displayName() + ")",
                evaluation.total(), target, allowed);
    }

    /** A chart drawn with a magnification factor that the page prints beside it. */
    record Magnified(JFreeChart chart, double factor) {
    }
}
