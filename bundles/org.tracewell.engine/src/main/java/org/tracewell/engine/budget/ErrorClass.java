package org.tracewell.engine.budget;

/** How a budget line behaves from one run or machine to the next. */
public enum ErrorClass {
    /** Repeatable error with a known or bounded magnitude; adds arithmetically where the method says so. */
    SYSTEMATIC("systematic"),
    /** Independent random error; combined in quadrature at the budget's coverage factor. */
    RANDOM("random");

    private final String displayName;

    ErrorClass(String displayName) {
        this.displayName = displayName;
    }

    /** Lower-case name for tables and reports. */
    public String displayName() {
        return displayName;
    }
}
