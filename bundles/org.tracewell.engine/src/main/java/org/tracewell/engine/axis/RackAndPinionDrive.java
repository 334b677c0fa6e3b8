package org.tracewell.engine.axis;

/**
 * Rack-and-pinion drive, rigid: ρ = r/n, J = J_motor + J_pinion/n² + m·ρ² (m·r² for a direct pinion).
 *
 * @param motor motor and current loop
 * @param pinionInertia kg·m²
 * @param pinionRadius pitch radius r, m
 * @param gearRatio n, motor revolutions per pinion revolution
 * @param loadMass kg
 * @param viscousFriction at the load, N·s/m
 * @param coulombFriction at the load, N
 */
public record RackAndPinionDrive(DriveMotor motor, double pinionInertia, double pinionRadius, double gearRatio,
        double loadMass, double viscousFriction, double coulombFriction) implements AxisPlant {

    public RackAndPinionDrive {
        if (motor == null) {
            throw new IllegalArgumentException("a rack-and-pinion drive needs a motor, got null");
        }
        Checks.nonNegative("pinion inertia", pinionInertia, "kg·m²");
        Checks.positive("pinion pitch radius", pinionRadius, "m");
        Checks.positive("gear ratio", gearRatio, "(motor rev per pinion rev)");
        Checks.nonNegative("load mass", loadMass, "kg");
        Checks.nonNegative("viscous friction", viscousFriction, "N·s/m");
        Checks.nonNegative("Coulomb friction", coulombFriction, "N");
    }

    private double ratio() {
        return pinionRadius / gearRatio;
    }

    @Override
    public double equivalentInertia() {
        return motor.inertia() + pinionInertia / (gearRatio * gearRatio) + loadMass * ratio() * ratio();
    }

    @Override
    public DriveMechanics mechanics() {
        return DriveMechanics.rigid(equivalentInertia(), viscousFriction * ratio() * ratio(), ratio());
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
