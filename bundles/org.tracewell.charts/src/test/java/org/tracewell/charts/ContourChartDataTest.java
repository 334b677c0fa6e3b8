package org.tracewell.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.contour.CircleTest;
import org.tracewell.engine.contour.CircleTestResult;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.contour.ContourErrorAnalysis;
import org.tracewell.engine.contour.ContourErrorResult;
import org.tracewell.engine.path.ArcDirection;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.path.Point2;
import org.tracewell.engine.sim.AxisLoop;
import org.tracewell.engine.sim.TrackingResult;
import org.tracewell.engine.sim.TrackingSimulator;
import org.tracewell.engine.trajectory.AxisLimits;
import org.tracewell.engine.trajectory.FeedPlanner;
import org.tracewell.engine.trajectory.PathLimits;
import org.tracewell.engine.trajectory.ProfileShape;
import org.tracewell.engine.trajectory.Trajectory;

/**
 * Chart data from a simulated circle test: two equal first-order loops Kv/(s + Kv) on R = 50 mm at F = 2000 mm/min,
 * Kv = 33.33 1/s, whose steady radius loss is R·(1 − 1/√(1 + (ω/Kv)²)) ≈ 10.0 µm (DOMAIN.md §4 [der]).
 */
class ContourChartDataTest {

    private static final double R = 0.050;
    private static final double FEED = 2.0 / 60;
    private static final double KV = 33.33;
    private static final double DT = 1e-3;

    static CircleTestSetup setup;
    static TrackingResult tracking;
    static ContourErrorResult errors;
    static CircleTestResult test;

    @BeforeAll
    static void simulate() {
        setup = new CircleTestSetup(ContourPlane.xy(), new Point2(0.2, 0.1), R, FEED, ArcDirection.CCW, 0,
                Math.PI / 2);
        Path path = setup.path();
        List<AxisLimits> axes = List.of(new AxisLimits(0.5, 5, 500), new AxisLimits(0.5, 5, 500));
        Trajectory reference = Trajectory.sample(path, FeedPlanner.plan(path, PathLimits.of(FEED, 2, 100), axes,
                ProfileShape.S_CURVE), DT);
        tracking = TrackingSimulator.simulate(reference, List.of(AxisLoop.firstOrder("X", KV),
                AxisLoop.firstOrder("Y", KV)));
        errors = ContourErrorAnalysis.analyse(tracking, path, ContourErrorAnalysis.DEFAULT_WINDOW);
        test = CircleTest.evaluate(setup, tracking);
    }

    @Test
    void polarRunHoldsTheEvaluatedTurnAtTheSteadyRadiusLoss() {
        double loss = R * (1 - 1 / Math.sqrt(1 + Math.pow(FEED / R / KV, 2)));
        CircleRun run = ContourChartData.circleRun("CCW", setup, test, errors, 100_000);
        // every evaluated sample, no overshoot arc: one turn of 2πR/F / T samples (±2 for the ends)
        assertEquals(test.evaluatedSamples(), run.angleRad().length, 2);
        for (double d : run.radialDeviation()) {
            // the overshoot arcs let the loops settle; 5 nm as in the engine's circle test (ZOH, start transient)
            assertEquals(-loss, d, 5e-9);
        }
        assertEquals(test.circularDeviation(), run.circularDeviationG(), 0);
        assertEquals(test.radialDeviation(), run.radialDeviationF(), 0);
    }

    @Test
    void deviationDrawsThePathDisplacedAlongItsNormalByTheMagnifiedError() {
        ContourDeviation data = ContourChartData.deviation("circle", errors, 3000);
        double factor = ContourChartData.suggestedMagnification(data, errors.path().length());
        // 0.12 · 100 mm (the diameter) / 10.0 µm = 1200 → 1000 on the 1–2–5 series (Magnification's rule)
        assertEquals(1000, factor, 0);
        JFreeChart chart = ContourDeviationChart.create("c", data, factor, "X", "Y");
        XYDataset drawn = chart.getXYPlot().getDataset();
        for (int i = 0; i < drawn.getItemCount(1); i++) {
            // CCW: the left normal points at the centre, and the loops cut inside (positive error): the drawn point
            // lies factor·e closer to the centre than the programmed one — exact by construction on a circle.
            double programmed = Math.hypot(drawn.getXValue(0, i) - 200, drawn.getYValue(0, i) - 100);
            double shown = Math.hypot(drawn.getXValue(1, i) - 200, drawn.getYValue(1, i) - 100);
            assertEquals(50.0, programmed, 1e-9, "programmed radius, mm");
            assertEquals(programmed - factor * data.signedError()[i] * 1e3, shown, 1e-9);
        }
        assertTrue(data.maxAbsError() > 9.9e-6 && data.maxAbsError() < 10.1e-6, "max " + data.maxAbsError());
    }

    @Test
    void axisTrackIsTheSimulatedRunAndLagsByVOverKv() {
        AxisTrack x = ContourChartData.track("X", tracking, 0);
        assertEquals(tracking.sampleCount(), x.timeSeconds().length, "nothing decimated in the data");
        int k = 4321;
        assertEquals(tracking.reference().position(0, k), x.reference()[k], 0);
        assertEquals(tracking.actual(0, k), x.actual()[k], 0);
        assertEquals(tracking.followingError(0, k), x.followingError()[k], 0);
        // Following error at constant velocity e = v/Kv (DOMAIN.md §4, common practice): over the evaluated turn X
        // peaks where its velocity is F; the first-order lag on a circle gives R·ω/√(Kv² + ω²), 0.02 % below F/Kv.
        // The simulator holds each reference sample for one period (zero-order hold), a lag of T/2 on average, which
        // adds F·T/2 = 16.7 µm [der]. 0.1 % tolerance. (The overall peak is larger still: decelerating at the end
        // adds |a|/Kv².)
        int[] turn = ContourChartData.evaluatedRange(setup, errors);
        double steadyPeak = 0;
        for (int i = turn[0]; i < turn[1]; i++) {
            steadyPeak = Math.max(steadyPeak, Math.abs(x.followingError()[i]));
        }
        assertEquals(FEED / KV + FEED * DT / 2, steadyPeak, 0.001 * FEED / KV);
        JFreeChart chart = TrackingChart.create("t", List.of(x, ContourChartData.track("Y", tracking, 1)),
                DisplayScale.SECONDS);
        String peaks = LiveChartsTest.pointerTexts(((CombinedDomainXYPlot) chart.getPlot()).getSubplots()
                .get(TrackingChart.FOLLOWING_ERROR));
        assertTrue(peaks.contains("X peak ") && peaks.contains("Y peak "), peaks);
    }
}
