package org.tracewell.engine.axis;

/**
 * A rotary servo motor with its current loop.
 *
 * @param inertia rotor inertia (plus coupling), kg·m²
 * @param torqueConstant N·m/A
 * @param currentLoopBandwidth closed current-loop bandwidth, rad/s; +∞ for an ideal current loop
 */
public record DriveMotor(double inertia, double torqueConstant, double currentLoopBandwidth) {

    public DriveMotor {
        Checks.positive("motor inertia", inertia, "kg·m²");
        Checks.positive("torque constant", torqueConstant, "N·m/A");
        Checks.positiveOrInfinite("current-loop bandwidth", currentLoopBandwidth, "rad/s");
    }

    /** Motor with an ideal (infinitely fast) current loop. */
    public static DriveMotor withIdealCurrentLoop(double inertia, double torqueConstant) {
        return new DriveMotor(inertia, torqueConstant, Double.POSITIVE_INFINITY);
    }
}
