package org.tracewell.engine.axis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;

/**
 * The lean figures must be the figures of the full analysis: the reference here is {@link AxisModel#analyze()} itself
 * on the same model (an independent code path through LoopAnalyzer), compared to rounding.
 */
class AxisLoopFiguresTest {

    /** Relative agreement to rounding: both sides run the same numerics on identical transfer functions. */
    private static final double ROUNDING = 1e-12;

    private static void assertSame(OptionalDouble expected, OptionalDouble actual, String what) {
        assertEquals(expected.isPresent(), actual.isPresent(), what + " present");
        if (expected.isPresent()) {
            assertEquals(expected.getAsDouble(), actual.getAsDouble(), ROUNDING * Math.abs(expected.getAsDouble()), what);
        }
    }

    private static void assertAgrees(AxisModel model) {
        AxisDynamics full = model.analyze();
        AxisLoopFigures lean = AxisLoopFigures.of(model);
        assertEquals(full.positionGain(), lean.positionGain(), ROUNDING * full.positionGain(), "Kv");
        assertEquals(full.stable(), lean.stable(), "stability");
        assertEquals(full.positionLoopMargins(), lean.positionMargins(), "position-loop margins");
        assertEquals(full.velocityLoopMargins(), lean.velocityMargins(), "velocity-loop margins");
        assertSame(full.positionBandwidthHz(), lean.positionBandwidthHz(), "position bandwidth");
        assertSame(full.velocityBandwidthHz(), lean.velocityBandwidthHz(), "velocity bandwidth");
        for (double v : new double[] {0.05, 0.5}) {
            assertSame(full.followingError(v), lean.followingError(v), "following error at " + v + " m/s");
        }
        OptionalDouble settling = full.positionLoop().step().map(s -> s.metrics().settlingTimeSeconds())
                .orElse(OptionalDouble.empty());
        assertSame(settling, lean.settlingTime(), "settling time");
    }

    @Test
    void twoMassScrewAxisWithFiltersAndFeedforwardAgreesWithTheFullAnalysis() {
        TwoMassScrewDrive plant = AxisFixtures.twoMass(2 * Math.PI * 1500, 0.03, 300);
        double resonance = plant.resonance().orElseThrow().resonanceRadPerSec();
        AxisModel model = AxisModel.of("Y", plant, AxisFixtures.tunedCascade(resonance));
        assertAgrees(model);
        assertTrue(AxisLoopFigures.of(model).stable());
    }

    @Test
    void rigidScrewAxisWithoutFeedforwardAgreesWithTheFullAnalysis() {
        RigidScrewDrive plant = new RigidScrewDrive(new DriveMotor(AxisFixtures.MOTOR_INERTIA, 1.1, 2 * Math.PI * 1500),
                AxisFixtures.SCREW_INERTIA, AxisFixtures.LOAD_MASS, AxisFixtures.LEAD, 1.0, 400, 0);
        CascadeController controller = new CascadeController(33, 0.9, 0.01, List.of(), 0, 0, 5e-4, 125e-6);
        assertAgrees(AxisModel.of("X", plant, controller));
    }

    @Test
    void anUnstableAxisHasNoBandwidthAndNoFollowingError() {
        RigidScrewDrive plant = new RigidScrewDrive(new DriveMotor(AxisFixtures.MOTOR_INERTIA, 1.1, 2 * Math.PI * 1500),
                AxisFixtures.SCREW_INERTIA, AxisFixtures.LOAD_MASS, AxisFixtures.LEAD, 1.0, 400, 0);
        // Kv far above the velocity-loop bandwidth with 1 ms position sampling: the position loop goes unstable
        CascadeController wild = new CascadeController(3000, 0.9, 0.01, List.of(), 0, 0, 1e-3, 125e-6);
        AxisModel model = AxisModel.of("X", plant, wild);
        AxisLoopFigures lean = AxisLoopFigures.of(model);
        assertFalse(lean.stable());
        assertTrue(lean.positionBandwidthHz().isEmpty());
        assertTrue(lean.followingError(0.1).isEmpty());
        assertAgrees(model);
    }
}
