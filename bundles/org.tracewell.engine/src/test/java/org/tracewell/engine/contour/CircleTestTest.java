package org.tracewell.engine.contour;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
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

/** Circle tests of simulated axes against the closed forms of DOMAIN.md §4. */
class CircleTestTest {

    private static final double R = 0.050;
    private static final double FEED = 2.0 / 60; // 2000 mm/min
    private static final double KV = 33.33;
    private static final double DT = 1e-3;

    private static CircleTestSetup setup(ArcDirection direction) {
        // ISO 230-4 style: start at 0°, 90° overshoot arcs in and out
        return new CircleTestSetup(ContourPlane.xy(), new Point2(0.2, 0.1), R, FEED, direction, 0, Math.PI / 2);
    }

    private static TrackingResult run(CircleTestSetup setup, AxisLoop x, AxisLoop y) {
        Path path = setup.path();
        List<AxisLimits> axes = List.of(new AxisLimits(0.5, 5, 500), new AxisLimits(0.5, 5, 500));
        Trajectory ref = Trajectory.sample(path, FeedPlanner.plan(path, PathLimits.of(setup.feed(), 2, 100), axes,
                ProfileShape.S_CURVE), DT);
        return TrackingSimulator.simulate(ref, List.of(x, y));
    }

    @Test
    void matchedGainsLoseRadiusButStayRound() {
        CircleTestSetup s = setup(ArcDirection.CCW);
        TrackingResult tracking = run(s, AxisLoop.firstOrder("X", KV), AxisLoop.firstOrder("Y", KV));
        CircleTestResult r = CircleTest.evaluate(s, tracking);
        double exact = ContourEstimates.circleRadiusLossExact(R, FEED, KV);
        // DOMAIN.md §4 [der]: R = 50 mm, F = 2000 mm/min, Kv = 33.33 1/s → ΔR ≈ 10.0 µm
        assertEquals(10.0e-6, exact, 0.05e-6);
        // simulated radius loss vs the exact first-order steady state R(1 − 1/√(1 + (ω/Kv)²)) [der];
        // tolerance 5 nm covers the ZOH hold (magnitude error ~(ωT)²) and the S-curve start transient
        assertEquals(-exact, r.radialDeviationMin(), 5e-9);
        assertEquals(-exact, r.radialDeviationMax(), 5e-9);
        assertEquals(R - exact, r.leastSquaresCircle().radius(), 5e-9);
        // the approximation F²/(2RKv²) agrees to the next order term (ω/Kv)² ≈ 4e-4 relative [der]
        assertEquals(exact, ContourEstimates.circleRadiusLossApprox(R, FEED, KV), exact * 1e-3);
        // matched gains keep the path a circle: G ≈ 0 while F ≈ ΔR (DOMAIN.md §4, invariant)
        assertTrue(r.circularDeviation() < 0.01e-6, "G = " + r.circularDeviation());
        assertEquals(0.2, r.leastSquaresCircle().centreU(), 1e-9);
        assertEquals(0.1, r.leastSquaresCircle().centreV(), 1e-9);
        // one evaluated turn: 2πR/F / T samples, ±1
        assertEquals(2 * Math.PI * R / FEED / DT, r.evaluatedSamples(), 2);
    }

    @Test
    void gainMismatchMakesAnEllipseOnTheDiagonalsThatFlipsWithDirection() {
        double kx = 33.33;
        double ky = 30.0;
        CircleTestSetup ccwSetup = setup(ArcDirection.CCW);
        CircleTestSetup cwSetup = setup(ArcDirection.CW);
        TrackingResult ccw = run(ccwSetup, AxisLoop.firstOrder("X", kx), AxisLoop.firstOrder("Y", ky));
        TrackingResult cw = run(cwSetup, AxisLoop.firstOrder("X", kx), AxisLoop.firstOrder("Y", ky));
        BidirectionalCircleResult both = CircleTest.bidirectional(cwSetup, cw, ccwSetup, ccw);
        CircleTestResult rc = both.counterClockwise();
        CircleTestResult rw = both.clockwise();

        // G ≈ F·|1/Kx − 1/Ky| (Kakino et al. 1993 — from memory; DOMAIN.md §4 [der]); the formula drops
        // the (ω/K)² terms, so allow 1 %
        double estimate = ContourEstimates.circleMismatchDeviation(FEED, kx, ky);
        assertEquals(estimate, rc.circularDeviation(), 0.01 * estimate);
        assertEquals(estimate, rw.circularDeviation(), 0.01 * estimate);
        // exact steady state [der]: x = R|Hx|cos(ψ), y = R|Hy|sin(ψ + ∠Hy − ∠Hx), Hi = Ki/(jω + Ki);
        // G is the radial band of that ellipse about its centre
        double exactG = steadyStateBand(kx, ky);
        assertEquals(exactG, rc.circularDeviation(), 0.01e-6);
        assertEquals(exactG, rw.circularDeviation(), 0.01e-6);
        // Kx > Ky: the Y axis lags more; CCW puts the major axis on 135°, CW on 45° [der]
        assertEquals(Math.toRadians(135), rc.ellipseOrientation(), Math.toRadians(1));
        assertEquals(Math.toRadians(45), rw.ellipseOrientation(), Math.toRadians(1));
        assertEquals(rc.circularDeviation(), rc.ellipsePeakToPeak(), 0.02 * rc.circularDeviation());
        // G(b) spans both runs, so it is at least either one
        assertTrue(both.bidirectionalDeviation() >= Math.max(rc.circularDeviation(), rw.circularDeviation()) - 1e-12);
        // from the runs' own results, only the common circle fitted: the same figures
        BidirectionalCircleResult reused = CircleTest.bidirectional(cwSetup, cw, CircleTest.evaluate(cwSetup, cw),
                ccwSetup, ccw, CircleTest.evaluate(ccwSetup, ccw));
        assertEquals(both.bidirectionalDeviation(), reused.bidirectionalDeviation(), 0.0);
        assertEquals(rc.circularDeviation(), reused.counterClockwise().circularDeviation(), 0.0);
        assertEquals(rw.circularDeviation(), reused.clockwise().circularDeviation(), 0.0);
        assertThrows(IllegalArgumentException.class, () -> CircleTest.bidirectional(cwSetup, cw,
                CircleTest.evaluate(ccwSetup, ccw), ccwSetup, ccw, CircleTest.evaluate(ccwSetup, ccw)));
    }

