package org.tracewell.engine.variation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.axis.AxisModel;
import org.tracewell.engine.axis.CascadeController;
import org.tracewell.engine.axis.DriveMotor;
import org.tracewell.engine.axis.FilterStage;
import org.tracewell.engine.axis.RigidScrewDrive;
import org.tracewell.engine.contour.CircleTest;
import org.tracewell.engine.contour.CircleTestResult;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.contour.ContourErrorAnalysis;
import org.tracewell.engine.path.ArcDirection;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.Point2;
import org.tracewell.engine.sim.AxisLoop;
import org.tracewell.engine.sim.TrackingResult;
import org.tracewell.engine.sim.TrackingSimulator;
import org.tracewell.engine.trajectory.AxisLimits;
import org.tracewell.engine.trajectory.FeedPlanner;
import org.tracewell.engine.trajectory.PathLimits;
import org.tracewell.engine.trajectory.ProfileShape;
import org.tracewell.engine.trajectory.Trajectory;

/** The shared circle run with full axis loops (cascade, filters, sample delays) against the stored simulation. */
class CircleRunKernelTest {

    /** LM-3020-like circle: R = 100 mm, F = 3 m/min (invented demo values). */
    private static final double RADIUS = 0.100;
    private static final double FEED = 0.05;

    private static AxisLoop screwAxis(String name, double kv, double loadMass) {
        RigidScrewDrive plant = new RigidScrewDrive(new DriveMotor(4.6e-4, 0.95, 2 * Math.PI * 1800), 6.9e-4, loadMass,
                0.01, 1.0, 600, 0);
        CascadeController controller = new CascadeController(kv, 0.5, 0.006,
                List.of(new FilterStage.LowPass2(2 * Math.PI * 700, 0.7)), 0, 0, 5e-4, 125e-6);
        return AxisModel.of(name, plant, controller).toAxisLoop();
    }

    @Test
    void figuresOfHighOrderLoopsMatchTheStoredSimulation() {
        for (ArcDirection direction : ArcDirection.values()) {
            CircleTestSetup setup = new CircleTestSetup(ContourPlane.xy(), new Point2(0, 0), RADIUS, FEED, direction,
                    0, Math.toRadians(12));
            Trajectory reference = Trajectory.sample(setup.path(), FeedPlanner.plan(setup.path(),
                    PathLimits.of(FEED, 1.0, 20.0), List.of(new AxisLimits(0.8, 3, 50), new AxisLimits(0.8, 3, 50)),
                    ProfileShape.S_CURVE), 1e-3);
            List<AxisLoop> loops = List.of(screwAxis("X", 41, 210), screwAxis("Y", 39, 180));
            double[] figures = new double[CircleRunKernel.FIGURE_COUNT];
            CircleRunKernel kernel = CircleRunKernel.of(setup, reference);
            kernel.newRun().evaluate(loops, figures);
            // independent path: TrackingSimulator, CircleTest (ISO 230-4 definitions), exact contour-error search
            TrackingResult tracking = TrackingSimulator.simulate(reference, loops);
            CircleTestResult circle = CircleTest.evaluate(setup, tracking);
            double maxError = ContourErrorAnalysis.analyse(tracking).maxAbsError();
            // same samples, same arithmetic: agreement to rounding (1e-12 relative)
            assertEquals(circle.circularDeviation(), figures[CircleRunKernel.G], 1e-12 * circle.circularDeviation());
            assertEquals(circle.radialDeviation(), figures[CircleRunKernel.F], 1e-12 * circle.radialDeviation());
            assertEquals(maxError, figures[CircleRunKernel.MAX_CONTOUR_ERROR], 1e-12 * maxError);
            assertEquals(tracking.peakFollowingError(0), figures[CircleRunKernel.PEAK_FOLLOWING_ERROR_FIRST], 0);
            assertEquals(tracking.peakFollowingError(1), figures[CircleRunKernel.PEAK_FOLLOWING_ERROR_SECOND], 0);
            // Kv 41 against 39 1/s: G ≈ F·|1/Kx − 1/Ky| = 0.05·(1/39 − 1/41) = 62.5 µm (DOMAIN.md §4, Kakino et al.
            // 1993 — from memory); the velocity loop and filters shift it by a few per cent, 10 % allowed
            assertEquals(FEED * (1 / 39.0 - 1 / 41.0), figures[CircleRunKernel.G], 0.1 * FEED * (1 / 39.0 - 1 / 41.0));
            assertTrue(figures[CircleRunKernel.PEAK_FOLLOWING_ERROR_FIRST] > 0);
        }
    }

    @Test
    void aRunNeedsTwoLoops() {
        CircleTestSetup setup = new CircleTestSetup(ContourPlane.xy(), new Point2(0, 0), RADIUS, FEED, ArcDirection.CCW,
                0, 0.2);
        Trajectory reference = Trajectory.sample(setup.path(), FeedPlanner.constantFeed(setup.path(), FEED), 1e-3);
        CircleRunKernel.Run run = CircleRunKernel.of(setup, reference).newRun();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> run.evaluate(List.of(screwAxis("X", 40, 200)), new double[CircleRunKernel.FIGURE_COUNT]));
        assertTrue(e.getMessage().contains("two axis loops"), e.getMessage());
    }
}
