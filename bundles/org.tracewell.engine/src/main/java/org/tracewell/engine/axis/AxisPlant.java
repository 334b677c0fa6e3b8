package org.tracewell.engine.axis;

import java.util.Optional;

import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.tf.TransferFunction;

/**
 * A drive plant: the mechanics from motor torque (or force) to motor velocity and load position,
 * the current loop as a first-order lag from torque command to torque, and the figures the
 * loop design needs (equivalent inertia, transmission ratio, friction).
 */
public sealed interface AxisPlant
        permits RigidScrewDrive, TwoMassScrewDrive, RackAndPinionDrive, DirectLinearDrive, RotaryTable,
        TransferFunctionPlant {

    /** Linear mechanics (viscous friction included, Coulomb friction not: it is nonlinear). */
    DriveMechanics mechanics();

    /** Total inertia seen by the motor, kg·m² (kg for a direct linear drive). */
    double equivalentInertia();

    /** ρ: load displacement per motor radian, m/rad (rad/rad for a rotary table, 1 for a linear motor). */
    default double loadPerMotorRadian() {
        return mechanics().ratio();
    }

    /** Closed current-loop bandwidth, rad/s; +∞ for an ideal current loop. */
    double currentLoopBandwidth();

    /** Motor torque (or force) per ampere, N·m/A (N/A). */
    double torqueConstant();

    /** Coulomb friction reflected to the motor, N·m (N for a linear motor). */
    double coulombFrictionTorque();

    /** First mechanical mode; empty for a rigid drive. */
    default Optional<Resonance> resonance() {
        return Optional.empty();
    }

    /** Current loop as the lag 1/(s/ω_i + 1) from torque command to torque; 1 when ideal. */
    default TransferFunction currentLoopLag() {
        return TransferFunction.of(Polynomial.ONE, currentLoopLagDenominator());
    }

    /** Denominator s/ω_i + 1 of the current-loop lag (1 when ideal). */
    default Polynomial currentLoopLagDenominator() {
        double w = currentLoopBandwidth();
        return Double.isInfinite(w) ? Polynomial.ONE : Polynomial.ofAscending(1.0, 1.0 / w);
    }

    /** Torque command → motor velocity, current lag included; rad/s per N·m. */
    default TransferFunction torqueCommandToMotorVelocity() {
        return currentLoopLag().series(mechanics().torqueToMotorVelocity());
    }

    /** Torque command → load position, current lag included; m per N·m. */
    default TransferFunction torqueCommandToLoadPosition() {
        return currentLoopLag().series(mechanics().torqueToLoadPosition());
    }
}
