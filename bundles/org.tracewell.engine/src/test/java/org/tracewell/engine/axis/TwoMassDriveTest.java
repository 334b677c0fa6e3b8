package org.tracewell.engine.axis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Comparator;
import java.util.List;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.tf.TransferFunction;

class TwoMassDriveTest {

    @Test
    void resonanceAndAntiResonanceMatchEllisAndThePolesAndZeros() {
        TwoMassScrewDrive drive = AxisFixtures.twoMass(Double.POSITIVE_INFINITY, 0, 0);
        double rho = AxisFixtures.LEAD / (2 * Math.PI);
        double k = AxisFixtures.AXIAL_STIFFNESS * rho * rho;
        double jm = AxisFixtures.MOTOR_INERTIA + AxisFixtures.SCREW_INERTIA;
        double jl = AxisFixtures.LOAD_MASS * rho * rho;
        Resonance r = drive.resonance().orElseThrow();
        // anti-resonance √(k/J_L), resonance √(k/J_L)·√(1 + J_L/J_M) (Ellis, Control System Design Guide, 4th ed., 2012, from memory)
        assertEquals(Math.sqrt(k / jl), r.antiResonanceRadPerSec(), 1e-9 * r.antiResonanceRadPerSec());
        assertEquals(Math.sqrt(k / jl) * Math.sqrt(1 + jl / jm), r.resonanceRadPerSec(), 1e-9 * r.resonanceRadPerSec());
        // in the linear frame the anti-resonance is the axial mode √(k_ax/m) (Altintas et al., CIRP Annals 60(2), 2011)
        assertEquals(Math.sqrt(AxisFixtures.AXIAL_STIFFNESS / AxisFixtures.LOAD_MASS), r.antiResonanceRadPerSec(),
                1e-9 * r.antiResonanceRadPerSec());

        // Independent check: the undamped ω_M/T has zeros ±j·ω_ar and poles 0, ±j·ω_r (root finder vs closed form)
        TransferFunction g = drive.mechanics().torqueToMotorVelocity();
        List<Complex> zeros = g.zeros();
        List<Complex> poles = g.poles();
        assertEquals(2, zeros.size());
        assertEquals(3, poles.size());
        for (Complex z : zeros) {
            assertEquals(0.0, z.getReal(), 1e-6 * r.antiResonanceRadPerSec());
            assertEquals(r.antiResonanceRadPerSec(), Math.abs(z.getImaginary()), 1e-8 * r.antiResonanceRadPerSec());
        }
        Complex top = poles.stream().max(Comparator.comparingDouble(Complex::getImaginary)).orElseThrow();
        assertEquals(r.resonanceRadPerSec(), top.getImaginary(), 1e-8 * r.resonanceRadPerSec());
        assertTrue(poles.stream().anyMatch(p -> p.abs() < 1e-6), "rigid-body pole at s = 0: " + poles);
        // the high-frequency asymptote is the motor-side inertia alone: ω_M/T → 1/(J_M·s)
        double w = 1e6;
        assertEquals(1 / (jm * w), g.evaluate(new Complex(0, w)).abs(), 1e-3 / (jm * w));
        // and the low-frequency one the total inertia: → 1/((J_M + J_L)·s)
        w = 1.0;
        assertEquals(1 / ((jm + jl) * w), g.evaluate(new Complex(0, w)).abs(), 1e-5 / ((jm + jl) * w));
    }

    @Test
    void firstAxialModeFallsAsTheNutMovesAwayFromTheFixedBearing() {
        ScrewShaft screw = ScrewShaft.steel(1.0, 0.032, 0.027);
        StiffnessChain ff = new StiffnessChain(screw, ScrewMounting.FIXED_FREE, 9e8, 1.2e9);
        TwoMassScrewDrive drive = new TwoMassScrewDrive(DriveMotor.withIdealCurrentLoop(1e-3, 1), 1e-3, 300, 0.01, 1,
                ff, 0.1, 0, 0, 0);
        double near = drive.firstAxialModeRadPerSec(0.1);
        double far = drive.firstAxialModeRadPerSec(1.0);
        // f ≈ (1/2π)·√(k(a)/m) with k(a) from E·A/a in series with nut and bearing (Altintas et al. 2011)
        assertEquals(Math.sqrt(ff.stiffnessAt(1.0) / 300), far, 1e-12 * far);
        assertTrue(far < near, near + " vs " + far);
        // the resonance model follows the nut: anti-resonance at a equals the axial mode there
        assertEquals(far, drive.atNutPosition(1.0).resonanceModel().antiResonanceRadPerSec(), 1e-9 * far);
        // fixed–fixed: softest at mid-span, symmetric about it
        StiffnessChain fx = new StiffnessChain(screw, ScrewMounting.FIXED_FIXED, 9e8, 1.2e9);
        assertEquals(fx.stiffnessAt(0.3), fx.stiffnessAt(0.7), 1e-9 * fx.stiffnessAt(0.3));
        assertTrue(fx.stiffnessAt(0.5) < fx.stiffnessAt(0.3));
    }

    @Test
    void rigidLimitOfTwoMassEqualsRigidScrewDrive() {
        // Stiffness → very large: the two-mass ω_M/T tends to 1/(J·s + b) of the rigid drive (independent model)
        ScrewShaft screw = ScrewShaft.steel(1.0, 0.032, 0.027);
        StiffnessChain stiff = new StiffnessChain(new ScrewShaft(1.0, 0.032, 0.027, 7850, 2.1e17),
                ScrewMounting.FIXED_FREE, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY);
        DriveMotor motor = DriveMotor.withIdealCurrentLoop(1.2e-3, 1.1);
        TwoMassScrewDrive elastic = new TwoMassScrewDrive(motor, screw.inertia(), 250, 0.01, 1, stiff, 0.5, 0, 80, 0);
        RigidScrewDrive rigid = RigidScrewDrive.withScrew(motor, screw, 250, 0.01, 1, 80, 0);
        assertEquals(rigid.equivalentInertia(), elastic.equivalentInertia(), 1e-15);
        for (double w : new double[] {1, 30, 300}) {
            Complex s = new Complex(0, w);
            Complex a = elastic.torqueCommandToLoadPosition().evaluate(s);
            Complex b = rigid.torqueCommandToLoadPosition().evaluate(s);
            assertEquals(0.0, AxisFixtures.relativeError(a, b), 1e-6, "at " + w + " rad/s");
        }
    }
}
