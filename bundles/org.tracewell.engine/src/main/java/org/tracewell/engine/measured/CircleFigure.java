package org.tracewell.engine.measured;

/** Which figure of a measured circular test becomes a budget line (ISO 230-4 terms). */
public enum CircleFigure {
    /** Circular deviation G, the larger of the measured runs. */
    CIRCULAR_DEVIATION("G", "circular deviation G"),
    /** Radial deviation F, the larger of the measured runs. */
    RADIAL_DEVIATION("F", "radial deviation F"),
    /** Bidirectional circular deviation G(b); needs a CW and a CCW run. */
    BIDIRECTIONAL_DEVIATION("G(b)", "bidirectional circular deviation G(b)");

    private final String symbol;
    private final String displayName;

    CircleFigure(String symbol, String displayName) {
        this.symbol = symbol;
        this.displayName = displayName;
    }

    public String symbol() {
        return symbol;
    }

    public String displayName() {
        return displayName;
    }
}
