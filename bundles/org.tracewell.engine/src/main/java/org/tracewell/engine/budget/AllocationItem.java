package org.tracewell.engine.budget;

/**
 * An axis or error category that receives part of a machine target.
 *
 * @param name       item name (axis X, "thermal", …), unique within one apportionment
 * @param weight     relative weight, finite and &gt;= 0 (allocations are proportional to it)
 * @param errorClass how the item's allocation combines under {@link CombinationMethod#SYSTEMATIC_PLUS_RSS};
 *                   the other methods ignore it
 */
public record AllocationItem(String name, double weight, ErrorClass errorClass) {

    public AllocationItem {
        BudgetChecks.requireText("allocation item name", name);
        BudgetChecks.requireNonNegative("weight of allocation item " + name, weight, "");
        BudgetChecks.requireNonNull("class of allocation item " + name, errorClass);
    }

    /** An item of weight 1, for equal apportionment. */
    public static AllocationItem equal(String name, ErrorClass errorClass) {
        return new AllocationItem(name, 1.0, errorClass);
    }
}
