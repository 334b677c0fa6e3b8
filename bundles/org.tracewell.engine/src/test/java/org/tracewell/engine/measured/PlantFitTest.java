package org.tracewell.engine.measured;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.Optional;
import java.util.Random;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.axis.DriveMotor;
import org.tracewell.engine.axis.RackAndPinionDrive;
import org.tracewell.engine.axis.ScrewMounting;
import org.tracewell.engine.axis.ScrewShaft;
import org.tracewell.engine.axis.StiffnessChain;
import org.tracewell.engine.axis.TransferFunctionPlant;
import org.tracewell.engine.axis.TwoMassScrewDrive;
import org.tracewell.engine.tf.FrequencyResponse;
import org.tracewell.engine.tf.TransferFunction;

/**
 * Plant fits to synthetic responses of known plants. Each response is generated twice: by the engine's own
 * transfer-function code (plant → polynomials → Horner) and independently from Newton's law for the two masses,
 * solved as a 2×2 complex system at each frequency; the two must agree before the fit is trusted.
 */
class PlantFitTest {

    /** LM-3020 Y-like ball-screw axis (DESIGN.md scenario, invented values): 25 mm screw, 10 mm lead, 180 kg. */
    private static TwoMassScrewDrive screwAxis() {
        DriveMotor motor = new DriveMotor(4.6e-4, 0.95, 2 * Math.PI * 1800);
        StiffnessChain chain = new StiffnessChain(ScrewShaft.steel(2.3, 0.0215, 0.0215), ScrewMounting.FIXED_FIXED,
                6e8, 7.5e8);
        double nut = 1.15;
        double damping = TwoMassScrewDrive.dampingForRatio(0.03, chain.stiffnessAt(nut), 180);
        return new TwoMassScrewDrive(motor, 6.9e-4, 180, 0.01, 1, chain, nut, damping, 600, 90);
    }

    /** LM-3020 X1-like rack drive (rigid in the engine): 10:1 gearbox, 31.83 mm pinion, 210 kg. */
    private static RackAndPinionDrive rackAxis() {
        return new RackAndPinionDrive(new DriveMotor(8e-4, 1.1, 2 * Math.PI * 1500), 6e-5 * 100, 0.03183, 10, 210,
                250, 120);
    }

