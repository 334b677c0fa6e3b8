package org.tracewell.engine.axis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.tracewell.engine.tf.PadeDelay;

/**
 * The closed-form loop algebra of {@link AxisModel} against an independent solution of the block
 * diagram: at each test frequency the physical equations of the two-mass drive (Newton's law for
 * each inertia, spring and damper between them) and of the cascade controller are solved as a
 * complex linear system. Agreement to 1e-9 relative shows the polynomial formulas (and their exact
 * cancellations) are right; the controller, filter and delay factors are written out here again.
 */
class DerivedLoopsTest {

    private static final double[] OMEGAS = {0.7, 13, 95, 410, 880, 2300, 9000};

    private final TwoMassScrewDrive drive = AxisFixtures.twoMass(2 * Math.PI * 1500, 0.05, 120);
    private final CascadeController controller = AxisFixtures.tunedCascade(
            drive.resonanceModel().resonanceRadPerSec());

    private final double rho = AxisFixtures.LEAD / (2 * Math.PI);
    private final double jm = AxisFixtures.MOTOR_INERTIA + AxisFixtures.SCREW_INERTIA;
    private final double jl = AxisFixtures.LOAD_MASS * rho * rho;
    private final double k = AxisFixtures.AXIAL_STIFFNESS * rho * rho;
    private final double c = drive.axialDamping() * rho * rho;
    private final double bl = 120 * rho * rho;

    /** C_v(s): PI times notch times second-order low-pass, written out from their textbook forms. */
    private Complex velocityController(Complex s) {
        Complex pi = Complex.ONE.add(Complex.ONE.divide(s.multiply(controller.velocityIntegralTime())))
                .multiply(controller.velocityGain());
        double wn = drive.resonanceModel().resonanceRadPerSec();
        double width = 2 * Math.PI * 40;
        Complex s2 = s.multiply(s);
        Complex notch = s2.add(s.multiply(0.1 * width)).add(wn * wn).divide(s2.add(s.multiply(width)).add(wn * wn));
        double wl = 2 * Math.PI * 800;
        Complex lowPass = new Complex(wl * wl).divide(s2.add(s.multiply(2 * 0.7 * wl)).add(wl * wl));
        return pi.multiply(notch).multiply(lowPass);
    }

    private Complex currentLag(Complex s) {
        return Complex.ONE.divide(s.divide(2 * Math.PI * 1500).add(1));
    }

    private Complex pade(double delay, Complex s) {
        return PadeDelay.of(delay, AxisModel.DEFAULT_PADE_ORDER).evaluate(s);
    }

    /** Solves the closed axis at s for reference R and load force F; returns {θ_M, θ_L, ω_cmd, T_cmd}. */
    private Complex[] closedAxis(Complex s, PositionSensor sensor, Complex r, Complex f) {
        Complex s2 = s.multiply(s);
        Complex spring = s.multiply(c).add(k);
        Complex dv = pade(controller.velocityDeadTime(), s);
        Complex dp = pade(controller.positionDeadTime(), s);
        Complex cv = velocityController(s);
        double kv = controller.positionGain();
        double j = jm + jl;
        Complex z = Complex.ZERO;
        Complex[][] a = new Complex[4][];
        // J_M·s²·θ_M = G_i·T_cmd − (c·s + k)(θ_M − θ_L)
        a[0] = new Complex[] {s2.multiply(jm).add(spring), spring.negate(), z, currentLag(s).negate()};
        // J_L·s²·θ_L = ρ·F − b_L·s·θ_L + (c·s + k)(θ_M − θ_L)
        a[1] = new Complex[] {spring.negate(), s2.multiply(jl).add(s.multiply(bl)).add(spring), z, z};
        // ω_cmd = D_p·[Kv·(r − ρ·θ_m) + k_vff·s·r]/ρ
        Complex fb = dp.multiply(kv);
        a[2] = sensor == PositionSensor.MOTOR ? new Complex[] {fb, z, Complex.ONE, z}
                : new Complex[] {z, fb, Complex.ONE, z};
        // T_cmd = D_v·[C_v·(ω_cmd − s·θ_M) + D_p·k_aff·J·s²·r/ρ]
        a[3] = new Complex[] {dv.multiply(cv).multiply(s), z, dv.multiply(cv).negate(), Complex.ONE};
        Complex[] b = {
            z,
            f.multiply(rho),
            dp.multiply(s.multiply(controller.velocityFeedforward()).add(kv)).multiply(r).divide(rho),
            dv.multiply(dp).multiply(s2).multiply(controller.accelerationFeedforward() * j).multiply(r).divide(rho)
        };
        return AxisFixtures.solve(a, b);
    }

