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
import org.tracewell.charts.ContourDeviation;
import org.tracewell.charts.ContourDeviationChart;
import org.tracewell.charts.DisplayScale;
import org.tracewell.charts.FrequencySeries;
import org.tracewell.charts.Magnification;
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
import org.tracewell.engine.path.Path;
import org.tracewell.engine.path.Point2;
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
        Path path = errors.path();
        int[] keep = ContourDeviationChart.displayIndices(errors.signedErrors(), DISPLAY_POINTS);
        int m = keep.length;
        double[] pu = new double[m];
        double[] pv = new double[m];
        double[] nu = new double[m];
        double[] nv = new double[m];
        double[] e = new double[m];
        for (int i = 0; i < m; i++) {
            double s = errors.pathParameter(keep[i]);
            Point2 p = path.pointAt(s);
            Point2 normal = path.normalAt(s);
            pu[i] = p.u();
            pv[i] = p.v();
            nu[i] = normal.u();
            nv[i] = normal.v();
            e[i] = errors.signedError(keep[i]);
        }
        ContourDeviation data = new ContourDeviation(contour.contourName(), pu, pv, nu, nv, e);
        double extent = data.extent() > 0 ? data.extent() : path.length();
        double factor = extent > 0 ? Magnification.suggest(extent, data.maxAbsError(), Magnification.DEFAULT_FRACTION)
                : 1;
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

    /**
     * Polar angle about the nominal centre and radial deviation ρ − R of every evaluated sample (overshoot arcs
     * left out). The actual point is rebuilt from its nearest path point and the signed contour error along the
     * left normal, which is exact for the shortest-distance error.
     */
    static CircleRun polar(String label, CircleTestSetup setup, CircleTestResult test, ContourErrorResult errors) {
        Path path = errors.path();
        int[] range = evaluatedRange(setup, errors);
        double[] window = java.util.Arrays.copyOfRange(errors.signedErrors(), range[0], range[1]);
        int[] keep = ContourDeviationChart.displayIndices(window, DISPLAY_POINTS);
        double[] angle = new double[keep.length];
        double[] deviation = new double[keep.length];
        for (int i = 0; i < keep.length; i++) {
            int k = range[0] + keep[i];
            double s = errors.pathParameter(k);
            Point2 p = path.pointAt(s);
            Point2 normal = path.normalAt(s);
            double e = errors.signedError(k);
            double du = p.u() + e * normal.u() - setup.centre().u();
            double dv = p.v() + e * normal.v() - setup.centre().v();
            angle[i] = Math.atan2(dv, du);
            deviation[i] = Math.hypot(du, dv) - setup.radius();
        }
        return new CircleRun(label, angle, deviation, test.circularDeviation(), test.radialDeviation());
    }

    /**
     * Samples [from, to) of the evaluated full circle, in time order: from the first sample whose nearest path
     * point lies on the circle segment up to the first that leaves it. Leaving is also recognised by the nearest
     * point jumping back by more than half a turn: the outgoing overshoot arc lies on top of the circle's start,
     * and a nearest-point search may place its samples there rather than on the overshoot segment.
     */
    static int[] evaluatedRange(CircleTestSetup setup, ContourErrorResult errors) {
        Path path = errors.path();
        int full = setup.overshootAngle() > 0 && path.segmentCount() > 1 ? 1 : 0;
        double start = path.segmentStart(full);
        double end = start + path.segment(full).length();
        double halfTurn = Math.PI * setup.radius();
        double[] s = errors.pathParameters();
        int from = 0;
        while (from < s.length && s[from] < start) {
            from++;
        }
        int to = from;
        while (to < s.length && s[to] <= end && (to == from || s[to] > s[to - 1] - halfTurn)) {
            to++;
        }
        return new int[] {from, to};
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
