package org.tracewell.engine.axis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.loop.Margins;
import org.tracewell.engine.loop.SteadyState;

class CascadeLoopTest {

    /** A linear-motor axis: force → velocity 1/(m·s + b), frame m/s, ρ = 1. */
    private static DirectLinearDrive linearMotor(double currentBandwidth, double viscous) {
        return new DirectLinearDrive(60, 120, currentBandwidth, viscous, 0);
    }

    @Test
    void cascadePPlusPiWithIdealCurrentLoopIsType1WithKvEqualToThePositionGain() {
        // DOMAIN.md §1 [der]: the closed PI velocity loop has DC gain 1, so Kv = position gain whatever the tuning.
        AxisPlant[] plants = {
            linearMotor(Double.POSITIVE_INFINITY, 40),
            new RigidScrewDrive(DriveMotor.withIdealCurrentLoop(1.2e-3, 1.1), 9.7e-4, 250, 0.01, 1, 150, 0),
            AxisFixtures.twoMass(Double.POSITIVE_INFINITY, 0.05, 150)
        };
        double[][] tunings = {{0.8, 0.004}, {3.0, 0.02}, {0.3, 0.05}};
        for (AxisPlant plant : plants) {
            double scale = plant.equivalentInertia() / 2.8e-3; // same bandwidth on every plant
            for (double[] t : tunings) {
                for (PositionSensor sensor : PositionSensor.values()) {
                    AxisModel axis = AxisModel.of("X", plant, CascadeController.continuous(25, t[0] * scale, t[1]))
                            .withSensor(sensor);
                    SteadyState pos = SteadyState.ofUnityFeedback(axis.positionOpenLoop(), true);
                    String what = plant.getClass().getSimpleName() + " " + sensor + " " + t[0] + "/" + t[1];
                    assertEquals(1, pos.systemType(), what);
                    assertEquals(25, pos.kv(), 1e-9 * 25, what); // [der], exact up to rounding
                }
            }
        }
        // the full analysis reports the same
        AxisDynamics full = AxisModel.of("X", plants[2], CascadeController.continuous(25, 1.0, 0.01)).analyze();
        assertEquals(1, full.positionLoopType());
        assertEquals(25, full.positionGain(), 1e-9 * 25);
        assertEquals(full.positionGain(), AxisModel.of("X", plants[2], CascadeController.continuous(25, 1.0, 0.01))
                .positionLoopKv(), 0.0);
        // Integral velocity action gives infinite static stiffness to a constant load force (DOMAIN.md §1 [der])
        AxisModel pi = AxisModel.of("X", linearMotor(Double.POSITIVE_INFINITY, 40), CascadeController.continuous(25, 3000, 0.01));
        assertEquals(Double.POSITIVE_INFINITY, pi.staticStiffness());
    }

    @Test
    void proportionalVelocityLoopWithFrictionLowersKvAndGivesFiniteStiffness() {
        // P velocity loop with viscous friction b: velocity DC gain K_p/(K_p + b), so Kv_eff = Kv·K_p/(K_p + b);
        // static stiffness Kv·K_p (ρ = 1) [der: final value of the closed-form loop, checked numerically here]
        double kp = 3000;
        double b = 600;
        AxisModel axis = AxisModel.of("X", linearMotor(Double.POSITIVE_INFINITY, b),
                CascadeController.continuous(25, kp, Double.POSITIVE_INFINITY));
        AxisDynamics d = axis.analyze();
        assertEquals(25 * kp / (kp + b), d.positionGain(), 1e-9);
        // the constant from the coefficients alone is the analysis's, exactly
        assertEquals(d.positionGain(), axis.positionLoopKv(), 0.0);
        assertEquals(25 * kp, axis.staticStiffness(), 1e-6 * 25 * kp);
    }

