package org.tracewell.engine.budget;

/**
 * The position gains a second axis may have so that its mismatch with a reference axis stays allowed:
 * |1/K_ref − 1/K| ≤ Δ ⇔ 1/(1/K_ref + Δ) ≤ K ≤ 1/(1/K_ref − Δ).
 *
 * @param referenceGain the reference axis's Kv, 1/s
 * @param maxMismatch   Δ, largest allowed |1/K_ref − 1/K|, s
 * @param lowest        smallest allowed Kv, 1/s
 * @param highest       largest allowed Kv, 1/s ({@code +∞} when Δ ≥ 1/K_ref)
 */
public record GainWindow(double referenceGain, double maxMismatch, double lowest, double highest) {

    /** The window around {@code referenceGain} (1/s, &gt; 0) for a mismatch of at most {@code maxMismatch} (s). */
    public static GainWindow around(double referenceGain, double maxMismatch) {
        BudgetChecks.requirePositive("reference position gain Kv", referenceGain, "1/s");
        if (!(maxMismatch >= 0.0)) {
            throw new IllegalArgumentException("largest allowed mismatch |1/Kx − 1/Ky| = " + maxMismatch
                    + " s is outside the valid range: >= 0 (or +infinity)");
        }
        double inverse = 1.0 / referenceGain;
        double lowest = 1.0 / (inverse + maxMismatch);
        double highest = maxMismatch >= inverse ? Double.POSITIVE_INFINITY : 1.0 / (inverse - maxMismatch);
        return new GainWindow(referenceGain, maxMismatch, lowest, highest);
    }

    /** Whether {@code gain} (1/s) lies in the window. */
    public boolean contains(double gain) {
        return gain >= lowest && gain <= highest;
    }
}
