package org.tracewell.engine.axis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.LineSegment;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.sim.ContinuousStateSpace;
import org.tracewell.engine.sim.TrackingResult;
import org.tracewell.engine.sim.TrackingSimulator;
import org.tracewell.engine.trajectory.FeedPlanner;
import org.tracewell.engine.trajectory.Trajectory;

class SimulationBridgeTest {

    private final TwoMassScrewDrive drive = AxisFixtures.twoMass(2 * Math.PI * 1500, 0.05, 120);
    private final CascadeController controller = AxisFixtures.tunedCascade(drive.resonanceModel().resonanceRadPerSec());

    /** C·(sI − A)⁻¹·B_j evaluated by a complex linear solve (independent of the realisation's algebra). */
    private static Complex[] stateSpaceResponse(ContinuousStateSpace ss, Complex s) {
        int n = ss.stateCount();
        Complex[] out = new Complex[ss.inputCount()];
        for (int j = 0; j < ss.inputCount(); j++) {
            Complex[][] m = new Complex[n][n];
            Complex[] b = new Complex[n];
            for (int r = 0; r < n; r++) {
                for (int c = 0; c < n; c++) {
                    m[r][c] = new Complex(r == c ? -ss.a(r, c) : -ss.a(r, c)).add(r == c ? s : Complex.ZERO);
                }
                b[r] = new Complex(ss.b(r, j));
            }
            Complex[] x = AxisFixtures.solve(m, b);
            Complex y = new Complex(ss.d(j));
            for (int r = 0; r < n; r++) {
                y = y.add(x[r].multiply(ss.c(r)));
            }
            out[j] = y;
        }
        return out;
    }

    @ParameterizedTest
    @EnumSource(PositionSensor.class)
    void stateSpaceMatchesTheClosedLoopTransferFunction(PositionSensor sensor) {
        AxisModel axis = AxisModel.of("Y", drive, controller).withSensor(sensor);
        ContinuousStateSpace ss = axis.closedLoopStateSpace();
        // order: mechanics 3 + current lag 1 + PI 1 + notch 2 + low-pass 2 + two Padé(2) 4 + position integrator 1
        assertEquals(14, ss.stateCount());
        for (double w : new double[] {0.5, 20, 150, 700, 900, 3000}) {
            Complex s = new Complex(0, w);
            Complex[] g = stateSpaceResponse(ss, s);
            // r, ṙ = s·r, r̈ = s²·r all from one reference: their sum is x_L/r
            Complex combined = g[0].add(g[1].multiply(s)).add(g[2].multiply(s.multiply(s)));
            assertEquals(0, AxisFixtures.relativeError(combined, axis.referenceToPosition().evaluate(s)), 1e-9,
                    sensor + " at " + w + " rad/s");
        }
    }

    @ParameterizedTest
    @EnumSource(PositionSensor.class)
    void simulatedRampSettlesOnTheAnalyticFollowingError(PositionSensor sensor) {
        double dt = 1e-4;
        double feed = 0.05; // 3 m/min
        Path path = Path.of(ContourPlane.xy(), List.of(LineSegment.of(0, 0, 0.05, 0)));
        Trajectory ramp = Trajectory.sample(path, FeedPlanner.constantFeed(path, feed), dt);
        AxisModel x = AxisModel.of("X", drive, controller).withSensor(sensor);
        AxisModel xPlain = x.withController(controller.withFeedforward(0, 0));
        AxisDynamics dyn = x.analyze();
        TrackingResult withFf = TrackingSimulator.simulate(ramp, List.of(x.toAxisLoop(), x.toAxisLoop()));
        TrackingResult plain = TrackingSimulator.simulate(ramp, List.of(xPlain.toAxisLoop(), xPlain.toAxisLoop()));
        int k = (int) (0.8 / dt); // 0.8 s: many times the slowest closed-loop time constant (≈ 1/Kv = 25 ms)
        // Steady ramp error from the final-value theorem on E/R (DOMAIN.md §1, Nise ch. 7, from memory), plus the
        // v·T/2 lag of the zero-order-held reference (as in TrackingSimulatorTest); the remainder of the
        // hold is of order Kv·v·T² = 2e-8 m, the tolerance.
        double holdLag = feed * dt / 2;
        double tol = 40 * feed * dt * dt;
        assertEquals(dyn.followingErrorWithoutFeedforward(feed).getAsDouble() + holdLag, plain.followingError(0, k),
                tol, "no feedforward");
        assertEquals(dyn.followingError(feed).getAsDouble() + holdLag, withFf.followingError(0, k), tol,
                "with feedforward");
        assertEquals(0.0, withFf.followingError(1, k), 1e-15);
    }
}
