package org.tracewell.charts;

/** One contributor of an error budget to draw: its label and its portion of the total, metres (≥ 0). */
public record BudgetBar(String label, double portion) {

    public BudgetBar {
        if (!(portion >= 0) || !Double.isFinite(portion)) {
            throw new IllegalArgumentException("budget bar '" + label + "': portion must be finite and ≥ 0 m, got "
                    + portion);
        }
    }
}
