package org.tracewell.engine.budget;

/** Where the value of a budget line comes from. */
public enum ValueOrigin {
    /** Produced by an engine analysis (loop, tracking or contour result); refreshed when the model changes. */
    COMPUTED("computed"),
    /** Typed in by the user (geometric, thermal and measured values); kept as entered. */
    ENTERED("entered");

    private final String displayName;

    ValueOrigin(String displayName) {
        this.displayName = displayName;
    }

    /** Lower-case name for tables and reports. */
    public String displayName() {
        return displayName;
    }
}