    @Test
    void velocityFeedforwardOfOneAroundFirstOrderVelocityLoopGivesZeroRampErrorAndKaKvOverT() {
        // Linear motor, P velocity loop, no friction, ideal current loop: closed velocity loop 1/(T·s + 1), T = m/K_p.
        double m = 60;
        double kp = 6000;
        double kv = 30;
        double lag = m / kp;
        AxisModel axis = AxisModel.of("X", linearMotor(Double.POSITIVE_INFINITY, 0),
                CascadeController.continuous(kv, kp, Double.POSITIVE_INFINITY).withFeedforward(1, 0));
        AxisDynamics d = axis.analyze();
        // E/R = T·s²/(T·s² + s + Kv): effective type 2, Ka_eff = Kv/T (DOMAIN.md §1 [der])
        assertEquals(2, d.effectiveType());
        assertEquals(kv / lag, d.tracking().ka(), 1e-9 * kv / lag);
        assertEquals(0.0, d.followingError(0.1).getAsDouble(), 0.0);
        // the loop itself stays type 1 with Kv (Nise ch. 7, from memory): v/Kv without feedforward
        assertEquals(1, d.positionLoopType());
        assertEquals(0.1 / kv, d.followingErrorWithoutFeedforward(0.1).getAsDouble(), 1e-12);
        // E/R against the closed form T·s²/(T·s² + s + Kv) at a few frequencies [der]
        for (double w : new double[] {1, 10, 100}) {
            Complex s = new Complex(0, w);
            Complex expected = s.multiply(s).multiply(lag).divide(s.multiply(s).multiply(lag).add(s).add(kv));
            assertEquals(0, AxisFixtures.relativeError(axis.errorTransfer().orElseThrow().evaluate(s), expected), 1e-12);
        }
        // full velocity and acceleration feedforward on this frictionless rigid axis: E ≡ 0 (perfect tracking)
        assertTrue(axis.withController(axis.controller().withFeedforward(1, 1)).errorTransfer().isEmpty());
    }

    @Test
    void positionLoopAroundSecondOrderVelocityLoopIsStableOnlyBelow2DOmega0() {
        // Linear motor, P velocity loop, current lag τ: velocity loop ω0²/(s² + s/τ + ω0²), ω0² = K_p/(m·τ),
        // 2·D·ω0 = 1/τ. Characteristic s³ + 2Dω0 s² + ω0² s + Kv ω0²: stable for Kv < 2·D·ω0 (DOMAIN.md §2 [der], Routh)
        double tau = 1 / (2 * Math.PI * 400.0);
        double kp = 9000;
        double bound = 1 / tau;
        DirectLinearDrive plant = linearMotor(1 / tau, 0);
        for (double factor : new double[] {0.98, 1.02}) {
            AxisModel axis = AxisModel.of("X", plant, CascadeController.continuous(factor * bound, kp,
                    Double.POSITIVE_INFINITY));
            assertEquals(factor < 1, axis.analyze().positionLoop().stable(), "Kv = " + factor + "·2Dω0");
        }
        // the stable gain range of the position loop ends at exactly 2Dω0/Kv (independent: Routh above)
        AxisModel axis = AxisModel.of("X", plant, CascadeController.continuous(100, kp, Double.POSITIVE_INFINITY));
        var range = axis.analyze().positionLoop().gainRange();
        assertTrue(range.contains(1.0));
        double upper = range.intervals().get(0).upper();
        assertEquals(bound / 100, upper, 1e-6 * bound / 100);
    }

    @Test
    void sampledLoopDeadTimeCostsPhaseOnePointFiveTOmegaC() {
        // ZOH + one sample of computation ≈ 1.5·T dead time; phase loss at crossover ≈ 1.5·T·ωc (common practice).
        // The delay leaves |L| unchanged, so the crossover stays and the loss is exactly 1.5·T·ωc here.
        AxisPlant plant = new RigidScrewDrive(new DriveMotor(1.2e-3, 1.1, 2 * Math.PI * 1500), 9.7e-4, 250, 0.01, 1, 0,
                0);
        CascadeController continuous = CascadeController.continuous(40, 1.0, 0.012);
        double period = 125e-6;
        Margins ideal = AxisModel.of("X", plant, continuous).analyze().velocityLoopMargins();
        AxisDynamics sampledAxis = AxisModel.of("X", plant, continuous.withSamplePeriods(0, period)).analyze();
        Margins sampled = sampledAxis.velocityLoopMargins();
        double wc = ideal.gainCrossoverRadPerSec().getAsDouble();
        assertEquals(wc, sampled.gainCrossoverRadPerSec().getAsDouble(), 1e-9 * wc);
        double lossDeg = Math.toDegrees(1.5 * period * wc);
        assertEquals(lossDeg, ideal.phaseMarginDeg() - sampled.phaseMarginDeg(), 1e-6);
        // the Padé(2) loop in the analysis agrees: phase error of order (ωT)^5 with ωT ≈ 0.07 (Baker 1975, from memory)
        assertEquals(sampled.phaseMarginDeg(), sampledAxis.velocityLoop().margins().phaseMarginDeg(), 1e-6);
        assertTrue(lossDeg > 2 && lossDeg < 5, "plausible loss " + lossDeg);
    }

