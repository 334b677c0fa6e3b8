package org.tracewell.engine.budget;

/**
 * One non-negative term of a combination: a budget line's contribution or an allocation, with its class.
 *
 * @param magnitude  metres, &gt;= 0 (for a random term: already at the budget's coverage, k·u)
 * @param errorClass decides how {@link CombinationMethod#SYSTEMATIC_PLUS_RSS} treats the term
 */
public record CombinationTerm(double magnitude, ErrorClass errorClass) {

    public CombinationTerm {
        BudgetChecks.requireNonNegative("combination term magnitude", magnitude, "m");
        BudgetChecks.requireNonNull("class of a combination term", errorClass);
    }
}
