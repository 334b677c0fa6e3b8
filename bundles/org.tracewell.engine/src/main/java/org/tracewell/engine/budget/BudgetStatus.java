package org.tracewell.engine.budget;

/** Outcome of comparing a budget total with its target. */
public enum BudgetStatus {
    /** The total is within the target less its reserve. */
    MET("met"),
    /** The total exceeds the target less its reserve. */
    VIOLATED("violated"),
    /** No target was given. */
    NOT_EVALUATED("not evaluated");

    private final String displayName;

    BudgetStatus(String displayName) {
        this.displayName = displayName;
    }

    /** Lower-case name for tables and reports. */
    public String displayName() {
        return displayName;
    }
}
