package org.tracewell.engine.variation;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.ForkJoinPool;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.budget.LimitBound;
import org.tracewell.engine.contour.CircleTest;
import org.tracewell.engine.contour.CircleTestResult;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.contour.ContourErrorAnalysis;
import org.tracewell.engine.contour.ContourErrorResult;
import org.tracewell.engine.path.ArcDirection;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.Point2;
import org.tracewell.engine.sim.TrackingResult;
import org.tracewell.engine.sim.TrackingSimulator;
import org.tracewell.engine.trajectory.AxisLimits;
import org.tracewell.engine.trajectory.FeedPlanner;
import org.tracewell.engine.trajectory.PathLimits;
import org.tracewell.engine.trajectory.ProfileShape;
import org.tracewell.engine.trajectory.Trajectory;

class CircleTestVariantModelTest {

    /** LM-3020 XY circle test: R = 100 mm, F = 3 m/min, path acceleration 1 m/s², jerk 20 m/s³ (invented demo). */
    private static final double RADIUS = 0.100;
    private static final double FEED = 0.05;
    private static final double KV = 50;
    private static final double LAG = 3e-3;

    private static CircleTestSetup setup(ArcDirection direction, double overshoot) {
        return new CircleTestSetup(ContourPlane.xy(), new Point2(0.4, 0.25), RADIUS, FEED, direction, Math.PI / 6,
                overshoot);
    }

    private static CircleTestVariantModel model(CircleTestSetup setup, boolean feedforward) {
        return CircleTestVariantModel.planned(setup, PathLimits.of(FEED, 1.0, 20.0), new AxisLimits(1.0, 3.0, 300.0),
                ProfileShape.S_CURVE, 1e-3, feedforward);
    }

    @Test
    void figuresMatchTheStoredSimulationAndIso230_4Evaluation() {
        for (ArcDirection direction : ArcDirection.values()) {
            CircleTestSetup setup = setup(direction, Math.toRadians(10));
            Trajectory ref = Trajectory.sample(setup.path(), FeedPlanner.plan(setup.path(), PathLimits.of(FEED, 1.0, 20.0),
                    List.of(new AxisLimits(1.0, 3.0, 300.0), new AxisLimits(1.0, 3.0, 300.0)), ProfileShape.S_CURVE), 1e-3);
            CircleTestVariantModel model = CircleTestVariantModel.of(setup, ref, true);
            double[] p = model.parameterVector(KV * 1.04, KV * 0.97, LAG * 0.9, LAG * 1.2, 0.3, 0.5, 0.2, 0);
            double[] m = model.evaluate(p);
            // independent path through the engine: stored trajectory, TrackingSimulator, CircleTest, ContourErrorAnalysis
            TrackingResult tracking = TrackingSimulator.simulate(ref, model.loops(p));
            CircleTestResult circle = CircleTest.evaluate(setup, tracking);
            ContourErrorResult contour = ContourErrorAnalysis.analyse(tracking);
            // same samples, same arithmetic on them: agreement to rounding (1e-12 relative)
            assertEquals(circle.circularDeviation(), m[0], 1e-12 * circle.circularDeviation() + 1e-15, direction + " G");
            assertEquals(circle.radialDeviation(), m[1], 1e-12 * circle.radialDeviation() + 1e-15, direction + " F");
            assertEquals(contour.maxAbsError(), m[2], 1e-12 * contour.maxAbsError() + 1e-15, direction + " max error");
            assertTrue(m[0] > 1e-6, "a 7 % Kv mismatch gives several µm of G, got " + m[0]);
            // the model's fallback (CircleTest.evaluate on its buffers) gives the same figures as its fast selection
            double[] viaCircleTest = new double[3];
            model.newCircleTestEvaluator().evaluate(p, viaCircleTest);
            assertArrayEquals(m, viaCircleTest, 1e-12 * m[0]);
        }
    }

    @Test
    void underdampedLoopsAgreeWithCircleTestToo() {
        // Kv·T = 1: ζ = 0.5 (DOMAIN.md §2), ringing at start and stop; whichever selection path the model takes
        CircleTestSetup setup = setup(ArcDirection.CCW, Math.toRadians(3));
        Trajectory ref = Trajectory.sample(setup.path(), FeedPlanner.constantFeed(setup.path(), FEED), 1e-3);
        CircleTestVariantModel model = CircleTestVariantModel.of(setup, ref, false);
        double[] p = {KV, KV * 0.9, 1 / KV, 1.2 / KV};
        double[] m = model.evaluate(p);
        TrackingResult tracking = TrackingSimulator.simulate(ref, model.loops(p));
        CircleTestResult circle = CircleTest.evaluate(setup, tracking);
        assertEquals(circle.circularDeviation(), m[0], 1e-12 * circle.circularDeviation() + 1e-15);
        assertEquals(circle.radialDeviation(), m[1], 1e-12 * circle.radialDeviation() + 1e-15);
        assertEquals(ContourErrorAnalysis.analyse(tracking).maxAbsError(), m[2], 1e-15);
    }

    @Test
    void matchedAxesKeepACircleWithTheExactRadiusLoss() {
        CircleTestVariantModel model = model(setup(ArcDirection.CCW, Math.toRadians(10)), false);
        double[] m = model.evaluate(KV, KV, LAG, LAG);
        double w = FEED / RADIUS;
        // steady state of Kv/(s(Ts + 1)) closed: ΔR = R·(|Kv/(Kv − Tω² + jω)| − 1) (DOMAIN.md §4, derived)
        double exact = RADIUS * (1 - KV / Math.hypot(KV - LAG * w * w, w));
        assertEquals(exact, m[1], 1e-3 * exact, "F equals the radius loss");
        // matched gains: the path stays a circle, G ≈ 0 (DOMAIN.md §4); 1 nm allows the sampled start-up residue
        assertTrue(m[0] < 1e-9, "G of matched axes " + m[0]);
    }

