package org.tracewell.engine.measured;

import org.tracewell.engine.axis.Resonance;

/**
 * The two-mass part of a fitted plant, in the motor-side rotary frame (as {@code DriveMechanics} uses it).
 *
 * @param motorInertia J_M, kg·m² (kg for a linear motor)
 * @param loadInertia  J_L, kg·m², reflected to the motor
 * @param stiffness    k, N·m/rad, reflected
 * @param damping      c across the spring, N·m·s/rad, reflected
 * @param dampingRatio ζ = c/(2·√(k·J_L)) of the anti-resonance (the locked-motor mode)
 * @param resonance    resonance √(k/J_L)·√(1 + J_L/J_M) and anti-resonance √(k/J_L) of the undamped model
 */
public record TwoMassParameters(double motorInertia, double loadInertia, double stiffness, double damping,
        double dampingRatio, Resonance resonance) {
}
