package org.tracewell.engine.measured;

import java.util.function.ToDoubleFunction;

/**
 * Which ISO 230-2 axis figure becomes a budget line, and how it enters the budget: the ranges of mean deviations
 * (E, M), the reversal values (B) and the accuracies (A) as systematic values; the repeatabilities (R = 4s wide,
 * ±2s) as random values, a normal distribution stated at k = 4 so that the line's standard uncertainty is s.
 */
public enum PositioningFigure {
    ACCURACY("A", "bidirectional accuracy A", false, PositioningFigures::accuracy),
    ACCURACY_UP("A↑", "unidirectional accuracy A↑", false, PositioningFigures::accuracyUp),
    ACCURACY_DOWN("A↓", "unidirectional accuracy A↓", false, PositioningFigures::accuracyDown),
    REPEATABILITY("R", "bidirectional repeatability R", true, PositioningFigures::repeatability),
    REPEATABILITY_UP("R↑", "unidirectional repeatability R↑", true, PositioningFigures::repeatabilityUp),
    REPEATABILITY_DOWN("R↓", "unidirectional repeatability R↓", true, PositioningFigures::repeatabilityDown),
    REVERSAL("B", "reversal value B", false, PositioningFigures::reversal),
    MEAN_REVERSAL("B̄", "mean reversal value B̄", false, PositioningFigures::meanReversal),
    SYSTEMATIC("E", "bidirectional systematic positioning error E", false, PositioningFigures::systematic),
    SYSTEMATIC_UP("E↑", "unidirectional systematic positioning error E↑", false, PositioningFigures::systematicUp),
    SYSTEMATIC_DOWN("E↓", "unidirectional systematic positioning error E↓", false, PositioningFigures::systematicDown),
    MEAN_RANGE("M", "range of the mean bidirectional positional deviation M", false, PositioningFigures::meanRange);

    /** A repeatability R = 4s spans ±2s: stated as k·σ with k = 4, its standard uncertainty is s. */
    public static final double REPEATABILITY_COVERAGE = 4;

    private final String symbol;
    private final String displayName;
    private final boolean random;
    private final ToDoubleFunction<PositioningFigures> value;

    PositioningFigure(String symbol, String displayName, boolean random, ToDoubleFunction<PositioningFigures> value) {
        this.symbol = symbol;
        this.displayName = displayName;
        this.random = random;
        this.value = value;
    }

    public String symbol() {
        return symbol;
    }

    public String displayName() {
        return displayName;
    }

    /** Whether the figure enters a budget as a random (repeatability) value. */
    public boolean random() {
        return random;
    }

    /** The figure's value, metres. */
    public double of(PositioningFigures figures) {
        return value.applyAsDouble(figures);
    }
}