    @Test
    void simulatedGFollowsTheKvMismatchFormulaAndItsYield() {
        CircleTestVariantModel model = model(setup(ArcDirection.CW, Math.toRadians(10)), false);
        double sigmaK = 0.01 * KV; // 1 % σ on Ky
        MonteCarloPlan plan = new MonteCarloPlan(List.of(ParameterDistribution.fixed(KV),
                ParameterDistribution.normal(KV, sigmaK, 0.8 * KV, 1.2 * KV), ParameterDistribution.fixed(LAG),
                ParameterDistribution.fixed(LAG)), 200, 314);
        ForkJoinPool pool = new ForkJoinPool(2);
        MonteCarloResult r;
        try {
            r = MonteCarloRunner.run(model, plan, RunControl.on(pool));
        } finally {
            pool.shutdown();
        }
        assertEquals(200, r.completedCount());
        for (int v = 0; v < 200; v++) {
            double ky = r.parameter(v, 1);
            // G ≈ F·|1/Kx − 1/Ky| (Kakino, Ihara & Shinohara 1993; DOMAIN.md §4 — from memory); the neglected
            // magnitude mismatch and lag terms are O(ω/Kv) = 1 % of it, plus 2 nm for sampling and start-up residue
            double formula = FEED * Math.abs(1 / KV - 1 / ky);
            assertEquals(formula, r.metric(0, v), 0.01 * formula + 2e-9, "variant " + v + ", Ky = " + ky);
        }
        // 1/Ky ≈ normal with σ_Δ = σ_K/K² (delta method), so P(G ≤ g) = 2Φ(g/(F·σ_Δ)) − 1; 3 binomial SE
        double sigmaDelta = sigmaK / (KV * KV);
        NormalDistribution z = new NormalDistribution(null, 0, 1);
        for (double g : new double[] {5e-6, 10e-6, 20e-6}) {
            YieldEstimate y = r.yield(0, LimitBound.AT_MOST, g);
            double expected = 2 * z.cumulativeProbability(g / (FEED * sigmaDelta)) - 1;
            assertEquals(expected, y.fraction(), 3 * Math.sqrt(expected * (1 - expected) / 200), "yield at G ≤ " + g);
        }
    }

    @Test
    void serialAndParallelRunsOfTheSimulationAgreeBitForBit() {
        // a 20 mm circle keeps the run short; 130 variants span three blocks, so both threads take part
        CircleTestSetup small = new CircleTestSetup(ContourPlane.xy(), new Point2(0, 0), 0.02, FEED, ArcDirection.CCW, 0,
                Math.toRadians(20));
        CircleTestVariantModel model = model(small, false);
        MonteCarloPlan plan = new MonteCarloPlan(List.of(ParameterDistribution.normal(KV, 0.02 * KV, 0.8 * KV, 1.2 * KV),
                ParameterDistribution.normal(KV, 0.02 * KV, 0.8 * KV, 1.2 * KV),
                ParameterDistribution.uniform(LAG, 0.1 * LAG, 1e-4, 1e-2),
                ParameterDistribution.triangular(0.8 * LAG, LAG, 1.3 * LAG, 1e-4, 1e-2)), 130, 8);
        MonteCarloResult serial = MonteCarloRunner.run(model, plan, RunControl.serial());
        ForkJoinPool pool = new ForkJoinPool(2);
        try {
            MonteCarloResult parallel = MonteCarloRunner.run(model, plan, RunControl.on(pool));
            for (int m = 0; m < 3; m++) {
                assertArrayEquals(serial.metricValues(m), parallel.metricValues(m));
            }
        } finally {
            pool.shutdown();
        }
    }

    @Test
    void sensitivityOfGToTheGainsHasOppositeSigns() {
        CircleTestVariantModel model = model(setup(ArcDirection.CCW, Math.toRadians(10)), false);
        SensitivityAnalysis s = SensitivityAnalysis.at(model, new double[] {KV * 1.02, KV, LAG, LAG}, 1e-3);
        // G ≈ F·(1/Ky − 1/Kx) for Kx > Ky: ∂G/∂Kx = F/Kx², ∂G/∂Ky = −F/Ky² (from the formula above, within 2 %)
        assertEquals(FEED / Math.pow(KV * 1.02, 2), s.derivative(0, 0), 0.02 * FEED / Math.pow(KV * 1.02, 2));
        assertEquals(-FEED / (KV * KV), s.derivative(0, 1), 0.02 * FEED / (KV * KV));
        assertEquals(List.of("Kv_y", "Kv_x"), s.ranked(0).subList(0, 2).stream().map(Sensitivity::name).toList());
    }

    @Test
    void badSetUpsAreRefused() {
        CircleTestSetup setup = setup(ArcDirection.CCW, 0.1);
        Trajectory wrong = Trajectory.sample(setup(ArcDirection.CCW, 0.5).path(),
                FeedPlanner.constantFeed(setup(ArcDirection.CCW, 0.5).path(), FEED), 1e-3);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CircleTestVariantModel.of(setup, wrong, false));
        assertTrue(e.getMessage().contains("circle test path"), e.getMessage());
        CircleTestVariantModel model = model(setup, false);
        assertThrows(VariantEvaluationException.class, () -> MonteCarloRunner.run(model, new MonteCarloPlan(List.of(
                ParameterDistribution.fixed(-1), ParameterDistribution.fixed(KV), ParameterDistribution.fixed(LAG),
                ParameterDistribution.fixed(LAG)), 1, 1), RunControl.serial()));
    }
}
