package org.tracewell.engine.budget;

/**
 * A budget total against its target.
 *
 * @param target          target limit, metres
 * @param reserveFraction fraction of the target held back
 * @param allowedTotal    (1 − reserve)·target, metres
 * @param total           budget total, metres
 * @param margin          target − total, metres (negative when the target itself is exceeded)
 * @param marginPercent   100·margin/target
 * @param reserveMargin   allowedTotal − total, metres: what is left after keeping the reserve
 * @param withinTarget    total ≤ target, ignoring the reserve
 * @param status          {@link BudgetStatus#MET} when total ≤ allowedTotal, else {@link BudgetStatus#VIOLATED}
 */
public record TargetComparison(double target, double reserveFraction, double allowedTotal, double total,
                               double margin, double marginPercent, double reserveMargin, boolean withinTarget,
                               BudgetStatus status) {

    /**
     * Relative slack on the comparisons. It absorbs the last-bit rounding of a budget built exactly from an
     * {@link Apportionment} (whose allocations combine to the allowed total), so such a budget is met.
     */
    public static final double ROUNDING_SLACK = 1e-12;

    /** Compares {@code total} (metres, finite, &gt;= 0) with {@code budgetTarget}. */
    public static TargetComparison of(BudgetTarget budgetTarget, double total) {
        BudgetChecks.requireNonNull("budget target", budgetTarget);
        BudgetChecks.requireNonNegative("budget total", total, "m");
        double target = budgetTarget.limit();
        double allowed = budgetTarget.allowedTotal();
        double margin = target - total;
        boolean within = total <= target * (1.0 + ROUNDING_SLACK);
        boolean reserveKept = total <= allowed * (1.0 + ROUNDING_SLACK);
        return new TargetComparison(target, budgetTarget.reserveFraction(), allowed, total, margin,
                100.0 * margin / target, allowed - total, within,
                reserveKept ? BudgetStatus.MET : BudgetStatus.VIOLATED);
    }
}
