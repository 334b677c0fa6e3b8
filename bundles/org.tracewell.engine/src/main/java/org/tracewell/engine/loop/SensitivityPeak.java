package org.tracewell.engine.loop;

/**
 * Peak of the sensitivity |S(jω)| = 1/|1 + L(jω)|; 1/Ms is the shortest distance of the
 * Nyquist curve to −1. Åström &amp; Murray (Feedback Systems, 2008) suggest Ms in 1.2–2.
 *
 * @param peak Ms
 * @param frequencyRadPerSec where the peak occurs
 */
public record SensitivityPeak(double peak, double frequencyRadPerSec) {
}
