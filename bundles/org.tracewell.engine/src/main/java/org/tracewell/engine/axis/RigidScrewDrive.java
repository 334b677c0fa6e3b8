package org.tracewell.engine.axis;

/**
 * Ball-screw drive with a rigid transmission: motor (through an optional gear) turning a screw
 * that moves the load. Reflected to the motor: J = J_motor + J_screw/n² + m·ρ², with
 * ρ = h/(2π·n) the load travel per motor radian.
 *
 * @param motor motor and current loop
 * @param screwInertia screw inertia, kg·m² (see {@link ScrewShaft#inertia()})
 * @param loadMass moving mass (table, workpiece, nut), kg
 * @param lead screw lead h, m per screw revolution
 * @param gearRatio n, motor revolutions per screw revolution (1 for a direct coupling)
 * @param viscousFriction at the load, N·s/m
 * @param coulombFriction at the load, N
 */
public record RigidScrewDrive(DriveMotor motor, double screwInertia, double loadMass, double lead, double gearRatio,
        double viscousFriction, double coulombFriction) implements AxisPlant {

    public RigidScrewDrive {
        if (motor == null) {
            throw new IllegalArgumentException("a screw drive needs a motor, got null");
        }
        Checks.nonNegative("screw inertia", screwInertia, "kg·m²");
        Checks.nonNegative("load mass", loadMass, "kg");
        Checks.positive("screw lead", lead, "m/rev");
        Checks.positive("gear ratio", gearRatio, "(motor rev per screw rev)");
        Checks.nonNegative("viscous friction", viscousFriction, "N·s/m");
        Checks.nonNegative("Coulomb friction", coulombFriction, "N");
    }

    /** The same drive with the screw inertia computed from its dimensions (π·ρ·L·d⁴/32). */
    public static RigidScrewDrive withScrew(DriveMotor motor, ScrewShaft screw, double loadMass, double lead,
            double gearRatio, double viscousFriction, double coulombFriction) {
        return new RigidScrewDrive(motor, screw.inertia(), loadMass, lead, gearRatio, viscousFriction,
                coulombFriction);
    }

    /** ρ = h/(2π·n), m/rad. */
    public static double screwRatio(double lead, double gearRatio) {
        return lead / (2 * Math.PI * gearRatio);
    }

    /** Load mass reflected to the motor, m·ρ², kg·m². */
    public double reflectedLoadInertia() {
        double rho = screwRatio(lead, gearRatio);
        return loadMass * rho * rho;
    }

    @Override
    public double equivalentInertia() {
        return motor.inertia() + screwInertia / (gearRatio * gearRatio) + reflectedLoadInertia();
    }

    @Override
    public DriveMechanics mechanics() {
        double rho = screwRatio(lead, gearRatio);
        return DriveMechanics.rigid(equivalentInertia(), viscousFriction * rho * rho, rho);
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
        return coulombFriction * screwRatio(lead, gearRatio);
    }
}
