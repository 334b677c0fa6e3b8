package org.tracewell.engine.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.LineSegment;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.trajectory.FeedPlanner;
import org.tracewell.engine.trajectory.Trajectory;

class TrackingSimulatorTest {

    private static final double DT = 1e-3;

    /** A 0.2 m line along X at constant feed (the idealised reference of the steady-state formulas). */
    private static Trajectory rampAlongX(double feed) {
        Path path = Path.of(ContourPlane.xy(), List.of(LineSegment.of(0, 0, 0.2, 0)));
        return Trajectory.sample(path, FeedPlanner.constantFeed(path, feed), DT);
    }

    @Test
    void firstOrderLoopFollowingErrorIsVOverKv() {
        double feed = 2.0 / 60; // 2 m/min
        double kv = 33.33;
        TrackingResult r = TrackingSimulator.simulate(rampAlongX(feed), List.of(AxisLoop.firstOrder("X", kv),
                AxisLoop.firstOrder("Y", kv)));
        int k = r.sampleCount() / 2; // long after the start transient (3 s ≫ 1/Kv)
        // sampled exactly: e = v·T/(1 − e^{−Kv·T}) for a ZOH-held ramp [der]
        assertEquals(feed * DT / (1 - Math.exp(-kv * DT)), r.followingError(0, k), 1e-12);
        // ≈ v/Kv (DOMAIN.md §4, common practice) plus the half-sample lag of the held reference, v·T/2
        assertEquals(feed / kv + feed * DT / 2, r.followingError(0, k), feed * kv * DT * DT);
        assertEquals(0.0, r.followingError(1, k), 0.0);
    }

    @Test
    void velocityLagLoopHasTheSameSteadyErrorAndFullFeedforwardRemovesIt() {
        double feed = 0.1;
        double kv = 30;
        double lag = 4e-3;
        Trajectory ref = rampAlongX(feed);
        int k = ref.sampleCount() / 2;
        TrackingResult plain = TrackingSimulator.simulate(ref, List.of(AxisLoop.withVelocityLag("X", kv, lag, 0, 0),
                AxisLoop.withVelocityLag("Y", kv, lag, 0, 0)));
        // type 1: ramp error v/Kv whatever the lag (DOMAIN.md §1, Nise ch. 7 — from memory) + v·T/2 hold lag
        assertEquals(feed / kv + feed * DT / 2, plain.followingError(0, k), 1e-7);
        TrackingResult ff = TrackingSimulator.simulate(ref, List.of(AxisLoop.withVelocityLag("X", kv, lag, 1, 1),
                AxisLoop.withVelocityLag("Y", kv, lag, 1, 1)));
        // with velocity feedforward 1 the ramp error vanishes (DOMAIN.md §1 [der]); what remains is the
        // ZOH hold of the reference, < v·T (bound [der]: the held staircase lags the ramp by at most one step)
        assertEquals(0.0, ff.followingError(0, k), feed * DT);
    }

    @Test
    void hessenbergKernelMatchesTheDenseRecursionInModelCoordinates() {
        // all three inputs drive the loop (feedforward), one block of rows
        assertKernelMatchesDenseRecursion(AxisLoop.closePositionLoop("X", DiscretisationTest.fourStatePlant(), 30, 0.8,
                0.5, 1e-3), false);
    }

    @Test
    void positionOnlyKernelMatchesTheDenseRecursion() {
        // no feedforward: the kernel that skips the velocity and acceleration terms
        assertKernelMatchesDenseRecursion(AxisLoop.closePositionLoop("X", DiscretisationTest.fourStatePlant(), 30, 0,
                0, 0), true);
    }

    @Test
    void kernelWithSeveralBlocksOfRowsMatchesTheDenseRecursion() {
        // 13 states: two blocks of eight rows (the second padded), with and without feedforward
        ContinuousStateSpace plant = lagChainPlant(12);
        assertKernelMatchesDenseRecursion(AxisLoop.closePositionLoop("X", plant, 30, 0.8, 0.5, 1e-3), false);
        assertKernelMatchesDenseRecursion(AxisLoop.closePositionLoop("X", plant, 30, 0, 0, 0), true);
    }

