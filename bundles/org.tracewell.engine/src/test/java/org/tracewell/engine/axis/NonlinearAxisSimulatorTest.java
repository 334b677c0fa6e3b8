package org.tracewell.engine.axis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracewell.engine.tf.TransferFunction;

class NonlinearAxisSimulatorTest {

    private static final double TP = 1e-3;
    private static final double TV = 125e-6;
    private static final double LEAD = 0.01;
    private static final double RHO = LEAD / (2 * Math.PI);

    private static RigidScrewDrive screw(double coulombN) {
        return new RigidScrewDrive(new DriveMotor(1.2e-3, 1.1, 2 * Math.PI * 1500), 9.7e-4, 250, LEAD, 1, 0, coulombN);
    }

    private static CascadeController cascade(double integralTime) {
        return new CascadeController(30, 1.0, integralTime, List.of(new FilterStage.LowPass1(2 * Math.PI * 1000)),
                0, 0, TP, TV);
    }

    /** Ramp r = v·t sampled at T_p, with its velocity and zero acceleration. */
    private static double[][] ramp(double v, int n) {
        double[][] r = new double[3][n];
        for (int k = 0; k < n; k++) {
            r[0][k] = v * k * TP;
            r[1][k] = v;
        }
        return r;
    }

    private static NonlinearTrackingResult run(AxisModel axis, NonlinearAxisSimulator.Limits limits, double[][] ref) {
        return NonlinearAxisSimulator.of(axis, limits, 10).simulate(ref[0], ref[1], ref[2]);
    }

    @Test
    void sampledLoopWithoutNonlinearitiesSettlesOnVOverKv() {
        double v = 0.05;
        NonlinearTrackingResult r = run(AxisModel.of("X", screw(0), cascade(0.012)), NonlinearAxisSimulator.Limits.NONE,
                ramp(v, 1500));
        // type-1 sampled P position loop at constant velocity: the held command Kv·e must equal v, so e = v/Kv at the
        // samples (DOMAIN.md §4, common practice); 1.5 s ≫ 1/Kv, so the transient has died out to 1e-12
        assertEquals(v / 30, r.followingError(1499), 1e-9 * v / 30);
    }

    @Test
    void integralActionAbsorbsCoulombFrictionWhileProportionalLoopPaysForIt() {
        double v = 0.05;
        double coulomb = 200; // N at the load, 0.32 N·m at the motor
        double[][] ref = ramp(v, 2500);
        NonlinearTrackingResult pi = run(AxisModel.of("X", screw(coulomb), cascade(0.012)),
                NonlinearAxisSimulator.Limits.NONE, ref);
        // PI: the integrator supplies T_c, the position error stays v/Kv (DOMAIN.md §1 [der], infinite stiffness)
        assertEquals(v / 30, pi.followingError(2499), 1e-7 * v / 30);
        NonlinearTrackingResult p = run(AxisModel.of("X", screw(coulomb), cascade(Double.POSITIVE_INFINITY)),
                NonlinearAxisSimulator.Limits.NONE, ref);
        // P velocity loop: ω_cmd − ω = T_c/K_p, so e = v/Kv + ρ·T_c/(K_p·Kv) [der: static balance of the loop]
        double expected = v / 30 + RHO * coulomb * RHO / (1.0 * 30);
        assertEquals(expected, p.followingError(2499), 1e-7 * expected);
    }

    @Test
    void torqueLimitGivesNewtonsAcceleration() {
        double limit = 0.5; // N·m
        double coulomb = 100; // N
        RigidScrewDrive plant = screw(coulomb);
        int n = 400;
        double[][] step = new double[3][n];
        java.util.Arrays.fill(step[0], 1, n, 0.05); // 50 mm step: the loop saturates at once
        NonlinearTrackingResult r = run(AxisModel.of("X", plant, cascade(0.012)),
                new NonlinearAxisSimulator.Limits(limit, Double.POSITIVE_INFINITY, 0), step);
        // while saturated: a = (T_max − T_c)/J at the motor, times ρ at the load (Newton's second law);
        // the current lag (0.1 ms) has settled long before samples 20–60
        double a = (limit - coulomb * RHO) / plant.equivalentInertia() * RHO;
        int k = 40;
        double measured = (r.actual(k + 1) - 2 * r.actual(k) + r.actual(k - 1)) / (TP * TP);
        assertEquals(a, measured, 1e-6 * a);
        assertEquals(limit, r.torqueCommand(k), 0);
    }

    @Test
    void encoderQuantisationStaysWithinAFewCounts() {
        double v = 0.02;
        double q = 1e-6; // 1 µm scale
        double[][] ref = ramp(v, 1500);
        AxisModel axis = AxisModel.of("X", screw(0), cascade(0.012));
        NonlinearTrackingResult ideal = run(axis, NonlinearAxisSimulator.Limits.NONE, ref);
        NonlinearTrackingResult quantised = run(axis,
                new NonlinearAxisSimulator.Limits(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, q), ref);
        double worst = 0;
        for (int k = 500; k < 1500; k++) {
            worst = Math.max(worst, Math.abs(quantised.actual(k) - ideal.actual(k)));
        }
        // Rounding error is uniform within ±q/2 (GUM, JCGM 100:2008, from memory); through the closed loop
        // (sensitivity peak below 2 for this tuning, Åström & Murray 2008) the position moves by at most about q
        assertTrue(worst > 0.01 * q && worst < q, "deviation " + worst + " m for q = " + q + " m");
    }

    @Test
    void refusesExplicitPlantsAndContinuousLoops() {
        TransferFunctionPlant tfPlant = TransferFunctionPlant.of(TransferFunction.ofDescending(new double[] {1},
                new double[] {2e-3, 0.01}), RHO);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> NonlinearAxisSimulator.of(AxisModel.of("X", tfPlant, cascade(0.01)),
                        NonlinearAxisSimulator.Limits.NONE, 4));
        assertTrue(e.getMessage().contains("explicit transfer function"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> NonlinearAxisSimulator.of(
                AxisModel.of("X", screw(0), CascadeController.continuous(30, 1, 0.01)),
                NonlinearAxisSimulator.Limits.NONE, 4));
        assertTrue(e.getMessage().contains("position-loop sample period") && e.getMessage().contains("got 0.0"),
                e.getMessage());
    }
}