    /** 3.2 Hz .. 1 kHz, log-spaced, as a swept-sine measurement would give. */
    private static double[] grid(int n) {
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = 2 * Math.PI * Math.pow(10, 0.5 + 2.5 * i / (n - 1));
        }
        return w;
    }

    /**
     * ω_M/T of a two-mass drive from the equations of motion (Newton's second law, motor-side frame):
     * J_M·jω·Ω_M = T − Z·(Ω_M − Ω_L), J_L·jω·Ω_L = Z·(Ω_M − Ω_L) − b·Ω_L, Z = k/(jω) + c; current lag 1/(1 + jω/ω_i),
     * dead time e^(−jωT_d).
     */
    private static Complex newton(double jm, double jl, double k, double c, double b, double wi, double td, double w) {
        Complex s = new Complex(0, w);
        Complex z = new Complex(k).divide(s).add(c);
        Complex a11 = s.multiply(jm).add(z);
        Complex a22 = s.multiply(jl).add(z).add(b);
        Complex det = a11.multiply(a22).subtract(z.multiply(z));
        Complex omegaM = a22.divide(det);
        Complex lag = Complex.ONE.divide(Complex.ONE.add(s.divide(wi)));
        return omegaM.multiply(lag).multiply(new Complex(0, -w * td).exp());
    }

    private static MeasuredFrequencyResponse measured(double[] w, Complex[] g, double noise, long seed) {
        Random random = new Random(seed);
        double[] re = new double[w.length];
        double[] im = new double[w.length];
        for (int i = 0; i < w.length; i++) {
            // multiplicative noise: relative magnitude error and phase error of about `noise` (1σ)
            Complex e = new Complex(1 + noise * random.nextGaussian(), 0)
                    .multiply(new Complex(0, noise * random.nextGaussian()).exp());
            Complex v = g[i].multiply(e);
            re[i] = v.getReal();
            im[i] = v.getImaginary();
        }
        return MeasuredFrequencyResponse.of(new MeasurementSource("synthetic.csv", Optional.empty(), false, Map.of()), w,
                re, im, null);
    }

    private static Complex[] engineResponse(TransferFunction g, double[] w) {
        FrequencyResponse r = g.frequencyResponse(w);
        Complex[] out = new Complex[w.length];
        for (int i = 0; i < w.length; i++) {
            out[i] = new Complex(r.real(i), r.imaginary(i));
        }
        return out;
    }

    private static void relative(double expected, double actual, double tolerance, String what) {
        assertEquals(expected, actual, tolerance * Math.abs(expected), what);
    }

    @Test
    void twoMassAxisIsRefittedFromBothSyntheticResponses() {
        TwoMassScrewDrive y = screwAxis();
        double td = 250e-6; // 2 velocity samples of 125 µs
        double[] w = grid(300);
        double rho2 = Math.pow(0.01 / (2 * Math.PI), 2);
        double jm = y.motorSideInertia();
        double jl = y.loadSideInertia();
        double k = y.reflectedStiffness();
        double c = y.axialDamping() * rho2;
        double b = 600 * rho2;
        double wi = y.currentLoopBandwidth();
        Complex[] byEngine = engineResponse(y.torqueCommandToMotorVelocity().withDelay(td), w);
        Complex[] byNewton = new Complex[w.length];
        for (int i = 0; i < w.length; i++) {
            byNewton[i] = newton(jm, jl, k, c, b, wi, td, w[i]);
            // the engine's polynomial algebra against the equations of motion: rounding only
            assertTrue(byEngine[i].subtract(byNewton[i]).abs() <= 1e-10 * byNewton[i].abs(), "at " + w[i]);
        }
        PlantFitOptions options = PlantFitOptions.defaults().withCurrentLoopBandwidth(wi);
        for (Complex[] data : new Complex[][] {byEngine, byNewton}) {
            PlantFitResult fit = PlantFit.fit(measured(w, data, 0, 1), PlantFitModel.TWO_MASS, options);
            TwoMassParameters t = fit.twoMass().orElseThrow();
            // noise-free data: the known plant is the exact minimum; 1e-6 relative leaves room for the
            // optimiser's stopping tolerance
            relative(jm + jl, fit.totalInertia(), 1e-6, "J");
            relative(jm, t.motorInertia(), 1e-6, "J_M");
            relative(k, t.stiffness(), 1e-6, "k");
            relative(0.03, t.dampingRatio(), 1e-5, "ζ");
            relative(b, fit.viscousDamping(), 1e-4, "b"); // its corner b/J ≈ 0.15 Hz lies below the band
            relative(td, fit.deadTime(), 1e-5, "T_d");
            relative(y.resonanceModel().resonanceRadPerSec(), t.resonance().resonanceRadPerSec(), 1e-6, "ω_r");
            assertTrue(fit.quality().logErrorRms() < 1e-8, "residual " + fit.quality().logErrorRms());
            assertTrue(fit.iterations() > 0 && fit.iterations() < 100, "iterations " + fit.iterations());
        }
    }

    @Test
    void twoMassFitWithSeededNoiseStaysWithinStatedTolerance() {
        TwoMassScrewDrive y = screwAxis();
        double[] w = grid(300);
        Complex[] g = engineResponse(y.torqueCommandToMotorVelocity().withDelay(250e-6), w);
        PlantFitOptions options = PlantFitOptions.defaults().withCurrentLoopBandwidth(y.currentLoopBandwidth());
        for (long seed = 1; seed <= 5; seed++) {
            // 2 % magnitude and 0.02 rad (1.1°) phase noise, 1σ, on every point
            PlantFitResult fit = PlantFit.fit(measured(w, g, 0.02, seed), PlantFitModel.TWO_MASS, options);
            TwoMassParameters t = fit.twoMass().orElseThrow();
            // Tolerances: 300 points at 2 % give parameter scatter of roughly 0.02/√300 ≈ 0.1 % on well-determined
            // quantities; 1 % (inertia, frequencies) and 10 % (damping ratio, which only a few points near the
            // mode determine; dead time) leave a wide margin.
            relative(y.equivalentInertia(), fit.totalInertia(), 0.01, "J seed " + seed);
            relative(y.resonanceModel().antiResonanceRadPerSec(), t.resonance().antiResonanceRadPerSec(), 0.01,
                    "ω_a seed " + seed);
            relative(y.resonanceModel().resonanceRadPerSec(), t.resonance().resonanceRadPerSec(), 0.01,
                    "ω_r seed " + seed);
            relative(0.03, t.dampingRatio(), 0.1, "ζ seed " + seed);
            relative(250e-6, fit.deadTime(), 0.1, "T_d seed " + seed);
            // the residual is the noise itself: √(0.02² + 0.02²) ≈ 0.028
            assertEquals(0.028, fit.quality().logErrorRms(), 0.005, "residual seed " + seed);
        }
    }

    @Test
    void rigidRackAxisIsRefittedAndMapsBackOntoItsLoadMass() {
        RackAndPinionDrive x = rackAxis();
        double[] w = grid(200);
        double rho = 0.03183 / 10;
        double j = x.equivalentInertia();
        double b = 250 * rho * rho;
        Complex[] byEngine = engineResponse(x.torqueCommandToMotorVelocity(), w);
        for (int i = 0; i < w.length; i++) {
            // independent formula: 1/(J·jω + b) behind the current lag 1/(1 + jω/ω_i)
            Complex s = new Complex(0, w[i]);
            Complex expected = Complex.ONE.divide(s.multiply(j).add(b))
                    .divide(Complex.ONE.add(s.divide(x.currentLoopBandwidth())));
            assertTrue(byEngine[i].subtract(expected).abs() <= 1e-12 * expected.abs(), "at " + w[i]);
        }
        PlantFitOptions options = PlantFitOptions.defaults().withCurrentLoopBandwidth(x.currentLoopBandwidth());
        PlantFitResult exact = PlantFit.fit(measured(w, byEngine, 0, 1), PlantFitModel.RIGID, options);
        relative(j, exact.totalInertia(), 1e-7, "J");
        relative(b, exact.viscousDamping(), 1e-4, "b");
        assertEquals(0, exact.deadTime(), 1e-9);
        PlantUpdate update = PlantUpdate.of(x, exact);
        RackAndPinionDrive back = assertInstanceOf(RackAndPinionDrive.class, update.updated());
        relative(210, back.loadMass(), 1e-6, "load mass");
        relative(250, back.viscousFriction(), 1e-4, "viscous friction");
        assertEquals(x.coulombFriction(), back.coulombFriction(), 0);

        PlantFitResult noisy = PlantFit.fit(measured(w, byEngine, 0.02, 42), PlantFitModel.RIGID, options);
        // 2 % noise on 200 points: J within 1 % (scatter ≈ 0.02/√200 ≈ 0.14 %)
        relative(j, noisy.totalInertia(), 0.01, "J with noise");
    }

    @Test
    void noiseFreeTwoMassFitMapsBackOntoTheScrewAxisParameters() {
        TwoMassScrewDrive y = screwAxis();
        double[] w = grid(300);
        Complex[] g = engineResponse(y.torqueCommandToMotorVelocity(), w);
        PlantFitResult fit = PlantFit.fit(measured(w, g, 0, 3), PlantFitModel.TWO_MASS,
                PlantFitOptions.defaults().withCurrentLoopBandwidth(y.currentLoopBandwidth()).withDeadTime(false));
        PlantUpdate update = PlantUpdate.of(y, fit);
        TwoMassScrewDrive back = assertInstanceOf(TwoMassScrewDrive.class, update.updated());
        relative(4.6e-4, back.motor().inertia(), 1e-5, "motor inertia");
        relative(180, back.loadMass(), 1e-5, "load mass");
        relative(6e8, back.stiffnessChain().nutStiffness(), 1e-4, "nut stiffness");
        relative(y.axialDamping(), back.axialDamping(), 1e-4, "axial damping");
        relative(600, back.viscousFriction(), 1e-3, "viscous friction");
        assertEquals(6.9e-4, back.screwInertia(), 0);
        ParameterChange load = update.changes().stream().filter(c -> c.parameter().equals("load mass")).findFirst()
                .orElseThrow();
        assertEquals(180, load.before(), 0);
        assertEquals(0, load.relativeChange(), 1e-5);
        assertEquals("kg", load.unit());
        // A rack drive has no two-mass parameters: the fit is offered as an explicit plant with the rack's ratio.
        PlantUpdate onRack = PlantUpdate.of(new RackAndPinionDrive(new DriveMotor(8e-4, 1.1, y.currentLoopBandwidth()),
                6e-3, 0.03183, 10, 210, 250, 120), fit);
        TransferFunctionPlant explicit = assertInstanceOf(TransferFunctionPlant.class, onRack.updated());
        assertEquals(0.003183, explicit.ratio(), 1e-15);
        relative(y.equivalentInertia(), explicit.equivalentInertia(), 1e-6, "inertia");
    }

    @Test
    void comparisonOfAResponseWithItselfIsZeroAndAGainErrorShowsInDecibels() {
        RackAndPinionDrive x = rackAxis();
        double[] w = grid(50);
        TransferFunction g = x.torqueCommandToMotorVelocity();
        MeasuredFrequencyResponse m = measured(w, engineResponse(g, w), 0, 1);
        assertEquals(0, ResponseComparison.of(m, g).logErrorRms(), 1e-12);
        ResponseComparison off = ResponseComparison.of(m, g.series(TransferFunction.gain(1.1)));
        // 20·log10(1.1) = 0.8279 dB, ln 1.1 = 0.09531, no phase error (definition of the decibel)
        assertEquals(0.8279, off.magnitudeRmsDb(), 1e-4);
        assertEquals(Math.log(1.1), off.logErrorRms(), 1e-12);
        assertEquals(0, off.phaseRmsDeg(), 1e-9);
        assertEquals(50, off.points());
    }

    @Test
    void twoMassFitNeedsAResonanceInsideTheBand() {
        RackAndPinionDrive x = rackAxis();
        double[] w = grid(100);
        MeasuredFrequencyResponse rigid = measured(w, engineResponse(x.torqueCommandToMotorVelocity(), w), 0, 1);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> PlantFit.fit(rigid,
                PlantFitModel.TWO_MASS, PlantFitOptions.defaults().withCurrentLoopBandwidth(x.currentLoopBandwidth())));
        assertTrue(e.getMessage().contains("no resonance peak inside the fit band"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> PlantFit.fit(rigid, PlantFitModel.RIGID,
                PlantFitOptions.defaults().withBand(1, 2)));
        assertTrue(e.getMessage().contains("0 points inside the fit band"), e.getMessage());
    }
}
