package org.tracewell.engine.axis;

/**
 * Rotary table through a gear (worm, belt or planetary), rigid: ρ = 1/n rad per motor rad,
 * J = J_motor + J_table/n². Load position is the table angle in radians; the load "force" is a
 * torque on the table, N·m.
 *
 * @param motor motor and current loop
 * @param tableInertia table plus workpiece, kg·m²
 * @param gearRatio n, motor revolutions per table revolution
 * @param viscousFriction at the table, N·m·s/rad
 * @param coulombFriction at the table, N·m
 */
public record RotaryTable(DriveMotor motor, double tableInertia, double gearRatio, double viscousFriction,
        double coulombFriction) implements AxisPlant {

    public RotaryTable {
        if (motor == null) {
            throw new IllegalArgumentException("a rotary table needs a motor, got null");
        }
        Checks.nonNegative("table inertia", tableInertia, "kg·m²");
        Checks.positive("gear ratio", gearRatio, "(motor rev per table rev)");
        Checks.nonNegative("viscous friction", viscousFriction, "N·m·s/rad");
        Checks.nonNegative("Coulomb friction", coulombFriction, "N·m");
    }

    /** Table inertia reflected to the motor, J_table/n², kg·m². */
    public double reflectedTableInertia() {
        return tableInertia / (gearRatio * gearRatio);
    }

    @Override
    public double equivalentInertia() {
        return motor.inertia() + reflectedTableInertia();
    }

    @Override
    public DriveMechanics mechanics() {
        return DriveMechanics.rigid(equivalentInertia(), viscousFriction / (gearRatio * gearRatio), 1.0 / gearRatio);
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
        return coulombFriction / gearRatio;
    }
}
