package org.tracewell.engine.contour;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.path.ArcDirection;
import org.tracewell.engine.path.ArcSegment;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.LineSegment;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.path.Point2;
import org.tracewell.engine.path.Polyline;
import org.tracewell.engine.sim.AxisLoop;
import org.tracewell.engine.sim.TrackingResult;
import org.tracewell.engine.sim.TrackingSimulator;
import org.tracewell.engine.trajectory.FeedPlanner;
import org.tracewell.engine.trajectory.Trajectory;

class ContourErrorAnalysisTest {

    @Test
    void lineAt45DegreesWithMismatchedGainsMatchesKoren() {
        double feed = 10.0 / 60; // 10 m/min, the LM-3020 line requirement
        double kx = 33.33;
        double ky = 30.0;
        double theta = Math.PI / 4;
        double length = 0.3;
        Path path = Path.of(ContourPlane.xy(), List.of(LineSegment.of(0.01, 0.02,
                0.01 + length * Math.cos(theta), 0.02 + length * Math.sin(theta))));
        Trajectory ref = Trajectory.sample(path, FeedPlanner.constantFeed(path, feed), 1e-3);
        TrackingResult tracking = TrackingSimulator.simulate(ref, List.of(AxisLoop.firstOrder("X", kx),
                AxisLoop.firstOrder("Y", ky)));
        ContourErrorResult result = ContourErrorAnalysis.analyse(tracking);
        // ε = (V/2)·sin 2θ·(1/Kx − 1/Ky), signed to the left of travel (Koren 1980; Poo, Bollinger &
        // Younkin 1972 — from memory; sign [der]); sample at 80 % of the move, long after the start
        double koren = ContourEstimates.lineMismatchError(feed, theta, kx, ky);
        assertEquals(-277.53e-6, koren, 0.01e-6);
        int k = (int) (0.8 * tracking.sampleCount());
        // the held reference adds the same half-sample lag to both axes, along the path only;
        // residual O(T²·(Kx − Ky)) ≈ 0.05 µm [der]
        assertEquals(koren, result.signedError(k), 0.1e-6);
    }

    @Test
    void cornerAtSpeedCutsInsideByVOverEKv() {
        double feed = 2.0 / 60;
        double kv = 33.33;
        double leg = 0.03; // ≫ V/Kv·20, the approach reaches steady state
        Path path = Polyline.exactStop(ContourPlane.xy(), List.of(new Point2(-leg, 0), new Point2(0, 0),
                new Point2(0, leg)));
        double dt = 1e-4;
        Trajectory ref = Trajectory.sample(path, FeedPlanner.constantFeed(path, feed), dt);
        TrackingResult tracking = TrackingSimulator.simulate(ref, List.of(AxisLoop.firstOrder("X", kv),
                AxisLoop.firstOrder("Y", kv)));
        // the reference stops dead at the end of the second leg; evaluate up to there only
        int cornerSample = (int) Math.round(leg / feed / dt);
        int end = cornerSample + (int) (10 / kv / dt);
        double[][] actual = new double[2][end];
        for (int i = 0; i < 2; i++) {
            tracking.readActual(i, 0, actual[i], end);
        }
        ContourErrorResult result = ContourErrorAnalysis.analyse(actual, path, ContourErrorAnalysis.DEFAULT_WINDOW);
        // max contour error V/(e·Kv) ≈ 0.368·V/Kv at t = 1/Kv after the corner (DOMAIN.md §4 [der]);
        // 1 % covers the sampling (Kv·T = 0.3 %) and the hold
        double estimate = ContourEstimates.cornerMaxError(feed, kv);
        assertEquals(0.368 * feed / kv, estimate, 0.001 * estimate);
        assertEquals(estimate, result.maxAbsError(), 0.01 * estimate);
        assertTrue(result.signedErrorAtMax() > 0, "a left turn is cut on the left (inside)");
        double tAfter = (result.indexOfMax() - cornerSample) * dt;
        assertEquals(1 / kv, tAfter, 0.05 / kv);
    }