    /** Velocity command → position through {@code lags} first-order lags (0.1 ms each) and an integrator. */
    private static ContinuousStateSpace lagChainPlant(int lags) {
        int n = lags + 1;
        double[][] a = new double[n][n];
        double[][] b = new double[n][1];
        double tau = 1e-4;
        for (int i = 0; i < lags; i++) {
            a[i][i] = -1 / tau;
            if (i > 0) {
                a[i][i - 1] = 1 / tau;
            }
        }
        b[0][0] = 1 / tau;
        a[lags][lags - 1] = 1; // position = ∫ velocity
        double[] c = new double[n];
        c[lags] = 1;
        return new ContinuousStateSpace(a, b, c, new double[] {0});
    }

    /**
     * The simulator runs an orthogonally transformed (upper-Hessenberg) realisation; compare with the plain recursion
     * x ← Φx + Γu, y = Cx + Du in the model's own states (independent arithmetic).
     */
    private static void assertKernelMatchesDenseRecursion(AxisLoop loop, boolean positionOnly) {
        Trajectory ref = rampAlongX(0.08);
        TrackingResult r = TrackingSimulator.simulate(ref, List.of(loop, loop));
        DiscreteStateSpace d = DiscreteStateSpace.zeroOrderHold(loop.system(), DT);
        assertEquals(positionOnly, SampledLoop.of(d).positionOnly(), "kernel without velocity/acceleration terms");
        int n = d.stateCount();
        double[] x = loop.restState(ref.position(0, 0));
        double[] next = new double[n];
        double[] cRow = loop.system().c();
        double[] dRow = loop.system().d();
        double worst = 0;
        for (int k = 0; k < ref.sampleCount(); k++) {
            double[] u = {ref.position(0, k), ref.velocity(0, k), ref.acceleration(0, k)};
            double y = 0;
            for (int i = 0; i < n; i++) {
                y += cRow[i] * x[i];
            }
            for (int j = 0; j < 3; j++) {
                y += dRow[j] * u[j];
            }
            worst = Math.max(worst, Math.abs(y - r.actual(0, k)));
            for (int i = 0; i < n; i++) {
                double sum = 0;
                for (int j = 0; j < n; j++) {
                    sum += d.phi(i, j) * x[j];
                }
                for (int j = 0; j < 3; j++) {
                    sum += d.gamma(i, j) * u[j];
                }
                next[i] = sum;
            }
            System.arraycopy(next, 0, x, 0, n);
        }
        // rounding only: positions ~0.2 m, 2000 steps of a well-damped loop
        assertEquals(0.0, worst, 1e-14, "states " + n);
    }

    @Test
    void restStateStartsOnTheReference() {
        AxisLoop loop = AxisLoop.closePositionLoop("Z", DiscretisationTest.fourStatePlant(), 25, 0, 0, 0);
        double[] x = loop.restState(0.123);
        assertEquals(0.123, x[0], 1e-15);
        assertEquals(0.0, x[1], 1e-15);
        assertEquals(0.0, x[3], 1e-15);
    }

    @Test
    void peakAndRmsFollowingError() {
        double feed = 0.05;
        double kv = 20;
        TrackingResult r = TrackingSimulator.simulate(rampAlongX(feed), List.of(AxisLoop.firstOrder("X", kv),
                AxisLoop.firstOrder("Y", kv)));
        // the constant-feed reference stops dead at the end; the peak lag is at the last moving sample
        double steady = feed * DT / (1 - Math.exp(-kv * DT));
        assertEquals(steady, r.peakFollowingError(0), 1e-9);
        double rms = 0;
        for (int k = 0; k < r.sampleCount(); k++) {
            rms += r.followingError(0, k) * r.followingError(0, k);
        }
        assertEquals(Math.sqrt(rms / r.sampleCount()), r.rmsFollowingError(0), 1e-15);
    }

    @Test
    void mismatchedAxisCountIsRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> TrackingSimulator.simulate(rampAlongX(0.1), List.of(AxisLoop.firstOrder("X", 30))));
        assertEquals("need one axis loop per trajectory axis: 2 axes, got 1 loops", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> AxisLoop.firstOrder("X", 30, 1.5));
    }
}
