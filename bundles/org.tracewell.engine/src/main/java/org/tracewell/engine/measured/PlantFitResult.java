package org.tracewell.engine.measured;

import java.util.Optional;

import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.tf.TransferFunction;

/**
 * A plant fitted to a measured torque-command → motor-velocity response.
 *
 * @param model                fitted structure
 * @param source               the measurement fitted
 * @param totalInertia         J = J_M + J_L seen by the motor, kg·m² (kg for a linear motor)
 * @param viscousDamping       b, N·m·s/rad at the motor (at the load side for the two-mass model)
 * @param twoMass              motor/load split, stiffness, damping and the mode; empty for the rigid model
 * @param deadTime             fitted pure dead time, s (0 when not fitted)
 * @param currentLoopBandwidth the current-loop bandwidth the fit assumed, rad/s (+∞: ideal)
 * @param quality              the fitted response against the measured points it was fitted to (unweighted)
 * @param iterations           Levenberg–Marquardt iterations
 * @param evaluations          model evaluations (Jacobians by finite differences included)
 */
public record PlantFitResult(PlantFitModel model, MeasurementSource source, double totalInertia, double viscousDamping,
        Optional<TwoMassParameters> twoMass, double deadTime, double currentLoopBandwidth, ResponseComparison quality,
        int iterations, int evaluations) {

    /** ω_M/T of the fitted mechanics, rad/s per N·m, delay-free and without the current loop. */
    public TransferFunction mechanics() {
        return mechanics(totalInertia, viscousDamping, twoMass);
    }

    /** The whole fitted response: current-loop lag, mechanics and the dead time (exact). */
    public TransferFunction torqueCommandToMotorVelocity() {
        return withDrive(mechanics(), currentLoopBandwidth, deadTime);
    }

    static TransferFunction mechanics(double totalInertia, double b, Optional<TwoMassParameters> twoMass) {
        if (twoMass.isEmpty()) {
            return TransferFunction.of(Polynomial.ONE, Polynomial.ofAscending(b, totalInertia));
        }
        TwoMassParameters t = twoMass.get();
        double jm = t.motorInertia();
        double jl = t.loadInertia();
        double k = t.stiffness();
        double c = t.damping();
        Polynomial numerator = Polynomial.ofAscending(k, b + c, jl);
        Polynomial denominator = Polynomial.ofAscending(k * b, k * (jm + jl) + c * b, jm * (b + c) + jl * c, jm * jl);
        return TransferFunction.of(numerator, denominator);
    }

    /** Current-loop lag 1/(s/ω_i + 1) in front of {@code mechanics}, and a dead time. */
    static TransferFunction withDrive(TransferFunction mechanics, double currentLoopBandwidth, double deadTime) {
        Polynomial lag = Double.isInfinite(currentLoopBandwidth) ? Polynomial.ONE
                : Polynomial.ofAscending(1.0, 1.0 / currentLoopBandwidth);
        return TransferFunction.of(Polynomial.ONE, lag).series(mechanics).withDelay(deadTime);
    }
}