    @Test
    void offsetsAlongTheNormalAreRecoveredExactlyWithTheirSign() {
        Path path = Polyline.blended(ContourPlane.xy(), List.of(new Point2(0, 0), new Point2(0.04, 0),
                new Point2(0.04, 0.03), new Point2(0.01, 0.05)), 0.5e-3);
        int n = 20_000;
        double[][] pts = new double[2][n];
        double[] offset = new double[n];
        for (int k = 0; k < n; k++) {
            double s = path.length() * k / (n - 1);
            Point2 p = path.pointAt(s);
            Point2 nrm = path.normalAt(s);
            offset[k] = 20e-6 * Math.sin(k * 0.01); // ±20 µm, both sides; far below the blend radii
            pts[0][k] = p.u() + offset[k] * nrm.u();
            pts[1][k] = p.v() + offset[k] * nrm.v();
        }
        ContourErrorResult r = ContourErrorAnalysis.analyse(pts, path, ContourErrorAnalysis.DEFAULT_WINDOW);
        for (int k = 0; k < n; k++) {
            // 1e-14 m: rounding of the sampled path points (coordinates ~0.05 m × 1e-16 × a few)
            assertEquals(offset[k], r.signedError(k), 1e-14, "sample " + k);
            assertEquals(path.length() * k / (n - 1), r.pathParameter(k), 1e-12, "path parameter " + k);
            // the monotone search agrees with the global exact distance
            assertEquals(path.distance(pts[0][k], pts[1][k]), Math.abs(r.signedError(k)), 1e-14);
        }
        assertEquals(20e-6, r.maxAbsError(), 1e-9);
        double rms = 0;
        for (double o : offset) {
            rms += o * o;
        }
        assertEquals(Math.sqrt(rms / n), r.rmsError(), 1e-15);
    }

    @Test
    void searchDoesNotJumpBackToAnEarlierPassOfTheSamePlace() {
        // out along u and back 10 µm to the left of the outgoing line: the way back must be measured
        // against the return line (0 error), not the outgoing line (10 µm)
        double gap = 10e-6;
        Path path = Path.of(ContourPlane.xy(), List.of(LineSegment.of(0, 0, 0.05, 0), LineSegment.of(0.05, 0, 0.05, gap),
                LineSegment.of(0.05, gap, 0, gap)));
        int n = 1000;
        double[][] pts = new double[2][n];
        for (int k = 0; k < n; k++) {
            pts[0][k] = 0.05 - 0.04 * k / n; // on the return line
            pts[1][k] = gap;
        }
        double[][] withApproach = new double[2][n + 1];
        withApproach[0][0] = 0.05; // the search starts at the turn point
        withApproach[1][0] = gap / 2;
        for (int i = 0; i < 2; i++) {
            System.arraycopy(pts[i], 0, withApproach[i], 1, n);
        }
        ContourErrorResult r = ContourErrorAnalysis.analyse(withApproach, path, 0.1);
        for (int k = 2; k <= n; k++) {
            assertEquals(0.0, r.signedError(k), 1e-18, "sample " + k);
            assertTrue(r.pathParameter(k) >= r.pathParameter(k - 1));
        }
    }

    @Test
    void outOfPlaneOffsetAddsInQuadratureOnAThreeAxisMachine() {
        ContourPlane xz = ContourPlane.ofAxes(3, 0, 2);
        Path path = Path.of(xz, List.of(ArcSegment.fullCircle(new Point2(0.1, 0.2), 0.05, 0, ArcDirection.CCW)));
        int n = 500;
        double[][] pts = new double[3][n];
        for (int k = 0; k < n; k++) {
            double a = 2 * Math.PI * k / n;
            pts[0][k] = 0.1 + 0.05003 * Math.cos(a); // 30 µm outside
            pts[2][k] = 0.2 + 0.05003 * Math.sin(a);
            pts[1][k] = 40e-6; // 40 µm off the plane along Y
        }
        ContourErrorResult r = ContourErrorAnalysis.analyse(pts, path, ContourErrorAnalysis.DEFAULT_WINDOW);
        for (int k = 0; k < n; k++) {
            // 3-4-5: √(30² + 40²) = 50 µm; outside a CCW circle is right of travel, so negative
            assertEquals(-50e-6, r.signedError(k), 1e-12);
        }
    }
}
