package org.tracewell.engine.loop;

/**
 * One frequency where L(jω) lies on the negative real axis (∠L = −180° mod 360°).
 *
 * @param frequencyRadPerSec ω_180
 * @param magnitude |L(jω_180)|
 * @param gainMarginDb −20·log10|L(jω_180)|; negative when the gain may only be reduced
 *        (conditionally stable loops)
 */
public record PhaseCrossover(double frequencyRadPerSec, double magnitude, double gainMarginDb) {
}
