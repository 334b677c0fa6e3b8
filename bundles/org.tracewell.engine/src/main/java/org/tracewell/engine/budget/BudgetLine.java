package org.tracewell.engine.budget;

/**
 * One line of an error budget.
 *
 * @param id                   stable identifier, unique within a budget
 * @param name                 human-readable name
 * @param axis                 axis name (X, Y, X2, C …), or {@code null} for a machine-wide line
 * @param source               physical origin of the error
 * @param value                stated value in metres: for a systematic line the error (its sign is ignored by
 *                             the combination), for a random line the quantity named by the distribution
 *                             (k·σ, half-width a or step q), which must be &gt;= 0
 * @param origin               computed by an analysis or entered by the user
 * @param errorClass           systematic or random
 * @param distribution         assumed distribution of the value; converts it to a standard uncertainty
 * @param statedCoverageFactor coverage factor k of a {@link Distribution#NORMAL} value (2 by default); ignored
 *                             by the other distributions
 * @param sensitivity          projection of the error onto the path normal (dimensionless, may be negative)
 * @param evidence             where the value comes from (analysis, measurement report, drawing); may be empty
 */
public record BudgetLine(String id, String name, String axis, SourceKind source, double value, ValueOrigin origin,
                         ErrorClass errorClass, Distribution distribution, double statedCoverageFactor,
                         double sensitivity, String evidence) {

    public BudgetLine {
        BudgetChecks.requireText("budget line id", id);
        BudgetChecks.requireNonNull("name of budget line " + id, name);
        if (axis != null && axis.isBlank()) {
            throw new IllegalArgumentException("axis of budget line " + id
                    + " is blank; give an axis name or null for a machine-wide line");
        }
        BudgetChecks.requireNonNull("source of budget line " + id, source);
        BudgetChecks.requireNonNull("origin of budget line " + id, origin);
        BudgetChecks.requireNonNull("class of budget line " + id, errorClass);
        BudgetChecks.requireNonNull("distribution of budget line " + id, distribution);
        BudgetChecks.requireNonNull("evidence of budget line " + id, evidence);
        if (errorClass == ErrorClass.RANDOM) {
            BudgetChecks.requireNonNegative("value of random budget line " + id, value, "m");
        } else {
            BudgetChecks.requireFinite("value of budget line " + id, value, "m");
        }
        BudgetChecks.requirePositive("stated coverage factor k of budget line " + id, statedCoverageFactor, "");
        BudgetChecks.requireFinite("sensitivity of budget line " + id, sensitivity, "");
    }

    /**
     * A systematic line with sensitivity 1, taken as a bound ±|value| (uniform distribution kept for
     * spread studies; it does not change the line's contribution).
     */
    public static BudgetLine systematic(String id, String name, String axis, SourceKind source, double value,
                                        String evidence) {
        return new BudgetLine(id, name, axis, source, value, source.usualOrigin(), ErrorClass.SYSTEMATIC,
                Distribution.UNIFORM, Distribution.DEFAULT_COVERAGE_FACTOR, 1.0, evidence);
    }

    /** A random line with sensitivity 1 whose value is an expanded uncertainty at k = 2 (normal). */
    public static BudgetLine random(String id, String name, String axis, SourceKind source, double value,
                                    String evidence) {
        return new BudgetLine(id, name, axis, source, value, source.usualOrigin(), ErrorClass.RANDOM,
                Distribution.NORMAL, Distribution.DEFAULT_COVERAGE_FACTOR, 1.0, evidence);
    }

    /** Whether the line belongs to the machine as a whole rather than one axis. */
    public boolean isMachineWide() {
        return axis == null;
    }

    /**
     * Standard uncertainty of the line projected onto the path normal, metres:
     * {@code |sensitivity| · u(value)} with the distribution's GUM conversion.
     */
    public double standardUncertainty() {
        return Math.abs(sensitivity) * distribution.standardUncertainty(value, statedCoverageFactor);
    }

    /**
     * The line's term in a combination, metres: {@code |sensitivity · value|} for a systematic line,
     * {@code k · standardUncertainty()} for a random line at the budget's coverage factor k.
     */
    public double contribution(double budgetCoverageFactor) {
        BudgetChecks.requirePositive("budget coverage factor k", budgetCoverageFactor, "");
        return errorClass == ErrorClass.SYSTEMATIC
                ? Math.abs(sensitivity * value)
                : budgetCoverageFactor * standardUncertainty();
    }

    /** A copy with another value (e.g. after re-running the analysis that computes it). */
    public BudgetLine withValue(double newValue) {
        return new BudgetLine(id, name, axis, source, newValue, origin, errorClass, distribution,
                statedCoverageFactor, sensitivity, evidence);
    }

    /** A copy with another sensitivity to the path normal. */
    public BudgetLine withSensitivity(double newSensitivity) {
        return new BudgetLine(id, name, axis, source, value, origin, errorClass, distribution,
                statedCoverageFactor, newSensitivity, evidence);
    }

    /** A copy with another distribution; {@code newStatedCoverageFactor} matters for a normal one only. */
    public BudgetLine withDistribution(Distribution newDistribution, double newStatedCoverageFactor) {
        return new BudgetLine(id, name, axis, source, value, origin, errorClass, newDistribution,
                newStatedCoverageFactor, sensitivity, evidence);
    }

    /** A copy with another class. */
    public BudgetLine withErrorClass(ErrorClass newErrorClass) {
        return new BudgetLine(id, name, axis, source, value, origin, newErrorClass, distribution,
                statedCoverageFactor, sensitivity, evidence);
    }

    /** A copy with another origin (for example a computed value overridden by a measured one). */
    public BudgetLine withOrigin(ValueOrigin newOrigin) {
        return new BudgetLine(id, name, axis, source, value, newOrigin, errorClass, distribution,
                statedCoverageFactor, sensitivity, evidence);
    }

    /** A copy with other evidence text. */
    public BudgetLine withEvidence(String newEvidence) {
        return new BudgetLine(id, name, axis, source, value, origin, errorClass, distribution,
                statedCoverageFactor, sensitivity, newEvidence);
    }
}
