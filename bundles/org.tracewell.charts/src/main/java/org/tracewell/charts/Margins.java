package org.tracewell.charts;

/**
 * Margins to mark on a Bode chart, SI; any field may be NaN when undefined (no crossing).
 *
 * @param gainCrossoverRadPerSec where |L| = 1
 * @param phaseMarginRad 180° + ∠L at the gain crossover
 * @param phaseCrossoverRadPerSec where ∠L = −180°
 * @param gainMarginRatio 1/|L| at the phase crossover
 */
public record Margins(double gainCrossoverRadPerSec, double phaseMarginRad, double phaseCrossoverRadPerSec,
        double gainMarginRatio) {

    public static final Margins NONE = new Margins(Double.NaN, Double.NaN, Double.NaN, Double.NaN);
}
