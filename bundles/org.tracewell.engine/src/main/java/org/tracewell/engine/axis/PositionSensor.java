package org.tracewell.engine.axis;

/** Where the position loop measures: the motor encoder (through ρ) or a linear scale on the load. */
public enum PositionSensor {
    /** Rotary encoder on the motor; position = ρ·θ_M. Compliance and screw wind-up lie outside the loop. */
    MOTOR,
    /** Linear scale (or table encoder) on the load; the mechanical mode lies inside the position loop. */
    LOAD
}
