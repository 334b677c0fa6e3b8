package org.tracewell.engine.axis;

/**
 * The first mechanical mode of a two-mass drive seen from the motor: the anti-resonance
 * √(k/J_L) (a zero pair of ω_M/T, the load swinging against a locked motor) and the resonance
 * √(k/J_L)·√(1 + J_L/J_M) (a pole pair, both masses swinging against each other), for the undamped
 * model (Ellis, Control System Design Guide, 4th ed., 2012).
 *
 * @param resonanceRadPerSec pole-pair frequency, rad/s
 * @param antiResonanceRadPerSec zero-pair frequency, rad/s
 */
public record Resonance(double resonanceRadPerSec, double antiResonanceRadPerSec) {

    public Resonance {
        Checks.positive("resonance frequency", resonanceRadPerSec, "rad/s");
        Checks.positive("anti-resonance frequency", antiResonanceRadPerSec, "rad/s");
    }

    /** From reflected stiffness k (N·m/rad) and inertias (kg·m²) of the undamped two-mass model. */
    public static Resonance ofTwoMass(double stiffness, double motorInertia, double loadInertia) {
        double anti = Math.sqrt(stiffness / loadInertia);
        return new Resonance(anti * Math.sqrt(1 + loadInertia / motorInertia), anti);
    }

    public double resonanceHz() {
        return resonanceRadPerSec / (2 * Math.PI);
    }

    public double antiResonanceHz() {
        return antiResonanceRadPerSec / (2 * Math.PI);
    }
}
