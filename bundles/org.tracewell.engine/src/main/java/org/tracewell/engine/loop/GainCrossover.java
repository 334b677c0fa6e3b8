package org.tracewell.engine.loop;

/**
 * One frequency where |L(jω)| = 1.
 *
 * @param frequencyRadPerSec ω_c
 * @param phaseMarginDeg 180° + ∠L(jω_c), normalised to (−180°, 180°]
 * @param delayMarginSeconds extra dead time that brings this crossing onto −1:
 *        (phase margin mod 360°) / ω_c
 */
public record GainCrossover(double frequencyRadPerSec, double phaseMarginDeg, double delayMarginSeconds) {
}
