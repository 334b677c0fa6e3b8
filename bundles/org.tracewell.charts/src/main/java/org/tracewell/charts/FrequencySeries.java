package org.tracewell.charts;

/**
 * One frequency response to draw, in SI: angular frequency in rad/s, magnitude as a ratio,
 * phase in radians (unwrapped by the caller). Charts show Hz, dB and degrees.
 */
public record FrequencySeries(String name, double[] omegaRadPerSec, double[] magnitude, double[] phaseRad) {

    public FrequencySeries {
        if (omegaRadPerSec.length != magnitude.length || omegaRadPerSec.length != phaseRad.length) {
            throw new IllegalArgumentException("series '" + name + "': " + omegaRadPerSec.length + " frequencies, "
                    + magnitude.length + " magnitudes and " + phaseRad.length + " phases; all must match");
        }
    }
}
