package org.tracewell.engine.loop;

import java.util.List;
import java.util.OptionalDouble;

/**
 * Stability margins of a loop L(s), every crossing listed.
 * <p>
 * Summary values: the gain margin is the phase-crossover entry closest to 0 dB (the
 * smallest change of gain, up or down, that reaches −1; +∞ when the phase never crosses
 * −180°); the phase margin is the smallest over all gain crossovers (+∞ when |L| never
 * crosses 1); the delay margin is the smallest over all gain crossovers (+∞ without a gain
 * crossover). Margins describe the Nyquist distance to −1; whether the closed loop is stable
 * is decided from its poles ({@link LoopAnalysis#stable()}).
 *
 * @param gainCrossovers every |L| = 1 crossing, ascending frequency
 * @param phaseCrossovers every −180° crossing, ascending frequency
 * @param gainMarginDb summary gain margin in dB
 * @param phaseCrossoverRadPerSec frequency of the summary gain margin; empty when there is none
 * @param phaseMarginDeg summary phase margin in degrees
 * @param gainCrossoverRadPerSec frequency of the summary phase margin; empty when there is none
 * @param delayMarginSeconds summary delay margin
 */
public record Margins(List<GainCrossover> gainCrossovers, List<PhaseCrossover> phaseCrossovers,
        double gainMarginDb, OptionalDouble phaseCrossoverRadPerSec, double phaseMarginDeg,
        OptionalDouble gainCrossoverRadPerSec, double delayMarginSeconds) {

    public Margins {
        gainCrossovers = List.copyOf(gainCrossovers);
        phaseCrossovers = List.copyOf(phaseCrossovers);
    }

    /** Summary gain margin as a factor (10^(dB/20)). */
    public double gainMarginFactor() {
        return Math.pow(10, gainMarginDb / 20);
    }
}
