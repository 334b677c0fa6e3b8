package org.tracewell.engine.budget;

/**
 * The limit a budget total must meet, with the fraction of it held back as reserve.
 *
 * @param limit           target total, metres, finite and &gt; 0
 * @param reserveFraction fraction of the limit held back, in [0, 1); 10-25 % is usual (common practice)
 */
public record BudgetTarget(double limit, double reserveFraction) {

    public BudgetTarget {
        BudgetChecks.requirePositive("target", limit, "m");
        BudgetChecks.requireReserveFraction(reserveFraction);
    }

    /** A target with no reserve. */
    public static BudgetTarget withoutReserve(double limit) {
        return new BudgetTarget(limit, 0.0);
    }

    /** The part of the limit the budget may use: (1 − reserve)·limit, metres. */
    public double allowedTotal() {
        return (1.0 - reserveFraction) * limit;
    }
}