    @Test
    void notchAtTheResonanceCutsTheVelocityLoopGainThereByItsDepth() {
        TwoMassScrewDrive drive = AxisFixtures.twoMass(2 * Math.PI * 1500, 0.03, 0);
        double wr = drive.resonanceModel().resonanceRadPerSec();
        CascadeController plain = new CascadeController(40, 1.0, 0.012, List.of(), 0, 0, 1e-3, 125e-6);
        CascadeController notched = plain.withFilters(List.of(new FilterStage.Notch(wr, 2 * Math.PI * 40, 0.1)));
        double g0 = AxisModel.of("X", drive, plain).analyze().velocityOpenLoopGainAtResonanceDb().getAsDouble();
        double g1 = AxisModel.of("X", drive, notched).analyze().velocityOpenLoopGainAtResonanceDb().getAsDouble();
        // notch gain at its centre = depth: 20·log10(0.1) = −20 dB (definition of the notch's depth)
        assertEquals(-20.0, g1 - g0, 1e-9);
    }

    @Test
    void axisDynamicsReportsBandwidthsMarginsAndFollowingError() {
        TwoMassScrewDrive drive = AxisFixtures.twoMass(2 * Math.PI * 1500, 0.05, 120);
        AxisDynamics d = AxisModel.of("Y", drive, AxisFixtures.tunedCascade(drive.resonanceModel().resonanceRadPerSec()))
                .analyze();
        assertTrue(d.stable());
        assertEquals(1, d.positionLoopType());
        // DOMAIN.md §8 (common practice): velocity loop 50–300 Hz for ball screws, position 5–30 Hz,
        // PM 40–60° velocity and ≥ 45° position, GM ≥ 6 dB — the fixture is tuned into those ranges
        double fv = d.velocityBandwidthHz().getAsDouble();
        double fp = d.positionBandwidthHz().getAsDouble();
        assertTrue(fv > 50 && fv < 300, "velocity bandwidth " + fv);
        assertTrue(fp > 5 && fp < 30, "position bandwidth " + fp);
        assertTrue(d.velocityLoopMargins().phaseMarginDeg() > 35, "" + d.velocityLoopMargins());
        assertTrue(d.positionLoopMargins().phaseMarginDeg() > 45, "" + d.positionLoopMargins());
        // Padé order 2 of a 1.5 ms delay at the ~40 rad/s crossover: phase error far below 1e-6° (Baker 1975,
        // error of order (ωT)^5; here ωT ≈ 0.06)
        assertEquals(d.positionLoopMargins().phaseMarginDeg(), d.positionLoop().margins().phaseMarginDeg(), 1e-6);
        assertTrue(d.velocityLoopMargins().gainMarginDb() > 6, "" + d.velocityLoopMargins());
        // following error without feedforward: v/Kv (DOMAIN.md §4, common practice) plus the screw wind-up
        // v·b_L/k_ax of the load friction outside a motor-encoder loop [der: static force balance]
        double v = 0.1;
        double windUp = v * 120 / AxisFixtures.AXIAL_STIFFNESS;
        assertEquals(v / 40 + windUp, d.followingErrorWithoutFeedforward(v).getAsDouble(), 1e-9 * v / 40);
        // 80 % velocity feedforward: E/R = 1 − T·(1 + k_vff·s/Kv) with T ≈ 1 − s/Kv_eff, so the ramp error is
        // v·(1 − k_vff)/Kv + wind-up; the loop dead times enter only at order s² [der: E/R expanded at s = 0]
        SteadyState t = d.tracking();
        assertEquals(1, t.systemType());
        double expected = v * (1 - 0.8) / 40 + windUp;
        assertEquals(expected, d.followingError(v).getAsDouble(), 1e-6 * expected);
    }
}
