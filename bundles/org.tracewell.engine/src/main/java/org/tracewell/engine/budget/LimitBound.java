package org.tracewell.engine.budget;

/** Which side of a design limit is allowed. */
public enum LimitBound {
    /** The design quantity must not exceed the limit (a largest allowed mismatch, feed or resolution). */
    AT_MOST("≤"),
    /** The design quantity must reach at least the limit (a smallest allowed position gain). */
    AT_LEAST("≥");

    private final String symbol;

    LimitBound(String symbol) {
        this.symbol = symbol;
    }

    /** "≤" or "≥". */
    public String symbol() {
        return symbol;
    }

    /** Whether {@code value} satisfies a limit of this kind at {@code limit}. */
    public boolean isSatisfiedBy(double value, double limit) {
        return this == AT_MOST ? value <= limit : value >= limit;
    }
}
