package org.tracewell.engine.axis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.tracewell.engine.tf.PadeDelay;

class PidAxisTest {

    private final TwoMassScrewDrive drive = AxisFixtures.twoMass(2 * Math.PI * 1500, 0.05, 120);
    private final double rho = AxisFixtures.LEAD / (2 * Math.PI);
    private final double jm = AxisFixtures.MOTOR_INERTIA + AxisFixtures.SCREW_INERTIA;
    private final double jl = AxisFixtures.LOAD_MASS * rho * rho;
    private final double k = AxisFixtures.AXIAL_STIFFNESS * rho * rho;
    private final double c = drive.axialDamping() * rho * rho;
    private final double bl = 120 * rho * rho;
    private final PidController pid = new PidController(2.5e4, 0.03, 0.004, 10,
            List.of(new FilterStage.LowPass1(2 * Math.PI * 600)), 0.7, 0.9, 250e-6);

    /** PID with derivative filter and the low-pass, written out from their textbook forms. */
    private Complex controller(Complex s) {
        Complex d = s.multiply(0.004).divide(s.multiply(0.0004).add(1));
        Complex p = Complex.ONE.add(Complex.ONE.divide(s.multiply(0.03))).add(d).multiply(2.5e4);
        double wl = 2 * Math.PI * 600;
        return p.multiply(new Complex(wl).divide(s.add(wl)));
    }

    @ParameterizedTest
    @EnumSource(PositionSensor.class)
    void closedFormMatchesTheBlockDiagramSolvedDirectly(PositionSensor sensor) {
        PidAxisModel axis = PidAxisModel.of("Z", drive, pid).withSensor(sensor);
        double j = jm + jl;
        for (double w : new double[] {0.9, 25, 180, 760, 1200, 5000}) {
            Complex s = new Complex(0, w);
            Complex s2 = s.multiply(s);
            Complex spring = s.multiply(c).add(k);
            Complex delay = PadeDelay.of(1.5 * 250e-6, AxisModel.DEFAULT_PADE_ORDER).evaluate(s);
            Complex lag = Complex.ONE.divide(s.divide(2 * Math.PI * 1500).add(1));
            Complex dc = delay.multiply(controller(s));
            Complex z = Complex.ZERO;
            // unknowns θ_M, θ_L, T_cmd; T_cmd = D·[C·(r − ρ·θ_m) + (k_vff·b·s + k_aff·J·s²)·r/ρ], b = b_L here
            Complex fbM = sensor == PositionSensor.MOTOR ? dc.multiply(rho) : z;
            Complex fbL = sensor == PositionSensor.LOAD ? dc.multiply(rho) : z;
            Complex[][] a = {
                {s2.multiply(jm).add(spring), spring.negate(), lag.negate()},
                {spring.negate(), s2.multiply(jl).add(s.multiply(bl)).add(spring), z},
                {fbM, fbL, Complex.ONE}
            };
            Complex ff = delay.multiply(s.multiply(0.7 * bl).add(s2.multiply(0.9 * j))).divide(rho);
            Complex[] ref = AxisFixtures.solve(a, new Complex[] {z, z, dc.add(ff)});
            Complex[] force = AxisFixtures.solve(a, new Complex[] {z, new Complex(rho), z});
            String at = sensor + " at " + w;
            assertEquals(0, AxisFixtures.relativeError(axis.referenceToPosition().evaluate(s), ref[1].multiply(rho)),
                    1e-9, at);
            assertEquals(0, AxisFixtures.relativeError(axis.compliance().evaluate(s), force[1].multiply(rho)), 1e-9, at);
            // state-space bridge: r, ṙ = s·r, r̈ = s²·r summed equals x_L/r
            var ss = axis.closedLoopStateSpace();
            int n = ss.stateCount();
            Complex total = Complex.ZERO;
            Complex[] weights = {Complex.ONE, s, s2};
            for (int in = 0; in < 3; in++) {
                Complex[][] m = new Complex[n][n];
                Complex[] b = new Complex[n];
                for (int r = 0; r < n; r++) {
                    for (int col = 0; col < n; col++) {
                        m[r][col] = new Complex(-ss.a(r, col)).add(r == col ? s : z);
                    }
                    b[r] = new Complex(ss.b(r, in));
                }
                Complex[] x = AxisFixtures.solve(m, b);
                for (int r = 0; r < n; r++) {
                    total = total.add(x[r].multiply(ss.c(r)).multiply(weights[in]));
                }
            }
            assertEquals(0, AxisFixtures.relativeError(total, ref[1].multiply(rho)), 1e-9, at);
        }
    }

    @Test
    void pdOnAMassIsTheTextbookSecondOrderAndPidAddsType() {
        // Linear motor, ideal current loop, no friction: L = K_p·(1 + T_d·s)/(m·s²) with N large.
        // Closed loop m·s² + K_p·T_d·s + K_p: ωn = √(K_p/m), ζ = K_p·T_d/(2·√(K_p·m)) (Nise ch. 4, from memory)
        double m = 60;
        double kp = 6e5;
        double td = 0.01;
        DirectLinearDrive motor = new DirectLinearDrive(m, 120, Double.POSITIVE_INFINITY, 0, 0);
        PidAxisDynamics pd = PidAxisModel.of("X", motor, PidController.continuous(kp, Double.POSITIVE_INFINITY, td, 1e6))
                .analyze();
        double wn = Math.sqrt(kp / m);
        double zeta = kp * td / (2 * Math.sqrt(kp * m));
        Complex pole = pd.loop().closedLoopPoles().stream().filter(p -> p.abs() < 10 * wn).findFirst().orElseThrow();
        assertEquals(wn, pole.abs(), 1e-4 * wn);
        assertEquals(zeta, -pole.getReal() / pole.abs(), 1e-4);
        // PD: static stiffness K_p (N/m) [der]; type 2 (two integrators of the mass) (Nise ch. 7, from memory)
        assertEquals(kp, pd.staticStiffnessNPerM(), 1e-6 * kp);
        assertEquals(2, pd.loop().loopType());
        // adding integral action: type 3, infinite static stiffness
        PidAxisDynamics full = PidAxisModel.of("X", motor, PidController.continuous(kp, 0.1, td, 1e6)).analyze();
        assertEquals(3, full.loop().loopType());
        assertEquals(Double.POSITIVE_INFINITY, full.staticStiffnessNPerM());
        assertTrue(full.loop().stable());
        assertEquals(0.0, full.followingError(0.1).getAsDouble(), 0.0);
    }
}