    private static double steadyStateBand(double kx, double ky) {
        double w = FEED / R;
        double mx = kx / Math.hypot(w, kx);
        double my = ky / Math.hypot(w, ky);
        double delta = Math.atan2(w, kx) - Math.atan2(w, ky); // ∠Hy − ∠Hx
        double min = Double.POSITIVE_INFINITY;
        double max = 0;
        for (int i = 0; i < 200_000; i++) {
            double psi = 2 * Math.PI * i / 200_000;
            double rho = R * Math.hypot(mx * Math.cos(psi), my * Math.sin(psi + delta));
            min = Math.min(min, rho);
            max = Math.max(max, rho);
        }
        return max - min;
    }

    @Test
    void velocityFeedforwardGrowsTheRadiusAndFullFeedforwardRemovesTheLoss() {
        double kv = 30;
        double lag = 5e-3;
        CircleTestSetup s = setup(ArcDirection.CCW);
        double w = FEED / R;
        // velocity feedforward 1 around Kv/(s(Ts+1)): H = (Kv + jω)/(Kv − Tω² + jω), |H| > 1 [der]
        double gain = Math.hypot(kv, w) / Math.hypot(kv - lag * w * w, w);
        CircleTestResult vff = CircleTest.evaluate(s, run(s, AxisLoop.withVelocityLag("X", kv, lag, 1, 0),
                AxisLoop.withVelocityLag("Y", kv, lag, 1, 0)));
        assertTrue(gain > 1);
        assertEquals(R * (gain - 1), vff.radialDeviationMax(), 5e-9);
        // velocity + acceleration feedforward matched to the lag: ΔR → 0 (DOMAIN.md §4 [der])
        CircleTestResult full = CircleTest.evaluate(s, run(s, AxisLoop.withVelocityLag("X", kv, lag, 1, 1),
                AxisLoop.withVelocityLag("Y", kv, lag, 1, 1)));
        assertEquals(0.0, full.radialDeviation(), 5e-9);
        // without feedforward: the second-order loop's exact gain |Kv/(Kv − Tω² + jω)| [der]
        CircleTestResult none = CircleTest.evaluate(s, run(s, AxisLoop.withVelocityLag("X", kv, lag, 0, 0),
                AxisLoop.withVelocityLag("Y", kv, lag, 0, 0)));
        assertEquals(R * (kv / Math.hypot(kv - lag * w * w, w) - 1), none.radialDeviationMin(), 5e-9);
    }

    @Test
    void overshootArcsAreLeftOut() {
        CircleTestSetup s = setup(ArcDirection.CW);
        assertEquals(3, s.path().segmentCount());
        assertEquals(2 * Math.PI * R + Math.PI * R, s.path().length(), 1e-12);
        // points of one exact circle traversed 1.5 times: only the middle 360° are evaluated
        int n = 3000;
        double[] u = new double[n + 1];
        double[] v = new double[n + 1];
        for (int k = 0; k <= n; k++) {
            double a = Math.PI / 2 - 3 * Math.PI * (k + 0.5) / n; // CW from +90°, no sample on a boundary
            u[k] = 0.2 + R * Math.cos(a);
            v[k] = 0.1 + R * Math.sin(a);
        }
        CircleTestResult r = CircleTest.evaluate(s, u, v);
        assertEquals(2000, r.evaluatedSamples()); // samples 500..2499: travelled 90°..450°
        assertEquals(0.0, r.circularDeviation(), 1e-15);
    }
}
