package org.tracewell.engine.axis;

import java.util.Optional;
import java.util.OptionalDouble;

import org.tracewell.engine.loop.LoopAnalysis;
import org.tracewell.engine.loop.LoopAnalyzer;
import org.tracewell.engine.loop.LoopFrequencyAnalysis;
import org.tracewell.engine.loop.Margins;
import org.tracewell.engine.loop.SteadyState;
import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.sim.AxisLoop;
import org.tracewell.engine.sim.ContinuousStateSpace;
import org.tracewell.engine.tf.PadeDelay;
import org.tracewell.engine.tf.TransferFunction;

/**
 * An axis under a single-loop {@link PidController}. Closed-form loop algebra as in {@link AxisModel},
 * with C = n/d the controller times the delay's Padé approximant, 1/d_i the current lag and N_m the
 * sensor numerator:
 * <pre>
 *   Φ     = d·d_i·s·Q + ρ·n·N_m
 *   x_L/r = K·n_D·(ρ·n_c + d_c·(k_vff·b·s + k_aff·J·s²)) / Φ
 *   x_L/F = ρ²·(A_M·d·d_i + χ·ρ·n) / Φ,   χ = 1 for a motor encoder on a compliant drive, else 0
 * </pre>
 *
 * @param name axis name
 * @param plant drive plant
 * @param controller PID controller
 * @param sensor position sensor
 * @param padeOrder Padé order for the dead time inside closed loops
 */