    /** Solves the axis with the velocity loop closed and ω_cmd = 1; returns {θ_M, θ_L, T_cmd}. */
    private Complex[] velocityLoopDriven(Complex s) {
        Complex s2 = s.multiply(s);
        Complex spring = s.multiply(c).add(k);
        Complex dvc = pade(controller.velocityDeadTime(), s).multiply(velocityController(s));
        Complex z = Complex.ZERO;
        Complex[][] a = {
            {s2.multiply(jm).add(spring), spring.negate(), currentLag(s).negate()},
            {spring.negate(), s2.multiply(jl).add(s.multiply(bl)).add(spring), z},
            {dvc.multiply(s), z, Complex.ONE}
        };
        return AxisFixtures.solve(a, new Complex[] {z, z, dvc});
    }

    @ParameterizedTest
    @EnumSource(PositionSensor.class)
    void closedFormLoopsMatchTheBlockDiagramSolvedDirectly(PositionSensor sensor) {
        AxisModel axis = AxisModel.of("X", drive, controller).withSensor(sensor);
        for (double w : OMEGAS) {
            Complex s = new Complex(0, w);
            Complex[] ref = closedAxis(s, sensor, Complex.ONE, Complex.ZERO);
            Complex[] force = closedAxis(s, sensor, Complex.ZERO, Complex.ONE);
            Complex xr = ref[1].multiply(rho);
            Complex xf = force[1].multiply(rho);
            String at = sensor + " at " + w + " rad/s";
            assertEquals(0, AxisFixtures.relativeError(axis.referenceToPosition().evaluate(s), xr), 1e-9, at);
            assertEquals(0, AxisFixtures.relativeError(axis.errorTransfer().orElseThrow().evaluate(s),
                    Complex.ONE.subtract(xr)), 1e-9, at);
            assertEquals(0, AxisFixtures.relativeError(axis.compliance().evaluate(s), xf), 1e-9, at);
            assertEquals(0, AxisFixtures.relativeError(axis.dynamicStiffness().evaluate(s), Complex.ONE.divide(xf)),
                    1e-9, at);

            Complex[] inner = velocityLoopDriven(s);
            // velocity closed loop ω_M/ω_cmd
            assertEquals(0, AxisFixtures.relativeError(axis.velocityClosedLoop().evaluate(s), inner[0].multiply(s)),
                    1e-9, at);
            // position open loop Kv·e^(−s·T_dp)·x_m/(ρ·ω_cmd), position dead time exact
            Complex measured = sensor == PositionSensor.MOTOR ? inner[0] : inner[1];
            Complex lp = measured.multiply(s.multiply(-controller.positionDeadTime()).exp())
                    .multiply(controller.positionGain());
            assertEquals(0, AxisFixtures.relativeError(axis.positionOpenLoop().evaluate(s), lp), 1e-9, at);
        }
    }

    @ParameterizedTest
    @EnumSource(PositionSensor.class)
    void velocityOpenLoopKeepsItsDeadTimeExact(PositionSensor sensor) {
        AxisModel axis = AxisModel.of("X", drive, controller).withSensor(sensor);
        for (double w : OMEGAS) {
            Complex s = new Complex(0, w);
            // ω_M per torque command from the two Newton equations with T = 1
            Complex s2 = s.multiply(s);
            Complex spring = s.multiply(c).add(k);
            Complex[] mech = AxisFixtures.solve(new Complex[][] {
                {s2.multiply(jm).add(spring), spring.negate()},
                {spring.negate(), s2.multiply(jl).add(s.multiply(bl)).add(spring)}}, new Complex[] {Complex.ONE,
                    Complex.ZERO});
            Complex lv = velocityController(s).multiply(s.multiply(-controller.velocityDeadTime()).exp())
                    .multiply(currentLag(s)).multiply(mech[0].multiply(s));
            assertEquals(0, AxisFixtures.relativeError(axis.velocityOpenLoop().evaluate(s), lv), 1e-9, "at " + w);
        }
    }
}
