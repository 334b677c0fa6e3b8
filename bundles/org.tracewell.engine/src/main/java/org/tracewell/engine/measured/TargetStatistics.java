package org.tracewell.engine.measured;

/**
 * ISO 230-2 statistics at one target position P_i (definitions of ISO 230-2:2014, from memory; coverage factor 2,
 * i.e. ±2s). Metres throughout.
 *
 * @param target               P_i
 * @param meanUp               mean unidirectional positional deviation x̄_i↑ = (1/n)·Σ_j x_ij↑
 * @param meanDown             x̄_i↓
 * @param standardUncertaintyUp estimator s_i↑ = √(Σ_j (x_ij↑ − x̄_i↑)² / (n − 1)) of the unidirectional
 *                             standard uncertainty
 * @param standardUncertaintyDown s_i↓
 */
public record TargetStatistics(double target, double meanUp, double meanDown, double standardUncertaintyUp,
        double standardUncertaintyDown) {

    /** Mean bidirectional positional deviation x̄_i = (x̄_i↑ + x̄_i↓)/2. */
    public double meanBidirectional() {
        return (meanUp + meanDown) / 2;
    }

    /** Reversal value B_i = x̄_i↑ − x̄_i↓ (signed). */
    public double reversal() {
        return meanUp - meanDown;
    }

    /** Unidirectional repeatability R_i↑ = 4·s_i↑ (the ±2s band). */
    public double repeatabilityUp() {
        return 4 * standardUncertaintyUp;
    }

    /** R_i↓ = 4·s_i↓. */
    public double repeatabilityDown() {
        return 4 * standardUncertaintyDown;
    }

    /** Bidirectional repeatability R_i = max(2s_i↑ + 2s_i↓ + |B_i|, R_i↑, R_i↓). */
    public double repeatability() {
        return Math.max(2 * standardUncertaintyUp + 2 * standardUncertaintyDown + Math.abs(reversal()),
                Math.max(repeatabilityUp(), repeatabilityDown()));
    }
}