public record PidAxisModel(String name, AxisPlant plant, PidController controller, PositionSensor sensor,
        int padeOrder) {

    public PidAxisModel {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("axis name must not be blank, got '" + name + "'");
        }
        if (plant == null || controller == null || sensor == null) {
            throw new IllegalArgumentException("axis '" + name + "' needs a plant, a controller and a sensor, got "
                    + plant + ", " + controller + ", " + sensor);
        }
        if (padeOrder < 1 || padeOrder > PadeDelay.MAX_ORDER) {
            throw new IllegalArgumentException("Padé order of axis '" + name + "' must be 1.." + PadeDelay.MAX_ORDER
                    + ", got " + padeOrder);
        }
    }

    public static PidAxisModel of(String name, AxisPlant plant, PidController controller) {
        return new PidAxisModel(name, plant, controller, PositionSensor.MOTOR, AxisModel.DEFAULT_PADE_ORDER);
    }

    public PidAxisModel withSensor(PositionSensor s) {
        return new PidAxisModel(name, plant, controller, s, padeOrder);
    }

    private final class Parts {
        final DriveMechanics mech = plant.mechanics();
        final TransferFunction c = controller.controller();
        final TransferFunction delay = controller.deadTime() == 0 ? TransferFunction.ONE
                : PadeDelay.of(controller.deadTime(), padeOrder);
        final Polynomial n = c.numerator().multiply(delay.numerator());
        final Polynomial d = c.denominator().multiply(delay.denominator());
        final Polynomial di = plant.currentLoopLagDenominator();
        final double rho = mech.ratio();
        final Polynomial sensorNumerator = sensor == PositionSensor.MOTOR ? mech.motorTorqueNumerator() : mech.coupling();
        final Polynomial feedback = n.multiply(sensorNumerator).scale(rho);
        final Polynomial phi = d.multiply(di).multiply(mech.q()).multiplyByPowerOfS(1).add(feedback);
        final Polynomial phiBound = d.abs().multiply(di.abs()).multiply(mech.q().abs()).multiplyByPowerOfS(1)
                .add(feedback.abs());
        final Polynomial common = mech.coupling().multiply(delay.numerator());
        // total viscous friction b = b_M + b_L (two-mass), or Q(0)/N(0) of ω_M/T = N/Q (rigid or explicit)
        final double viscous = mech.compliant()
                ? mech.motorTorqueNumerator().coefficient(1) + mech.loadForceNumerator().coefficient(1)
                        - 2 * mech.coupling().coefficient(1)
                : mech.q().coefficient(0) / mech.motorTorqueNumerator().coefficient(0);

        Polynomial referenceNumerator(double vff, double aff) {
            Polynomial ff = Polynomial.ofAscending(0, vff * viscous, aff * plant.equivalentInertia());
            return c.numerator().scale(rho).add(c.denominator().multiply(ff));
        }
    }

    /** Open loop C·e^(−s·T_d)·(current lag)·x_m/T, dead time exact. */
    public TransferFunction openLoop() {
        DriveMechanics mech = plant.mechanics();
        TransferFunction toMeasured = sensor == PositionSensor.MOTOR ? mech.torqueToMotorPosition()
                : mech.torqueToLoadPosition();
        return controller.controller().withDelay(controller.deadTime()).series(plant.currentLoopLag())
                .series(toMeasured);
    }

    /** Reference → load position with feedforward. */
    public TransferFunction referenceToPosition() {
        Parts p = new Parts();
        return TransferFunction.of(p.common.multiply(p.referenceNumerator(controller.velocityFeedforward(),
                controller.accelerationFeedforward())), p.phi);
    }

    /** Load force → load position, m/N. */
    public TransferFunction compliance() {
        Parts p = new Parts();
        Polynomial z = p.mech.loadForceNumerator().multiply(p.d).multiply(p.di);
        if (sensor == PositionSensor.MOTOR && p.mech.compliant()) {
            z = z.add(p.n.scale(p.rho));
        }
        return TransferFunction.of(z.scale(p.rho * p.rho), p.phi);
    }

    /** Static stiffness against a constant load force, N/m (+∞ with integral action). */
    public double staticStiffness() {
        double dc = compliance().dcGain();
        return dc == 0 ? Double.POSITIVE_INFINITY : 1.0 / dc;
    }

    private SteadyState errorSteadyState(double vff, double aff, boolean stable) {
        Parts p = new Parts();
        Polynomial tracked = p.common.multiply(p.referenceNumerator(vff, aff));
        return SteadyState.ofErrorTransfer(p.phi.subtract(tracked), p.phiBound.add(tracked.abs()), p.phi, stable);
    }

    /** Loop analysis (dead time as Padé of this model's order, margins also exact) and tracking figures. */
    public PidAxisDynamics analyze() {
        TransferFunction loop = openLoop();
        LoopAnalysis analysis = LoopAnalyzer.analyze(loop.withPadeDelay(padeOrder), null);
        Margins exact = LoopFrequencyAnalysis.margins(loop);
        boolean stable = analysis.stable();
        OptionalDouble gainAtResonance = OptionalDouble.empty();
        Optional<Resonance> resonance = plant.resonance();
        if (resonance.isPresent()) {
            double[] v = new double[2];
            loop.evaluateAtFrequency(resonance.get().resonanceRadPerSec(), v);
            gainAtResonance = OptionalDouble.of(20 * Math.log10(Math.hypot(v[0], v[1])));
        }
        return new PidAxisDynamics(name, analysis, exact, errorSteadyState(controller.velocityFeedforward(),
                controller.accelerationFeedforward(), stable), errorSteadyState(0, 0, stable), resonance,
                gainAtResonance, staticStiffness());
    }

    /** Closed loop as state space, inputs (r, ṙ, r̈), output load position. */
    public ContinuousStateSpace closedLoopStateSpace() {
        Parts p = new Parts();
        Polynomial[] numerators = {
            p.common.multiply(p.c.numerator()).scale(p.rho),
            p.common.multiply(p.c.denominator()).scale(controller.velocityFeedforward() * p.viscous),
            p.common.multiply(p.c.denominator()).scale(controller.accelerationFeedforward() * plant.equivalentInertia())
        };
        return AxisModel.observableRealisation(p.phi, numerators);
    }

    public AxisLoop toAxisLoop() {
        return AxisLoop.of(name, closedLoopStateSpace());
    }
}
