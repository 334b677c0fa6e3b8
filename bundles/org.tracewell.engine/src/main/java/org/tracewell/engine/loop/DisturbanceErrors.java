package org.tracewell.engine.loop;

/**
 * Steady-state error E = R − Y caused by a disturbance added at the plant input, with R = 0
 * (Nise, Control Systems Engineering, §7.5): E(s)/D(s) = −P/(1 + C·P·H). Signed: a positive
 * disturbance that pushes the output up gives a negative error. ±∞ means unbounded.
 *
 * @param unitStep error for a constant disturbance of 1 (e.g. a load force of 1 N)
 * @param unitRamp error for a disturbance growing at 1 per second
 */
public record DisturbanceErrors(double unitStep, double unitRamp) {

    /** Error for a constant disturbance d0. */
    public double step(double d0) {
        return d0 == 0 ? 0.0 : unitStep * d0;
    }
}
