package org.tracewell.engine.axis;

import org.tracewell.engine.tf.TransferFunction;

/**
 * A plant given by its transfer function from motor torque to motor velocity (for example from a
 * measured frequency response fit); the load is taken to follow the motor rigidly through ρ, and
 * a load force acts like a torque ρ·F at the motor. The current loop is part of the given
 * function unless a finite bandwidth is added here.
 *
 * @param torqueToMotorVelocity ω_M/T, rad/s per N·m; strictly proper, no dead time
 * @param ratio ρ, load displacement per motor radian
 * @param equivalentInertia inertia the feedforward uses, kg·m²
 * @param currentLoopBandwidth rad/s; +∞ when the given function already contains the current loop
 * @param torqueConstant N·m/A
 * @param coulombFrictionTorque N·m at the motor
 */
public record TransferFunctionPlant(TransferFunction torqueToMotorVelocity, double ratio, double equivalentInertia,
        double currentLoopBandwidth, double torqueConstant, double coulombFrictionTorque) implements AxisPlant {

    public TransferFunctionPlant {
        if (torqueToMotorVelocity == null) {
            throw new IllegalArgumentException("the explicit plant needs a transfer function, got null");
        }
        if (!torqueToMotorVelocity.isStrictlyProper() || torqueToMotorVelocity.hasDelay()) {
            throw new IllegalArgumentException("the torque → velocity transfer function must be strictly proper and"
                    + " delay-free (model the delay in the controller's sample periods), got " + torqueToMotorVelocity);
        }
        Checks.positive("transmission ratio", ratio, "m/rad");
        Checks.positive("equivalent inertia", equivalentInertia, "kg·m²");
        Checks.positiveOrInfinite("current-loop bandwidth", currentLoopBandwidth, "rad/s");
        Checks.positive("torque constant", torqueConstant, "N·m/A");
        Checks.nonNegative("Coulomb friction torque", coulombFrictionTorque, "N·m");
    }

    /**
     * The explicit plant with the equivalent inertia read from the high-frequency asymptote
     * ω_M/T → 1/(J·s), which needs relative degree 1; torque constant 1 N·m/A (the command is the torque),
     * no Coulomb friction, the current loop taken as part of the given function.
     */
    public static TransferFunctionPlant of(TransferFunction torqueToMotorVelocity, double ratio) {
        if (torqueToMotorVelocity.relativeDegree() != 1) {
            throw new IllegalArgumentException("the inertia can be read from ω_M/T only at relative degree 1 (→ 1/(J·s)),"
                    + " got relative degree " + torqueToMotorVelocity.relativeDegree() + "; give the inertia explicitly");
        }
        double j = torqueToMotorVelocity.denominator().leadingCoefficient()
                / torqueToMotorVelocity.numerator().leadingCoefficient();
        return new TransferFunctionPlant(torqueToMotorVelocity, ratio, j, Double.POSITIVE_INFINITY, 1.0, 0.0);
    }

    @Override
    public DriveMechanics mechanics() {
        return DriveMechanics.ofVelocityTransfer(torqueToMotorVelocity, ratio);
    }
}
