package org.tracewell.engine.measured;

/**
 * Axis figures of ISO 230-2 (definitions of ISO 230-2:2014, from memory; coverage factor 2). Metres; ↑ is the
 * positive approach direction, ↓ the negative one.
 *
 * @param accuracy         A = max(x̄_i↑ + 2s_i↑, x̄_i↓ + 2s_i↓) − min(x̄_i↑ − 2s_i↑, x̄_i↓ − 2s_i↓)
 * @param accuracyUp       A↑ = max(x̄_i↑ + 2s_i↑) − min(x̄_i↑ − 2s_i↑)
 * @param accuracyDown     A↓ likewise
 * @param repeatability    R = max R_i (bidirectional)
 * @param repeatabilityUp  R↑ = max R_i↑
 * @param repeatabilityDown R↓ = max R_i↓
 * @param reversal         B = max |B_i|
 * @param meanReversal     B̄ = (1/m)·Σ B_i (signed)
 * @param systematic       E = max(x̄_i↑, x̄_i↓) − min(x̄_i↑, x̄_i↓), the bidirectional systematic positioning error
 * @param systematicUp     E↑ = max x̄_i↑ − min x̄_i↑
 * @param systematicDown   E↓ likewise
 * @param meanRange        M = max x̄_i − min x̄_i, the range of the mean bidirectional positional deviation
 */
public record PositioningFigures(double accuracy, double accuracyUp, double accuracyDown, double repeatability,
        double repeatabilityUp, double repeatabilityDown, double reversal, double meanReversal, double systematic,
        double systematicUp, double systematicDown, double meanRange) {
}
