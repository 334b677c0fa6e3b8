package org.tracewell.engine.measured;

/**
 * How a plant is fitted to a measured response.
 *
 * @param currentLoopBandwidth known closed current-loop bandwidth ω_i, rad/s, taken as the lag 1/(s/ω_i + 1) in
 *                             front of the mechanics; +∞ when the measurement starts at the torque itself
 * @param fitDeadTime          whether a pure dead time (sampling, computation) is fitted along; otherwise it is 0
 * @param minOmega             lowest frequency used, rad/s (0 for all)
 * @param maxOmega             highest frequency used, rad/s (+∞ for all)
 * @param maxIterations        Levenberg–Marquardt iteration limit
 */
public record PlantFitOptions(double currentLoopBandwidth, boolean fitDeadTime, double minOmega, double maxOmega,
        int maxIterations) {

    public PlantFitOptions {
        if (!(currentLoopBandwidth > 0)) {
            throw new IllegalArgumentException("current-loop bandwidth must be > 0 rad/s (or +Infinity for an ideal"
                    + " current loop), got " + currentLoopBandwidth);
        }
        if (!(minOmega >= 0) || !(maxOmega > minOmega)) {
            throw new IllegalArgumentException("fit band must satisfy 0 <= min < max rad/s, got " + minOmega + " .. "
                    + maxOmega);
        }
        if (maxIterations < 1) {
            throw new IllegalArgumentException("iteration limit must be >= 1, got " + maxIterations);
        }
    }

    /** Ideal current loop, dead time fitted, the whole band, 500 iterations. */
    public static PlantFitOptions defaults() {
        return new PlantFitOptions(Double.POSITIVE_INFINITY, true, 0, Double.POSITIVE_INFINITY, 500);
    }

    public PlantFitOptions withCurrentLoopBandwidth(double radPerSec) {
        return new PlantFitOptions(radPerSec, fitDeadTime, minOmega, maxOmega, maxIterations);
    }

    public PlantFitOptions withDeadTime(boolean fit) {
        return new PlantFitOptions(currentLoopBandwidth, fit, minOmega, maxOmega, maxIterations);
    }

    public PlantFitOptions withBand(double minRadPerSec, double maxRadPerSec) {
        return new PlantFitOptions(currentLoopBandwidth, fitDeadTime, minRadPerSec, maxRadPerSec, maxIterations);
    }
}
