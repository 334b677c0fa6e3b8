package org.tracewell.engine.axis;

import java.util.Optional;

/**
 * Ball-screw drive with an elastic axial chain between screw and load: the motor side (rotor,
 * coupling, screw) J_M = J_motor + J_screw/n² and the load side J_L = m·ρ² are joined by the axial
 * stiffness k_ax (screw, nut and bearing in series, depending on the nut position) and damping c_ax,
 * reflected as k = k_ax·ρ², c = c_ax·ρ². Friction acts on the load.
 *
 * @param motor motor and current loop
 * @param screwInertia kg·m²
 * @param loadMass kg
 * @param lead m per screw revolution
 * @param gearRatio motor revolutions per screw revolution
 * @param stiffnessChain screw, nut and bearing stiffness
 * @param nutPosition distance of the nut from the fixed bearing, m (where the model is evaluated)
 * @param axialDamping N·s/m across the axial chain
 * @param viscousFriction at the load, N·s/m
 * @param coulombFriction at the load, N
 */
public record TwoMassScrewDrive(DriveMotor motor, double screwInertia, double loadMass, double lead, double gearRatio,
        StiffnessChain stiffnessChain, double nutPosition, double axialDamping, double viscousFriction,
        double coulombFriction) implements AxisPlant {

    public TwoMassScrewDrive {
        if (motor == null || stiffnessChain == null) {
            throw new IllegalArgumentException("a two-mass screw drive needs a motor and a stiffness chain, got "
                    + motor + " and " + stiffnessChain);
        }
        Checks.nonNegative("screw inertia", screwInertia, "kg·m²");
        Checks.positive("load mass", loadMass, "kg");
        Checks.positive("screw lead", lead, "m/rev");
        Checks.positive("gear ratio", gearRatio, "(motor rev per screw rev)");
        Checks.nonNegative("axial damping", axialDamping, "N·s/m");
        Checks.nonNegative("viscous friction", viscousFriction, "N·s/m");
        Checks.nonNegative("Coulomb friction", coulombFriction, "N");
        stiffnessChain.stiffnessAt(nutPosition); // validates the nut position against the mounting
    }

    /** Damping c_ax = 2·ζ·√(k_ax·m) that gives the locked-motor axial mode the damping ratio ζ, N·s/m. */
    public static double dampingForRatio(double dampingRatio, double axialStiffness, double loadMass) {
        Checks.nonNegative("damping ratio", dampingRatio, "");
        return 2 * dampingRatio * Math.sqrt(axialStiffness * loadMass);
    }

    /** The same drive with the nut at another position, m. */
    public TwoMassScrewDrive atNutPosition(double position) {
        return new TwoMassScrewDrive(motor, screwInertia, loadMass, lead, gearRatio, stiffnessChain, position,
                axialDamping, viscousFriction, coulombFriction);
    }

    private double ratio() {
        return RigidScrewDrive.screwRatio(lead, gearRatio);
    }

    /** Axial stiffness of the chain at the current nut position, N/m. */
    public double axialStiffness() {
        return stiffnessChain.stiffnessAt(nutPosition);
    }

    /** Reflected torsional stiffness k_ax·ρ², N·m/rad. */
    public double reflectedStiffness() {
        double rho = ratio();
        return axialStiffness() * rho * rho;
    }

    /** Motor-side inertia J_M, kg·m². */
    public double motorSideInertia() {
        return motor.inertia() + screwInertia / (gearRatio * gearRatio);
    }

    /** Load-side inertia J_L = m·ρ², kg·m². */
    public double loadSideInertia() {
        double rho = ratio();
        return loadMass * rho * rho;
    }

    /**
     * First axial mode with the motor held, √(k_ax(a)/m), rad/s, at nut position a in metres: the
     * f ≈ (1/2π)·√(k/m) of the feed-drive literature, equal to the anti-resonance seen by the motor.
     */
    public double firstAxialModeRadPerSec(double position) {
        return Math.sqrt(stiffnessChain.stiffnessAt(position) / loadMass);
    }

    /** Resonance and anti-resonance of the undamped model at the current nut position. */
    public Resonance resonanceModel() {
        return Resonance.ofTwoMass(reflectedStiffness(), motorSideInertia(), loadSideInertia());
    }

    @Override
    public Optional<Resonance> resonance() {
        return Optional.of(resonanceModel());
    }

    @Override
    public double equivalentInertia() {
        return motorSideInertia() + loadSideInertia();
    }

    @Override
    public DriveMechanics mechanics() {
        double rho2 = ratio() * ratio();
        return DriveMechanics.twoMass(motorSideInertia(), loadSideInertia(), reflectedStiffness(),
                axialDamping * rho2, 0.0, viscousFriction * rho2, ratio());
    }

    @Override
    public double currentLoopBandwidth() {
        return motor.currentLoopBandwidth();
    }

    @Override
    public double torqueConstant() {
        return motor.torqueConstant();
    }

    @Override
    public double coulombFrictionTorque() {
        return coulombFriction * ratio();
    }
}
