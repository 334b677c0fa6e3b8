package org.tracewell.engine.axis;

/**
 * Linear motor driving the load directly. Its frame is linear: force N, velocity m/s, "inertia"
 * the moving mass in kg, ρ = 1.
 *
 * @param movingMass coil carriage plus load, kg
 * @param forceConstant N/A
 * @param currentLoopBandwidth rad/s; +∞ for an ideal current loop
 * @param viscousFriction N·s/m
 * @param coulombFriction N
 */
public record DirectLinearDrive(double movingMass, double forceConstant, double currentLoopBandwidth,
        double viscousFriction, double coulombFriction) implements AxisPlant {

    public DirectLinearDrive {
        Checks.positive("moving mass", movingMass, "kg");
        Checks.positive("force constant", forceConstant, "N/A");
        Checks.positiveOrInfinite("current-loop bandwidth", currentLoopBandwidth, "rad/s");
        Checks.nonNegative("viscous friction", viscousFriction, "N·s/m");
        Checks.nonNegative("Coulomb friction", coulombFriction, "N");
    }

    @Override
    public double equivalentInertia() {
        return movingMass;
    }

    @Override
    public DriveMechanics mechanics() {
        return DriveMechanics.rigid(movingMass, viscousFriction, 1.0);
    }

    @Override
    public double torqueConstant() {
        return forceConstant;
    }

    @Override
    public double coulombFrictionTorque() {
        return coulombFriction;
    }
}
