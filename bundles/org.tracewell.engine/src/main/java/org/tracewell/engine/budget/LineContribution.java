package org.tracewell.engine.budget;

/**
 * What one budget line adds to an evaluated total.
 *
 * @param line                the line
 * @param standardUncertainty |s|·u(v), metres (for every class; used by the combination for random lines only)
 * @param contribution        the line's term c_i in the combination, metres (see the package comment)
 * @param portion             part of the total attributed to the line, metres; portions add up to the total
 *                            (see {@link CombinationMethod#portions})
 * @param share               portion / total (0 when the total is 0)
 * @param rank                1 for the largest portion; ties broken by contribution, then by line id
 */
public record LineContribution(BudgetLine line, double standardUncertainty, double contribution, double portion,
                               double share, int rank) {
}
